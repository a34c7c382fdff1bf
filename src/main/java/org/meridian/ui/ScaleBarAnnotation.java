package org.meridian.ui;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import org.jfree.chart.annotations.AbstractXYAnnotation;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;

/** A µV scale bar in the lower-left corner of a chart's data area, sized from the range axis. */
final class ScaleBarAnnotation extends AbstractXYAnnotation {
    private final String unit;
    private final Workbench bench;

    ScaleBarAnnotation(String unit, Workbench bench) {
        this.unit = unit;
        this.bench = bench;
    }

    @Override
    public void draw(Graphics2D g2, XYPlot plot, Rectangle2D dataArea, ValueAxis domainAxis,
            ValueAxis rangeAxis, int rendererIndex, PlotRenderingInfo info) {
        double range = rangeAxis.getRange().getLength();
        double length = ScaleBar.roundLength(range);
        double pixels = dataArea.getHeight() * length / range;
        Graphics2D g = (Graphics2D) g2.create();
        try {
            ScaleBar.draw(g, dataArea.getX() + 10, dataArea.getMaxY() - 10, pixels,
                    ScaleBar.label(length, unit), bench.theme().ink(), ChartStyle.tickFont());
        } finally {
            g.dispose();
        }
    }
}
