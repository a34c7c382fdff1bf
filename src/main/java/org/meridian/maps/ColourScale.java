package org.meridian.maps;

import java.awt.Color;

/**
 * A colour scale: a colour for every position t in [0, 1] along a colour bar, t = 0 at the lower
 * limit (most negative), 1 at the upper limit (most positive). Implementations are immutable.
 * To add one, implement this interface (or build an {@link MshDivergingScale}) and list it in
 * {@link ColourScales}.
 */
public interface ColourScale {
    /** The name shown to the user and accepted by the command line, e.g. {@code diverging}. */
    String name();

    /** The colour at t (clamped to [0, 1]) as {@code 0xRRGGBB}. */
    int rgb(double t);

    default Color colour(double t) {
        return new Color(rgb(t));
    }

    /** {@code size} colours from t = 0 to 1 as opaque ARGB, for fast lookup. */
    default int[] argbTable(int size) {
        int[] out = new int[size];
        for (int i = 0; i < size; i++) {
            out[i] = 0xff000000 | rgb(size == 1 ? 0.5 : i / (size - 1.0));
        }
        return out;
    }
}
