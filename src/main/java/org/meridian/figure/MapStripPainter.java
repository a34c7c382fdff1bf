package org.meridian.figure;

import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Point2D;
import java.util.List;
import java.util.Set;
import org.meridian.maps.MapLayout;
import org.meridian.maps.MapRenderer;
import org.meridian.maps.MapStyle;
import org.meridian.maps.ScalpMap;

/**
 * Draws a map strip: the title band (letter and the wave's name), the maps side by side on the
 * figure's shared colour limits ({@link MapRenderer}, the same renderer as the window's), and
 * under each map its time. The head outline takes the figure's axis line width; each map is a
 * group of class {@code scalp-map} in SVG.
 */
final class MapStripPainter {
    private MapStripPainter() {
    }

    /** The side of the maps in a strip panel, in points: as wide as fits, as tall as the row allows. */
    static double side(Rectangle2D bounds, int maps, FigureStyle style) {
        double pt = ExportFormat.PT_PER_MM;
        double byWidth = FigureLayout.mapSide(bounds.getWidth() / pt, maps) * pt;
        double byHeight = bounds.getHeight() - FigureLayout.textBands(style) * pt;
        return Math.max(1, Math.min(byWidth, byHeight));
    }

    static void draw(Graphics2D g, Rectangle2D bounds, PanelContent.MapStrip strip, MapScales scales,
            FigureStyle style, String letter, double side, String idPrefix) {
        TitleBand.draw(g, bounds, letter, strip.title(), style);
        List<ScalpMap> maps = strip.maps();
        int n = maps.size();
        double gap = FigureLayout.MAP_GAP_MM * ExportFormat.PT_PER_MM;
        double used = n * side + (n - 1) * gap;
        double x0 = bounds.getX() + (bounds.getWidth() - used) / 2;
        double top = bounds.getY() + TitleBand.height(style);
        // the renderer's contour lines are 0.6 × 0.0045 × side × factor wide: no thinner than 0.5 pt
        // (its head outline is then 1/0.6 of that, the zero contour 1.3/0.6)
        MapStyle mapStyle = scales.style().withHighlighted(Set.of()).withMarkers(false)
                .withSizeFactor(Math.max(0.5, style.axisPt()) / (0.6 * 0.0045 * side));
        Graphics2D t = (Graphics2D) g.create();
        try {
            t.setFont(style.small());
            t.setColor(FigureStyle.INK);
            FontMetrics fm = t.getFontMetrics();
            for (int i = 0; i < n; i++) {
                ScalpMap map = maps.get(i);
                double x = x0 + i * (side + gap);
                SvgGroups.begin(g, idPrefix + "-map-" + (i + 1), "scalp-map");
                Rectangle2D square = new Rectangle2D.Double(x, top, side, side);
                MapRenderer.draw(g, square, map, scales.limits(), mapStyle);
                drawElectrodes(g, square, map.layout(), strip.highlight(), scales.style().markers(), style);
                SvgGroups.end(g);
                String time = map.title();
                t.drawString(time, (float) (x + (side - fm.stringWidth(time)) / 2),
                        (float) (top + side + fm.getAscent() + 1));
            }
        } finally {
            t.dispose();
        }
    }

    /**
     * Where a highlighted electrode's name goes: right of its ring, else left, above or below,
     * whichever first keeps clear of the names already placed (neighbouring electrodes such as
     * FCz, Cz and CPz lie closer than a line of text on a small map). Returns the baseline start
     * and adds the name's ink box to {@code taken}.
     */
    private static Point2D labelPlace(Graphics2D g, String label, Point2D dot, double ring, List<Rectangle2D> taken) {
        Rectangle2D ink = g.getFont().createGlyphVector(g.getFontRenderContext(), label).getVisualBounds();
        double w = ink.getWidth();
        double h = ink.getHeight();
        double gap = 0.8;
        double middle = dot.getY() + h / 2;
        Point2D[] candidates = {
            new Point2D.Double(dot.getX() + ring + gap, middle),
            new Point2D.Double(dot.getX() - ring - gap - w, middle),
            new Point2D.Double(dot.getX() - w / 2, dot.getY() - ring - gap),
            new Point2D.Double(dot.getX() - w / 2, dot.getY() + ring + gap + h)};
        Point2D chosen = candidates[0];
        Rectangle2D chosenBox = null;
        for (Point2D c : candidates) {
            Rectangle2D box = new Rectangle2D.Double(c.getX() + ink.getX(), c.getY() + ink.getY(), w, h);
            if (taken.stream().noneMatch(box::intersects)) {
                chosen = c;
                chosenBox = box;
                break;
            }
        }
        taken.add(chosenBox != null ? chosenBox
                : new Rectangle2D.Double(chosen.getX() + ink.getX(), chosen.getY() + ink.getY(), w, h));
        return chosen;
    }

    /**
     * Small electrode dots (0.9 pt across, whatever the map's size: the renderer's markers grow
     * with its line width and would crowd a 64-channel map at print size), and the highlighted
     * electrodes as white dots ringed in ink, named beside them ({@link #labelPlace}).
     */
    private static void drawElectrodes(Graphics2D target, Rectangle2D square, MapLayout layout,
            Set<String> highlight, boolean markers, FigureStyle style) {
        Graphics2D g = (Graphics2D) target.create();
        try {
            AffineTransform toDevice = MapRenderer.planeToDevice(square, layout);
            float labelSize = Math.max(5, style.small().getSize2D() * 0.85f);
            g.setFont(style.small().deriveFont(labelSize));
            FontMetrics fm = g.getFontMetrics();
            double r = 0.45;
            double ring = 1.6;
            List<Rectangle2D> taken = new java.util.ArrayList<>();
            for (int i = 0; i < layout.electrodeCount(); i++) {
                String label = layout.labels().get(i);
                boolean marked = highlight.stream().anyMatch(label::equalsIgnoreCase);
                double[] p = layout.position(i);
                Point2D d = toDevice.transform(new Point2D.Double(p[0], p[1]), null);
                if (marked) {
                    Ellipse2D dot = new Ellipse2D.Double(d.getX() - ring, d.getY() - ring, 2 * ring, 2 * ring);
                    g.setColor(java.awt.Color.WHITE);
                    g.fill(dot);
                    g.setColor(FigureStyle.INK);
                    g.setStroke(new java.awt.BasicStroke(0.5f));
                    g.draw(dot);
                    Point2D at = labelPlace(g, label, d, ring, taken);
                    g.drawString(label, (float) at.getX(), (float) at.getY());
                } else if (markers) {
                    g.setColor(FigureStyle.INK);
                    g.fill(new Ellipse2D.Double(d.getX() - r, d.getY() - r, 2 * r, 2 * r));
                }
            }
        } finally {
            g.dispose();
        }
    }
}
