package org.meridian.spline;

/**
 * The two kernels of the spherical spline of order m with T Legendre terms (Perrin, Pernier,
 * Bertrand &amp; Echallier, 1989, eqs. 2 and 5; corrigendum 1990), as functions of the cosine x
 * of the angle between two points on the unit sphere:
 *
 * <pre>
 *   g_m(x) =  1/(4π) · Σ<sub>n=1..T</sub> (2n+1) / (n(n+1))<sup>m</sup>   · P<sub>n</sub>(x)
 *   h_m(x) = −1/(4π) · Σ<sub>n=1..T</sub> (2n+1) / (n(n+1))<sup>m−1</sup> · P<sub>n</sub>(x)
 * </pre>
 *
 * g interpolates the potential; h is its surface Laplacian on the unit sphere (each P<sub>n</sub>
 * is an eigenfunction of the Laplace–Beltrami operator with eigenvalue −n(n+1)), so the
 * Laplacian on a sphere of radius R is h / R². Evaluated here by the direct series with the
 * Legendre recurrence; {@link KernelTable} tabulates both for speed.
 */
public final class SplineKernel {
    private final int order;
    private final int terms;
    private final double[] gCoefficients;
    private final double[] hCoefficients;

    public SplineKernel(int order, int terms) {
        if (order < 2 || terms < 1) {
            throw new IllegalArgumentException("kernel needs order ≥ 2 and terms ≥ 1, got m="
                    + order + ", T=" + terms);
        }
        this.order = order;
        this.terms = terms;
        this.gCoefficients = new double[terms + 1];
        this.hCoefficients = new double[terms + 1];
        double inv4Pi = 1 / (4 * Math.PI);
        for (int n = 1; n <= terms; n++) {
            double nn1 = (double) n * (n + 1);
            gCoefficients[n] = inv4Pi * (2 * n + 1) / Math.pow(nn1, order);
            hCoefficients[n] = -inv4Pi * (2 * n + 1) / Math.pow(nn1, order - 1);
        }
    }

    public int order() {
        return order;
    }

    public int terms() {
        return terms;
    }

    /** g_m(x) by the direct series; x is clamped to [−1, 1]. */
    public double g(double x) {
        return Legendre.series(gCoefficients, clamp(x));
    }

    /** h_m(x) by the direct series; x is clamped to [−1, 1]. */
    public double h(double x) {
        return Legendre.series(hCoefficients, clamp(x));
    }

    /** The Legendre coefficients of g (index n = 0 … T; the n = 0 coefficient is 0). */
    public double[] gCoefficients() {
        return gCoefficients.clone();
    }

    /** The Legendre coefficients of h (index n = 0 … T). */
    public double[] hCoefficients() {
        return hCoefficients.clone();
    }

    static double clamp(double x) {
        return x < -1 ? -1 : (x > 1 ? 1 : x);
    }
}
