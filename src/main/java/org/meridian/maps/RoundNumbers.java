package org.meridian.maps;

import java.math.BigDecimal;

/**
 * Round steps for colour limits, colour-bar ticks, contour levels and figure axes: 1, 2, 2.5 and 5 times a
 * power of ten (common practice for axis labels).
 */
public final class RoundNumbers {
    private static final double[] MANTISSAS = {1, 2, 2.5, 5, 10};

    private RoundNumbers() {
    }

    /** The smallest round number ≥ x (x &gt; 0). */
    public static double atLeast(double x) {
        if (!(x > 0) || !Double.isFinite(x)) {
            throw new IllegalArgumentException("a round step needs a positive size, got " + x);
        }
        double power = Math.pow(10, Math.floor(Math.log10(x)));
        for (double m : MANTISSAS) {
            double candidate = m * power;
            if (candidate >= x * (1 - 1e-12)) {
                return candidate;
            }
        }
        return 10 * power;
    }

    /** The next round number above a round number. */
    public static double next(double round) {
        return atLeast(round * (1 + 1e-9));
    }

    /** Whether {@code v} is (to rounding) an integer multiple of {@code step}. */
    public static boolean isMultiple(double v, double step) {
        double q = v / step;
        return Math.abs(q - Math.rint(q)) < 1e-9 * Math.max(1, Math.abs(q));
    }

    /** A value printed with as many decimals as the step needs: 2.5 → "2.5", 10 → "10". */
    public static String format(double v, double step) {
        int decimals = Math.max(0, BigDecimal.valueOf(step).stripTrailingZeros().scale());
        double r = Math.abs(v) < step * 1e-9 ? 0 : v;
        String s = String.format(java.util.Locale.ROOT, "%." + decimals + "f", r);
        return s.startsWith("-") ? "\u2212" + s.substring(1) : s;
    }
}
