package org.meridian.spline;

/**
 * Legendre polynomials P<sub>n</sub> and their derivatives by Bonnet's three-term recurrence:
 *
 * <pre>
 *   P₀ = 1,  P₁ = x,  (n + 1) P<sub>n+1</sub> = (2n + 1) x P<sub>n</sub> − n P<sub>n−1</sub>
 *   P′₀ = 0, P′₁ = 1, P′<sub>n+1</sub> = P′<sub>n−1</sub> + (2n + 1) P<sub>n</sub>
 * </pre>
 *
 * (Abramowitz &amp; Stegun, 1964, 8.5.3 and 22.7.10). The recurrence is stable on [−1, 1], where
 * |P<sub>n</sub>| ≤ 1.
 */
public final class Legendre {
    private Legendre() {
    }

    /** Fills {@code out[n] = P_n(x)} for n = 0 … out.length − 1. */
    public static void values(double x, double[] out) {
        if (out.length == 0) {
            return;
        }
        out[0] = 1;
        if (out.length == 1) {
            return;
        }
        out[1] = x;
        for (int n = 1; n + 1 < out.length; n++) {
            out[n + 1] = ((2 * n + 1) * x * out[n] - n * out[n - 1]) / (n + 1);
        }
    }

    /** P₀(x) … P<sub>maxDegree</sub>(x) in a new array. */
    public static double[] values(double x, int maxDegree) {
        double[] out = new double[maxDegree + 1];
        values(x, out);
        return out;
    }

    /**
     * Fills {@code derivatives[n] = P′_n(x)} given {@code values[n] = P_n(x)} from
     * {@link #values(double, double[])} (both arrays the same length).
     */
    public static void derivatives(double[] values, double[] derivatives) {
        if (derivatives.length == 0) {
            return;
        }
        derivatives[0] = 0;
        if (derivatives.length == 1) {
            return;
        }
        derivatives[1] = 1;
        for (int n = 1; n + 1 < derivatives.length; n++) {
            derivatives[n + 1] = derivatives[n - 1] + (2 * n + 1) * values[n];
        }
    }

    /**
     * The series Σ<sub>n</sub> coefficients[n] · P<sub>n</sub>(x), summed directly with the
     * recurrence (no table).
     */
    public static double series(double[] coefficients, double x) {
        double sum = 0;
        double previous = 1;
        double current = x;
        if (coefficients.length > 0) {
            sum += coefficients[0];
        }
        if (coefficients.length > 1) {
            sum += coefficients[1] * x;
        }
        for (int n = 1; n + 1 < coefficients.length; n++) {
            double next = ((2 * n + 1) * x * current - n * previous) / (n + 1);
            sum += coefficients[n + 1] * next;
            previous = current;
            current = next;
        }
        return sum;
    }
}
