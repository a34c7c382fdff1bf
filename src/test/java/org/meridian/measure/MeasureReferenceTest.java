package org.meridian.measure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.meridian.core.TimeAxis;

/**
 * The fast measure loops against plain implementations written straight from the definitions
 * of DESIGN §6.3, on random smooth and jagged waves.
 */
class MeasureReferenceTest {
    private static final TimeAxis AXIS = new TimeAxis(-100, 500, 200);

    /** Smooth, jagged, or jagged on a steep slope (where most local maxima fail the side means). */
    private static double[] wave(Random random, int kind) {
        double[] x = new double[AXIS.samples()];
        double ar = 0;
        for (int i = 0; i < x.length; i++) {
            ar = kind == 0 ? 0.9 * ar + random.nextGaussian() : random.nextGaussian();
            x[i] = ar + (random.nextBoolean() ? 0.5 : -0.5) * Math.sin(i / 7.0) + (kind == 2 ? 0.4 * i : 0);
        }
        return x;
    }

    /** DESIGN §6.3 read literally, one sample at a time. */
    private static int localPeakByDefinition(double[] x, int from, int to, int sign, int k) {
        int best = -1;
        for (int i = from; i <= to; i++) {
            if (i == 0 || i == x.length - 1) {
                continue;
            }
            double v = sign * x[i];
            double left = 0;
            int nl = 0;
            for (int j = Math.max(0, i - k); j < i; j++) {
                left += sign * x[j];
                nl++;
            }
            double right = 0;
            int nr = 0;
            for (int j = i + 1; j <= Math.min(x.length - 1, i + k); j++) {
                right += sign * x[j];
                nr++;
            }
            boolean qualifies = v > sign * x[i - 1] && v > sign * x[i + 1] && v > left / nl && v > right / nr;
            if (qualifies && (best < 0 || v > sign * x[best])) {
                best = i;
            }
        }
        return best;
    }

    /** The exact integral of max(x, 0) for the straight lines between samples. */
    private static double positiveAreaByDefinition(double[] x, int from, int to, double dt) {
        double sum = 0;
        for (int i = from; i < to; i++) {
            double a = x[i];
            double b = x[i + 1];
            if (a >= 0 && b >= 0) {
                sum += (a + b) / 2 * dt;
            } else if (a > 0 || b > 0) {
                double top = Math.max(a, b);
                double crossing = top / (top - Math.min(a, b)) * dt;
                sum += top * crossing / 2;
            }
        }
        return sum;
    }

    @Test
    void theLocalPeakLoopFindsWhatTheDefinitionFinds() {
        Random random = new Random(17);
        for (int trial = 0; trial < 400; trial++) {
            double[] x = wave(random, trial % 3);
            int from = random.nextInt(150);
            int to = from + random.nextInt(AXIS.samples() - from);
            int k = 1 + random.nextInt(15);
            Polarity polarity = random.nextBoolean() ? Polarity.POSITIVE : Polarity.NEGATIVE;
            Trace t = new Trace(x, AXIS, from, to);
            assertThat(LocalPeakMeasure.localPeakIndex(t, polarity, k))
                    .isEqualTo(localPeakByDefinition(x, from, to, polarity.sign(), k));
        }
    }

    @Test
    void theAreaLoopMatchesTheExactIntegralOfEachPart() {
        Random random = new Random(5);
        for (int trial = 0; trial < 400; trial++) {
            double[] x = wave(random, trial % 3);
            int from = random.nextInt(150);
            int to = from + random.nextInt(AXIS.samples() - from);
            double dt = AXIS.stepMs();
            double positive = positiveAreaByDefinition(x, from, to, dt);
            double[] negated = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                negated[i] = -x[i];
            }
            double negative = -positiveAreaByDefinition(negated, from, to, dt);
            Trace t = new Trace(x, AXIS, from, to);
            assertThat(t.area(Polarity.POSITIVE)).isCloseTo(positive, within(1e-9));
            assertThat(t.area(Polarity.NEGATIVE)).isCloseTo(negative, within(1e-9));
            // positive and negative parts make up the signed wave (textbook identity)
            assertThat(t.area(Polarity.SIGNED)).isCloseTo(positive + negative, within(1e-9));
        }
    }
}
