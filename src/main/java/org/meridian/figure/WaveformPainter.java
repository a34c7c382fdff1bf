package org.meridian.figure;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisSpace;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.SeriesRenderingOrder;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.data.xy.XYDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/**
 * Draws a waveform panel: a title band (panel letter, channel or region, and, where asked, the
 * {@link Legend}) above a JFreeChart plot drawn straight into the figure's {@code Graphics2D}, so waves
 * and maps share one vector drawing. The plot has no frame, background or grid: a time axis and
 * an amplitude axis with outward ticks at round steps and labelled units, a zero line at 0 µV and
 * one at 0 ms, a light band where the maps are taken, interval bands under the waves. Every panel
 * of a figure reserves the same room for its axes, so plots of equal panels line up exactly.
 */
final class WaveformPainter {
    private static final double TICK_PT = 2.5;
    private static final double TICK_GAP_PT = 1.5;
    private static final double TOP_INSET_PT = 2;

    private WaveformPainter() {
    }

    /**
     * @param axisLabel whether this panel prints the amplitude axis label (the first of its row)
     * @param legend the panel's legend (with the polarity note where it carries it)
     * @param bandLines lines of text in the top band: the same for every waveform panel of a row
     *        (the most any of their legends needs), so their plots line up
     */
    static void draw(Graphics2D g, Rectangle2D bounds, PanelContent.Waveforms panel, WaveScales scales,
            FigureStyle style, String letter, boolean axisLabel, Legend legend, int bandLines,
            float bandOpacity) {
        double band = bandHeight(style, bandLines);
        TitleBand.draw(g, bounds, letter, panel.title(), style);
        legend.draw(g, bounds);
        Rectangle2D chartArea = new Rectangle2D.Double(bounds.getX(), bounds.getY() + band, bounds.getWidth(),
                bounds.getHeight() - band);
        JFreeChart chart = new JFreeChart(null, null, plot(panel, scales, style, bandOpacity), false);
        chart.setBackgroundPaint(null);
        chart.setBorderVisible(false);
        chart.setPadding(RectangleInsets.ZERO_INSETS);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        Graphics2D c = (Graphics2D) g.create();
        try {
            chart.draw(c, chartArea);
        } finally {
            c.dispose();
        }
        if (axisLabel) {
            drawAmplitudeLabel(g, chartArea, scales.amplitudeLabel(), style);
        }
    }

    /** The height of a panel's top band (title, and legend lines below it), in points. */
    static double bandHeight(FigureStyle style, int bandLines) {
        return TitleBand.height(style) + (bandLines - 1) * FigureStyle.lineHeight(style.small());
    }

    /** The height of the plot itself in a panel, in points. */
    static double plotHeight(Rectangle2D bounds, FigureStyle style, int bandLines) {
        return bounds.getHeight() - bandHeight(style, bandLines) - TOP_INSET_PT - bottomSpace(style);
    }

    /** The width of the plot itself in a panel, in points. */
    static double plotWidth(Rectangle2D bounds, WaveScales scales, FigureStyle style) {
        return bounds.getWidth() - leftSpace(scales, style) - rightInset(scales, style);
    }

    /**
     * The amplitude axis label, turned a quarter left and centred on the plot's height. Drawn
     * here rather than by the chart, whose rotated labels take a glyph-outline path that PDF
     * output cannot keep as text.
     */
    private static void drawAmplitudeLabel(Graphics2D target, Rectangle2D chartArea, String label, FigureStyle style) {
        Graphics2D g = (Graphics2D) target.create();
        try {
            g.setFont(style.label());
            g.setColor(FigureStyle.INK);
            double plotTop = chartArea.getY() + TOP_INSET_PT;
            double plotBottom = chartArea.getMaxY() - bottomSpace(style);
            double centreY = (plotTop + plotBottom) / 2;
            double x = chartArea.getX() + TextMeasure.ascent(style.label());
            g.rotate(-Math.PI / 2, x, centreY);
            g.drawString(label, (float) (x - TextMeasure.width(label, style.label()) / 2.0), (float) centreY);
        } finally {
            g.dispose();
        }
    }

    /** The room left of the plot for ticks, tick labels and the axis label (points). */
    static double leftSpace(WaveScales scales, FigureStyle style) {
        TickFormat format = new TickFormat(scales.amplitudeStep());
        double widest = 0;
        for (double v = scales.amplitudeFrom(); v <= scales.amplitudeTo() + 1e-9 * scales.amplitudeStep();
                v += scales.amplitudeStep()) {
            widest = Math.max(widest, TextMeasure.width(format.format(v), style.small()));
        }
        return TICK_PT + TICK_GAP_PT + widest + TICK_GAP_PT + TextMeasure.lineHeight(style.label()) + 1;
    }

    /** The room below the plot for ticks, tick labels and the axis label (points). */
    static double bottomSpace(FigureStyle style) {
        return TICK_PT + TICK_GAP_PT + TextMeasure.lineHeight(style.small()) + TICK_GAP_PT
                + TextMeasure.lineHeight(style.label());
    }

    private static XYPlot plot(PanelContent.Waveforms panel, WaveScales scales, FigureStyle style,
            float bandOpacity) {
        NumberAxis time = axis(scales.timeLabel(), scales.timeFromMs(), scales.timeToMs(), scales.timeStepMs(), style);
        NumberAxis amplitude = axis(null, scales.amplitudeFrom(),
                scales.amplitudeTo(), scales.amplitudeStep(), style);
        amplitude.setInverted(scales.polarity() == org.meridian.figure.spec.Polarity.NEGATIVE_UP);
        boolean bands = panel.traces().stream().anyMatch(WaveTrace::hasBand);
        XYLineAndShapeRenderer renderer = bands ? new DeviationRenderer(true, false) : new XYLineAndShapeRenderer(true, false);
        renderer.setDrawSeriesLineAsPath(true);
        renderer.setAutoPopulateSeriesPaint(false);
        renderer.setAutoPopulateSeriesStroke(false);
        renderer.setAutoPopulateSeriesFillPaint(false);
        if (renderer instanceof DeviationRenderer d) {
            d.setAlpha(bandOpacity);
        }
        for (int i = 0; i < panel.traces().size(); i++) {
            WaveTrace t = panel.traces().get(i);
            renderer.setSeriesPaint(i, t.colour());
            renderer.setSeriesFillPaint(i, t.colour());
            renderer.setSeriesStroke(i, style.waveStroke(t.dashed()));
        }
        XYPlot plot = new XYPlot(dataset(panel.traces(), bands), time, amplitude, renderer);
        plot.setSeriesRenderingOrder(SeriesRenderingOrder.FORWARD);
        plot.setBackgroundPaint(null);
        plot.setOutlineVisible(false);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        plot.setDomainCrosshairVisible(false);
        plot.setRangeCrosshairVisible(false);
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
        plot.setInsets(new RectangleInsets(TOP_INSET_PT, 0, 0, rightInset(scales, style)));
        AxisSpace left = new AxisSpace();
        left.setLeft(leftSpace(scales, style));
        plot.setFixedRangeAxisSpace(left);
        AxisSpace bottom = new AxisSpace();
        bottom.setBottom(bottomSpace(style));
        plot.setFixedDomainAxisSpace(bottom);
        for (double[] mark : scales.marksMs()) {
            IntervalMarker m = new IntervalMarker(mark[0], mark[1], FigureStyle.MARK);
            m.setOutlinePaint(null);
            plot.addDomainMarker(m, Layer.BACKGROUND);
        }
        if (scales.amplitudeFrom() < 0 && scales.amplitudeTo() > 0) {
            plot.addRangeMarker(new ValueMarker(0, FigureStyle.ZERO, style.zeroStroke()), Layer.BACKGROUND);
        }
        if (scales.timeFromMs() < 0 && scales.timeToMs() > 0) {
            plot.addDomainMarker(new ValueMarker(0, FigureStyle.ZERO, style.zeroStroke()), Layer.BACKGROUND);
        }
        return plot;
    }

    /** Room right of the plot for half the last time tick label, which is centred on the axis end. */
    private static double rightInset(WaveScales scales, FigureStyle style) {
        double last = Math.floor(scales.timeToMs() / scales.timeStepMs() + 1e-9) * scales.timeStepMs();
        double width = TextMeasure.width(new TickFormat(scales.timeStepMs()).format(last), style.small());
        double tickX = (last - scales.timeFromMs()) / (scales.timeToMs() - scales.timeFromMs());
        return tickX > 0.97 ? width / 2 + 1 : 2;
    }

    private static NumberAxis axis(String label, double from, double to, double step, FigureStyle style) {
        NumberAxis a = new NumberAxis(label);
        a.setAutoRange(false);
        a.setRange(from, to);
        a.setTickUnit(new NumberTickUnit(step, new TickFormat(step)));
        a.setMinorTickMarksVisible(false);
        a.setTickMarkInsideLength(0);
        a.setTickMarkOutsideLength((float) TICK_PT);
        a.setTickMarkStroke(style.axisStroke());
        a.setTickMarkPaint(FigureStyle.INK);
        a.setAxisLineStroke(style.axisStroke());
        a.setAxisLinePaint(FigureStyle.INK);
        a.setTickLabelFont(style.small());
        a.setTickLabelPaint(FigureStyle.INK);
        a.setTickLabelInsets(new RectangleInsets(TICK_GAP_PT, TICK_GAP_PT, TICK_GAP_PT, TICK_GAP_PT));
        a.setLabelFont(style.label());
        a.setLabelPaint(FigureStyle.INK);
        a.setLabelInsets(new RectangleInsets(0, 0, 0, 0));
        return a;
    }

    private static XYDataset dataset(List<WaveTrace> traces, boolean bands) {
        if (bands) {
            YIntervalSeriesCollection data = new YIntervalSeriesCollection();
            for (int i = 0; i < traces.size(); i++) {
                WaveTrace t = traces.get(i);
                YIntervalSeries s = new YIntervalSeries(i, false, true);
                for (int k = 0; k < t.timesMs().length; k++) {
                    double lo = t.hasBand() ? t.lower()[k] : t.mean()[k];
                    double hi = t.hasBand() ? t.upper()[k] : t.mean()[k];
                    s.add(new org.jfree.data.xy.YIntervalDataItem(t.timesMs()[k], t.mean()[k], lo, hi), false);
                }
                data.addSeries(s);
            }
            return data;
        }
        XYSeriesCollection data = new XYSeriesCollection();
        for (int i = 0; i < traces.size(); i++) {
            WaveTrace t = traces.get(i);
            XYSeries s = new XYSeries(i, false, true);
            for (int k = 0; k < t.timesMs().length; k++) {
                s.add(t.timesMs()[k], t.mean()[k], false);
            }
            data.addSeries(s);
        }
        return data;
    }
}
