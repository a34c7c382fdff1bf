package org.meridian.ui;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Component;
import java.awt.Container;
import java.awt.Window;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JDialog;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSpinner;
import javax.swing.JTextField;
import javax.swing.UIManager;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.figure.ExportFormat;
import org.meridian.figure.FigureDrawing;
import org.meridian.figure.Figures;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.FigureWidth;
import org.meridian.signal.TimeWindow;

/**
 * The figure composer: starts from what the window shows ({@link FigureFromView}), lets the
 * researcher pick the width, channels (or regions such as {@code P3+Pz+P4}), map times, a GFP
 * trace and panel letters, previews the figure at its true size (zoomable), and exports it — the
 * figure through the same code as the {@code figure} command, so the SVG is the same bytes, and
 * its spec beside it ({@code name.json}), so the command can make it again. Previews and exports
 * run as background tasks with progress in the status bar; nothing here blocks the event thread.
 */
final class FigureComposerDialog extends JDialog {
    private static final long serialVersionUID = 1L;
    private static final String[] ZOOMS = {"50 %", "75 %", "100 % (true size)", "150 %", "200 %"};
    private static final double[] ZOOM_FACTORS = {0.5, 0.75, 1, 1.5, 2};
    private static final String[] WIDTHS = {"One column (85 mm)", "Two columns (175 mm)"};

    private final transient ViewState state;
    private final transient ViewModel model;
    private final Window owner;
    private final JComboBox<String> width = new JComboBox<>(WIDTHS);
    private final JTextField channels = new JTextField(16);
    private final JTextField times = new JTextField(22);
    private final JCheckBox gfp = new JCheckBox("GFP trace");
    private final JCheckBox letters = new JCheckBox("Panel letters", true);
    private final JComboBox<String> zoom = new JComboBox<>(ZOOMS);
    private final FigurePreview preview = new FigurePreview();
    private final JTextField file = new JTextField(28);
    private final JComboBox<Integer> dpi = new JComboBox<>(new Integer[] {300, 600});
    private final JButton export = new JButton("Export");
    private final JLabel status = new JLabel(" ");
    private transient FigureSpec spec;

    FigureComposerDialog(Window owner, ViewState state, ViewModel model) {
        super(owner, "Figure", ModalityType.MODELESS);
        this.owner = owner;
        this.state = state;
        this.model = model;
        setName("figure.composer");
        setDefaultCloseOperation(DISPOSE_ON_CLOSE);
        JPanel content = new JPanel(new BorderLayout(0, 6));
        content.setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        content.add(choices(), BorderLayout.NORTH);
        JScrollPane scroll = new JScrollPane(preview);
        scroll.setName("figure.scroll");
        content.add(scroll, BorderLayout.CENTER);
        content.add(exportRow(), BorderLayout.SOUTH);
        setContentPane(content);
        setSize(1100, 720);
        setLocationRelativeTo(owner);
        fromView();
    }

    private JPanel choices() {
        JPanel row = new JPanel(new WrapLayout(6, 2));
        width.setName("figure.width");
        channels.setName("figure.channels");
        channels.setToolTipText("Channels, each a waveform panel; join channels with + for a region (P3+Pz+P4)");
        times.setName("figure.times");
        times.setToolTipText("The maps: times in ms (280, 310) or windows (280:310, 310:340), separated by commas");
        gfp.setName("figure.gfp");
        letters.setName("figure.letters");
        zoom.setName("figure.zoom");
        zoom.setSelectedIndex(2);
        JButton fromView = new JButton("From view");
        fromView.setName("figure.fromView");
        fromView.setToolTipText("Start again from what the window shows now");
        row.add(new JLabel("Width"));
        row.add(width);
        row.add(new JLabel("Channels"));
        row.add(channels);
        row.add(new JLabel("Maps (ms)"));
        row.add(times);
        row.add(gfp);
        row.add(letters);
        row.add(new JLabel("Zoom"));
        row.add(zoom);
        row.add(fromView);
        width.addActionListener(e -> refresh());
        channels.addActionListener(e -> refresh());
        times.addActionListener(e -> refresh());
        gfp.addActionListener(e -> refresh());
        letters.addActionListener(e -> refresh());
        zoom.addActionListener(e -> rezoom());
        fromView.addActionListener(e -> fromView());
        return row;
    }

    private JPanel exportRow() {
        JPanel row = new JPanel(new WrapLayout(6, 2));
        file.setName("figure.file");
        file.setToolTipText("The figure file: .svg, .pdf, .png or .tiff; its spec is saved beside it as .json");
        JButton browse = new JButton("Browse…");
        browse.setName("figure.browse");
        browse.addActionListener(e -> browse());
        dpi.setName("figure.dpi");
        dpi.setToolTipText("Resolution of PNG and TIFF files");
        export.setName("figure.export");
        export.addActionListener(e -> export());
        status.setName("figure.status");
        row.add(new JLabel("Save as"));
        row.add(file);
        row.add(browse);
        row.add(new JLabel("dpi"));
        row.add(dpi);
        row.add(export);
        row.add(status);
        return row;
    }

    /** Fills the choices from the window's view and previews. */
    void fromView() {
        FigureFromView.Choices c = FigureFromView.suggested(state, mapCount(owner), waveformMode(owner));
        width.setSelectedIndex(c.width().mm() > FigureWidth.ONE_COLUMN.mm() ? 1 : 0);
        channels.setText(String.join(", ", c.channels()));
        List<String> t = new ArrayList<>();
        c.mapTimesMs().forEach(v -> t.add(TimeWindow.format(v)));
        c.mapWindowsMs().forEach(w -> t.add(TimeWindow.format(w.get(0)) + ":" + TimeWindow.format(w.get(1))));
        times.setText(String.join(", ", t));
        gfp.setSelected(c.spanTrace());
        refresh();
    }

    /** The span view's map count, as its spinner shows it (the default when there is none). */
    private static int mapCount(Component root) {
        if (root instanceof JSpinner s && "span.count".equals(s.getName()) && s.getValue() instanceof Integer n) {
            return n;
        }
        if (root instanceof Container c) {
            for (Component child : c.getComponents()) {
                int n = mapCount(child);
                if (n > 0) {
                    return n;
                }
            }
        }
        return root == null || root instanceof Window ? SpanPanel.DEFAULT_MAPS : -1;
    }

    /** The mode of the window's waveform view, or null when there is none. */
    private static WaveformMode waveformMode(Component root) {
        if (root instanceof WaveformPanel w) {
            return w.mode();
        }
        if (root instanceof Container c) {
            for (Component child : c.getComponents()) {
                WaveformMode m = waveformMode(child);
                if (m != null) {
                    return m;
                }
            }
        }
        return null;
    }

    private FigureFromView.Choices readChoices() {
        List<String> picked = new ArrayList<>();
        for (String part : channels.getText().split(",")) {
            if (!part.isBlank()) {
                picked.add(part.trim());
            }
        }
        List<Double> ms = new ArrayList<>();
        List<List<Double>> windows = new ArrayList<>();
        for (String part : times.getText().split(",")) {
            if (part.isBlank()) {
                continue;
            }
            if (part.indexOf(':', 1) > 0) {
                TimeWindow w = TimeWindow.parse(part);
                windows.add(List.of(w.startMs(), w.endMs()));
            } else {
                try {
                    ms.add(Double.parseDouble(part.trim()));
                } catch (NumberFormatException e) {
                    throw new BadInputException("maps: \"" + part.trim() + "\" is not a time in ms (300) or a window (300:350)");
                }
            }
        }
        if (!ms.isEmpty() && !windows.isEmpty()) {
            throw new BadInputException("maps: give times (300, 350) or windows (300:350, 350:400), not both");
        }
        FigureWidth w = width.getSelectedIndex() == 1 ? FigureWidth.TWO_COLUMN : FigureWidth.ONE_COLUMN;
        return new FigureFromView.Choices(w, picked, ms, windows, gfp.isSelected(), letters.isSelected());
    }

    private Path studyPath() {
        return model.session() == null ? null : model.session().source().orElse(null);
    }

    /** Rebuilds the spec from the choices and computes the preview in the background. */
    void refresh() {
        if (!rebuildSpec()) {
            return;
        }
        Study study = model.session().study();
        FigureSpec wanted = spec;
        double pixels = preview.devicePixelsPerPoint();
        say("Drawing…", false);
        model.tasks().submit("figure.preview", "Figure preview",
                p -> FigurePreview.render(Figures.draw(wanted, study), pixels),
                rendered -> {
                    preview.show(rendered);
                    FigureDrawing drawing = rendered.figure();
                    say(String.format(Locale.ROOT, "%.0f × %.1f mm", drawing.widthMm(), drawing.heightMm()), false);
                },
                this::failed);
    }

    /** Shows the preview at the chosen zoom: the image is drawn again for it in the background. */
    private void rezoom() {
        preview.setZoom(ZOOM_FACTORS[zoom.getSelectedIndex()]);
        FigureDrawing shown = preview.figure();
        if (shown == null) {
            return;
        }
        double pixels = preview.devicePixelsPerPoint();
        model.tasks().submit("figure.preview", "Figure preview", p -> FigurePreview.render(shown, pixels),
                preview::show, this::failed);
    }

    /** Makes the spec from the choices as they stand (typed text counts even before Enter). */
    private boolean rebuildSpec() {
        if (model.session() == null) {
            say("Open a study first", true);
            return false;
        }
        try {
            Path source = studyPath();
            spec = FigureFromView.build(state, model, readChoices(),
                    source == null ? model.session().study().name() : source.toString());
            return true;
        } catch (BadInputException e) {
            spec = null;
            say(e.getMessage(), true);
            return false;
        }
    }

    private void browse() {
        JFileChooser chooser = new JFileChooser();
        chooser.setDialogTitle("Save figure");
        if (!file.getText().isBlank()) {
            chooser.setSelectedFile(Path.of(file.getText().trim()).toFile());
        }
        if (chooser.showSaveDialog(this) == JFileChooser.APPROVE_OPTION) {
            file.setText(chooser.getSelectedFile().getPath());
        }
    }

    /**
     * Exports the figure and its spec beside it, in the background; a study with no file or
     * folder (the simulated demo) is first written beside the figure ({@link FigureComposerExport}).
     */
    void export() {
        Path study = studyPath();
        if (!rebuildSpec()) {
            return;
        }
        if (file.getText().isBlank()) {
            say("Choose where to save the figure", true);
            return;
        }
        Path target = Path.of(file.getText().trim()).toAbsolutePath();
        ExportFormat format;
        try {
            format = ExportFormat.of(target);
        } catch (BadInputException e) {
            say(e.getMessage(), true);
            return;
        }
        FigureSpec wanted = spec;
        Study data = model.session().study();
        int resolution = (Integer) dpi.getSelectedItem();
        export.setEnabled(false);
        say(study == null ? "Saving the study beside the figure, then exporting…" : "Exporting…", false);
        model.tasks().submit("figure.export", "Figure export",
                p -> FigureComposerExport.run(wanted, data, study, target, resolution, p), done -> {
                    export.setEnabled(true);
                    String saved = "Saved " + done.figure().getFileName() + " ("
                            + format.extension().toUpperCase(Locale.ROOT) + ") and " + done.spec().getFileName();
                    say(done.writtenStudy() == null ? saved : saved + "; the study had no folder, so it was saved as "
                            + done.writtenStudy().getFileName() + " beside them", false);
                }, e -> {
                    export.setEnabled(true);
                    failed(e);
                }, () -> {
                    export.setEnabled(true);
                    say("Export cancelled", false);
                });
    }

    private void failed(Throwable t) {
        if (t instanceof BadInputException) {
            say(t.getMessage(), true);
        } else {
            say("The figure could not be made: " + t, true);
        }
    }

    private void say(String text, boolean problem) {
        status.setText(text);
        Color error = UIManager.getColor("Component.error.focusedBorderColor");
        status.setForeground(problem ? (error != null ? error : Color.RED) : UIManager.getColor("Label.foreground"));
    }

    FigurePreview preview() {
        return preview;
    }
}
