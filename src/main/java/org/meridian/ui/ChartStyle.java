package org.meridian.ui;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import javax.swing.UIManager;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleInsets;

/** Puts a theme's colours and the window's fonts on a chart: one place for every time plot. */
final class ChartStyle {
    static final BasicStroke WAVE = new BasicStroke(1.6f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final BasicStroke THIN = new BasicStroke(0.8f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final BasicStroke BOLD = new BasicStroke(2.4f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);

    private ChartStyle() {
    }

    static Font font(float size, int style) {
        Font base = UIManager.getFont("Label.font");
        return (base == null ? new Font(Font.SANS_SERIF, Font.PLAIN, 12) : base).deriveFont(style, size);
    }

    static Font labelFont() {
        Font base = UIManager.getFont("Label.font");
        return font(base == null ? 12f : base.getSize2D(), Font.PLAIN);
    }

    static Font tickFont() {
        Font base = UIManager.getFont("Label.font");
        return font(base == null ? 11f : base.getSize2D() - 1, Font.PLAIN);
    }

    static void apply(JFreeChart chart, Theme theme) {
        Color panel = UIManager.getColor("Panel.background");
        chart.setBackgroundPaint(panel == null ? theme.plotBackground() : panel);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setBackgroundPaint(panel);
            legend.setItemPaint(theme.ink());
            legend.setItemFont(tickFont());
        }
        Plot plot = chart.getPlot();
        if (plot instanceof CombinedDomainXYPlot c) {
            styleAxis(c.getDomainAxis(), theme);
            for (XYPlot sub : c.getSubplots()) {
                stylePlot(sub, theme);
            }
        } else if (plot instanceof XYPlot xy) {
            stylePlot(xy, theme);
        }
    }

    static void stylePlot(XYPlot plot, Theme theme) {
        plot.setBackgroundPaint(theme.plotBackground());
        plot.setOutlinePaint(theme.grid());
        plot.setDomainGridlinePaint(theme.grid());
        plot.setRangeGridlinePaint(theme.grid());
        plot.setDomainGridlineStroke(THIN);
        plot.setRangeGridlineStroke(THIN);
        plot.setRangeZeroBaselineVisible(true);
        plot.setRangeZeroBaselinePaint(theme.faint());
        plot.setDomainZeroBaselineVisible(true);
        plot.setDomainZeroBaselinePaint(theme.faint());
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
        for (int i = 0; i < plot.getDomainAxisCount(); i++) {
            styleAxis(plot.getDomainAxis(i), theme);
        }
        for (int i = 0; i < plot.getRangeAxisCount(); i++) {
            styleAxis(plot.getRangeAxis(i), theme);
        }
    }

    static void styleAxis(ValueAxis axis, Theme theme) {
        if (axis == null) {
            return;
        }
        axis.setLabelPaint(theme.ink());
        axis.setTickLabelPaint(theme.ink());
        axis.setAxisLinePaint(theme.faint());
        axis.setTickMarkPaint(theme.faint());
        axis.setLabelFont(labelFont());
        axis.setTickLabelFont(tickFont());
        if (axis instanceof NumberAxis n) {
            n.setAutoRangeIncludesZero(false);
        }
    }
}
