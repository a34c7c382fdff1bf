package org.meridian.figure;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import org.meridian.maps.ColourBar;

/**
 * Draws the figure's one colour bar ({@link ColourBar}) so that the bar itself runs exactly from
 * the top to the bottom of the maps in its row, with the unit above it.
 */
final class ColourBarPainter {
    private ColourBarPainter() {
    }

    /** @param side the side of the maps in this row, in points (the bar's length) */
    static void draw(Graphics2D g, Rectangle2D bounds, MapScales scales, FigureStyle style, double side) {
        double line = g.getFontMetrics(style.small()).getHeight();
        double top = bounds.getY() + TitleBand.height(style);
        // ColourBar puts the bar 1.6 lines below the top of its bounds and 0.8 lines above the bottom
        Rectangle2D barBounds = new Rectangle2D.Double(bounds.getX(), top - 1.6 * line, bounds.getWidth(),
                side + 2.4 * line);
        ColourBar.draw(g, barBounds, scales.style().scale(), scales.limits(), scales.unitLabel(), style.small(),
                style.axisPt());
    }
}
