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
     * The area of the chosen part over samples from..to of x, from the window's one-pass sums
     * ({@link WindowScan}); see {@link #fromSums}.
     */
    static double sum(WindowScan scan, double[] x, int from, int to, double dt, Polarity polarity) {
        return fromSums(scan.evenSum + scan.oddSum, scan.evenAbs + scan.oddAbs, scan.overshoot,
                x[from], x[to], dt, polarity);
    }

    /**
     * The area of the chosen part over samples from..to from Σ x and Σ |x| over from..to (ends
     * included) and the crossings' overshoot in between. The trapezoid sums are sums over
     * samples with the two end samples halved (Σ_i (x_i + x_{i+1})/2 = Σ x − (x_from + x_to)/2),
     * and x⁺ = (x + |x|)/2; the crossings' overshoot is subtracted from the clipped trapezoids.
     */
    static double fromSums(double sum, double absSum, double overshoot, double first, double last,
            double dt, Polarity polarity) {
        double ends = 0.5 * (first + last);
        double signed = sum - ends;
        double clipped = 0.5 * (sum + absSum) - 0.5 * (ends + 0.5 * (Math.abs(first) + Math.abs(last)));
        double positive = (clipped - 0.5 * overshoot) * dt;
        return switch (polarity) {
            case SIGNED -> signed * dt;
            case POSITIVE -> positive;
            case NEGATIVE -> signed * dt - positive;
        };
    }
}
