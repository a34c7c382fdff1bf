package org.meridian.maps;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.AffineTransform;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;

/**
 * A vertical colour bar: the scale from the lower limit (bottom) to the upper limit (top), ticks
 * with values at the limits' round step, and the unit above (e.g. {@code µV} or
 * {@code CSD (µV/m²)}). Drawn onto any {@code Graphics2D}; sizes follow the bounds' height.
 */
public final class ColourBar {
    private static final Color INK = new Color(0x26, 0x26, 0x26);

    private ColourBar() {
    }

    /** Draws the bar with a font and line width that follow the bounds' height. */
    public static void draw(Graphics2D target, Rectangle2D bounds, ColourScale scale, ColourLimits limits,
            String unitLabel, double sizeFactor) {
        float fontSize = (float) Math.max(5, bounds.getHeight() * 0.055 * sizeFactor);
        draw(target, bounds, scale, limits, unitLabel, new Font(Font.SANS_SERIF, Font.PLAIN, 1).deriveFont(fontSize),
                (float) Math.max(0.4, fontSize * 0.07));
    }

    /**
     * Draws the bar with a given font (tick values and unit) and line width (outline and ticks),
     * for figures whose type sizes are fixed in points. The bar is at most 1.3 font sizes wide.
     */
    public static void draw(Graphics2D target, Rectangle2D bounds, ColourScale scale, ColourLimits limits,
            String unitLabel, Font font, float lineWidth) {
        Graphics2D g = (Graphics2D) target.create();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
            float fontSize = font.getSize2D();
            g.setFont(font);
            FontMetrics fm = g.getFontMetrics();
            double top = bounds.getY() + fm.getHeight() * 1.6;
            double bottom = bounds.getMaxY() - fm.getHeight() * 0.8;
            double barWidth = Math.min(bounds.getWidth() * 0.28, fontSize * 1.3);
            double x = bounds.getX() + fontSize * 0.3;
            Rectangle2D bar = new Rectangle2D.Double(x, top, barWidth, bottom - top);

            int steps = 256;
            BufferedImage ramp = new BufferedImage(1, steps, BufferedImage.TYPE_INT_RGB);
            // the part of the scale the limits use (all of it when they are symmetric)
            double from = limits.position(limits.lower());
            double to = limits.position(limits.upper());
            for (int i = 0; i < steps; i++) {
                ramp.setRGB(0, steps - 1 - i, scale.rgb(from + (to - from) * i / (steps - 1.0)));
            }
            AffineTransform place = AffineTransform.getTranslateInstance(bar.getX(), bar.getY());
            place.scale(bar.getWidth(), bar.getHeight() / steps);
            g.drawImage(ramp, place, null);
            g.setColor(INK);
            g.setStroke(new BasicStroke(lineWidth));
            g.draw(bar);
            for (double tick : limits.ticks()) {
                double y = bar.getMaxY() - limits.barFraction(tick) * bar.getHeight();
                g.draw(new Line2D.Double(bar.getMaxX(), y, bar.getMaxX() + fontSize * 0.35, y));
                g.drawString(limits.format(tick), (float) (bar.getMaxX() + fontSize * 0.55),
                        (float) (y + fm.getAscent() * 0.35));
            }
            g.drawString(unitLabel, (float) bounds.getX(), (float) (bounds.getY() + fm.getAscent()));
        } finally {
            g.dispose();
        }
    }
}
