package org.meridian.maps;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.meridian.core.BadInputException;

/**
 * The values at the two ends of a colour bar. Values beyond them take the end colours. Maps of
 * the trade are symmetric about zero by default; the automatic limits are ±(largest absolute
 * value, rounded up to a round number). Fixed limits may also be asymmetric (−2 to 8 µV).
 *
 * <p>Zero always takes the colour scale's middle (neutral) colour, which a diverging scale keeps
 * for the critical value (Moreland, 2009): with M = max(|lower|, |upper|) a value v has the
 * colour at position (v + M) / (2M) of the scale, v clamped to [lower, upper]. Symmetric limits
 * use the whole scale; asymmetric ones the part of it between their ends, so −2 to 8 µV colours
 * −2 µV as −2 µV would be coloured under ±8 µV.
 */
public record ColourLimits(double lower, double upper) {
    /** The automatic limits aim at about this many tick intervals from zero to the upper limit. */
    private static final int AUTO_STEPS = 8;

    public ColourLimits {
        if (!Double.isFinite(lower) || !Double.isFinite(upper) || !(lower < upper)) {
            throw new BadInputException("colour limits must be two numbers, the lower below the upper, got "
                    + lower + " and " + upper);
        }
    }

    /** ±halfRange. */
    public static ColourLimits symmetric(double halfRange) {
        if (!(halfRange > 0) || !Double.isFinite(halfRange)) {
            throw new BadInputException("a symmetric colour scale needs a positive limit, got " + halfRange);
        }
        return new ColourLimits(-halfRange, halfRange);
    }

    /** ±maxAbs rounded up to a round number (±1 when everything is zero). */
    public static ColourLimits automatic(double maxAbs) {
        if (!(maxAbs > 0) || !Double.isFinite(maxAbs)) {
            return symmetric(1);
        }
        double step = RoundNumbers.atLeast(maxAbs / AUTO_STEPS);
        return symmetric(Math.ceil(maxAbs / step * (1 - 1e-12)) * step);
    }

    /** Automatic limits covering every map. */
    public static ColourLimits automatic(List<ScalpMap> maps) {
        double m = 0;
        for (ScalpMap map : maps) {
            m = Math.max(m, map.maxAbs());
        }
        return automatic(m);
    }

    /**
     * Reads {@code auto} (returns null: compute from the data), {@code X} or {@code ±X} (also
     * {@code +-X}) for ±X, or {@code LOWER:UPPER} (e.g. {@code -2:8}) for fixed limits.
     */
    public static ColourLimits parse(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        if (t.equals("auto")) {
            return null;
        }
        int colon = t.indexOf(':');
        if (colon >= 0) {
            double lower = limit(t.substring(0, colon), text);
            double upper = limit(t.substring(colon + 1), text);
            if (!(lower < upper)) {
                throw new BadInputException("colour limits \"" + text.trim()
                        + "\" must run from a lower to a higher value (LOWER:UPPER, e.g. -2:8)");
            }
            return new ColourLimits(lower, upper);
        }
        if (t.startsWith("±") || t.startsWith("+-")) {
            t = t.substring(t.startsWith("±") ? 1 : 2);
        }
        return symmetric(limit(t, text));
    }

    private static double limit(String number, String text) {
        String n = number.trim().replace('\u2212', '-');
        if (!n.matches("[+-]?([0-9]+\\.?[0-9]*|\\.[0-9]+)([eE][+-]?[0-9]+)?")) {
            throw new BadInputException("colour limits \"" + text.trim()
                    + "\" are not auto, ±X (e.g. ±5) or LOWER:UPPER (e.g. -2:8)");
        }
        double v = Double.parseDouble(n);
        if (!Double.isFinite(v)) {
            throw new BadInputException("colour limit " + n + " is too large");
        }
        return v;
    }

    /** The largest absolute limit: the value at either end of the full colour scale. */
    public double halfRange() {
        return Math.max(Math.abs(lower), Math.abs(upper));
    }

    /**
     * Where a value falls along the colour scale: (v + M) / (2M) with M = {@link #halfRange} and
     * v clamped to the limits, so zero is always at 0.5.
     */
    public double position(double value) {
        double v = value < lower ? lower : (value > upper ? upper : value);
        double m = halfRange();
        return (v + m) / (2 * m);
    }

    /** Where a value falls along the colour bar: 0 at the lower limit, 1 at the upper, clamped. */
    public double barFraction(double value) {
        double t = (value - lower) / (upper - lower);
        return t < 0 ? 0 : (t > 1 ? 1 : t);
    }

    /**
     * The round step between colour-bar ticks: the largest round step with at least 4 and at
     * most 8 intervals whose multiples land on both limits, else the smallest round step with
     * at most 8 intervals.
     */
    public double step() {
        double range = upper - lower;
        double first = RoundNumbers.atLeast(range / 8);
        double best = first;
        boolean found = false;
        for (double s = first; s <= range / 4 * (1 + 1e-9); s = RoundNumbers.next(s)) {
            if (RoundNumbers.isMultiple(upper, s) && RoundNumbers.isMultiple(lower, s)) {
                best = s;
                found = true;
            }
        }
        return found ? best : first;
    }

    /** The round step between contour lines: the smallest round step with at most 12 intervals. */
    public double contourStep() {
        return RoundNumbers.atLeast((upper - lower) / 12);
    }

    /** The multiples of {@link #step} within the limits, ascending. */
    public List<Double> ticks() {
        double s = step();
        List<Double> out = new ArrayList<>();
        long k0 = (long) Math.ceil(lower / s - 1e-9);
        long k1 = (long) Math.floor(upper / s + 1e-9);
        for (long k = k0; k <= k1; k++) {
            out.add(k * s);
        }
        return out;
    }

    /** A tick value as printed on the colour bar. */
    public String format(double value) {
        return RoundNumbers.format(value, step());
    }
}
