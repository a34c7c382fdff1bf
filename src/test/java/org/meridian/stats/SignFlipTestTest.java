package org.meridian.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicLong;
import org.apache.commons.math3.distribution.BinomialDistribution;
import org.junit.jupiter.api.Test;

class SignFlipTestTest {

    /** S*(s) = |(1/N) Σ s_i d_i|², computed directly. */
    static SignFlipStatistic squaredMean(double[][] d) {
        return signs -> {
            double ss = 0;
            for (int c = 0; c < d[0].length; c++) {
                double m = 0;
                for (int i = 0; i < d.length; i++) {
                    m += signs[i] * d[i][c];
                }
                m /= d.length;
                ss += m * m;
            }
            return ss;
        };
    }

    static double[][] randomVectors(long seed, int n, int channels, double shift) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[][] d = new double[n][channels];
        for (int i = 0; i < n; i++) {
            for (int c = 0; c < channels; c++) {
                d[i][c] = rnd.nextDouble(-1, 1) + (c == 0 ? shift : 0);
            }
        }
        return d;
    }

    /** Counts by recursion over the participants, independently of the bitmask enumeration. */
    static long bruteForceCount(double[][] d, double[] signs, int i, double threshold) {
        if (i == d.length) {
            return squaredMean(d).value(signs) >= threshold ? 1 : 0;
        }
        long n = 0;
        for (double s : new double[] {1, -1}) {
            signs[i] = s;
            n += bruteForceCount(d, signs, i + 1, threshold);
        }
        return n;
    }

    @Test
    void exactEnumerationMatchesABruteForceCount() {
        for (int n = 1; n <= 9; n++) {
            for (double shift : new double[] {0, 0.3, 1.0}) {
                double[][] d = randomVectors(40L * n + (long) (10 * shift), n, 5, shift);
                SignFlipStatistic stat = squaredMean(d);
                double[] plus = new double[n];
                java.util.Arrays.fill(plus, 1);
                double observed = stat.value(plus);
                long count = bruteForceCount(d, new double[n], 0, observed - 1e-12);
                PermutationResult r = new SignFlipTest(16, 100, 1).run(n, stat, 1e-12, Progress.NONE);
                // definition of the exact randomisation p-value (identity included): count / 2^N
                assertThat(r.exact()).isTrue();
                assertThat(r.patterns()).isEqualTo(1L << n);
                assertThat(r.reaching()).as("N=%d shift=%s", n, shift).isEqualTo(count);
                assertThat(r.p()).isEqualTo((double) count / (1L << n));
            }
        }
    }

    @Test
    void exactSignTestMatchesTheBinomialTail() {
        // d_i = ±1 with k plus signs; T(s) = Σ s_i d_i. Under sign flips the number of plus signs
        // is Binomial(N, 1/2), so P(T* ≥ T) = P(B ≥ k): the exact sign test (textbook identity;
        // reference: Commons Math BinomialDistribution)
        int n = 13;
        for (int k = 0; k <= n; k++) {
            double[] d = new double[n];
            for (int i = 0; i < n; i++) {
                d[i] = i < k ? 1 : -1;
            }
            SignFlipStatistic t = signs -> {
                double s = 0;
                for (int i = 0; i < n; i++) {
                    s += signs[i] * d[i];
                }
                return s;
            };
            PermutationResult r = new SignFlipTest(16, 1, 0).run(n, t, 1e-9, Progress.NONE);
            double expected = 1 - new BinomialDistribution(null, n, 0.5).cumulativeProbability(k - 1);
            assertThat(r.p()).as("k=%d", k).isCloseTo(expected, within(1e-12));
        }
    }

    @Test
    void randomPatternsApproximateTheBinomialTailAndNeverGiveZero() {
        int n = 30;
        int k = 21;
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = i < k ? 1 : -1;
        }
        SignFlipStatistic t = signs -> {
            double s = 0;
            for (int i = 0; i < n; i++) {
                s += signs[i] * d[i];
            }
            return s;
        };
        int m = 20000;
        PermutationResult r = SignFlipTest.withRandomPatterns(m, 99).run(n, t, 1e-9, Progress.NONE);
        // exact sign-test tail from Commons Math BinomialDistribution; Monte Carlo error of a
        // proportion ≈ sqrt(p(1−p)/m), allowed 4 of them
        double expected = 1 - new BinomialDistribution(null, n, 0.5).cumulativeProbability(k - 1);
        assertThat(r.exact()).isFalse();
        assertThat(r.p()).isCloseTo(expected, within(4 * Math.sqrt(expected * (1 - expected) / m)));
        assertThat(r.p()).isEqualTo((r.reaching() + 1.0) / (m + 1.0));

        // all 30 positive: no random pattern reaches T = 30 in practice, yet
        // Phipson & Smyth (2010): p = (b + 1)/(m + 1) is never 0
        SignFlipStatistic allPlus = signs -> {
            double s = 0;
            for (double x : signs) {
                s += x;
            }
            return s;
        };
        PermutationResult extreme = SignFlipTest.withRandomPatterns(999, 5).run(n, allPlus, 0, Progress.NONE);
        assertThat(extreme.p()).isGreaterThan(0).isEqualTo((extreme.reaching() + 1.0) / 1000.0);
        assertThat(extreme.p()).isGreaterThanOrEqualTo(extreme.smallestPossibleP());
    }

    @Test
    void theSameSeedGivesTheSamePValue() {
        double[][] d = randomVectors(8, 20, 6, 0.2);
        PermutationResult a = SignFlipTest.withRandomPatterns(3000, 42).run(20, squaredMean(d), 0, Progress.NONE);
        PermutationResult b = SignFlipTest.withRandomPatterns(3000, 42).run(20, squaredMean(d), 0, Progress.NONE);
        PermutationResult c = SignFlipTest.withRandomPatterns(3000, 43).run(20, squaredMean(d), 0, Progress.NONE);
        assertThat(a).isEqualTo(b);
        // common practice: a different seed draws other patterns (and almost surely another b)
        assertThat(c.reaching()).isNotEqualTo(a.reaching());
    }

    @Test
    void tiedPatternsCountAsReachingTheObservedStatistic() {
        // all d_i equal: every pattern with as many flips as the identity (none) or as its
        // mirror (all) ties; for N = 4, S* = ((4 − 2f)/4)² is 1 only for f = 0 or f = 4
        double[][] d = {{0.1, 0.7}, {0.1, 0.7}, {0.1, 0.7}, {0.1, 0.7}};
        PermutationResult r = new SignFlipTest(16, 1, 0).run(4, squaredMean(d), 1e-12, Progress.NONE);
        // binomial count (textbook): C(4,0) + C(4,4) = 2 of 16 patterns reach S
        assertThat(r.reaching()).isEqualTo(2);
        assertThat(r.p()).isEqualTo(2.0 / 16);
    }

    @Test
    void progressIsReportedAndCancellationStopsTheTest() {
        double[][] d = randomVectors(3, 14, 4, 0);
        AtomicLong last = new AtomicLong();
        new SignFlipTest(16, 1, 0).run(14, squaredMean(d), 0, (done, total) -> {
            assertThat(done).isGreaterThan(last.get()).isLessThanOrEqualTo(total);
            last.set(done);
        });
        assertThat(last.get()).isEqualTo(1L << 14);

        Progress cancelAtOnce = new Progress() {
            @Override
            public void update(long done, long total) {
            }

            @Override
            public boolean cancelled() {
                return true;
            }
        };
        assertThatThrownBy(() -> SignFlipTest.withRandomPatterns(5000, 1)
                .run(20, squaredMean(randomVectors(1, 20, 3, 0)), 0, cancelAtOnce))
                .isInstanceOf(CancellationException.class);
    }

    @Test
    void constructorRejectsImpossiblePlans() {
        assertThatThrownBy(() -> new SignFlipTest(31, 10, 0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new SignFlipTest(16, 0, 0)).isInstanceOf(IllegalArgumentException.class);
    }
}
