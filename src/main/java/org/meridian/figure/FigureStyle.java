package org.meridian.figure;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import org.meridian.figure.spec.FigureSpec;

/**
 * The fonts and strokes of one figure, in points, made once from its spec: small text (ticks,
 * legends, map times), labels (axis labels, panel titles), bold panel letters, and the wave, axis
 * and zero-line widths. One ink colour, a near-black, for all text and axes. Immutable.
 */
public record FigureStyle(Font small, Font label, Font letter, float wavePt, float axisPt, float zeroPt) {
    /** Text and axis colour. */
    public static final Color INK = new Color(0x21, 0x21, 0x21);
    /** The zero lines: darker than the shading, lighter than the ink. */
    public static final Color ZERO = new Color(0x80, 0x80, 0x80);
    /** The band marking the time of the maps in waveform panels. */
    public static final Color MARK = new Color(0xEC, 0xEC, 0xEC);

    public static FigureStyle of(FigureSpec spec) {
        String family = spec.font().family();
        return new FigureStyle(FigureFonts.font(family, spec.font().sizePt(), false),
                FigureFonts.font(family, spec.font().labelPt(), false),
                FigureFonts.font(family, spec.font().letterPt(), true),
                spec.lines().wavePt().floatValue(), spec.lines().axisPt().floatValue(),
                spec.lines().zeroPt().floatValue());
    }

    public BasicStroke axisStroke() {
        return new BasicStroke(axisPt, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER);
    }

    public BasicStroke zeroStroke() {
        return new BasicStroke(zeroPt, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER);
    }

    /** A wave's stroke; dashed waves (contrasts) use dashes scaled to the line width. */
    public BasicStroke waveStroke(boolean dashed) {
        if (!dashed) {
            return new BasicStroke(wavePt, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
        }
        float unit = Math.max(1.5f, wavePt * 2.5f);
        return new BasicStroke(wavePt, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10,
                new float[] {unit * 1.6f, unit}, 0);
    }

    /** Height of a line of text in a font, in points. */
    public static double lineHeight(Font f) {
        return f.getSize2D() * 1.25;
    }
}
