package org.meridian.figure;

import java.awt.Font;
import java.awt.font.FontRenderContext;

/**
 * Widths of text as a figure's layout reckons them: anti-aliased, with fractional advances, in
 * points, independent of the {@code Graphics2D} the figure is drawn on — so the layout, and the
 * SVG made from it, are the same wherever the figure is made.
 */
final class TextMeasure {
    private static final FontRenderContext CONTEXT = new FontRenderContext(null, true, true);

    private TextMeasure() {
    }

    /** The advance width of a text in a font, in points. */
    static double width(String text, Font font) {
        return text.isEmpty() ? 0 : font.getStringBounds(text, CONTEXT).getWidth();
    }

    /** A line's height in a font (ascent + descent + leading), in points. */
    static double lineHeight(Font font) {
        return font.getLineMetrics("0", CONTEXT).getHeight();
    }

    /** The ascent of a font, in points. */
    static double ascent(Font font) {
        return font.getLineMetrics("0", CONTEXT).getAscent();
    }
}
