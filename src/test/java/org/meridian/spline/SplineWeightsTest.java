package org.meridian.spline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.meridian.core.Montage;
import org.meridian.montage.StandardSystem;

class SplineWeightsTest {

    private static double[][] scalpPoints(int count, Random random) {
        double[][] out = new double[count][];
        for (int i = 0; i < count; i++) {
            // directions from Cz down to 107° (a little below the lower electrode ring)
            double theta = Math.acos(random.nextDouble() * 1.3 - 0.3);
            double phi = random.nextDouble() * 2 * Math.PI;
            out[i] = new double[] {Math.sin(theta) * Math.cos(phi), Math.sin(theta) * Math.sin(phi), Math.cos(theta)};
        }
        return out;
    }

    /**
     * Single-precision map weights against the double-precision evaluation of the same spline,
     * for a dipolar field buried in white noise as large as the field (rough data make the
     * coefficients large, the hardest case for single precision). Worst relative errors reached:
     * 1.3e-6 at λ = 1e-5, 3.7e-5 at λ = 1e-7, 2.2e-5 at λ = 0 on the 10-10 positions.
     */
    @ParameterizedTest(name = "{0}, lambda={1}")
    @CsvSource({"10-20, 1e-5, 5e-6", "10-10, 1e-5, 5e-6", "10-5, 1e-5, 5e-6", "10-5, 1e-7, 1e-4",
        "10-10, 0, 1e-4"})
    void singlePrecisionMapsAgreeWithTheDoublePrecisionSpline(String system, double lambda, double tolerance) {
        Montage m = StandardSystem.parse(system).montage();
        SphericalSpline spline = SphericalSpline.fit(m, SplineParameters.defaults().withLambda(lambda));
        Random random = new Random(1);
        double[] v = TestFields.dipolar(10, -1, 0.3, 0.2).on(m);
        for (int i = 0; i < v.length; i++) {
            v[i] += 10 * random.nextGaussian();
        }
        double[][] points = scalpPoints(1500, random);
        double[] c = spline.coefficients(v);
        for (Quantity q : Quantity.values()) {
            float[] fast = spline.weightsAt(q, points).apply(v);
            double lo = Double.MAX_VALUE;
            double hi = -Double.MAX_VALUE;
            double worst = 0;
            for (int i = 0; i < points.length; i++) {
                // reference: double-precision evaluation (common practice: float weights judged against double)
                double exact = spline.valueAt(q, c, points[i][0], points[i][1], points[i][2]);
                lo = Math.min(lo, exact);
                hi = Math.max(hi, exact);
                worst = Math.max(worst, Math.abs(exact - fast[i]));
            }
            assertThat(worst / (hi - lo)).as(q.name()).isLessThan(tolerance);
        }
    }

    @Test
    void manyMapsAtOnceEqualOneMapAtATime() {
        Montage m = StandardSystem.TEN_TEN.montage();
        SphericalSpline spline = SphericalSpline.fit(m, SplineParameters.defaults());
        Random random = new Random(2);
        SplineWeights w = spline.weightsAt(Quantity.CSD, scalpPoints(300, random));
        double[][] frames = new double[5][m.size()];
        for (double[] f : frames) {
            for (int i = 0; i < f.length; i++) {
                f[i] = random.nextGaussian();
            }
        }
        float[][] together = new float[5][w.pointCount()];
        w.applyAll(frames, together);
        for (int f = 0; f < 5; f++) {
            assertThat(together[f]).containsExactly(w.apply(frames[f]), within(0f));
        }
    }

    @Test
    void lowDegreeCubicEqualsTheLegendreTermsAndItsMonomialExpansion() {
        double[] a = {0, 0.7, -0.2, 0.05};
        double[] alpha = LowDegree.cubic(a);
        Random random = new Random(3);
        for (int k = 0; k < 50; k++) {
            double t = 2 * random.nextDouble() - 1;
            double expected = 0;
            for (int n = 1; n <= 3; n++) {
                // Commons Math Legendre polynomials as the reference for P1..P3
                expected += a[n] * org.apache.commons.math3.analysis.polynomials.PolynomialsUtils
                        .createLegendrePolynomial(n).value(t);
            }
            assertThat(LowDegree.cubicAt(alpha, t)).isCloseTo(expected, within(1e-14));
        }
        double[][] r = scalpPoints(2, random);
        double t = r[0][0] * r[1][0] + r[0][1] * r[1][1] + r[0][2] * r[1][2];
        double viaMonomials = 0;
        for (int m = 0; m < LowDegree.COUNT; m++) {
            viaMonomials += LowDegree.weight(alpha, m) * LowDegree.monomial(m, r[0][0], r[0][1], r[0][2])
                    * LowDegree.monomial(m, r[1][0], r[1][1], r[1][2]);
        }
        // multinomial theorem: (r·q)^k = Σ_{|e|=k} k!/e! r^e q^e
        assertThat(viaMonomials).isCloseTo(LowDegree.cubicAt(alpha, t), within(1e-14));
    }
}
