package org.meridian.ui;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Toolkit;
import java.awt.datatransfer.StringSelection;
import java.awt.event.MouseEvent;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.table.JTableHeader;
import org.meridian.core.Study;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.io.AtomicFiles;
import org.meridian.io.OutputGuard;
import org.meridian.measure.Measure;
import org.meridian.measure.MeasureRequest;
import org.meridian.measure.MeasureSettings;
import org.meridian.measure.MeasureTable;
import org.meridian.measure.Measurement;
import org.meridian.measure.Measures;
import org.meridian.measure.Polarity;
import org.meridian.signal.ConditionWave;
import org.meridian.signal.GrandAverage;
import org.meridian.signal.TimeWindow;

/**
 * The measures of DESIGN §6.3 for the time window and the selected channels, for every shown
 * wave: the grand average's row first, each participant's on request. Polarity positive or
 * negative (peaks and areas), or signed (areas of the signed wave; no peaks). Sortable by any
 * column, and the sort order survives every refresh; Copy puts the rows on screen on the
 * clipboard as tab-separated text; Export writes the tidy table ({@link MeasureTable}, every
 * participant and the grand average) through {@link AtomicFiles}. Recomputed in a background
 * task whenever the window or channels change or new averages arrive (a newer request cancels an
 * older one); the value-at-cursor column reads the grand averages the model holds. With no wave
 * shown or no channel selected the table is emptied and says why.
 */
final class MeasuresPanel extends JPanel {
    private final Workbench bench;
    private final MeasureRows rows = new MeasureRows();
    private final JTable table = new JTable(rows) {
        @Override
        protected JTableHeader createDefaultTableHeader() {
            return new JTableHeader(columnModel) {
                @Override
                public String getToolTipText(MouseEvent e) {
                    int c = columnAtPoint(e.getPoint());
                    return c < 0 ? null : rows.description(convertColumnIndexToModel(c));
                }
            };
        }
    };
    private final JLabel scope = new JLabel(" ");
    private final JComboBox<Polarity> polarity = new JComboBox<>(Polarity.values());
    private final JCheckBox participants = new JCheckBox("Participants");
    private final JLabel warnings = new JLabel();
    private Result last;

    MeasuresPanel(Workbench bench) {
        super(new BorderLayout());
        this.bench = bench;
        setName("measures");
        setMinimumSize(new Dimension(220, 140));
        JPanel header = new JPanel(new BorderLayout());
        header.setBorder(BorderFactory.createEmptyBorder(2, 6, 2, 6));
        JPanel top = new JPanel(new WrapLayout(4, 2));
        JLabel title = new JLabel("Measures");
        title.putClientProperty("FlatLaf.styleClass", "h4");
        top.add(title);
        polarity.setName("measures.polarity");
        polarity.setToolTipText("<html>Peaks and areas of the positive or of the negative deflections;"
                + "<br>signed: the area of the signed wave (and its fractional area latency), no peaks</html>");
        polarity.setRenderer(new javax.swing.DefaultListCellRenderer() {
            @Override
            public java.awt.Component getListCellRendererComponent(javax.swing.JList<?> l, Object v,
                    int i, boolean s, boolean f) {
                return super.getListCellRendererComponent(l, polarityWord((Polarity) v), i, s, f);
            }
        });
        polarity.addActionListener(e -> recompute());
        participants.setName("measures.participants");
        participants.setToolTipText("Show each participant's row under the grand average's");
        participants.addActionListener(e -> {
            if (participants.isSelected() && last != null && !last.withParticipants()) {
                recompute();
            } else {
                showTable(rows.table());
            }
        });
        JButton copy = new JButton("Copy");
        copy.setName("measures.copy");
        copy.setToolTipText("Copy the rows on screen as tab-separated text");
        copy.addActionListener(e -> copy());
        JButton export = new JButton("Export…");
        export.setName("measures.export");
        export.setToolTipText("Write the tidy measure table (every participant and the grand average) as TSV");
        export.addActionListener(e -> exportTable());
        top.add(polarity);
        top.add(participants);
        top.add(copy);
        top.add(export);
        header.add(top, BorderLayout.NORTH);
        scope.setName("measures.scope");
        warnings.setName("measures.warnings");
        JPanel line = new JPanel(new BorderLayout(8, 0));
        line.add(scope, BorderLayout.CENTER);
        line.add(warnings, BorderLayout.EAST);
        header.add(line, BorderLayout.SOUTH);
        add(header, BorderLayout.NORTH);
        table.setName("measures.table");
        table.setAutoCreateRowSorter(true);
        table.setAutoResizeMode(JTable.AUTO_RESIZE_OFF);
        table.setFillsViewportHeight(true);
        add(new JScrollPane(table), BorderLayout.CENTER);

        // shown waves and participants change the model's averages, which arrive as AVERAGES
        bench.state().addListener((s, what) -> {
            if (what.contains(ViewState.Aspect.WINDOW) || what.contains(ViewState.Aspect.CHANNELS)) {
                recompute();
            } else if (what.contains(ViewState.Aspect.CURSOR)) {
                followCursor();
            }
        });
        bench.model().addListener((m, what) -> {
            if (what.contains(ViewModel.Change.AVERAGES) || what.contains(ViewModel.Change.SESSION)) {
                recompute();
            }
        });
    }

    /** How the polarity box names a polarity. */
    static String polarityWord(Polarity p) {
        return p == null ? "" : switch (p) {
            case POSITIVE -> "positive";
            case NEGATIVE -> "negative";
            case SIGNED -> "signed area";
        };
    }

    /** The measures that apply with a polarity (a signed polarity has areas and no peaks). */
    static List<Measure> measuresFor(MeasureSettings settings) {
        List<Measure> out = new ArrayList<>();
        for (Measure m : Measures.all()) {
            try {
                m.check(settings);
                out.add(m);
            } catch (org.meridian.core.BadInputException e) {
                // this measure does not apply with these settings: no column for it
            }
        }
        return out;
    }

    JTable table() {
        return table;
    }

    /** The text above the table: window and channels measured. */
    String scopeText() {
        return scope.getText();
    }

    private void recompute() {
        StudySession session = bench.model().session();
        ViewState s = bench.state();
        Averages averages = bench.model().averages();
        List<String> waves = new ArrayList<>();
        for (String name : s.shownWaves()) {
            if (bench.model().entry(name) != null) {
                waves.add(name);
            }
        }
        if (session == null || waves.isEmpty() || s.selectedChannels().isEmpty()) {
            bench.tasks().cancel("measures");
            last = null;
            rows.clear();
            warnings.setText("");
            warnings.setToolTipText(null);
            scope.setText(session == null ? " " : waves.isEmpty() ? "No wave shown: tick a condition or contrast"
                    : "No channel selected: click one on the scalp map");
            return;
        }
        TimeWindow window = new TimeWindow(s.windowStartMs(), s.windowEndMs());
        MeasureSettings settings = MeasureSettings.defaults().withPolarity((Polarity) polarity.getSelectedItem());
        MeasureRequest.Builder b = MeasureRequest.builder()
                .window(window)
                .settings(settings)
                .grand(true)
                .excluded(s.excludedParticipants());
        for (String name : waves) {
            b.condition(bench.model().entry(name).wave());
        }
        for (String c : s.selectedChannels()) {
            b.channel(c);
        }
        List<Measure> measures = measuresFor(settings);
        for (Measure m : measures) {
            b.measure(m);
        }
        MeasureRequest request = b.build();
        Unit unit = session.study().unit();
        List<String> units = new ArrayList<>();
        for (Measure m : measures) {
            units.add(m.unit(unit));
        }
        String channels = String.join(", ", s.selectedChannels());
        String scopeText = Texts.window(s.windowStartMs(), s.windowEndMs()) + "  ·  " + channels;
        boolean withParticipants = participants.isSelected();
        Map<String, float[]> grand = grandSeries(averages, request);
        Study study = bench.model().study();
        bench.tasks().submit("measures", "Measures",
                p -> new Result(Measurement.run(study, request),
                        withParticipants ? participantSeries(study, request, grand) : grand,
                        measures, units, withParticipants),
                result -> {
                    last = result;
                    showTable(result.table());
                    scope.setText(scopeText);
                    showWarnings(result.table());
                    followCursor();
                }, bench::report);
    }

    /** A measure table, its measures and units, and the wave behind each of its rows. */
    private record Result(MeasureTable table, Map<String, float[]> series, List<Measure> measures,
            List<String> units, boolean withParticipants) {
        float[] seriesOf(String participant, String condition, String channel) {
            return series.get(key(participant, condition, channel));
        }
    }

    private static String key(String participant, String condition, String channel) {
        return participant + "\u0000" + condition + "\u0000" + channel.toLowerCase(java.util.Locale.ROOT);
    }

    /**
     * The grand average's wave behind each grand-average row, for the value at the cursor: read
     * from the model's averages (computed once for the same participants), never recomputed.
     */
    private static Map<String, float[]> grandSeries(Averages averages, MeasureRequest request) {
        Map<String, float[]> out = new HashMap<>();
        for (ConditionWave wave : request.conditions()) {
            Averages.WaveAverage w = averages.wave(wave.name());
            if (w == null) {
                continue;
            }
            Waveforms grand = w.grand();
            for (String ch : request.channels()) {
                int c = grand.indexOf(ch);
                if (c >= 0) {
                    out.put(key(MeasureTable.GRAND, wave.name(), ch), grand.channel(c));
                }
            }
        }
        return out;
    }

    /** The grand average's waves and each included participant's (off the event thread). */
    private static Map<String, float[]> participantSeries(Study study, MeasureRequest request,
            Map<String, float[]> grand) {
        Map<String, float[]> out = new HashMap<>(grand);
        for (ConditionWave wave : request.conditions()) {
            for (int p = 0; p < study.participants().size(); p++) {
                String name = study.participants().get(p);
                if (GrandAverage.isExcluded(name, request.excluded())) {
                    continue;
                }
                Waveforms w = wave.forParticipant(study, p);
                for (String ch : request.channels()) {
                    int c = w.indexOf(ch);
                    if (c >= 0) {
                        out.put(key(name, wave.name(), ch), w.channel(c));
                    }
                }
            }
        }
        return out;
    }

    private void followCursor() {
        ViewState s = bench.state();
        StudySession session = bench.model().session();
        // the model's update event repaints the value-at-cursor column's cells and nothing else
        rows.cursor(s.cursorSample(), Texts.ms(s.cursorMs()),
                session == null ? "µV" : session.study().unit().symbol());
    }

    /** The title of the value-at-cursor column's tool tip, e.g. {@code At 352 ms}. */
    String cursorText() {
        return rows.cursorColumnName();
    }

    /**
     * Shows the last result's rows (participants' too when ticked). The sort order the researcher
     * chose survives: the model keeps its columns when they are unchanged, and otherwise the sort
     * keys are put back on the columns of the same name.
     */
    private void showTable(MeasureTable t) {
        if (t == null || last == null) {
            return;
        }
        List<javax.swing.RowSorter.SortKey> keys = table.getRowSorter() == null ? List.of()
                : List.copyOf(table.getRowSorter().getSortKeys());
        List<String> names = columnNames();
        boolean sameColumns = rows.show(t, last.measures(), last.units(), participants.isSelected(), last::seriesOf);
        if (!sameColumns && table.getRowSorter() != null) {
            List<javax.swing.RowSorter.SortKey> kept = new ArrayList<>();
            for (javax.swing.RowSorter.SortKey k : keys) {
                int column = k.getColumn() < names.size() ? columnNames().indexOf(names.get(k.getColumn())) : -1;
                if (column >= 0) {
                    kept.add(new javax.swing.RowSorter.SortKey(column, k.getSortOrder()));
                }
            }
            table.getRowSorter().setSortKeys(kept);
        }
        sizeColumns();
    }

    private List<String> columnNames() {
        List<String> out = new ArrayList<>();
        for (int c = 0; c < rows.getColumnCount(); c++) {
            out.add(rows.getColumnName(c));
        }
        return out;
    }

    private void showWarnings(MeasureTable t) {
        if (t.warnings().isEmpty()) {
            warnings.setText("");
            warnings.setToolTipText(null);
            return;
        }
        warnings.setText(t.warnings().size() + (t.warnings().size() == 1 ? " note" : " notes"));
        StringBuilder sb = new StringBuilder("<html>");
        t.warnings().stream().limit(20).forEach(w -> sb.append(escape(w.describe())).append("<br>"));
        if (t.warnings().size() > 20) {
            sb.append("… and ").append(t.warnings().size() - 20).append(" more");
        }
        warnings.setToolTipText(sb.append("</html>").toString());
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    private void sizeColumns() {
        java.awt.FontMetrics fm = table.getFontMetrics(table.getFont());
        for (int c = 0; c < table.getColumnCount(); c++) {
            int w = fm.stringWidth(table.getColumnName(c)) + 24;
            for (int r = 0; r < Math.min(50, table.getRowCount()); r++) {
                Object v = table.getValueAt(r, c);
                w = Math.max(w, fm.stringWidth(String.valueOf(v)) + 16);
            }
            table.getColumnModel().getColumn(c).setPreferredWidth(w);
        }
    }

    /**
     * The rows on screen, in their sorted order, as tab-separated text with a header line; values
     * in full precision with a plain minus, so a spreadsheet reads them as numbers.
     */
    String rowsAsTsv() {
        StringBuilder sb = new StringBuilder();
        for (int c = 0; c < table.getColumnCount(); c++) {
            sb.append(c == 0 ? "" : "\t").append(table.getColumnName(c));
        }
        sb.append('\n');
        for (int r = 0; r < table.getRowCount(); r++) {
            for (int c = 0; c < table.getColumnCount(); c++) {
                Object v = table.getValueAt(r, c);
                String text = v == null ? ""
                        : v instanceof MeasureRows.Value m ? MeasureTable.formatValue(m.value()) : v.toString();
                sb.append(c == 0 ? "" : "\t").append(text);
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    private void copy() {
        Toolkit.getDefaultToolkit().getSystemClipboard().setContents(new StringSelection(rowsAsTsv()), null);
        bench.message("copied " + table.getRowCount() + " rows of measures");
    }

    /** Asks where to write the tidy table and writes it in the background. */
    void exportTable() {
        MeasureTable t = rows.table();
        if (t == null) {
            bench.message("no measures to export yet");
            return;
        }
        JFileChooser chooser = new JFileChooser();
        chooser.setDialogTitle("Export the measure table (TSV)");
        chooser.setSelectedFile(new java.io.File("measures.tsv"));
        if (chooser.showSaveDialog(this) == JFileChooser.APPROVE_OPTION) {
            export(chooser.getSelectedFile().toPath(), t);
        }
    }

    /** Writes the tidy table to a file through {@link AtomicFiles}, off the event thread. */
    void export(Path target, MeasureTable t) {
        Study study = bench.model().study();
        bench.tasks().submit("export", "Exporting measures", p -> {
            if (study != null) {
                OutputGuard.requireNotInput(study, "the measure table", target);
            }
            AtomicFiles.writeString(target, t.toTsv());
            return target;
        }, done -> bench.message("wrote " + t.rows().size() + " measures to " + done), bench::report);
    }
}
