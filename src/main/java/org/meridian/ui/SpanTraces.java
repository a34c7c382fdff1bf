package org.meridian.ui;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYBoxAnnotation;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.HorizontalAlignment;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.chart.ui.VerticalAlignment;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.meridian.core.TimeAxis;
import org.meridian.span.Segment;
import org.meridian.span.SpanWindow;
import org.meridian.span.StabilityTrace;

/**
 * The span view's traces over the window (with a margin of context on either side): the GFP of
 * the map wave, its DISS against the reference map (the map at the GFP maximum, marked), and the
 * topographic states as coloured runs, each numbered and captioned as descriptive. The split of
 * the span test (the middle of the window) is a dashed line.
 */
final class SpanTraces {
    /** Context shown on each side of the window, as a share of its width. */
    static final double CONTEXT = 0.25;

    private SpanTraces() {
    }

    static JFreeChart build(Workbench bench, SpanData data, Averages.WaveAverage wave) {
        Theme theme = bench.theme();
        SpanWindow window = data.window();
        TimeAxis axis = window.axis();
        double width = window.endMs() - window.startMs();
        double from = Math.max(axis.firstMs(), window.startMs() - CONTEXT * width);
        double to = Math.min(axis.lastMs(), window.endMs() + CONTEXT * width);
        NumberAxis time = new NumberAxis("Time (ms)");
        time.setRange(from, to);
        time.setAutoRange(false);
        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(time);
        combined.setGap(4);
        Color colour = theme.wave(wave.entry().colourIndex());
        String unit = data.quantity() == MapQuantity.CSD ? "µV/m²" : wave.grand().unit().symbol();

        XYSeries gfp = new XYSeries("GFP", false, false);
        double[] g = wave.gfp(data.quantity());
        for (int s = axis.nearestIndex(from); s <= axis.nearestIndex(to); s++) {
            gfp.add(axis.timeMs(s), g[s]);
        }
        XYPlot gfpPlot = plot(new XYSeriesCollection(gfp), axisNamed("GFP (" + unit + ")", true), colour, ChartStyle.WAVE);
        StabilityTrace trace = data.trace();
        ValueMarker reference = new ValueMarker(trace.referenceMs(), theme.faint(),
                new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {2f, 2f}, 0f));
        reference.setLabel("reference");
        reference.setLabelFont(ChartStyle.tickFont());
        reference.setLabelPaint(theme.faint());
        reference.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
        reference.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
        reference.setLabelBackgroundColor(new Color(0, 0, 0, 0));
        gfpPlot.addDomainMarker(reference, Layer.BACKGROUND);

        XYSeries diss = new XYSeries("DISS", false, false);
        for (int t = 0; t < trace.size(); t++) {
            if (!Double.isNaN(trace.diss(t))) {
                diss.add(trace.timeMs(t), trace.diss(t));
            }
        }
        NumberAxis dissAxis = axisNamed("DISS", false);
        dissAxis.setRange(0, 2.2);
        dissAxis.setTickUnit(new org.jfree.chart.axis.NumberTickUnit(1));
        XYPlot dissPlot = plot(new XYSeriesCollection(diss), dissAxis, theme.ink(), ChartStyle.WAVE);

        // the strip is too low for a vertical label; its caption sits under the time axis
        NumberAxis stateAxis = axisNamed("", false);
        stateAxis.setRange(0, 1);
        stateAxis.setTickLabelsVisible(false);
        stateAxis.setTickMarksVisible(false);
        XYPlot states = new XYPlot(new XYSeriesCollection(), null, stateAxis, new XYLineAndShapeRenderer());
        for (Segment s : data.segmentation().segments()) {
            double half = axis.stepMs() / 2;
            Color c = theme.wave(s.state() + 3);
            states.addAnnotation(new XYBoxAnnotation(s.startMs() - half, 0.1, s.endMs() + half, 0.9,
                    new BasicStroke(0.5f), theme.plotBackground(), c));
            if (s.samples() >= 3) {
                XYTextAnnotation label = new XYTextAnnotation(String.valueOf(s.state()), (s.startMs() + s.endMs()) / 2, 0.5);
                label.setFont(ChartStyle.font(ChartStyle.tickFont().getSize2D(), Font.BOLD));
                label.setPaint(Theme.inkOn(c));
                label.setToolTipText("State " + s.state() + " (descriptive): " + Texts.window(s.startMs(), s.endMs()));
                states.addAnnotation(label);
            }
        }
        double split = axis.timeMs(window.lateFirst()) - axis.stepMs() / 2;
        for (XYPlot p : new XYPlot[] {gfpPlot, dissPlot, states}) {
            ValueMarker m = new ValueMarker(split, theme.ink(),
                    new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {5f, 4f}, 0f));
            p.addDomainMarker(m, Layer.FOREGROUND);
        }
        combined.add(gfpPlot, 3);
        combined.add(dissPlot, 2);
        combined.add(states, 1);
        JFreeChart chart = new JFreeChart(null, ChartStyle.labelFont(), combined, false);
        ChartStyle.apply(chart, theme);
        states.setDomainGridlinesVisible(false);
        states.setRangeGridlinesVisible(false);
        chart.addSubtitle(new TextTitle("Coloured strip: states (descriptive)", ChartStyle.tickFont(), theme.ink(),
                RectangleEdge.BOTTOM, HorizontalAlignment.LEFT, VerticalAlignment.CENTER,
                new RectangleInsets(0, 4, 2, 0)));
        return chart;
    }

    private static NumberAxis axisNamed(String label, boolean zero) {
        NumberAxis a = new NumberAxis(label);
        a.setAutoRangeIncludesZero(zero);
        return a;
    }

    private static XYPlot plot(XYSeriesCollection data, NumberAxis axis, Color colour, BasicStroke stroke) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setAutoPopulateSeriesPaint(false);
        r.setDefaultPaint(colour);
        r.setAutoPopulateSeriesStroke(false);
        r.setDefaultStroke(stroke);
        return new XYPlot(data, null, axis, r);
    }
}
