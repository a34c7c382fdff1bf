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

    /**
     * Smooth, jagged, jagged on a steep slope (where most local maxima fail the side means), or
     * smooth rounded to whole µV (ties, flat runs and exact zeros, where "first on ties" and the
     * strict comparisons matter).
     */
    private static double[] wave(Random random, int kind) {
        double[] x = new double[AXIS.samples()];
        double ar = 0;
        for (int i = 0; i < x.length; i++) {
            ar = kind == 0 || kind == 3 ? 0.9 * ar + random.nextGaussian() : random.nextGaussian();
            x[i] = ar + (random.nextBoolean() ? 0.5 : -0.5) * Math.sin(i / 7.0) + (kind == 2 ? 0.4 * i : 0);
            if (kind == 3) {
                x[i] = Math.rint(x[i]);
            }
        }
        return x;
    }

    /** DESIGN §6.3 read literally: the first window sample with the largest sign·x. */
    private static int extremeByDefinition(double[] x, int from, int to, int sign) {
        int best = from;
        for (int i = from; i <= to; i++) {
            if (sign * x[i] > sign * x[best]) {
                best = i;
            }
        }
        return best;
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
            double[] x = wave(random, trial % 4);
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
            double[] x = wave(random, trial % 4);
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

    @Test
    void theRunningAreaAtEveryMarkAndOfEveryShortWindowIsTheExactIntegral() {
        Random random = new Random(31);
        double dt = AXIS.stepMs();
        for (int trial = 0; trial < 120; trial++) {
            // whole-number waves have exact zeros of both signs (rint(−0.3) = −0.0)
            double[] x = wave(random, trial % 2 == 0 ? 3 : 1);
            double[] negated = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                negated[i] = -x[i];
            }
            // the data's first sample, and windows of every length up to a few groups of four
            int from = trial % 3 == 0 ? 0 : random.nextInt(20);
            int to = trial < 60 ? from + trial % 40 : AXIS.samples() - 1 - random.nextInt(10);
            Trace t = new Trace(x, AXIS, from, to);
            // against the exact integral of each part of the piecewise-linear wave, crossings
            // found by similar triangles (textbook geometry)
            assertThat(t.area(Polarity.POSITIVE)).as("trial %d", trial)
                    .isCloseTo(positiveAreaByDefinition(x, from, to, dt), within(1e-9));
            assertThat(t.area(Polarity.NEGATIVE)).as("trial %d", trial)
                    .isCloseTo(-positiveAreaByDefinition(negated, from, to, dt), within(1e-9));
            for (int mark = from + WindowScan.BLOCK; mark + WindowScan.BLOCK - 1 <= to; mark += WindowScan.BLOCK) {
                assertThat(t.areaTo(mark, Polarity.POSITIVE)).as("trial %d, mark %d", trial, mark)
                        .isCloseTo(positiveAreaByDefinition(x, from, mark, dt), within(1e-9));
                assertThat(t.areaTo(mark, Polarity.NEGATIVE)).as("trial %d, mark %d", trial, mark)
                        .isCloseTo(-positiveAreaByDefinition(negated, from, mark, dt), within(1e-9));
            }
        }
    }

    @Test
    void theSharedScansFindWhatTheDefinitionsFind() {
        Random random = new Random(23);
        for (int trial = 0; trial < 400; trial++) {
            double[] x = wave(random, trial % 4);
            int from = random.nextInt(150);
            int to = from + random.nextInt(AXIS.samples() - from);
            // the shared scan looks for one polarity's extreme; the other is searched apart
            Trace t = new Trace(x, AXIS, from, to, random.nextBoolean() ? Polarity.POSITIVE : Polarity.NEGATIVE);
            double sum = 0;
            for (int i = from; i <= to; i++) {
                sum += x[i];
            }
            // the mean by its definition, summed in plain order
            assertThat(Measures.byName("mean").score(t, MeasureSettings.defaults()).value())
                    .isCloseTo(sum / (to - from + 1), within(1e-12));
            // ask in either order: each polarity's extreme is remembered separately
            boolean negativeFirst = random.nextBoolean();
            for (Polarity p : negativeFirst ? new Polarity[] {Polarity.NEGATIVE, Polarity.POSITIVE}
                    : new Polarity[] {Polarity.POSITIVE, Polarity.NEGATIVE}) {
                assertThat(t.extremeIndex(p)).isEqualTo(extremeByDefinition(x, from, to, p.sign()));
            }
        }
    }

    /**
     * DESIGN §6.3 read literally: the time at which the running area of the chosen part, taken
     * interval by interval from the window start, first reaches f of its total, interpolated
     * linearly in the running area.
     */
    private static double fractionalAreaLatencyByDefinition(double[] x, int from, int to, double dt,
            Polarity polarity, double f) {
        double[] negated = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            negated[i] = -x[i];
        }
        double[] piece = new double[to - from];
        double total = 0;
        for (int j = from; j < to; j++) {
            piece[j - from] = switch (polarity) {
                case POSITIVE -> positiveAreaByDefinition(x, j, j + 1, dt);
                case NEGATIVE -> positiveAreaByDefinition(negated, j, j + 1, dt);
                case SIGNED -> (x[j] + x[j + 1]) / 2 * dt;
            };
            total += piece[j - from];
        }
        double direction = Math.signum(total);
        double target = f * total * direction;
        double running = 0;
        for (int j = from; j < to; j++) {
            double next = running + direction * piece[j - from];
            if (next >= target) {
                return AXIS.timeMs(j) + (next == running ? 0 : (target - running) / (next - running)) * dt;
            }
            running = next;
        }
        return AXIS.timeMs(to);
    }

    @Test
    void theFractionalAreaSearchFindsWhatTheDefinitionFinds() {
        Random random = new Random(29);
        MeasureSettings base = MeasureSettings.defaults();
        for (int trial = 0; trial < 600; trial++) {
            double[] x = wave(random, trial % 4);
            int from = random.nextInt(150);
            int to = from + 1 + random.nextInt(AXIS.samples() - from - 1);
            Polarity polarity = Polarity.values()[trial % 3];
            // f = 1 in every fifth trial: the running area must end where the part's area ends,
            // however the total was summed
            double f = trial % 5 == 0 ? 1.0 : 0.05 + 0.9 * random.nextDouble();
            // shifted well above or below zero, or not at all
            double shift = trial % 7 == 0 ? 0 : (random.nextBoolean() ? 6 : -6);
            for (int i = 0; i < x.length; i++) {
                x[i] += shift;
            }
            Trace t = new Trace(x, AXIS, from, to);
            Score s = Measures.byName("frac-area-latency").score(t, base.withPolarity(polarity).withFraction(f));
            double expected = fractionalAreaLatencyByDefinition(x, from, to, AXIS.stepMs(), polarity, f);
            if (s.isEmpty()) {
                // only when there is no area of that part at all
                assertThat(t.area(polarity)).isZero();
            } else {
                assertThat(s.value()).as("trial %d", trial).isCloseTo(expected, within(1e-6));
            }
        }
    }
}
