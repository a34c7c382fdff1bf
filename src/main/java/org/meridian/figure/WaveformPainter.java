package org.meridian.figure;

import java.awt.Font;
import java.awt.FontMetrics;
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
 * legend) above a JFreeChart plot drawn straight into the figure's {@code Graphics2D}, so waves
 * and maps share one vector drawing. The plot has no frame, background or grid: a time axis and
 * an amplitude axis with outward ticks at round steps and labelled units, a zero line at 0 µV and
 * one at 0 ms, a light band where the maps are taken, interval bands under the waves. Every panel
 * of a figure reserves the same room for its axes, so plots of equal panels line up exactly.
 */
final class WaveformPainter {
    private static final double TICK_PT = 2.5;
    private static final double TICK_GAP_PT = 1.5;
    private static final double LEGEND_LINE_PT = 10;
    private static final double TOP_INSET_PT = 2;

    private WaveformPainter() {
    }

    /**
     * @param axisLabel whether this panel prints the amplitude axis label (the first of its row)
     * @param polarityNote the polarity statement to print with the legend, or null
     * @param legendLines 1 when the legend shares the title's line, 2 when it goes on a line of
     *        its own below (the same for every waveform panel of a row, so their plots line up)
     */
    static void draw(Graphics2D g, Rectangle2D bounds, PanelContent.Waveforms panel, WaveScales scales,
            FigureStyle style, String letter, boolean axisLabel, String polarityNote, int legendLines,
            float bandOpacity) {
        double band = TitleBand.height(style) + (legendLines - 1) * FigureStyle.lineHeight(style.small());
        TitleBand.draw(g, bounds, letter, panel.title(), style);
        if (panel.legend() || polarityNote != null) {
            double baseline = bounds.getY() + (legendLines == 1 ? TitleBand.baseline(style)
                    : TitleBand.height(style) + style.small().getSize2D());
            drawLegend(g, bounds, baseline, panel.legend() ? panel.traces() : List.of(), polarityNote, style);
        }
        Rectangle2D chartArea = new Rectangle2D.Double(bounds.getX(), bounds.getY() + band, bounds.getWidth(),
                bounds.getHeight() - band);
        JFreeChart chart = new JFreeChart(null, null, plot(g, panel, scales, style, axisLabel, bandOpacity), false);
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
            FontMetrics fm = g.getFontMetrics();
            double plotTop = chartArea.getY() + TOP_INSET_PT;
            double plotBottom = chartArea.getMaxY() - bottomSpace(g, style);
            double centreY = (plotTop + plotBottom) / 2;
            double x = chartArea.getX() + fm.getAscent();
            g.rotate(-Math.PI / 2, x, centreY);
            g.drawString(label, (float) (x - fm.stringWidth(label) / 2.0), (float) centreY);
        } finally {
            g.dispose();
        }
    }

    /** Whether the panel's legend fits on the title's line, beside the letter and title. */
    static boolean legendFitsBesideTitle(Graphics2D g, Rectangle2D bounds, PanelContent.Waveforms panel,
            String letter, String polarityNote, FigureStyle style) {
        if (!panel.legend() && polarityNote == null) {
            return true;
        }
        double title = g.getFontMetrics(style.letter()).stringWidth(letter) + style.letter().getSize2D()
                + g.getFontMetrics(style.label()).stringWidth(panel.title());
        double legend = legendWidth(g, panel.legend() ? panel.traces() : List.of(), polarityNote, style);
        return title + legend + style.small().getSize2D() <= bounds.getWidth();
    }

    /** The room left of the plot for ticks, tick labels and the axis label (points). */
    static double leftSpace(Graphics2D g, WaveScales scales, FigureStyle style) {
        FontMetrics fm = g.getFontMetrics(style.small());
        TickFormat format = new TickFormat(scales.amplitudeStep());
        double widest = 0;
        for (double v = scales.amplitudeFrom(); v <= scales.amplitudeTo() + 1e-9 * scales.amplitudeStep();
                v += scales.amplitudeStep()) {
            widest = Math.max(widest, fm.stringWidth(format.format(v)));
        }
        return TICK_PT + TICK_GAP_PT + widest + TICK_GAP_PT + g.getFontMetrics(style.label()).getHeight() + 1;
    }

    /** The room below the plot for ticks, tick labels and the axis label (points). */
    static double bottomSpace(Graphics2D g, FigureStyle style) {
        return TICK_PT + TICK_GAP_PT + g.getFontMetrics(style.small()).getHeight() + TICK_GAP_PT
                + g.getFontMetrics(style.label()).getHeight();
    }

    private static XYPlot plot(Graphics2D g, PanelContent.Waveforms panel, WaveScales scales, FigureStyle style,
            boolean axisLabel, float bandOpacity) {
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
        plot.setInsets(new RectangleInsets(TOP_INSET_PT, 0, 0, rightInset(g, scales, style)));
        AxisSpace left = new AxisSpace();
        left.setLeft(leftSpace(g, scales, style));
        plot.setFixedRangeAxisSpace(left);
        AxisSpace bottom = new AxisSpace();
        bottom.setBottom(bottomSpace(g, style));
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
    private static double rightInset(Graphics2D g, WaveScales scales, FigureStyle style) {
        double last = Math.floor(scales.timeToMs() / scales.timeStepMs() + 1e-9) * scales.timeStepMs();
        double width = g.getFontMetrics(style.small()).stringWidth(new TickFormat(scales.timeStepMs()).format(last));
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

    private static double legendWidth(Graphics2D g, List<WaveTrace> traces, String note, FigureStyle style) {
        Font font = style.small();
        FontMetrics fm = g.getFontMetrics(font);
        double gap = font.getSize2D() * 0.35;
        double spacing = font.getSize2D() * 1.1;
        double width = 0;
        for (WaveTrace t : traces) {
            width += LEGEND_LINE_PT + gap + fm.stringWidth(t.label()) + spacing;
        }
        if (note != null) {
            width += fm.stringWidth(note);
        } else if (!traces.isEmpty()) {
            width -= spacing;
        }
        return width;
    }

    /** The legend (and polarity note), right-aligned on a baseline. */
    private static void drawLegend(Graphics2D target, Rectangle2D bounds, double baseline, List<WaveTrace> traces,
            String note, FigureStyle style) {
        Graphics2D g = (Graphics2D) target.create();
        try {
            Font font = style.small();
            g.setFont(font);
            FontMetrics fm = g.getFontMetrics();
            double gap = font.getSize2D() * 0.35;
            double spacing = font.getSize2D() * 1.1;
            double x = bounds.getMaxX() - legendWidth(g, traces, note, style);
            double lineY = baseline - fm.getAscent() * 0.35;
            for (WaveTrace t : traces) {
                g.setColor(t.colour());
                g.setStroke(style.waveStroke(t.dashed()));
                g.draw(new java.awt.geom.Line2D.Double(x, lineY, x + LEGEND_LINE_PT, lineY));
                x += LEGEND_LINE_PT + gap;
                g.setColor(FigureStyle.INK);
                g.drawString(t.label(), (float) x, (float) baseline);
                x += fm.stringWidth(t.label()) + spacing;
            }
            if (note != null) {
                g.setColor(FigureStyle.INK);
                g.drawString(note, (float) x, (float) baseline);
            }
        } finally {
            g.dispose();
        }
    }
}
