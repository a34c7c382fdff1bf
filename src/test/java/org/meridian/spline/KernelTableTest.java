package org.meridian.spline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class KernelTableTest {

    /** The largest |table − series| over [−1, 1], divided by max |series|, for g and h. */
    private static double[] worstRelativeError(SplineKernel kernel) {
        KernelTable table = new KernelTable(kernel);
        double gScale = Math.abs(kernel.g(1));
        double hScale = Math.abs(kernel.h(1));
        double gWorst = 0;
        double hWorst = 0;
        Random random = new Random(7);
        int grid = 40_000;
        for (int k = 0; k <= grid + 10_000; k++) {
            double x = k <= grid ? -1 + 2.0 * k / grid : 2 * random.nextDouble() - 1;
            gWorst = Math.max(gWorst, Math.abs(table.g(x) - kernel.g(x)) / gScale);
            hWorst = Math.max(hWorst, Math.abs(table.h(x) - kernel.h(x)) / hScale);
        }
        return new double[] {gWorst, hWorst};
    }

    @ParameterizedTest(name = "m={0}, T={1}")
    @CsvSource({"4, 50", "2, 50", "3, 30", "6, 100", "2, 120", "10, 7"})
    void tableStaysWithinOneMillionthOfTheDirectSeriesOverTheWholeRange(int m, int terms) {
        double[] worst = worstRelativeError(new SplineKernel(m, terms));
        // DESIGN §5: tabulated g and h must stay below 1e-6 relative error against the direct series
        assertThat(worst[0]).as("g").isLessThan(1e-6);
        assertThat(worst[1]).as("h").isLessThan(1e-6);
    }

    @Test
    void tableErrorIsAlsoSmallRelativeToTheLocalValueAwayFromZeroCrossings() {
        SplineKernel kernel = new SplineKernel(4, 50);
        KernelTable table = new KernelTable(kernel);
        for (int k = 0; k <= 20_000; k++) {
            double x = -1 + k / 10_000.0;
            double g = kernel.g(x);
            double h = kernel.h(x);
            // common practice: relative error judged where the value is not near a zero crossing
            if (Math.abs(g) > 1e-2 * Math.abs(kernel.g(1))) {
                assertThat(Math.abs(table.g(x) - g) / Math.abs(g)).as("g(%s)", x).isLessThan(1e-6);
            }
            if (Math.abs(h) > 1e-2 * Math.abs(kernel.h(1))) {
                assertThat(Math.abs(table.h(x) - h) / Math.abs(h)).as("h(%s)", x).isLessThan(1e-6);
            }
        }
    }

    @Test
    void hIsTheSphereLaplacianOfG() {
        SplineKernel g4 = new SplineKernel(4, 50);
        double d = 1e-4;
        for (double x : new double[] {-0.9, -0.5, 0, 0.4, 0.8}) {
            double f1 = (g4.g(x + d) - g4.g(x - d)) / (2 * d);
            double f2 = (g4.g(x + d) - 2 * g4.g(x) + g4.g(x - d)) / (d * d);
            // Laplace–Beltrami of a zonal function f(cos θ) on the unit sphere: (1 − x²) f'' − 2x f'
            // (Legendre's differential equation; any text on spherical harmonics)
            double laplacian = (1 - x * x) * f2 - 2 * x * f1;
            assertThat(g4.h(x)).as("h(%s)", x).isCloseTo(laplacian, within(1e-6));
        }
    }

    @Test
    void kernelsCarryTheOneOverFourPiFactor() {
        SplineKernel kernel = new SplineKernel(4, 1);
        // Perrin et al. (1989) with corrigendum (1990): g_m = 1/(4π) Σ (2n+1)/(n(n+1))^m P_n; n = 1 only here
        assertThat(kernel.g(1)).isCloseTo(3.0 / (4 * Math.PI * 16), within(1e-15));
        // h_m = −1/(4π) Σ (2n+1)/(n(n+1))^(m−1) P_n; n = 1: −3/(4π·8)·x
        assertThat(kernel.h(0.5)).isCloseTo(-3.0 / (4 * Math.PI * 8) * 0.5, within(1e-15));
    }
}
