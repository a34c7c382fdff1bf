package org.meridian.ui;

import java.awt.BasicStroke;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.event.ChartChangeEvent;
import org.jfree.chart.panel.AbstractOverlay;
import org.jfree.chart.panel.Overlay;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.RectangleEdge;

/**
 * A chart whose domain is time, linked to the {@link ViewState}: the chart is drawn once into an
 * image at device resolution (sharp on HiDPI screens) and redrawn only when the chart itself
 * changes or the panel is resized; the window band and the time cursor are drawn over that image
 * on every paint, so moving the cursor or the band copies one image and draws three lines, and
 * never redraws the data. The mouse moves the cursor and the band's edges ({@link TimeDrag}), and
 * what lies under the mouse goes to the status bar through a {@link Probe}.
 *
 * <p>JFreeChart's own buffer is left off: it is made at the panel's size in user pixels, so it
 * would be blurred on a scaled screen.
 */
final class TimeChartPanel extends ChartPanel {
    /** Says what lies under the mouse at a time and a value of the plot under it. */
    @FunctionalInterface
    interface Probe {
        /** Returns {channel, value text}, or null when nothing is near. */
        String[] at(double timeMs, double value, XYPlot plot);
    }

    private final Workbench bench;
    private final TimeOverlay overlay = new TimeOverlay();
    private Probe probe = (t, v, p) -> null;
    /** The chart without band and cursor, in device pixels; null or stale when it must be redrawn. */
    private BufferedImage image;
    private boolean stale = true;
    private double imageScale;
    private int chartDraws;

    TimeChartPanel(Workbench bench, JFreeChart chart) {
        super(chart, false);
        this.bench = bench;
        setMouseZoomable(false);
        setDomainZoomable(false);
        setRangeZoomable(false);
        setPopupMenu(null);
        setMinimumDrawWidth(10);
        setMinimumDrawHeight(10);
        setMaximumDrawWidth(10_000);
        setMaximumDrawHeight(10_000);
        new TimeDrag(this, bench.state(), this::xToMs, this::msToX,
                e -> getScreenDataArea().contains(e.getPoint())).install();
        addMouseMotionListener(new MouseAdapter() {
            @Override
            public void mouseMoved(MouseEvent e) {
                report(e);
            }

            @Override
            public void mouseDragged(MouseEvent e) {
                report(e);
            }
        });
        addMouseListener(new MouseAdapter() {
            @Override
            public void mouseExited(MouseEvent e) {
                bench.pointer("", "", "");
            }
        });
        bench.state().addListener((s, what) -> {
            if (what.contains(ViewState.Aspect.CURSOR) || what.contains(ViewState.Aspect.WINDOW)) {
                repaint();
            }
        });
    }

    @Override
    public void setChart(JFreeChart chart) {
        stale = true;
        super.setChart(chart);
    }

    @Override
    public void chartChanged(ChartChangeEvent event) {
        stale = true;
        super.chartChanged(event);
    }

    /** How often the chart has been drawn into the image (for tests: a cursor step draws none). */
    int chartDraws() {
        return chartDraws;
    }

    /**
     * Copies the chart's image (redrawn first when the chart, the size or the screen's scale
     * changed) and draws the window band and the cursor over it.
     */
    @Override
    public void paintComponent(Graphics g) {
        if (getChart() == null) {
            super.paintComponent(g);
            return;
        }
        Graphics2D g2 = (Graphics2D) g.create();
        try {
            double scale = g2.getTransform().getScaleX();
            int w = Math.max(1, (int) Math.ceil(getWidth() * scale));
            int h = Math.max(1, (int) Math.ceil(getHeight() * scale));
            if (stale || image == null || image.getWidth() != w || image.getHeight() != h || imageScale != scale) {
                image = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
                Graphics2D ig = image.createGraphics();
                try {
                    ig.scale(scale, scale);
                    ig.setClip(0, 0, getWidth(), getHeight());
                    super.paintComponent(ig);
                } finally {
                    ig.dispose();
                }
                imageScale = scale;
                stale = false;
                chartDraws++;
            }
            g2.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_NEAREST_NEIGHBOR);
            g2.drawImage(image, 0, 0, getWidth(), getHeight(), null);
            overlay.paintOverlay(g2, this);
        } finally {
            g2.dispose();
        }
    }

    void setProbe(Probe p) {
        this.probe = p;
    }

    /** The time at an x pixel of the panel. */
    double xToMs(double x) {
        Rectangle2D area = getScreenDataArea();
        return domainPlot().getDomainAxis() == null ? 0
                : domainPlot().getDomainAxis().java2DToValue(x, area, RectangleEdge.BOTTOM);
    }

    /** The x pixel of a time. */
    double msToX(double ms) {
        Rectangle2D area = getScreenDataArea();
        return domainPlot().getDomainAxis() == null ? 0
                : domainPlot().getDomainAxis().valueToJava2D(ms, area, RectangleEdge.BOTTOM);
    }

    private XYPlot domainPlot() {
        return (XYPlot) getChart().getPlot();
    }

    private void report(MouseEvent e) {
        Rectangle2D area = getScreenDataArea(e.getX(), e.getY());
        if (area == null || !area.contains(e.getPoint())) {
            bench.pointer("", "", "");
            return;
        }
        double t = bench.state().snap(xToMs(e.getX()));
        XYPlot plot = plotAt(e.getX(), e.getY());
        if (plot == null || plot.getRangeAxis() == null) {
            return;
        }
        double v = plot.getRangeAxis().java2DToValue(e.getY(), area, RectangleEdge.LEFT);
        String[] found = probe.at(t, v, plot);
        bench.pointer(Texts.ms(t), found == null ? "" : found[0], found == null ? "" : found[1]);
    }

    private XYPlot plotAt(int x, int y) {
        if (getChart().getPlot() instanceof CombinedDomainXYPlot c) {
            int i = getChartRenderingInfo().getPlotInfo().getSubplotIndex(
                    translateScreenToJava2D(new java.awt.Point(x, y)));
            return i >= 0 ? c.getSubplots().get(i) : null;
        }
        return (XYPlot) getChart().getPlot();
    }

    /** Draws the window band and the cursor above the chart's image. */
    private final class TimeOverlay extends AbstractOverlay implements Overlay {
        @Override
        public void paintOverlay(Graphics2D g2, ChartPanel panel) {
            Rectangle2D area = getScreenDataArea();
            if (area == null || area.isEmpty() || domainPlot().getDomainAxis() == null) {
                return;
            }
            Theme theme = bench.theme();
            ViewState s = bench.state();
            Shape savedClip = g2.getClip();
            g2.clip(area);
            double a = msToX(s.windowStartMs());
            double b = msToX(s.windowEndMs());
            g2.setPaint(theme.windowFill());
            g2.fill(new Rectangle2D.Double(a, area.getY(), b - a, area.getHeight()));
            g2.setPaint(theme.selection());
            g2.setStroke(new BasicStroke(1.5f));
            g2.draw(new Line2D.Double(a, area.getY(), a, area.getMaxY()));
            g2.draw(new Line2D.Double(b, area.getY(), b, area.getMaxY()));
            double c = msToX(s.cursorMs());
            g2.setPaint(theme.cursor());
            g2.setStroke(new BasicStroke(1.5f));
            g2.draw(new Line2D.Double(c, area.getY(), c, area.getMaxY()));
            g2.setClip(savedClip);
        }
    }
}
