package org.meridian.measure;

/**
 * The area between the straight line joining two samples and zero, over one sample interval:
 * the trapezoid rule applied exactly to the positive part max(x, 0), the negative part
 * min(x, 0), or the signed wave. Where the line crosses zero inside the interval, the interval
 * is split at the crossing, so for a piecewise-linear wave with its corners on samples the
 * areas are exact, and positive + negative = signed always.
 */
final class SegmentArea {
    private SegmentArea() {
    }

    /** Area of the chosen part between values a and b a time dt apart (negative for neg). */
    static double of(double a, double b, double dt, Polarity polarity) {
        return switch (polarity) {
            case SIGNED -> 0.5 * (a + b) * dt;
            case POSITIVE -> positive(a, b, dt);
            case NEGATIVE -> -positive(-a, -b, dt);
        };
    }

    private static double positive(double a, double b, double dt) {
        if (a >= 0 && b >= 0) {
            return 0.5 * (a + b) * dt;
        }
        if (a <= 0 && b <= 0) {
            return 0;
        }
        // one end above zero: a triangle from the crossing to the positive end
        double top = Math.max(a, b);
        return 0.5 * top * top / Math.abs(a - b) * dt;
    }
}
