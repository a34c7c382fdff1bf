package org.meridian.ui;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.util.Locale;
import java.util.Set;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSpinner;
import javax.swing.JSplitPane;
import javax.swing.SpinnerNumberModel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.meridian.core.Study;
import org.meridian.span.SpanAnalysis;
import org.meridian.span.SpanReport;
import org.meridian.span.SpanSettings;
import org.meridian.span.SpanTest;
import org.meridian.stats.Progress;

/**
 * The span view under the waveforms: for the map wave over the time window, a strip of maps
 * evenly spaced across it (count adjustable) with one colour bar; the GFP and DISS traces with
 * the topographic states beneath; and the correlation matrix. "Run span test" runs the span
 * test of DESIGN §7 on the included participants in a background task with progress and Cancel,
 * and shows p, the DISS between the early and late mean maps and the verdict in place. The
 * descriptive part follows every change of window, wave, quantity or participants; a test
 * result is cleared as soon as what it was run on changes.
 */
final class SpanPanel extends JPanel {
    static final int DEFAULT_MAPS = 6;

    private final Workbench bench;
    private final JLabel scope = new JLabel(" ");
    private final JSpinner count = new JSpinner(new SpinnerNumberModel(DEFAULT_MAPS, 2, 12, 1));
    private final JSpinner patterns = new JSpinner(new SpinnerNumberModel(SpanSettings.DEFAULT_PERMUTATIONS,
            99, 10_000_000, 1000));
    private final JButton run = new JButton("Run span test");
    private final JLabel result = new JLabel(" ");
    private final MapStripView strip;
    private final CorrelationMatrixView matrix;
    private final TimeChartPanel traces;
    private SpanData data;

    SpanPanel(Workbench bench) {
        super(new BorderLayout());
        this.bench = bench;
        setName("span");
        setMinimumSize(new Dimension(320, 180));
        strip = new MapStripView(bench);
        matrix = new CorrelationMatrixView(bench);
        traces = new TimeChartPanel(bench, new JFreeChart(new XYPlot()));
        traces.setName("span.traces");
        traces.setProbe((t, v, p) -> probe(t));

        JPanel header = new JPanel(new BorderLayout());
        header.setBorder(BorderFactory.createEmptyBorder(2, 6, 0, 6));
        JPanel row = new JPanel(new WrapLayout(4, 2));
        JLabel title = new JLabel("Span view");
        title.putClientProperty("FlatLaf.styleClass", "h4");
        row.add(title);
        scope.setName("span.scope");
        row.add(scope);
        count.setName("span.count");
        count.setToolTipText("How many maps the strip spreads evenly across the window");
        count.addChangeListener(e -> recompute());
        header.add(row, BorderLayout.CENTER);
        JPanel test = new JPanel(new FlowLayout(FlowLayout.RIGHT, 4, 2));
        // a clear gap between the scope text and the controls, however narrow the view
        test.setBorder(BorderFactory.createEmptyBorder(0, 14, 0, 0));
        test.add(new JLabel("Maps:"));
        test.add(count);
        patterns.setName("span.patterns");
        patterns.setToolTipText("Random sign patterns when there are more than 16 participants (up to 16: all patterns)");
        ((JSpinner.DefaultEditor) patterns.getEditor()).getTextField().setColumns(7);
        test.add(new JLabel("  Patterns:"));
        test.add(patterns);
        run.setName("span.run");
        run.setToolTipText("<html>Does one map, at whatever strength, account for the whole window in every "
                + "participant?<br>Compares the early and late halves of the window; sign-flip randomisation.</html>");
        run.addActionListener(e -> runTest());
        test.add(run);
        header.add(test, BorderLayout.EAST);
        result.setName("span.result");
        result.setBorder(BorderFactory.createEmptyBorder(0, 8, 2, 8));
        header.add(result, BorderLayout.SOUTH);
        add(header, BorderLayout.NORTH);

        JSplitPane lower = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, true, traces, matrix) {
            private boolean placed;

            @Override
            public void doLayout() {
                if (!placed && getWidth() > 0) {
                    placed = true;
                    setDividerLocation(Math.max(200, getWidth() - Math.min(300, getWidth() / 3)));
                }
                super.doLayout();
            }
        };
        lower.setResizeWeight(0.7);
        lower.setBorder(BorderFactory.createEmptyBorder());
        JSplitPane body = new JSplitPane(JSplitPane.VERTICAL_SPLIT, true, strip, lower);
        body.setResizeWeight(0.4);
        body.setBorder(BorderFactory.createEmptyBorder());
        add(body, BorderLayout.CENTER);

        bench.state().addListener((s, what) -> {
            if (what.contains(ViewState.Aspect.WINDOW) || what.contains(ViewState.Aspect.MAP_WAVE)
                    || what.contains(ViewState.Aspect.QUANTITY)) {
                clearResult();
                recompute();
            } else if (what.contains(ViewState.Aspect.PARTICIPANTS)) {
                clearResult();
            } else if (what.contains(ViewState.Aspect.COLOUR_RANGE) || what.contains(ViewState.Aspect.CHANNELS)) {
                strip.repaint();
            }
        });
        bench.model().addListener((m, what) -> recompute());
        bench.addThemeListener(t -> {
            rebuildTraces();
            strip.repaint();
            matrix.repaint();
        });
    }

    MapStripView strip() {
        return strip;
    }

    String resultText() {
        return result.getText();
    }

    /** The descriptive data last shown, or null. */
    SpanData data() {
        return data;
    }

    private void recompute() {
        StudySession session = bench.model().session();
        ViewState s = bench.state();
        Averages.WaveAverage w = bench.model().averages().wave(s.mapWave());
        if (session == null || w == null) {
            return;
        }
        MapQuantity q = s.quantity() == MapQuantity.CSD && !session.hasCsd() ? MapQuantity.POTENTIAL : s.quantity();
        double start = s.windowStartMs();
        double end = s.windowEndMs();
        int maps = (Integer) count.getValue();
        scope.setText(w.name() + "  ·  " + Texts.window(start, end) + "  ·  " + q.word());
        Study study = included(bench.model().study(), s.excludedParticipants());
        bench.tasks().submit("span", "Span view", p -> SpanData.compute(session, study, w, q, start, end, maps, p),
                d -> {
                    data = d;
                    strip.show(d);
                    matrix.show(d);
                    rebuildTraces();
                }, bench::report);
    }

    private void rebuildTraces() {
        if (data == null) {
            return;
        }
        Averages.WaveAverage w = bench.model().averages().wave(data.wave());
        if (w != null) {
            traces.setChart(SpanTraces.build(bench, data, w));
        }
    }

    private String[] probe(double t) {
        if (data == null) {
            return null;
        }
        Averages.WaveAverage w = bench.model().averages().wave(data.wave());
        int sample = bench.state().axis().nearestIndex(t);
        int k = sample - data.window().first();
        String diss = k >= 0 && k < data.trace().size()
                ? String.format(Locale.ROOT, "  DISS %.3f  state %d (descriptive)", data.trace().diss(k), data.segmentation().state(k)) : "";
        String unit = data.quantity() == MapQuantity.CSD ? "µV/m²" : "µV";
        return new String[] {"GFP", w == null ? "" : Texts.value(w.gfp(data.quantity())[sample], unit) + diss};
    }

    private void clearResult() {
        bench.tasks().cancel("span.test");
        result.setText(" ");
    }

    private void runTest() {
        StudySession session = bench.model().session();
        ViewState s = bench.state();
        WaveEntry e = bench.model().entry(s.mapWave());
        if (session == null || e == null) {
            return;
        }
        Study study = included(bench.model().study(), s.excludedParticipants());
        SpanSettings settings = SpanSettings.window(s.windowStartMs(), s.windowEndMs())
                .withCsd(s.quantity() == MapQuantity.CSD)
                .withPermutations((Integer) patterns.getValue(), SpanSettings.DEFAULT_SEED);
        result.setText("span test running …");
        bench.tasks().submit("span.test", "Span test", p -> SpanAnalysis.run(study, e.name(),
                        i -> e.wave().forParticipant(study, i), settings, progressOf(p)),
                this::showResult, t -> {
                    result.setText("span test failed: " + Workbench.oneLine(t.getMessage()));
                    bench.report(t);
                }, () -> result.setText("span test cancelled"));
    }

    private void showResult(SpanReport r) {
        SpanTest.Result t = r.test();
        String p = t.randomisation().exact()
                ? String.format(Locale.ROOT, "p = %.4f (all %,d sign patterns)", t.p(), t.randomisation().patterns())
                : String.format(Locale.ROOT, "p = %.4f (%,d random sign patterns)", t.p(), t.randomisation().patterns());
        result.setText(String.format(Locale.ROOT,
                "<html>Span test, %d participants, early %s vs late %s ms: %s, DISS %.3f → <b>%s</b></html>",
                r.participants().size(), r.window().earlyRangeMs(), r.window().lateRangeMs(), p, t.diss(),
                t.verdict().word()));
    }

    static Progress progressOf(Tasks.TaskProgress p) {
        return new Progress() {
            @Override
            public void update(long done, long total) {
                p.update(done, total);
            }

            @Override
            public boolean cancelled() {
                return p.cancelled();
            }
        };
    }

    /** The study without the excluded participants (the same waveforms, no copies). */
    static Study included(Study study, Set<String> excluded) {
        if (excluded.isEmpty()) {
            return study;
        }
        Study.Builder b = Study.builder(study.name()).montage(study.montage()).placements(study.placements());
        for (int p = 0; p < study.participants().size(); p++) {
            String name = study.participants().get(p);
            if (excluded.contains(name)) {
                continue;
            }
            for (int c = 0; c < study.conditions().size(); c++) {
                b.add(name, study.conditions().get(c), study.waveforms(p, c), study.trials(p, c).orElse(-1));
            }
        }
        return b.build();
    }
}
