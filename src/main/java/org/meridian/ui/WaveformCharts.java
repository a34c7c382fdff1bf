package org.meridian.ui;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;
import org.meridian.signal.ConfidenceBand;

/**
 * Builds the JFreeChart plots of the waveform view from the model's averages: one channel with
 * the shown waves and their interval bands, the selected channels overlaid, and every channel of
 * the map wave over each other with the GFP of each shown wave beneath. Only reads; draws nothing
 * itself. Each chart comes with the {@link TimeChartPanel.Probe} that names what lies under the
 * mouse.
 */
final class WaveformCharts {
    /** Dash patterns that tell overlaid channels apart (the wave keeps its colour). */
    private static final float[][] DASHES = {null, {7f, 4f}, {2f, 3f}, {9f, 3f, 2f, 3f}, {4f, 4f}};

    /** A chart and its probe. */
    record Built(JFreeChart chart, TimeChartPanel.Probe probe) {
    }

    private WaveformCharts() {
    }

    static Built oneChannel(Workbench bench, Averages averages, String channel) {
        return channels(bench, averages, List.of(channel), true);
    }

    /**
     * The given channels overlaid: every shown wave at every channel, colour by wave, dashes by
     * channel; bands at the first channel only (when {@code bands}).
     */
    static Built channels(Workbench bench, Averages averages, List<String> channels, boolean bands) {
        Theme theme = bench.theme();
        ViewState s = bench.state();
        String unit = unitOf(averages);
        NumberAxis time = timeAxis(s.axis());
        NumberAxis value = valueAxis(channels.size() == 1 ? channels.get(0) + " (" + unit + ")" : unit, s);
        XYPlot plot = new XYPlot(null, time, value, null);
        int index = 0;
        for (int k = 0; k < channels.size(); k++) {
            String ch = channels.get(k);
            for (Averages.WaveAverage w : shownOf(bench, averages)) {
                int c = w.grand().indexOf(ch);
                if (c < 0) {
                    continue;
                }
                Color colour = theme.wave(w.entry().colourIndex());
                String key = channels.size() == 1 ? w.name() : w.name() + " · " + ch;
                BasicStroke stroke = dashed(ChartStyle.WAVE, k);
                ConfidenceBand band = w.band();
                if (bands && k == 0 && band != null) {
                    YIntervalSeriesCollection data = new YIntervalSeriesCollection();
                    data.addSeries(intervalSeries(key, w.grand(), band, c));
                    DeviationRenderer r = new DeviationRenderer(true, false);
                    r.setSeriesPaint(0, colour);
                    r.setSeriesFillPaint(0, colour);
                    r.setAlpha(0.22f);
                    r.setSeriesStroke(0, stroke);
                    plot.setDataset(index, data);
                    plot.setRenderer(index, r);
                } else {
                    XYSeriesCollection data = new XYSeriesCollection(series(key, w.grand(), c));
                    plot.setDataset(index, data);
                    plot.setRenderer(index, lineRenderer(colour, stroke));
                }
                index++;
            }
        }
        plot.addAnnotation(new ScaleBarAnnotation(unit, bench));
        withRenderer(plot);
        JFreeChart chart = new JFreeChart(null, ChartStyle.labelFont(), plot, true);
        placeLegend(chart);
        ChartStyle.apply(chart, theme);
        TimeChartPanel.Probe probe = (t, v, p) -> nearestWave(bench, averages, channels, t, v);
        return new Built(chart, probe);
    }

    /** Every channel of the map wave (the selected ones in colour), GFP of each shown wave beneath. */
    static Built butterfly(Workbench bench, Averages averages) {
        Theme theme = bench.theme();
        ViewState s = bench.state();
        Averages.WaveAverage map = averages.wave(s.mapWave());
        String unit = unitOf(averages);
        NumberAxis time = timeAxis(s.axis());
        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(time);
        combined.setGap(8);
        XYPlot all = new XYPlot(null, null, valueAxis(map == null ? unit : map.name() + " (" + unit + ")", s), null);
        if (map != null) {
            XYSeriesCollection faint = new XYSeriesCollection();
            XYSeriesCollection chosen = new XYSeriesCollection();
            Waveforms g = map.grand();
            for (int c = 0; c < g.channelCount(); c++) {
                boolean selected = s.selectedChannels().stream().anyMatch(g.label(c)::equalsIgnoreCase);
                (selected ? chosen : faint).addSeries(series(g.label(c), g, c));
            }
            XYLineAndShapeRenderer faintRenderer = lineRenderer(theme.faint(), ChartStyle.THIN);
            faintRenderer.setDefaultSeriesVisibleInLegend(false);
            faintRenderer.setDrawSeriesLineAsPath(true);
            all.setDataset(0, chosen);
            all.setRenderer(0, lineRenderer(theme.wave(map.entry().colourIndex()), ChartStyle.BOLD));
            all.getRenderer(0).setDefaultSeriesVisibleInLegend(false);
            all.setDataset(1, faint);
            all.setRenderer(1, faintRenderer);
            all.addAnnotation(new ScaleBarAnnotation(unit, bench));
        }
        XYPlot gfp = new XYPlot(null, null, gfpAxis(unit), null);
        int i = 0;
        for (Averages.WaveAverage w : shownOf(bench, averages)) {
            XYSeries series = new XYSeries("GFP " + w.name(), false, false);
            TimeAxis axis = w.grand().axis();
            double[] values = w.gfp();
            for (int k = 0; k < values.length; k++) {
                series.add(axis.timeMs(k), values[k]);
            }
            gfp.setDataset(i, new XYSeriesCollection(series));
            gfp.setRenderer(i, lineRenderer(theme.wave(w.entry().colourIndex()), ChartStyle.WAVE));
            i++;
        }
        withRenderer(all);
        withRenderer(gfp);
        combined.add(all, 3);
        combined.add(gfp, 1);
        JFreeChart chart = new JFreeChart(null, ChartStyle.labelFont(), combined, true);
        placeLegend(chart);
        ChartStyle.apply(chart, theme);
        TimeChartPanel.Probe probe = (t, v, p) -> p == all ? nearestChannel(bench, map, t, v)
                : nearestGfp(bench, averages, t, v);
        return new Built(chart, probe);
    }

    /** An empty plot (no wave shown) still needs a renderer: JFreeChart draws its zero line with it. */
    private static void withRenderer(XYPlot plot) {
        if (plot.getRenderer() == null) {
            plot.setRenderer(new XYLineAndShapeRenderer(true, false));
        }
    }

    private static List<Averages.WaveAverage> shownOf(Workbench bench, Averages averages) {
        return bench.state().shownWaves().stream().map(averages::wave)
                .filter(java.util.Objects::nonNull).toList();
    }

    static String unitOf(Averages averages) {
        return averages.isEmpty() ? "µV" : averages.waves().get(0).grand().unit().symbol();
    }

    private static NumberAxis timeAxis(TimeAxis axis) {
        NumberAxis time = new NumberAxis("Time (ms)");
        time.setRange(axis.firstMs(), axis.lastMs());
        time.setAutoRange(false);
        return time;
    }

    private static NumberAxis valueAxis(String label, ViewState s) {
        NumberAxis value = new NumberAxis(label);
        value.setAutoRangeIncludesZero(true);
        value.setInverted(s.polarity().inverted());
        return value;
    }

    private static NumberAxis gfpAxis(String unit) {
        NumberAxis value = new NumberAxis("GFP (" + unit + ")");
        value.setAutoRangeIncludesZero(true);
        return value;
    }

    private static void placeLegend(JFreeChart chart) {
        LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setPosition(RectangleEdge.TOP);
            legend.setFrame(new org.jfree.chart.block.BlockBorder(0, 0, 0, 0));
        }
    }

    private static BasicStroke dashed(BasicStroke base, int k) {
        float[] dash = DASHES[k % DASHES.length];
        return dash == null ? base : new BasicStroke(base.getLineWidth(), BasicStroke.CAP_BUTT,
                BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    private static XYLineAndShapeRenderer lineRenderer(Color colour, BasicStroke stroke) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setAutoPopulateSeriesPaint(false);
        r.setAutoPopulateSeriesStroke(false);
        r.setDefaultPaint(colour);
        r.setDefaultStroke(stroke);
        return r;
    }

    private static XYSeries series(String key, Waveforms w, int channel) {
        XYSeries s = new XYSeries(key, false, false);
        TimeAxis axis = w.axis();
        for (int k = 0; k < w.sampleCount(); k++) {
            s.add(axis.timeMs(k), w.value(channel, k));
        }
        return s;
    }

    private static YIntervalSeries intervalSeries(String key, Waveforms mean, ConfidenceBand band, int channel) {
        YIntervalSeries s = new YIntervalSeries(key, false, false);
        TimeAxis axis = mean.axis();
        int bc = band.halfWidth().indexOf(mean.label(channel));
        for (int k = 0; k < mean.sampleCount(); k++) {
            double m = mean.value(channel, k);
            double h = bc < 0 ? 0 : band.halfWidth().value(bc, k);
            s.add(axis.timeMs(k), m, m - h, m + h);
        }
        return s;
    }

    private static String[] nearestWave(Workbench bench, Averages averages, List<String> channels,
            double t, double v) {
        int sample = bench.state().axis().nearestIndex(t);
        String[] best = null;
        double bestDistance = Double.MAX_VALUE;
        for (String ch : channels) {
            for (Averages.WaveAverage w : shownOf(bench, averages)) {
                int c = w.grand().indexOf(ch);
                if (c >= 0) {
                    double value = w.grand().value(c, sample);
                    if (Math.abs(value - v) < bestDistance) {
                        bestDistance = Math.abs(value - v);
                        best = new String[] {ch, Texts.value(value, w.grand().unit().symbol()) + "  " + w.name()};
                    }
                }
            }
        }
        return best;
    }

    private static String[] nearestChannel(Workbench bench, Averages.WaveAverage map, double t, double v) {
        if (map == null) {
            return null;
        }
        int sample = bench.state().axis().nearestIndex(t);
        Waveforms g = map.grand();
        int best = 0;
        for (int c = 1; c < g.channelCount(); c++) {
            if (Math.abs(g.value(c, sample) - v) < Math.abs(g.value(best, sample) - v)) {
                best = c;
            }
        }
        return new String[] {g.label(best), Texts.value(g.value(best, sample), g.unit().symbol())};
    }

    private static String[] nearestGfp(Workbench bench, Averages averages, double t, double v) {
        int sample = bench.state().axis().nearestIndex(t);
        String[] best = null;
        double bestDistance = Double.MAX_VALUE;
        for (Averages.WaveAverage w : shownOf(bench, averages)) {
            double value = w.gfp()[sample];
            if (Math.abs(value - v) < bestDistance) {
                bestDistance = Math.abs(value - v);
                best = new String[] {"GFP", Texts.value(value, w.grand().unit().symbol()) + "  " + w.name()};
            }
        }
        return best;
    }
}
