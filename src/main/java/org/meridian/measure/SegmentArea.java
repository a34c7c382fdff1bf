package org.meridian.measure;

/**
 * The area between the straight line joining two samples and zero, over one sample interval:
 * the trapezoid rule applied exactly to the positive part max(x, 0), the negative part
 * min(x, 0), or the signed wave. Where the line crosses zero inside the interval, only the
 * triangle on the chosen side counts, so for a piecewise-linear wave with its corners on samples
 * the areas are exact, and positive + negative = signed always.
 *
 * <p>The positive part is computed as the trapezoid of both ends clipped at zero,
 * Δt·(a⁺ + b⁺)/2 with x⁺ = (x + |x|)/2, less its overshoot at a crossing, Δt·(−ab)/(2|a − b|)
 * (similar triangles). The clipped trapezoids take no branch; the overshoot, which needs a
 * division, is added only for the few intervals where an averaged wave crosses zero. The
 * negative part is the signed area less the positive part.
 */
final class SegmentArea {
    private SegmentArea() {
    }

    /** Area of the chosen part between values a and b a time dt apart (negative for neg). */
    static double of(double a, double b, double dt, Polarity polarity) {
        return switch (polarity) {
            case SIGNED -> signed(a, b, dt);
            case POSITIVE -> positive(a, b, dt);
            case NEGATIVE -> signed(a, b, dt) - positive(a, b, dt);
        };
    }

    static double signed(double a, double b, double dt) {
        return 0.5 * (a + b) * dt;
    }

    static double positive(double a, double b, double dt) {
        double clipped = 0.25 * (a + Math.abs(a) + b + Math.abs(b)) * dt;
        double ab = a * b;
        return ab < 0 ? clipped - overshoot(a, b, ab, dt) : clipped;
    }

    /** Δt·(−ab)/(2|a − b|) for ends of opposite signs (ab &lt; 0). */
    private static double overshoot(double a, double b, double ab, double dt) {
        return -0.5 * ab / Math.abs(a - b) * dt;
    }

    /** The area of the chosen part over samples from..to of x. */
    static double sum(double[] x, int from, int to, double dt, Polarity polarity) {
        double signed = 0;
        double clipped = 0;
        double overshoot = 0;
        for (int i = from; i < to; i++) {
            double a = x[i];
            double b = x[i + 1];
            signed += a + b;
            clipped += a + Math.abs(a) + b + Math.abs(b);
            double ab = a * b;
            if (ab < 0) {
                overshoot -= ab / Math.abs(a - b);
            }
        }
        double positive = (0.25 * clipped - 0.5 * overshoot) * dt;
        return switch (polarity) {
            case SIGNED -> 0.5 * signed * dt;
            case POSITIVE -> positive;
            case NEGATIVE -> 0.5 * signed * dt - positive;
        };
    }
}
