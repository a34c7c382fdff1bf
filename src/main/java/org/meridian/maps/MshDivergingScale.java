package org.meridian.maps;

/**
 * A diverging colour scale built in Msh space (Moreland, 2009, "Diverging color maps for
 * scientific visualization"). Each arm runs on a straight line in Msh from an end colour to an
 * unsaturated midpoint (M<sub>mid</sub>, 0, ·) at t = 0.5:
 *
 * <ul>
 *   <li>M<sub>mid</sub> = max(M₁, M₂, 88) when the two ends are saturated (s &gt; 0.05) and
 *       their hues differ by more than π/3 — Moreland's rule — unless a midpoint is given;
 *   <li>the midpoint's hue is that of the saturated end, spun by
 *       s·√(M<sub>mid</sub>² − M²) / (M·sin s) away from −π/3 (Moreland's hue adjustment), so
 *       the arm does not bend through an unrelated hue on its way to grey;
 *   <li>linear interpolation of M, s and h along each arm; the result is converted back through
 *       CIELAB (D65) to sRGB and clamped into the gamut.
 * </ul>
 *
 * The colours are precomputed at {@value #STEPS} positions. Immutable.
 */
public final class MshDivergingScale implements ColourScale {
    static final int STEPS = 1024;
    /** Moreland's least midpoint magnitude (a light grey, L* = 88). */
    static final double MORELAND_MID_M = 88;
    private static final double SATURATED = 0.05;

    private final String name;
    private final int[] table;

    /**
     * @param lowRgb  the colour at t = 0 ({@code 0xRRGGBB})
     * @param highRgb the colour at t = 1
     * @param midM    the midpoint's M (= its L*, being neutral), or NaN for Moreland's rule
     */
    public MshDivergingScale(String name, int lowRgb, int highRgb, double midM) {
        this.name = name;
        double[] low = ColourSpace.labToMsh(ColourSpace.srgbToLab(lowRgb));
        double[] high = ColourSpace.labToMsh(ColourSpace.srgbToLab(highRgb));
        if (!(low[1] > SATURATED) || !(high[1] > SATURATED)) {
            throw new IllegalArgumentException(name + ": both ends of a diverging scale must be saturated");
        }
        double mid = Double.isNaN(midM) ? Math.max(Math.max(low[0], high[0]), MORELAND_MID_M) : midM;
        this.table = new int[STEPS];
        for (int i = 0; i < STEPS; i++) {
            double t = i / (STEPS - 1.0);
            double[] msh = t < 0.5 ? towardMidpoint(low, mid, 2 * t) : towardMidpoint(high, mid, 2 * (1 - t));
            table[i] = ColourSpace.labToSrgb(ColourSpace.mshToLab(msh));
        }
    }

    /** The point at fraction u of the way from a saturated end to the neutral midpoint. */
    static double[] towardMidpoint(double[] end, double midM, double u) {
        double[] mid = {midM, 0, adjustedHue(end, midM)};
        return new double[] {
            (1 - u) * end[0] + u * mid[0],
            (1 - u) * end[1] + u * mid[1],
            (1 - u) * end[2] + u * mid[2],
        };
    }

    /** Moreland's (2009) hue for an unsaturated colour of magnitude {@code m} next to {@code saturated}. */
    static double adjustedHue(double[] saturated, double m) {
        double ms = saturated[0];
        double s = saturated[1];
        double h = saturated[2];
        if (ms >= m) {
            return h;
        }
        double spin = s * Math.sqrt(m * m - ms * ms) / (ms * Math.sin(s));
        return h > -Math.PI / 3 ? h + spin : h - spin;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public int rgb(double t) {
        double c = Double.isNaN(t) ? 0.5 : Math.max(0, Math.min(1, t));
        return table[(int) Math.round(c * (STEPS - 1))];
    }
}
