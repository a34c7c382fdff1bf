package org.meridian.figure;

import java.awt.Font;
import java.awt.Graphics2D;
import java.util.ArrayList;
import java.util.List;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.signal.Processing;

/**
 * The figure's caption line under its panels, stating what was done to the data before drawing
 * ({@link Processing#describe()}), so that no filter or reference is ever applied silently. It
 * appears only when the spec processes the data, and wraps onto further lines, at spaces, when it
 * is wider than the figure.
 */
final class Caption {
    private Caption() {
    }

    /** The caption's text, or null when the figure shows the data as loaded. */
    static String text(FigureSpec spec) {
        Processing p = spec.processingValue();
        // a number stays on the line of its unit
        return p.isNone() ? null : ("Processing: " + p.describe() + ".").replace(" Hz", "\u00A0Hz")
                .replace(" ms", "\u00A0ms");
    }

    /** The text broken at spaces into lines no wider than {@code widthPt} (a longer word stands alone). */
    static List<String> wrap(String text, Font font, double widthPt) {
        List<String> lines = new ArrayList<>();
        if (text == null) {
            return lines;
        }
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            String candidate = line.length() == 0 ? word : line + " " + word;
            if (line.length() > 0 && TextMeasure.width(candidate, font) > widthPt) {
                lines.add(line.toString());
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(candidate);
            }
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }

    /** Draws the lines from a top edge, left-aligned, in the small font. */
    static void draw(Graphics2D target, double x, double top, List<String> lines, FigureStyle style) {
        Graphics2D g = (Graphics2D) target.create();
        try {
            g.setFont(style.small());
            g.setColor(FigureStyle.INK);
            double lineHeight = FigureStyle.lineHeight(style.small());
            for (int i = 0; i < lines.size(); i++) {
                g.drawString(lines.get(i), (float) x, (float) (top + i * lineHeight + style.small().getSize2D()));
            }
        } finally {
            g.dispose();
        }
    }
}
