package org.meridian.figure.spec;

import java.util.List;

/**
 * The default colours of the waves in a figure, in order of appearance: blue #0072B2,
 * vermilion #D55E00, bluish green #009E73, reddish purple #CC79A7, orange #E69F00, sky blue
 * #56B4E9, then black. These are colours of the palette Okabe &amp; Ito (2008) proposed for
 * colour-universal design, in an order of our own: the first two (the usual pair of conditions)
 * differ in lightness and along the blue–yellow axis, which protanopes, deuteranopes and
 * tritanopes all keep, and every pair of the first six stays apart under simulated dichromacy
 * (tested). Waves beyond the sixth reuse the list; contrasts are drawn dashed by default, so a
 * difference wave never relies on colour alone.
 */
public final class ConditionPalette {
    public static final List<String> COLOURS = List.of(
            "#0072B2", "#D55E00", "#009E73", "#CC79A7", "#E69F00", "#56B4E9", "#000000");

    private ConditionPalette() {
    }

    /** The default colour of the wave at a position (0-based). */
    public static String colour(int index) {
        return COLOURS.get(index % COLOURS.size());
    }
}
