package org.meridian.span;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.apache.commons.math3.stat.correlation.PearsonsCorrelation;
import org.apache.commons.math3.stat.descriptive.moment.StandardDeviation;
import org.junit.jupiter.api.Test;

class FieldStatisticsTest {

    @Test
    void gfpIsThePopulationStandardDeviationAcrossChannels() {
        SplittableRandom rnd = new SplittableRandom(1);
        for (int trial = 0; trial < 200; trial++) {
            int channels = 2 + rnd.nextInt(255);
            double[] map = randomMap(rnd, channels, rnd.nextDouble(-10, 10), rnd.nextDouble(0.1, 5));
            // Lehmann & Skrandies (1980): GFP is the spatial standard deviation, with 1/C
            // (population form); reference: Commons Math StandardDeviation(isBiasCorrected = false)
            double expected = new StandardDeviation(false).evaluate(map);
            assertThat(FieldStatistics.gfp(map)).isCloseTo(expected, within(1e-12 * (1 + expected)));
        }
    }

    @Test
    void gfpDoesNotDependOnTheReference() {
        double[] map = randomMap(new SplittableRandom(3), 64, 0, 1);
        double[] shifted = map.clone();
        for (int c = 0; c < shifted.length; c++) {
            shifted[c] += 17.5;
        }
        // Lehmann & Skrandies (1980): GFP is reference-free (a constant added to every channel
        // leaves the spatial standard deviation unchanged)
        assertThat(FieldStatistics.gfp(shifted)).isCloseTo(FieldStatistics.gfp(map), within(1e-12));
    }

    @Test
    void dissIsSquareRootOfTwiceOneMinusTheSpatialCorrelation() {
        SplittableRandom rnd = new SplittableRandom(2);
        for (int trial = 0; trial < 200; trial++) {
            int channels = 3 + rnd.nextInt(254);
            checkDissIdentity(rnd, channels);
        }
    }

    private static void checkDissIdentity(SplittableRandom rnd, int channels) {
        double[] v = randomMap(rnd, channels, 2, 4);
        double[] w = randomMap(rnd, channels, -1, 0.5);
        double[] vHat = FieldStatistics.normalised(v);
        double[] wHat = FieldStatistics.normalised(w);
        double ss = 0;
        for (int c = 0; c < channels; c++) {
            ss += (vHat[c] - wHat[c]) * (vHat[c] - wHat[c]);
        }
        double dissByDefinition = Math.sqrt(ss / channels);
        // algebraic identity: mean((v̂ − ŵ)²) = mean(v̂²) + mean(ŵ²) − 2 mean(v̂ŵ) = 2 − 2r;
        // r from Commons Math PearsonsCorrelation
        double r = new PearsonsCorrelation().correlation(v, w);
        assertThat(FieldStatistics.correlation(v, w)).isCloseTo(r, within(1e-12));
        assertThat(dissByDefinition).isCloseTo(Math.sqrt(2 * (1 - r)), within(1e-9));
        assertThat(FieldStatistics.diss(v, w)).isCloseTo(dissByDefinition, within(1e-7));
        assertThat(FieldStatistics.correlationOfNormalised(vHat, wHat)).isCloseTo(r, within(1e-12));
    }

    @Test
    void dissOfAScaledCopyIsZeroAndOfTheNegationIsTwo() {
        SplittableRandom rnd = new SplittableRandom(3);
        for (int trial = 0; trial < 100; trial++) {
            checkScaledAndNegated(randomMap(rnd, 32, 1, 2), Math.exp(rnd.nextDouble(-4.6, 4.6)));
        }
    }

    private static void checkScaledAndNegated(double[] v, double scale) {
        double[] scaled = new double[v.length];
        double[] negated = new double[v.length];
        for (int c = 0; c < v.length; c++) {
            scaled[c] = scale * v[c] + 3.0;
            negated[c] = -v[c];
        }
        // Lehmann & Skrandies (1980): DISS is 0 for maps of equal shape (any strength, any
        // reference) and 2 for maps of inverted polarity (r = −1 in sqrt(2(1 − r)))
        assertThat(FieldStatistics.diss(v, scaled)).isCloseTo(0.0, within(1e-6));
        assertThat(FieldStatistics.diss(v, negated)).isCloseTo(2.0, within(1e-12));
    }

    @Test
    void normalisedMapHasMeanZeroAndGfpOne() {
        double[] hat = FieldStatistics.normalised(randomMap(new SplittableRandom(11), 40, 7, 0.3));
        // definition of v̂ (Lehmann & Skrandies, 1980): centred and divided by its GFP
        assertThat(FieldStatistics.mean(hat)).isCloseTo(0.0, within(1e-12));
        assertThat(FieldStatistics.gfp(hat)).isCloseTo(1.0, within(1e-12));
    }

    @Test
    void aFlatMapHasNoShape() {
        double[] flat = {2, 2, 2, 2};
        double[] other = {1, 2, 3, 4};
        assertThat(FieldStatistics.gfp(flat)).isZero();
        assertThat(FieldStatistics.correlation(flat, other)).isNaN();
        assertThat(FieldStatistics.diss(flat, other)).isNaN();
        assertThat(FieldStatistics.normalised(flat)).containsOnly(Double.NaN);
    }

    static double[] randomMap(SplittableRandom rnd, int channels, double offset, double sd) {
        double[] m = new double[channels];
        for (int c = 0; c < channels; c++) {
            m[c] = offset + sd * gaussian(rnd);
        }
        return m;
    }

    static double gaussian(SplittableRandom rnd) {
        double u = rnd.nextDouble();
        double v = rnd.nextDouble();
        return Math.sqrt(-2 * Math.log(1 - u)) * Math.cos(2 * Math.PI * v);
    }
}
