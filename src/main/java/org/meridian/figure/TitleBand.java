package org.meridian.figure;

import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;

/**
 * The band at the top of a panel: the bold panel letter at the far left, then the panel's title
 * in the label font, on one baseline.
 */
final class TitleBand {
    private TitleBand() {
    }

    /** The band's height in points: one line of the letter font. */
    static double height(FigureStyle style) {
        return FigureStyle.lineHeight(style.letter());
    }

    /** The baseline below the band's top, in points. */
    static double baseline(FigureStyle style) {
        return style.letter().getSize2D();
    }

    static void draw(Graphics2D target, Rectangle2D bounds, String letter, String title, FigureStyle style) {
        Graphics2D g = (Graphics2D) target.create();
        try {
            g.setColor(FigureStyle.INK);
            float baseline = (float) (bounds.getY() + baseline(style));
            float x = (float) bounds.getX();
            if (!letter.isEmpty()) {
                g.setFont(style.letter());
                g.drawString(letter, x, baseline);
                FontMetrics fm = g.getFontMetrics();
                x += fm.stringWidth(letter) + style.letter().getSize2D() * 0.6f;
            }
            if (title != null && !title.isEmpty()) {
                g.setFont(style.label());
                g.drawString(title, x, baseline);
            }
        } finally {
            g.dispose();
        }
    }
}
