package org.meridian.span;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.stats.Progress;
import org.meridian.stats.SignFlipTest;

class SpanTestTest {
    private static final SignFlipTest FLIPS = SignFlipTest.withRandomPatterns(2000, 7);

    /** N participants with maps a_i m1 + b_i m2 + noise, average-referenced. */
    static double[][][] twoMapStudy(long seed, int n, int channels, double[] earlyWeights,
            double[] lateWeights, double noise) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] m1 = FieldStatisticsTest.randomMap(rnd, channels, 0, 1);
        double[] m2 = FieldStatisticsTest.randomMap(rnd, channels, 0, 1);
        double[][] early = new double[n][channels];
        double[][] late = new double[n][channels];
        for (int i = 0; i < n; i++) {
            double gain = 0.5 + rnd.nextDouble();
            for (int c = 0; c < channels; c++) {
                early[i][c] = gain * (earlyWeights[0] * m1[c] + earlyWeights[1] * m2[c])
                        + noise * FieldStatisticsTest.gaussian(rnd);
                late[i][c] = gain * (lateWeights[0] * m1[c] + lateWeights[1] * m2[c])
                        + noise * FieldStatisticsTest.gaussian(rnd);
            }
            FieldStatistics.averageReferenceInPlace(early[i]);
            FieldStatistics.averageReferenceInPlace(late[i]);
        }
        return new double[][][] {early, late};
    }

    @Test
    void statisticIsZeroForExactlyProportionalMapsOfAnySignAndScale() {
        SplittableRandom rnd = new SplittableRandom(5);
        double[] m = FieldStatisticsTest.randomMap(rnd, 32, 0, 3);
        int n = 12;
        double[][] early = new double[n][];
        double[][] late = new double[n][];
        for (int i = 0; i < n; i++) {
            // amplitudes of either sign and any size, different in every participant and part
            double a = rnd.nextDouble(-5, 5);
            double b = rnd.nextDouble(-0.01, 0.01) * (i % 3 == 0 ? 1000 : 1);
            early[i] = scaled(m, a);
            late[i] = scaled(m, b);
        }
        SpanTest.Result r = SpanTest.run(early, late, FLIPS, 0.05, Progress.NONE);
        // algebraic identity: with x_i = a_i m and y_i = b_i m, α_x·y_i − α_y·x_i is a multiple of
        // m = ±|m|u and P⊥ removes u, so every d_i = 0 and S = 0; with every pattern tied,
        // p = 1 (exact enumeration, N = 12)
        assertThat(r.statistic()).isZero();
        assertThat(r.p()).isEqualTo(1.0);
        assertThat(r.verdict()).isEqualTo(SpanVerdict.STABLE);
        // a biphasic wave (early positive, late negative in everyone) is still one map
        for (int i = 0; i < n; i++) {
            late[i] = scaled(m, -0.7 * (i + 1));
            early[i] = scaled(m, 2.0 + i);
        }
        assertThat(new SpanResiduals(early, late).statistic()).isZero();
        // the same holds for the whitened variant: whitening mixes each pair by one 2 × 2 matrix,
        // and a mix of two multiples of m is a multiple of m
        assertThat(SpanTest.run(early, late, FLIPS, 0.05, Progress.NONE, true).statistic()).isZero();
    }

    @Test
    void statisticIsTheSquaredSecondSingularValueOfTheGrandMeans() {
        double[][][] s = twoMapStudy(11, 20, 48, new double[] {1, 0.2}, new double[] {0.4, 1}, 0.8);
        SpanResiduals r = new SpanResiduals(s[0], s[1]);
        double[][] m = new double[48][2];
        double[] x = r.earlyMean();
        double[] y = r.lateMean();
        for (int c = 0; c < 48; c++) {
            m[c][0] = x[c];
            m[c][1] = y[c];
        }
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(m));
        double sigma2 = svd.getSingularValues()[1];
        // derived from the definitions (see SpanResiduals): mean_i d_i = σ₂ u₂, so S = σ₂²;
        // singular values and the leading left singular vector from Commons Math SVD
        assertThat(r.statistic()).isCloseTo(sigma2 * sigma2, within(1e-9 * sigma2 * sigma2));
        double[] u = r.commonMap();
        double[] u1 = svd.getU().getColumn(0);
        assertThat(Math.abs(SpanResiduals.dot(u, u1))).isCloseTo(1.0, within(1e-12));
        assertThat(Math.hypot(r.alphaEarly(), r.alphaLate()))
                .isCloseTo(svd.getSingularValues()[0], within(1e-9));
        // every residual is orthogonal to the common map (P⊥)
        for (int i = 0; i < 20; i++) {
            assertThat(SpanResiduals.dot(r.residual(i), u)).isCloseTo(0.0, within(1e-10));
        }
    }

    @Test
    void aChangeOfMapIsDetectedAndOneNoisyMapIsNot() {
        double[][][] change = twoMapStudy(3, 20, 64, new double[] {1, 0}, new double[] {0, 1}, 1.0);
        SpanTest.Result r = SpanTest.run(change[0], change[1], FLIPS, 0.05, Progress.NONE);
        // two unrelated random maps: DISS near sqrt(2) (r ≈ 0), and the test must see it
        assertThat(r.verdict()).isEqualTo(SpanVerdict.CHANGES);
        assertThat(r.p()).isEqualTo(1.0 / 2001);
        assertThat(r.diss()).isGreaterThan(1.0);

        double[][][] one = twoMapStudy(4, 20, 64, new double[] {1, 0}, new double[] {0.3, 0}, 1.0);
        SpanTest.Result s = SpanTest.run(one[0], one[1], FLIPS, 0.05, Progress.NONE);
        assertThat(s.p()).isGreaterThan(0.05);
        assertThat(s.verdict()).isEqualTo(SpanVerdict.STABLE);
    }

    @Test
    void theDefaultTestWorksOnTheMapsAsMeasured() {
        double[][][] s = twoMapStudy(9, 10, 16, new double[] {1, 0.5}, new double[] {0.5, 1}, 1.0);
        SpanTest.Result a = SpanTest.run(s[0], s[1], FLIPS, 0.05, Progress.NONE);
        assertThat(a.whitened()).isFalse();
        // DESIGN §7: S = Σ_c (mean_i d_ic)² of the unwhitened residuals, recomputed here from
        // the definition with the leading left singular vector from Commons Math SVD
        double[] x = SpanTest.grandMean(s[0]);
        double[] y = SpanTest.grandMean(s[1]);
        double[][] m = new double[16][2];
        for (int c = 0; c < 16; c++) {
            m[c][0] = x[c];
            m[c][1] = y[c];
        }
        double[] u = new SingularValueDecomposition(new Array2DRowRealMatrix(m)).getU().getColumn(0);
        double ax = SpanResiduals.dot(x, u);
        double ay = SpanResiduals.dot(y, u);
        double[] mean = new double[16];
        for (int i = 0; i < 10; i++) {
            double[] d = new double[16];
            for (int c = 0; c < 16; c++) {
                d[c] = (ax * s[1][i][c] - ay * s[0][i][c]) / Math.hypot(ax, ay);
            }
            double along = SpanResiduals.dot(d, u);
            for (int c = 0; c < 16; c++) {
                mean[c] += (d[c] - along * u[c]) / 10;
            }
        }
        assertThat(a.statistic()).isCloseTo(SpanResiduals.dot(mean, mean), within(1e-9 * a.statistic()));
    }

    @Test
    void scaleAndPolarityChangeOnlyTheUnitOfTheStatistic() {
        double[][][] s = twoMapStudy(9, 10, 16, new double[] {1, 0.5}, new double[] {0.5, 1}, 1.0);
        double[][] e2 = new double[10][];
        double[][] l2 = new double[10][];
        for (int i = 0; i < 10; i++) {
            e2[i] = scaled(s[0][i], -1e-3);
            l2[i] = scaled(s[1][i], -1e-3);
        }
        for (boolean whiten : new boolean[] {false, true}) {
            SpanTest.Result a = SpanTest.run(s[0], s[1], FLIPS, 0.05, Progress.NONE, whiten);
            SpanTest.Result b = SpanTest.run(e2, l2, FLIPS, 0.05, Progress.NONE, whiten);
            // common practice: a change of unit (µV → mV) and of polarity convention changes
            // neither p nor the effect size; S is in squared map units (µV² → 10⁻⁶ mV²), and the
            // whitened variant's S has no unit at all
            double factor = whiten ? 1 : 1e-6;
            assertThat(b.p()).isEqualTo(a.p());
            assertThat(b.statistic()).isCloseTo(factor * a.statistic(), within(1e-9 * factor * a.statistic()));
            assertThat(b.diss()).isCloseTo(a.diss(), within(1e-12));
        }
    }

    @Test
    void swappingThePartsGivesTheSameTest() {
        double[][][] s = twoMapStudy(15, 12, 24, new double[] {1, 0.4}, new double[] {0.3, 1}, 1.5);
        SpanTest.Result a = SpanTest.run(s[0], s[1], FLIPS, 0.05, Progress.NONE);
        SpanTest.Result b = SpanTest.run(s[1], s[0], FLIPS, 0.05, Progress.NONE);
        // algebraic identity: [ȳ x̄] has the singular values of [x̄ ȳ], so S = σ₂² is the same,
        // and every d_i only changes sign, which the sign-flip null ignores
        assertThat(b.statistic()).isCloseTo(a.statistic(), within(1e-9 * a.statistic()));
        assertThat(b.p()).isEqualTo(a.p());
    }

    @Test
    void anyInvertibleMixingOfTheTwoPartsGivesTheSameWhitenedTest() {
        double[][][] s = twoMapStudy(15, 12, 24, new double[] {1, 0.4}, new double[] {0.3, 1}, 1.5);
        SpanTest.Result a = SpanTest.run(s[0], s[1], FLIPS, 0.05, Progress.NONE, true);
        assertThat(a.whitened()).isTrue();
        double[][] mixes = {{2, 0.5, -1, 3}, {0, 1, 1, 0}, {1, 1, 1, -1}, {-4, 0, 0, 0.01}};
        for (double[] m : mixes) {
            double[][] x = new double[12][24];
            double[][] y = new double[12][24];
            for (int i = 0; i < 12; i++) {
                for (int c = 0; c < 24; c++) {
                    x[i][c] = m[0] * s[0][i][c] + m[2] * s[1][i][c];
                    y[i][c] = m[1] * s[0][i][c] + m[3] * s[1][i][c];
                }
            }
            SpanTest.Result b = SpanTest.run(x, y, FLIPS, 0.05, Progress.NONE, true);
            // PairWhitening: [x y]A(AᵀTA)^(−1/2) = [x y]T^(−1/2)R with R orthogonal (polar
            // decomposition, a textbook identity), and S = σ₂² is unchanged by R
            assertThat(b.statistic()).as("mix %s", java.util.Arrays.toString(m))
                    .isCloseTo(a.statistic(), within(1e-9 * a.statistic()));
            assertThat(b.p()).isEqualTo(a.p());
        }
    }

    @Test
    void whitenedPairsHaveAnIdentitySecondMoment() {
        double[][][] s = twoMapStudy(16, 9, 20, new double[] {1, 0.2}, new double[] {0.5, 0.8}, 2);
        double[][][] w = PairWhitening.whiten(s[0], s[1]);
        double xx = 0;
        double xy = 0;
        double yy = 0;
        for (int i = 0; i < 9; i++) {
            xx += SpanResiduals.dot(w[0][i], w[0][i]) / 9;
            xy += SpanResiduals.dot(w[0][i], w[1][i]) / 9;
            yy += SpanResiduals.dot(w[1][i], w[1][i]) / 9;
        }
        // definition of W = T^(−1/2): Wᵀ T W = I
        assertThat(xx).isCloseTo(1, within(1e-12));
        assertThat(xy).isCloseTo(0, within(1e-12));
        assertThat(yy).isCloseTo(1, within(1e-12));
    }

    @Test
    void exactTestIsUsedUpToSixteenParticipants() {
        double[][][] s = twoMapStudy(21, 16, 20, new double[] {1, 0}, new double[] {0.5, 0.5}, 2);
        SpanTest.Result r = SpanTest.run(s[0], s[1], FLIPS, 0.05, Progress.NONE);
        assertThat(r.randomisation().exact()).isTrue();
        assertThat(r.randomisation().patterns()).isEqualTo(65536);
        // S*(s) = S*(−s): the reaching patterns come in pairs, p is a multiple of 2^(1−N)
        assertThat(r.randomisation().reaching() % 2).isZero();
        assertThat(r.smallestPossibleP()).isEqualTo(2.0 / 65536);
    }

    @Test
    void effectSizeIsTheDissOfTheGrandMeans() {
        double[][][] s = twoMapStudy(2, 8, 30, new double[] {1, 0.1}, new double[] {0.2, 1}, 0.5);
        SpanResiduals r = new SpanResiduals(s[0], s[1]);
        double[] x = FieldStatistics.normalised(r.earlyMean());
        double[] y = FieldStatistics.normalised(r.lateMean());
        double ss = 0;
        for (int c = 0; c < 30; c++) {
            ss += (x[c] - y[c]) * (x[c] - y[c]);
        }
        // Lehmann & Skrandies (1980): DISS = sqrt(mean((x̂ − ŷ)²)) of the GFP-normalised maps
        assertThat(r.grandMeanDiss()).isCloseTo(Math.sqrt(ss / 30), within(1e-9));
        // algebraic identity DISS = sqrt(2(1 − r)), Pearson r from Commons Math
        double pearson = new org.apache.commons.math3.stat.correlation.PearsonsCorrelation()
                .correlation(r.earlyMean(), r.lateMean());
        assertThat(r.grandMeanDiss()).isCloseTo(Math.sqrt(2 * (1 - pearson)), within(1e-9));
    }

    @Test
    void unusableInputIsRefusedWithAReason() {
        double[][] flat = new double[4][5];
        assertThatThrownBy(() -> new SpanResiduals(flat, flat))
                .isInstanceOf(BadInputException.class).hasMessageContaining("flat");
        assertThatThrownBy(() -> new SpanResiduals(new double[1][5], new double[1][5]))
                .isInstanceOf(BadInputException.class).hasMessageContaining("at least 2 participants");
        assertThatThrownBy(() -> SpanTest.run(new double[3][4], new double[3][4], FLIPS, 1.5, Progress.NONE))
                .isInstanceOf(BadInputException.class).hasMessageContaining("alpha");
    }

    static double[] scaled(double[] m, double a) {
        double[] out = new double[m.length];
        for (int c = 0; c < m.length; c++) {
            out[c] = a * m[c];
        }
        return out;
    }
}
