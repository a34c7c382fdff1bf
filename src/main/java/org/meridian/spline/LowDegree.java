package org.meridian.spline;

/**
 * The part of a Legendre series Σ a<sub>n</sub>P<sub>n</sub>(t) of degree n ≤ 3, written as a
 * cubic in t = r·q and applied through the 20 monomials x<sup>i</sup>y<sup>j</sup>z<sup>k</sup>
 * (i + j + k ≤ 3) of r:
 *
 * <pre>
 *   Σ<sub>n=1..3</sub> a<sub>n</sub>P<sub>n</sub>(t) = α₀ + α₁t + α₂t² + α₃t³,
 *     α₀ = −a₂/2,  α₁ = a₁ − 3a₃/2,  α₂ = 3a₂/2,  α₃ = 5a₃/2      (P₂ = (3t² − 1)/2, P₃ = (5t³ − 3t)/2)
 *   t<sup>k</sup> = (r·q)<sup>k</sup> = Σ<sub>|e|=k</sub> k!/(e₁!e₂!e₃!) · r<sup>e</sup> q<sup>e</sup>   (multinomial theorem)
 * </pre>
 *
 * so Σ<sub>j</sub> c<sub>j</sub>·low(r·q<sub>j</sub>) = Σ<sub>e</sub> r<sup>e</sup> · α<sub>|e|</sub>
 * mult(e) Σ<sub>j</sub> c<sub>j</sub>q<sub>j</sub><sup>e</sup>: a fixed set of 20 numbers per map.
 * The spline kernels are dominated by their lowest degrees (for g₄ the n = 1 coefficient is
 * about 50 times the n = 2 one); taking degrees 1–3 out exactly leaves a remainder whose largest
 * coefficient is about 3000 times smaller for g₄ and 300 times for h₄, which single-precision
 * map weights then store with correspondingly smaller error.
 */
final class LowDegree {
    static final int DEGREE = 3;
    /** Exponents (i, j, k) of the monomials x^i y^j z^k, by total degree. */
    static final int[][] EXPONENTS = {
        {0, 0, 0},
        {1, 0, 0}, {0, 1, 0}, {0, 0, 1},
        {2, 0, 0}, {0, 2, 0}, {0, 0, 2}, {1, 1, 0}, {1, 0, 1}, {0, 1, 1},
        {3, 0, 0}, {0, 3, 0}, {0, 0, 3}, {2, 1, 0}, {2, 0, 1}, {1, 2, 0}, {0, 2, 1}, {1, 0, 2},
        {0, 1, 2}, {1, 1, 1},
    };
    static final int COUNT = EXPONENTS.length;

    private LowDegree() {
    }

    /** α₀ … α₃ of the cubic equal to the degree 1–3 terms of the Legendre coefficients. */
    static double[] cubic(double[] legendreCoefficients) {
        double a1 = legendreCoefficients.length > 1 ? legendreCoefficients[1] : 0;
        double a2 = legendreCoefficients.length > 2 ? legendreCoefficients[2] : 0;
        double a3 = legendreCoefficients.length > 3 ? legendreCoefficients[3] : 0;
        return new double[] {-0.5 * a2, a1 - 1.5 * a3, 1.5 * a2, 2.5 * a3};
    }

    static double cubicAt(double[] alpha, double t) {
        return alpha[0] + t * (alpha[1] + t * (alpha[2] + t * alpha[3]));
    }

    /** The weight α<sub>|e|</sub> · |e|!/(e₁!e₂!e₃!) of monomial {@code m}. */
    static double weight(double[] alpha, int m) {
        int[] e = EXPONENTS[m];
        int degree = e[0] + e[1] + e[2];
        return alpha[degree] * factorial(degree) / (factorial(e[0]) * factorial(e[1]) * factorial(e[2]));
    }

    /** The monomial {@code m} at (x, y, z). */
    static double monomial(int m, double x, double y, double z) {
        int[] e = EXPONENTS[m];
        return power(x, e[0]) * power(y, e[1]) * power(z, e[2]);
    }

    private static double power(double v, int k) {
        return switch (k) {
            case 0 -> 1;
            case 1 -> v;
            case 2 -> v * v;
            default -> v * v * v;
        };
    }

    private static int factorial(int k) {
        int f = 1;
        for (int i = 2; i <= k; i++) {
            f *= i;
        }
        return f;
    }
}
