package org.meridian.spline;

import java.util.Arrays;

/**
 * The kernels g_m and h_m of a {@link SplineKernel}, evaluated fast: each kernel is split into its
 * degree 1–3 part, a cubic in x computed exactly ({@link LowDegree}), and the remainder
 * (degrees 4 … T), tabulated at equally spaced x over [−1, 1] with its derivative and read back
 * by cubic Hermite interpolation. {@link #g} and {@link #h} return the sum; the map weights use
 * the two parts separately.
 *
 * <p>Node spacing. On an interval of length Δx the cubic Hermite interpolant of f errs by at most
 * Δx⁴/384 · max|f⁗| (Burden &amp; Faires, Numerical Analysis, theorem 3.9). For a Legendre series
 * Σ a<sub>n</sub>P<sub>n</sub>, max|f⁗| ≤ Σ |a<sub>n</sub>|·P<sub>n</sub>⁗(1) with
 * P<sub>n</sub>⁗(1) = (n−3)(n−2)(n−1)n(n+1)(n+2)(n+3)(n+4)/384, and max|f| = |f(1)| because
 * all a<sub>n</sub> share one sign. Each table takes the spacing that holds this bound below
 * {@value #TARGET_RELATIVE_ERROR} · |f(1)| of its own remainder (a few thousand nodes at m = 4,
 * T = 50), far inside the 1e-6 relative error that DESIGN §5 allows for the whole kernel;
 * {@code KernelTableTest} checks it against the direct series.
 */
public final class KernelTable {
    /** The interpolation error aimed at, relative to the remainder's largest value. */
    static final double TARGET_RELATIVE_ERROR = 1e-9;
    private static final int MIN_NODES = 257;
    private static final int MAX_NODES = 1 << 21;

    private final SplineKernel kernel;
    private final double[] gCubic;
    private final double[] hCubic;
    private final Table gRemainder;
    private final Table hRemainder;

    public KernelTable(SplineKernel kernel) {
        this.kernel = kernel;
        double[] g = kernel.gCoefficients();
        double[] h = kernel.hCoefficients();
        this.gCubic = LowDegree.cubic(g);
        this.hCubic = LowDegree.cubic(h);
        this.gRemainder = new Table(remainder(g));
        this.hRemainder = new Table(remainder(h));
    }

    private static double[] remainder(double[] coefficients) {
        double[] r = coefficients.clone();
        Arrays.fill(r, 0, Math.min(r.length, LowDegree.DEGREE + 1), 0);
        return r;
    }

    public SplineKernel kernel() {
        return kernel;
    }

    /** g_m(x); x is clamped to [−1, 1]. */
    public double g(double x) {
        double t = SplineKernel.clamp(x);
        return LowDegree.cubicAt(gCubic, t) + gRemainder.valueAt(t);
    }

    /** h_m(x); x is clamped to [−1, 1]. */
    public double h(double x) {
        double t = SplineKernel.clamp(x);
        return LowDegree.cubicAt(hCubic, t) + hRemainder.valueAt(t);
    }

    /** The cubic α₀ … α₃ of g's degrees 1–3 (a copy). */
    double[] gCubic() {
        return gCubic.clone();
    }

    double[] hCubic() {
        return hCubic.clone();
    }

    /** g's degrees 4 … T. */
    Table gRemainder() {
        return gRemainder;
    }

    Table hRemainder() {
        return hRemainder;
    }

    /**
     * One tabulated series: on each interval between nodes, the cubic Hermite interpolant of the
     * values and derivatives at its two ends, stored as its four coefficients in the local
     * variable u ∈ [0, 1] (value, Δx·slope, and the two higher coefficients), so a lookup is one
     * index and three multiply–adds.
     */
    static final class Table {
        final int nodes;
        private final double inverseStep;
        private final int lastInterval;
        private final double[] cubic;

        Table(double[] coefficients) {
            int terms = coefficients.length - 1;
            double maxValue = Math.abs(Legendre.series(coefficients, 1));
            double fourthBound = 0;
            for (int n = 4; n <= terms; n++) {
                double p4 = 1;
                for (int k = -3; k <= 4; k++) {
                    p4 *= n + k;
                }
                fourthBound += Math.abs(coefficients[n]) * p4 / 384;
            }
            double spacing = fourthBound > 0
                    ? Math.pow(384 * TARGET_RELATIVE_ERROR * maxValue / fourthBound, 0.25) : 2;
            int n = (int) Math.min(MAX_NODES, Math.max(MIN_NODES, Math.ceil(2 / spacing) + 1));
            this.nodes = n;
            double step = 2.0 / (n - 1);
            this.inverseStep = 1 / step;
            this.lastInterval = n - 2;
            double[] value = new double[n];
            double[] slope = new double[n];
            double[] p = new double[terms + 1];
            double[] dp = new double[terms + 1];
            for (int i = 0; i < n; i++) {
                double x = i == n - 1 ? 1 : -1 + i * step;
                Legendre.values(x, p);
                Legendre.derivatives(p, dp);
                double v = 0;
                double d = 0;
                for (int k = 1; k <= terms; k++) {
                    v += coefficients[k] * p[k];
                    d += coefficients[k] * dp[k];
                }
                value[i] = v;
                slope[i] = d * step;
            }
            this.cubic = new double[4 * (n - 1)];
            for (int i = 0; i + 1 < n; i++) {
                double f0 = value[i];
                double f1 = value[i + 1];
                double s0 = slope[i];
                double s1 = slope[i + 1];
                cubic[4 * i] = f0;
                cubic[4 * i + 1] = s0;
                cubic[4 * i + 2] = 3 * (f1 - f0) - 2 * s0 - s1;
                cubic[4 * i + 3] = 2 * (f0 - f1) + s0 + s1;
            }
        }

        /** The interpolated value at x in [−1, 1] (the caller clamps). */
        double valueAt(double x) {
            double t = (x + 1) * inverseStep;
            int i = Math.min((int) t, lastInterval);
            double u = t - i;
            int k = 4 * i;
            return cubic[k] + u * (cubic[k + 1] + u * (cubic[k + 2] + u * cubic[k + 3]));
        }
    }
}
