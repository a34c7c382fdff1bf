package org.meridian.ui;

import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.Dimension;
import java.util.EnumMap;
import java.util.Map;
import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JToggleButton;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;

/**
 * The waveform view: one channel with its interval bands, the selected channels overlaid, every
 * channel at its place on the scalp, or every channel over each other with the GFP beneath. A row
 * of buttons above switches between them; the interval choice applies to the one-channel plot.
 * Charts are rebuilt from the model's averages when waves, channels, participants, polarity,
 * processing or theme change; the cursor and the window band are an overlay and cost no rebuild.
 * When the averages were processed (reference, filter, baseline), the header says how.
 */
final class WaveformPanel extends JPanel {
    private final Workbench bench;
    private final CardLayout cards = new CardLayout();
    private final JPanel deck = new JPanel(cards);
    private final TimeChartPanel chartPanel;
    private final ScalpLayoutView layoutView;
    private final Map<WaveformMode, JToggleButton> modeButtons = new EnumMap<>(WaveformMode.class);
    private final JComboBox<IntervalKind> intervals = new JComboBox<>(IntervalKind.values());
    private final JLabel processing = new JLabel();
    private WaveformMode mode = WaveformMode.ONE_CHANNEL;

    WaveformPanel(Workbench bench) {
        super(new BorderLayout());
        this.bench = bench;
        setName("waveforms");
        setMinimumSize(new Dimension(320, 200));
        chartPanel = new TimeChartPanel(bench, new JFreeChart(new XYPlot()));
        chartPanel.setName("waveforms.chart");
        layoutView = new ScalpLayoutView(bench);
        deck.add(chartPanel, "chart");
        deck.add(layoutView, "layout");
        add(header(), BorderLayout.NORTH);
        add(deck, BorderLayout.CENTER);

        bench.state().addListener((s, what) -> {
            if (what.contains(ViewState.Aspect.CHANNELS) || what.contains(ViewState.Aspect.WAVES)
                    || what.contains(ViewState.Aspect.MAP_WAVE) || what.contains(ViewState.Aspect.POLARITY)) {
                rebuild();
            } else if (mode == WaveformMode.LAYOUT && (what.contains(ViewState.Aspect.CURSOR)
                    || what.contains(ViewState.Aspect.WINDOW))) {
                layoutView.repaint();
            }
        });
        bench.model().addListener((m, what) -> {
            showProcessing();
            rebuild();
        });
        bench.addThemeListener(t -> rebuild());
    }

    private JPanel header() {
        JPanel row = new JPanel(new WrapLayout(4, 2));
        row.setBorder(BorderFactory.createEmptyBorder(2, 4, 0, 4));
        JLabel title = new JLabel("Waveforms");
        title.putClientProperty("FlatLaf.styleClass", "h4");
        row.add(title);
        ButtonGroup group = new ButtonGroup();
        for (WaveformMode m : WaveformMode.values()) {
            JToggleButton b = new JToggleButton(m.label(), m == mode);
            b.setName("waveforms.mode." + m.name());
            b.setToolTipText(m.tip());
            b.putClientProperty("JButton.buttonType", "segmented");
            b.addActionListener(e -> setMode(m));
            group.add(b);
            modeButtons.put(m, b);
            row.add(b);
        }
        intervals.setName("waveforms.intervals");
        intervals.setSelectedItem(bench.model().intervals());
        intervals.setToolTipText("<html>The band around each grand average: a 95 % t-interval across participants,"
                + "<br>or the within-participant interval of Cousineau (2005) with Morey's (2008) correction"
                + "<br>for the shown conditions together (a contrast keeps the t-interval of its own differences)</html>");
        intervals.addActionListener(e -> bench.model().setIntervals((IntervalKind) intervals.getSelectedItem()));
        // the label and its box wrap together
        JPanel band = new JPanel(new java.awt.FlowLayout(java.awt.FlowLayout.LEFT, 4, 0));
        band.setOpaque(false);
        band.add(new JLabel("Band:"));
        band.add(intervals);
        row.add(band);
        processing.setName("waveforms.processing");
        processing.putClientProperty("FlatLaf.styleClass", "small");
        processing.setVisible(false);
        row.add(processing);
        return row;
    }

    /** States the processing of the averages on screen; hidden when there is none. */
    private void showProcessing() {
        org.meridian.signal.Processing p = bench.model().averages().processing();
        processing.setVisible(!p.isNone());
        processing.setText(p.isNone() ? "" : "  Processed: " + p.describe());
        processing.setToolTipText(p.isNone() ? null
                : "Every participant's averages were processed so before any grand average: " + p.describe()
                + " (View → Processing… to change)");
    }

    /** The processing caption as shown ("" when hidden). */
    String processingText() {
        return processing.isVisible() ? processing.getText().trim() : "";
    }

    WaveformMode mode() {
        return mode;
    }

    void setMode(WaveformMode m) {
        mode = m;
        modeButtons.get(m).setSelected(true);
        cards.show(deck, m == WaveformMode.LAYOUT ? "layout" : "chart");
        intervals.setEnabled(m == WaveformMode.ONE_CHANNEL || m == WaveformMode.OVERLAY);
        rebuild();
    }

    TimeChartPanel chartPanel() {
        return chartPanel;
    }

    ScalpLayoutView layoutView() {
        return layoutView;
    }

    private void rebuild() {
        Averages averages = bench.model().averages();
        if (bench.model().session() == null) {
            return;
        }
        if (mode == WaveformMode.LAYOUT) {
            layoutView.repaint();
            return;
        }
        WaveformCharts.Built built = switch (mode) {
            case ONE_CHANNEL -> WaveformCharts.oneChannel(bench, averages, bench.state().currentChannel());
            case OVERLAY -> WaveformCharts.channels(bench, averages, bench.state().selectedChannels(), true);
            default -> WaveformCharts.butterfly(bench, averages);
        };
        chartPanel.setChart(built.chart());
        chartPanel.setProbe(built.probe());
    }
}
