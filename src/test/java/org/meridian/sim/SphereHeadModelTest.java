package org.meridian.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.SplittableRandom;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.polynomials.PolynomialsUtils;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.montage.StandardSystem;

class SphereHeadModelTest {
    private static final double R = 0.09;
    private static final double SIGMA = 0.33;
    private final SphereHeadModel model = new SphereHeadModel(R, SIGMA, 1e-10);
    private final Montage tenTen = StandardSystem.TEN_TEN.montage();
    /** |p|/(4πσR²) in µV for |p| = 1 nA·m: the unit of the truncation tolerance. */
    private final double unit = 1e-3 / (4 * Math.PI * SIGMA * R * R);

    @Test
    void centredDipoleGivesThreePCosThetaOverFourPiSigmaRSquared() {
        Vector3 p = new Vector3(3, -4, 12); // |p| = 13 nA·m
        LeadField lf = model.leadField(Vector3.ZERO, tenTen);
        double[] map = lf.map(p);
        for (int c = 0; c < tenTen.size(); c++) {
            Electrode e = tenTen.electrodes().get(c);
            double cosTheta = p.unit().dot(new Vector3(e.x(), e.y(), e.z()));
            // centred dipole in a homogeneous sphere: V = 3 p cos θ / (4π σ R²) (closed form,
            // any bioelectric field textbook, e.g. Malmivuo & Plonsey 1995; from memory)
            double expected = 1e-3 * 3 * 13 * cosTheta / (4 * Math.PI * SIGMA * R * R);
            assertThat(map[c]).as(e.label()).isCloseTo(expected, within(1e-12 * unit * 13));
        }
    }

    @Test
    void nearlyCentredDipoleApproachesTheCentredFormula() {
        Vector3 p = new Vector3(0, 10, 0);
        Vector3 tiny = new Vector3(1e-9, 2e-9, -1e-9);
        for (Electrode e : tenTen.electrodes()) {
            Vector3 dir = new Vector3(e.x(), e.y(), e.z());
            // same closed form as above (from memory); the offset of 1e-8 R moves V by ~1e-8 relative
            double expected = 1e-3 * 3 * p.dot(dir) / (4 * Math.PI * SIGMA * R * R);
            assertThat(model.potential(tiny, p, dir)).isCloseTo(expected,
                    within(1e-6 * unit * 10));
        }
    }

    @Test
    void seriesAgreesWithTheClosedFormForEccentricDipoles() {
        SplittableRandom rnd = new SplittableRandom(11);
        double[] eccentricities = {0.1, 0.4, 0.6, 0.75, 0.85, 0.9, 0.95, 0.98, 0.989};
        for (double t : eccentricities) {
            for (int k = 0; k < 20; k++) {
                Vector3 r0 = randomUnit(rnd).times(t * R);
                Vector3 p = randomUnit(rnd).times(1 + 40 * rnd.nextDouble());
                LeadField lf = model.leadField(r0, tenTen);
                double[] map = lf.map(p);
                for (int c = 0; c < tenTen.size(); c++) {
                    Electrode e = tenTen.electrodes().get(c);
                    Vector3 dir = new Vector3(e.x(), e.y(), e.z());
                    // closed form for the homogeneous sphere (Frank 1952; Brody, Terry & Ideker
                    // 1973; Mosher, Leahy & Lewis 1999), from memory: see HomogeneousSphereClosedForm
                    double expected = HomogeneousSphereClosedForm.potential(R, SIGMA, r0, p, dir);
                    double allowed = 1e-10 * unit * p.norm() + 1e-10 * Math.abs(expected);
                    assertThat(Math.abs(map[c] - expected)).as("t=%s %s", t, e.label())
                            .isLessThanOrEqualTo(allowed);
                }
            }
        }
    }

    @Test
    void seriesAgreesWithTheClosedFormStraightAboveAndOppositeTheDipole() {
        for (double t : new double[] {0.5, 0.9, 0.989}) {
            Vector3 axis = new Vector3(0.3, -0.5, 0.8).unit();
            Vector3 r0 = axis.times(t * R);
            Vector3 p = new Vector3(1, 2, -3);
            for (Vector3 dir : new Vector3[] {axis, axis.times(-1)}) {
                // closed form (Frank 1952 / Brody, Terry & Ideker 1973), from memory
                double expected = HomogeneousSphereClosedForm.potential(R, SIGMA, r0, p, dir);
                assertThat(model.potential(r0, p, dir)).isCloseTo(expected,
                        within(1e-10 * unit * p.norm() + 1e-10 * Math.abs(expected)));
            }
        }
    }

    @Test
    void radialDipoleGivesAMapSymmetricAboutItsAxis() {
        Vector3 axis = new Vector3(-0.4, 0.2, 0.9).unit();
        Vector3 r0 = axis.times(0.7 * R);
        Vector3 p = axis.times(25);
        Vector3 u = axis.cross(new Vector3(1, 0, 0)).unit();
        Vector3 v = axis.cross(u);
        for (double gammaDeg = 5; gammaDeg < 180; gammaDeg += 25) {
            double g = Math.toRadians(gammaDeg);
            double first = Double.NaN;
            for (double phiDeg = 0; phiDeg < 360; phiDeg += 37) {
                double f = Math.toRadians(phiDeg);
                Vector3 dir = axis.times(Math.cos(g))
                        .plus(u.times(Math.sin(g) * Math.cos(f))).plus(v.times(Math.sin(g) * Math.sin(f)));
                double value = model.potential(r0, p, dir);
                if (Double.isNaN(first)) {
                    first = value;
                }
                // a radial dipole in a sphere has rotational symmetry about its axis (symmetry of
                // the boundary-value problem; textbook fact)
                assertThat(value).isCloseTo(first, within(1e-12 * Math.abs(first) + 1e-14));
            }
        }
    }

    @Test
    void reversingTheMomentFlipsTheSignEverywhere() {
        Vector3 r0 = new Vector3(0.03, -0.02, 0.05);
        Vector3 p = new Vector3(4, -7, 2);
        LeadField lf = model.leadField(r0, tenTen);
        double[] plus = lf.map(p);
        double[] minus = lf.map(p.times(-1));
        for (int c = 0; c < plus.length; c++) {
            // potentials are linear in the source (Poisson's equation is linear; textbook fact)
            assertThat(minus[c]).isEqualTo(-plus[c]);
        }
        assertThat(java.util.Arrays.stream(plus).map(Math::abs).max().orElseThrow()).isGreaterThan(0.1);
    }

    @Test
    void momentsAtOnePlaceAddTheirMaps() {
        Vector3 r0 = new Vector3(-0.04, 0.01, 0.04);
        Vector3 p1 = new Vector3(5, 0, 1);
        Vector3 p2 = new Vector3(-1, 3, 8);
        LeadField lf = model.leadField(r0, tenTen);
        double[] sum = lf.map(p1.plus(p2));
        double[] a = lf.map(p1);
        double[] b = lf.map(p2);
        for (int c = 0; c < sum.length; c++) {
            Vector3 dir = new Vector3(tenTen.electrodes().get(c).x(), tenTen.electrodes().get(c).y(),
                    tenTen.electrodes().get(c).z());
            // superposition: potentials of sources in a linear conductor add (textbook fact),
            // checked against the closed form (from memory) so the lead field is not compared with itself
            double independent = HomogeneousSphereClosedForm.potential(R, SIGMA, r0, p1, dir)
                    + HomogeneousSphereClosedForm.potential(R, SIGMA, r0, p2, dir);
            assertThat(sum[c]).isCloseTo(a[c] + b[c], within(1e-12 * unit * 10));
            assertThat(sum[c]).isCloseTo(independent, within(1e-9 * unit * 10));
        }
    }

    @Test
    void aDipoleOutsideTheAllowedRadiusIsRefusedWithItsPosition() {
        assertThatThrownBy(() -> model.leadField(new Vector3(0, 0, 0.0895), tenTen, "source P3b"))
                .isInstanceOf(BadInputException.class)
                .hasMessageContaining("source P3b")
                .hasMessageContaining("99.4 %");
    }

    @Test
    void legendreRecurrencesMatchCommonsMathPolynomials() {
        for (int n = 0; n <= 20; n++) {
            PolynomialFunction pn = PolynomialsUtils.createLegendrePolynomial(n);
            PolynomialFunction dpn = pn.polynomialDerivative();
            for (double x = -1; x <= 1.0001; x += 0.05) {
                double xc = Math.min(1, x);
                // reference library: Commons Math PolynomialsUtils.createLegendrePolynomial
                assertThat(SphereSeries.legendre(n, xc)).isCloseTo(pn.value(xc), within(1e-9));
                assertThat(SphereSeries.legendreDerivative(n, xc))
                        .isCloseTo(dpn.value(xc), within(1e-9 * Math.max(1, Math.abs(dpn.value(xc)))));
            }
        }
    }

    @Test
    void associatedLegendreOverDegreeStaysWithinOneAsTheTruncationBoundAssumes() {
        for (int n = 1; n <= 400; n += 7) {
            for (double x = -1; x <= 1; x += 0.001) {
                double p1 = Math.sqrt(Math.max(0, 1 - x * x)) * SphereSeries.legendreDerivative(n, x);
                // Bernstein's inequality: |sqrt(1 − x²) q'(x)| ≤ n · max|q| for a polynomial q of
                // degree n (Bernstein 1912; from memory), and max|P_n| = 1
                assertThat(Math.abs(p1) / n).isLessThanOrEqualTo(1 + 1e-9);
                assertThat(Math.abs(SphereSeries.legendre(n, x))).isLessThanOrEqualTo(1 + 1e-9);
            }
        }
    }

    private static Vector3 randomUnit(SplittableRandom rnd) {
        while (true) {
            Vector3 v = new Vector3(2 * rnd.nextDouble() - 1, 2 * rnd.nextDouble() - 1, 2 * rnd.nextDouble() - 1);
            double n = v.norm();
            if (n > 0.1 && n <= 1) {
                return v.times(1 / n);
            }
        }
    }
}
