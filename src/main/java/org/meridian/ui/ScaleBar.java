package org.meridian.ui;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;

/**
 * A vertical scale bar of a round length in µV (or µV/m²) with its value written beside it, so a
 * plot's amplitude reads without axes and the same way under either polarity convention.
 */
final class ScaleBar {
    private ScaleBar() {
    }

    /** The round length (1, 2 or 5 × 10^k) nearest below a quarter of the given range. */
    static double roundLength(double range) {
        if (!(range > 0) || !Double.isFinite(range)) {
            return 1;
        }
        double target = range / 4;
        double p = Math.pow(10, Math.floor(Math.log10(target)));
        double best = p;
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * p <= target * 1.0001) {
                best = m * p;
            }
        }
        return best;
    }

    static String label(double length, String unit) {
        String n = length >= 1 ? String.valueOf((long) Math.round(length))
                : String.valueOf(length).replaceAll("0+$", "");
        return n + " " + unit;
    }

    /**
     * Draws a bar {@code pixels} tall whose bottom is at (x, y), with its label to the right.
     */
    static void draw(Graphics2D g, double x, double y, double pixels, String label, Color ink, Font font) {
        g.setColor(ink);
        g.setStroke(new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER));
        g.draw(new Line2D.Double(x, y, x, y - pixels));
        g.setStroke(new BasicStroke(1.2f));
        g.draw(new Line2D.Double(x - 3, y, x + 3, y));
        g.draw(new Line2D.Double(x - 3, y - pixels, x + 3, y - pixels));
        g.setFont(font);
        FontMetrics fm = g.getFontMetrics();
        g.drawString(label, (float) (x + 6), (float) (y - pixels / 2 + fm.getAscent() / 2.0 - 1));
    }

    /** Where the bar's label would sit, to keep other drawings clear of it. */
    static Rectangle2D bounds(Graphics2D g, double x, double y, double pixels, String label, Font font) {
        FontMetrics fm = g.getFontMetrics(font);
        return new Rectangle2D.Double(x - 3, y - pixels, 9 + fm.stringWidth(label), pixels);
    }
}
