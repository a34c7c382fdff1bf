package org.meridian.maps;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.font.FontRenderContext;
import java.awt.font.LineMetrics;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.Optional;

/**
 * Draws a {@link ScalpMap} onto any {@code Graphics2D} (screen, SVG, PDF, PNG): the coloured
 * map clipped to its region, contour lines at the colour limits' contour step (the zero line
 * thicker and darker, negative levels dashed so the sign reads without colour), the head
 * outline with nose and ears, electrode markers, optional labels, and highlighted electrodes.
 * The map fills the largest centred square of the given bounds, nose up, left on the left.
 * Line widths and fonts scale with that square. Stateless.
 */
public final class MapRenderer {
    private static final Color OUTLINE = new Color(0x26, 0x26, 0x26);
    private static final Color CONTOUR = new Color(0, 0, 0, 140);
    private static final Color ZERO_LINE = new Color(0, 0, 0, 220);
    private static final Color HIGHLIGHT = new Color(0xff, 0xff, 0xff);

    private MapRenderer() {
    }

    /** The transform from plane coordinates (y up) of a layout to device coordinates in bounds. */
    public static AffineTransform planeToDevice(Rectangle2D bounds, MapLayout layout) {
        double side = Math.min(bounds.getWidth(), bounds.getHeight());
        double k = side / (2 * layout.viewHalfWidth());
        AffineTransform t = new AffineTransform();
        t.translate(bounds.getCenterX(), bounds.getCenterY());
        t.scale(k, -k);
        return t;
    }

    /** The electrode whose marker lies within {@code tolerance} device units of a point, if any. */
    public static Optional<String> electrodeAt(Rectangle2D bounds, MapLayout layout, Point2D device,
            double tolerance) {
        AffineTransform t = planeToDevice(bounds, layout);
        String best = null;
        double bestDistance = tolerance;
        for (int i = 0; i < layout.electrodeCount(); i++) {
            double[] p = layout.position(i);
            Point2D d = t.transform(new Point2D.Double(p[0], p[1]), null);
            double dist = d.distance(device);
            if (dist <= bestDistance) {
                bestDistance = dist;
                best = layout.labels().get(i);
            }
        }
        return Optional.ofNullable(best);
    }

    /** The map's grid as an image (one pixel per grid point; transparent outside the map). */
    public static BufferedImage image(ScalpMap map, ColourLimits limits, ColourScale scale) {
        int n = map.grid().size();
        int[] lut = scale.argbTable(MshDivergingScale.STEPS);
        int[] argb = new int[n * n];
        for (int row = 0; row < n; row++) {
            for (int col = 0; col < n; col++) {
                float v = map.value(col, row);
                argb[row * n + col] = Float.isNaN(v) ? 0
                        : lut[(int) Math.round(limits.position(v) * (lut.length - 1))];
            }
        }
        BufferedImage image = new BufferedImage(n, n, BufferedImage.TYPE_INT_ARGB);
        image.setRGB(0, 0, n, n, argb, 0, n);
        return image;
    }

    /** Draws the map into the bounds: colours, contours (if the style asks), head and electrodes. */
    public static void draw(Graphics2D target, Rectangle2D bounds, ScalpMap map, ColourLimits limits,
            MapStyle style) {
        drawImage(target, bounds, map.layout(), map.grid(), image(map, limits, style.scale()));
        if (style.contours()) {
            drawContours(target, bounds, map, limits, style);
        }
        drawHeadAndElectrodes(target, bounds, map.layout(), style);
    }

    /**
     * Draws an image whose pixel (column, row) is centred on the grid point (column, row),
     * clipped to the layout's region: a map's own image, or the display image of a
     * {@link MapRaster} (whose grid is {@link MapRaster#displayGrid}).
     */
    public static void drawImage(Graphics2D target, Rectangle2D bounds, MapLayout layout, MapGrid grid,
            BufferedImage image) {
        Graphics2D g = prepared(target);
        try {
            AffineTransform toDevice = planeToDevice(bounds, layout);
            g.clip(toDevice.createTransformedShape(layout.region().outline()));
            double step = grid.step();
            AffineTransform place = new AffineTransform(toDevice);
            // image pixel (0, 0) covers the square around grid point (0, 0); rows run down (−y)
            place.translate(grid.x(0) - step / 2, grid.y(0) + step / 2);
            place.scale(step * grid.size() / image.getWidth(), -step * grid.size() / image.getHeight());
            g.drawImage(image, place, null);
        } finally {
            g.dispose();
        }
    }

    /**
     * Draws the map's contour lines at the limits' contour step, clipped to its region: the zero
     * line thicker and darker, negative levels dashed.
     */
    public static void drawContours(Graphics2D target, Rectangle2D bounds, ScalpMap map, ColourLimits limits,
            MapStyle style) {
        Graphics2D g = prepared(target);
        try {
            AffineTransform toDevice = planeToDevice(bounds, map.layout());
            g.clip(toDevice.createTransformedShape(map.layout().region().outline()));
            double line = lineWidth(bounds, style);
            float thin = (float) (0.6 * line);
            BasicStroke positive = new BasicStroke(thin, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
            BasicStroke negative = new BasicStroke(thin, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10,
                    new float[] {3 * thin, 2.5f * thin}, 0);
            BasicStroke zero = new BasicStroke((float) (1.3 * line), BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
            for (Contours.Line c : Contours.atSteps(map, limits.contourStep(), limits.lower(), limits.upper())) {
                Shape path = toDevice.createTransformedShape(c.path());
                if (c.zero()) {
                    g.setColor(ZERO_LINE);
                    g.setStroke(zero);
                } else {
                    g.setColor(CONTOUR);
                    g.setStroke(c.level() > 0 ? positive : negative);
                }
                g.draw(path);
            }
        } finally {
            g.dispose();
        }
    }

    /** Draws the head outline with nose and ears, the electrode markers, labels and highlights. */
    public static void drawHeadAndElectrodes(Graphics2D target, Rectangle2D bounds, MapLayout layout, MapStyle style) {
        Graphics2D g = prepared(target);
        try {
            AffineTransform toDevice = planeToDevice(bounds, layout);
            drawHead(g, toDevice, lineWidth(bounds, style));
            drawElectrodes(g, layout, style, toDevice, Math.min(bounds.getWidth(), bounds.getHeight()));
        } finally {
            g.dispose();
        }
    }

    private static Graphics2D prepared(Graphics2D target) {
        Graphics2D g = (Graphics2D) target.create();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
        return g;
    }

    private static double lineWidth(Rectangle2D bounds, MapStyle style) {
        return Math.max(0.4, Math.min(bounds.getWidth(), bounds.getHeight()) * 0.0045 * style.sizeFactor());
    }

    private static void drawHead(Graphics2D g, AffineTransform toDevice, double line) {
        g.setColor(OUTLINE);
        g.setStroke(new BasicStroke((float) line, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        g.draw(toDevice.createTransformedShape(HeadShape.outline()));
        g.draw(toDevice.createTransformedShape(HeadShape.nose()));
        g.draw(toDevice.createTransformedShape(HeadShape.ear(-1)));
        g.draw(toDevice.createTransformedShape(HeadShape.ear(1)));
    }

    private static void drawElectrodes(Graphics2D g, MapLayout layout, MapStyle style,
            AffineTransform toDevice, double side) {
        double r = markerRadius(layout, style, side);
        g.setFont(labelFont(layout, style, side));
        FontRenderContext frc = g.getFontRenderContext();
        for (int i = 0; i < layout.electrodeCount(); i++) {
            double[] p = layout.position(i);
            Point2D d = toDevice.transform(new Point2D.Double(p[0], p[1]), null);
            String label = layout.labels().get(i);
            boolean highlighted = style.isHighlighted(label);
            if (highlighted) {
                double hr = 2.2 * r;
                Ellipse2D dot = new Ellipse2D.Double(d.getX() - hr, d.getY() - hr, 2 * hr, 2 * hr);
                g.setColor(HIGHLIGHT);
                g.fill(dot);
                g.setColor(OUTLINE);
                g.setStroke(new BasicStroke((float) Math.max(0.5, 0.45 * r)));
                g.draw(dot);
            } else if (style.markers()) {
                g.setColor(OUTLINE);
                g.fill(new Ellipse2D.Double(d.getX() - r, d.getY() - r, 2 * r, 2 * r));
            }
            if (style.labels() || highlighted) {
                g.setColor(OUTLINE);
                Rectangle2D box = labelBox(d, label, g.getFont(), frc, r);
                g.drawString(label, (float) box.getX(), (float) (box.getY() + g.getFont().getLineMetrics(label,
                        frc).getAscent()));
            }
        }
    }

    /**
     * The device rectangle every electrode label drawn on a map in these bounds takes (labels of
     * all electrodes when the style shows labels, else of the highlighted ones), or null when no
     * label is drawn. Lets a layout keep room for labels that reach beyond the map's square (Iz
     * below the head, T9 and T10 at its sides).
     */
    public static Rectangle2D labelBounds(Rectangle2D bounds, MapLayout layout, MapStyle style, FontRenderContext frc) {
        double side = Math.min(bounds.getWidth(), bounds.getHeight());
        AffineTransform toDevice = planeToDevice(bounds, layout);
        double r = markerRadius(layout, style, side);
        Font font = labelFont(layout, style, side);
        Rectangle2D all = null;
        for (int i = 0; i < layout.electrodeCount(); i++) {
            String label = layout.labels().get(i);
            if (!style.labels() && !style.isHighlighted(label)) {
                continue;
            }
            double[] p = layout.position(i);
            Rectangle2D box = labelBox(toDevice.transform(new Point2D.Double(p[0], p[1]), null), label, font, frc, r);
            if (all == null) {
                all = box;
            } else {
                all.add(box);
            }
        }
        return all;
    }

    /** Marker radius: smaller on dense montages, never below 0.6 device units. */
    private static double markerRadius(MapLayout layout, MapStyle style, double side) {
        return Math.max(0.6, side * 0.0085 * style.sizeFactor() * density(layout));
    }

    private static Font labelFont(MapLayout layout, MapStyle style, double side) {
        return new Font(Font.SANS_SERIF, Font.PLAIN, 1).deriveFont((float) Math.max(5,
                side * 0.032 * style.sizeFactor() * Math.max(0.6, density(layout))));
    }

    /** 1 up to 64 electrodes, then shrinking as 1/√n, so markers and labels of dense caps do not crowd. */
    private static double density(MapLayout layout) {
        return Math.min(1, Math.sqrt(64.0 / Math.max(64, layout.electrodeCount())));
    }

    /** A label's box: centred under its marker, its top 2.4 marker radii below the marker's centre. */
    private static Rectangle2D labelBox(Point2D marker, String label, Font font, FontRenderContext frc, double r) {
        LineMetrics lm = font.getLineMetrics(label, frc);
        double width = font.getStringBounds(label, frc).getWidth();
        double baseline = marker.getY() + 2.4 * r + lm.getAscent() * 0.8;
        return new Rectangle2D.Double(marker.getX() - width / 2, baseline - lm.getAscent(), width,
                lm.getAscent() + lm.getDescent());
    }
}
