package org.meridian.spline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.polynomials.PolynomialsUtils;
import org.junit.jupiter.api.Test;

class LegendreTest {
    /**
     * Commons Math evaluates its polynomials in the power basis, whose cancellation costs about
     * 1e-7 by degree 30; up to degree 20 it is accurate to better than 1e-9 and can serve as the
     * reference. Higher degrees are checked against the exact end values below.
     */
    private static final int MAX_DEGREE = 20;

    @Test
    void recurrenceMatchesCommonsMathLegendrePolynomials() {
        double[] p = new double[MAX_DEGREE + 1];
        for (int k = 0; k <= 200; k++) {
            double x = -1 + k / 100.0;
            Legendre.values(x, p);
            for (int n = 0; n <= MAX_DEGREE; n++) {
                // Commons Math PolynomialsUtils.createLegendrePolynomial (exact rational coefficients)
                double expected = PolynomialsUtils.createLegendrePolynomial(n).value(x);
                assertThat(p[n]).as("P_%d(%s)", n, x).isCloseTo(expected, within(1e-9));
            }
        }
    }

    @Test
    void derivativesMatchCommonsMathPolynomialDerivatives() {
        double[] p = new double[MAX_DEGREE + 1];
        double[] dp = new double[MAX_DEGREE + 1];
        for (double x : new double[] {-1, -0.73, -0.2, 0, 0.31, 0.9, 1}) {
            Legendre.values(x, p);
            Legendre.derivatives(p, dp);
            for (int n = 0; n <= MAX_DEGREE; n++) {
                PolynomialFunction derivative = PolynomialsUtils.createLegendrePolynomial(n).polynomialDerivative();
                // Commons Math: derivative of the exact polynomial; P'_n(1) = n(n+1)/2 (Abramowitz & Stegun 22.2.10 consequence)
                double expected = derivative.value(x);
                assertThat(dp[n]).as("P'_%d(%s)", n, x)
                        .isCloseTo(expected, within(1e-8 * Math.max(1, Math.abs(expected))));
            }
        }
        Legendre.values(1, p);
        Legendre.derivatives(p, dp);
        // P'_n(1) = n(n+1)/2 (from memory, follows from Legendre's differential equation at x = 1)
        assertThat(dp[10]).isEqualTo(55.0, within(1e-9));
    }

    @Test
    void seriesEqualsTheSumOfTermsAndTheEndValuesAreKnown() {
        double[] coefficients = {0.5, -1, 0.25, 2, 0, 0.125};
        for (double x : new double[] {-1, -0.5, 0.1, 0.77, 1}) {
            double expected = 0;
            for (int n = 0; n < coefficients.length; n++) {
                // Commons Math Legendre polynomials
                expected += coefficients[n] * PolynomialsUtils.createLegendrePolynomial(n).value(x);
            }
            assertThat(Legendre.series(coefficients, x)).isCloseTo(expected, within(1e-12));
        }
        // P_n(1) = 1 and P_n(−1) = (−1)^n (Abramowitz & Stegun 22.4.6)
        assertThat(Legendre.values(1, 30)).containsOnly(1.0);
        assertThat(Legendre.values(-1, 5)).containsExactly(new double[] {1, -1, 1, -1, 1, -1}, within(1e-15));
    }
}
