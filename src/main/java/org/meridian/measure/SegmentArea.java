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

    /**
     * The area of the chosen part over samples from..to of x. The trapezoid sums are sums over
     * samples with the two end samples halved (Σ_i (x_i + x_{i+1})/2 = Σ x − (x_from + x_to)/2),
     * and x⁺ = (x + |x|)/2; the crossings' overshoot is a separate, rarely branching loop.
     */
    static double sum(double[] x, int from, int to, double dt, Polarity polarity) {
        double sum0 = 0;
        double sum1 = 0;
        double abs0 = 0;
        double abs1 = 0;
        int i = from;
        for (; i + 1 <= to; i += 2) {
            double a = x[i];
            double b = x[i + 1];
            sum0 += a;
            sum1 += b;
            abs0 += Math.abs(a);
            abs1 += Math.abs(b);
        }
        if (i == to) {
            sum0 += x[i];
            abs0 += Math.abs(x[i]);
        }
        double ends = 0.5 * (x[from] + x[to]);
        double signed = (sum0 + sum1) - ends;
        double clipped = 0.5 * ((sum0 + sum1) + (abs0 + abs1)) - 0.5 * (ends + 0.5 * (Math.abs(x[from]) + Math.abs(x[to])));
        double overshoot = 0;
        for (int j = from; j < to; j++) {
            double ab = x[j] * x[j + 1];
            if (ab < 0) {
                overshoot -= ab / Math.abs(x[j] - x[j + 1]);
            }
        }
        double positive = (clipped - 0.5 * overshoot) * dt;
        return switch (polarity) {
            case SIGNED -> signed * dt;
            case POSITIVE -> positive;
            case NEGATIVE -> signed * dt - positive;
        };
    }
}
