package org.meridian.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class SphereSeriesTest {

    @Test
    void addingTermsBeyondTheStatedCountChangesThePotentialByLessThanTheTolerance() {
        double[] tolerances = {1e-6, 1e-10};
        double[] eccentricities = {0.0, 0.2, 0.5, 0.7, 0.8, 0.9, 0.95, 0.98, 0.99};
        double[] few = new double[2];
        double[] many = new double[2];
        for (double eps : tolerances) {
            for (double t : eccentricities) {
                int n = SphereSeries.termCount(t, eps);
                for (double x = -1; x <= 1; x += 1.0 / 64) {
                    double xc = Math.min(1, x);
                    SphereSeries.sums(t, xc, n, few);
                    SphereSeries.sums(t, xc, 4 * n + 200, many);
                    double s = Math.sqrt(Math.max(0, 1 - xc * xc));
                    // in units of |p|/(4πσR²): radial unit moment gives A, tangential gives B·sin γ
                    double radialChange = Math.abs(many[0] - few[0]);
                    double tangentialChange = Math.abs(many[1] - few[1]) * s;
                    // the stated rule: truncation error ≤ ε·|p|/(4πσR²) (Bernstein bound; see SphereSeries)
                    assertThat(radialChange).as("t=%s x=%s", t, xc).isLessThanOrEqualTo(eps);
                    assertThat(tangentialChange).as("t=%s x=%s", t, xc).isLessThanOrEqualTo(eps);
                    assertThat((radialChange + tangentialChange) / Math.sqrt(2)).isLessThanOrEqualTo(eps);
                }
            }
        }
    }

    @Test
    void termCountGrowsAsTheDipoleNearsTheSurface() {
        int previous = 0;
        for (double t = 0; t < 0.995; t += 0.01) {
            int n = SphereSeries.termCount(t, 1e-10);
            assertThat(n).isGreaterThanOrEqualTo(previous);
            previous = n;
        }
        // the figures quoted in the class comment of SphereSeries
        assertThat(SphereSeries.termCount(0.0, 1e-10)).isEqualTo(1);
        assertThat(SphereSeries.termCount(0.5, 1e-10)).isBetween(35, 45);
        assertThat(SphereSeries.termCount(0.9, 1e-10)).isBetween(270, 330);
        assertThat(SphereSeries.termCount(0.99, 1e-10)).isBetween(3400, 3800);
    }

    @Test
    void theTailBoundIsTheSumOfTheTermsItReplaces() {
        double t = 0.83;
        int n = 25;
        double direct = 0;
        for (int k = n + 1; k < 5000; k++) {
            direct += (2 * k + 1) * Math.pow(t, k - 1);
        }
        // geometric series and its derivative, summed in closed form (textbook identity)
        assertThat(SphereSeries.tailBound(t, n, Math.pow(t, n))).isCloseTo(direct,
                within(1e-10 * direct));
    }
}
