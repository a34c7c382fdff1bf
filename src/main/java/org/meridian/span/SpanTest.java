package org.meridian.span;

import org.meridian.core.BadInputException;
import org.meridian.stats.PermutationResult;
import org.meridian.stats.Progress;
import org.meridian.stats.SignFlipTest;

/**
 * The span test (DESIGN §7, our own): does one scalp map, at whatever strength and polarity,
 * account for a window in every participant, or does the map change between the early and the
 * late part of the window?
 *
 * <p>The residuals d_i and the statistic S = Σ_c (mean_i d_ic)² are those of
 * {@link SpanResiduals}, computed on the part maps as measured, so S is in the squared unit of
 * the maps (µV², or (µV/m²)² for CSD). Under the null hypothesis each d_i is symmetric about 0,
 * so S is compared with its values under every sign pattern (d_i → s_i d_i): all 2^N patterns
 * when N ≤ 16, else m random patterns with p = (b + 1)/(m + 1) ({@link SignFlipTest}). The d_i
 * are not centred before flipping: centring would remove the very mean being tested and put the
 * identity at S* = 0. Patterns whose statistic falls short of S by less than 10⁻⁹ of the largest
 * value S* can take count as ties (≥ S); s and −s always give the same S*, so an exact p is a
 * multiple of 2^(1−N) and is never below 2^(1−N).
 *
 * <p>A variant, on request only: the part pairs are first whitened ({@link PairWhitening}), a
 * more conservative test (lower false-alarm rate and lower power at high noise in the README's
 * validation table) whose S has no unit.
 *
 * <p>The split into early and late parts must be fixed before looking at the data (the middle
 * of the window, or a time the researcher names); a split chosen where the maps differ most
 * would make the test meaningless. Beside p the test reports the DISS of the normalised
 * grand-mean early and late maps, an effect size on the 0..2 scale of Lehmann &amp; Skrandies
 * (1980), always from the maps as measured.
 */
public final class SpanTest {
    /** Share of the largest possible S* within which two statistics count as tied. */
    public static final double TIE_TOLERANCE = 1e-9;

    private SpanTest() {
    }

    /**
     * The outcome of one span test.
     *
     * @param residuals the residuals, the common map and the statistic
     * @param whitened  whether the pairs were whitened first (the {@code --whiten} variant)
     * @param randomisation the sign-flip test's result (p, patterns)
     * @param alpha     the level the verdict was taken at
     * @param verdict   "changes" when p &lt; alpha, else "stable"
     * @param diss      DISS between the normalised grand-mean early and late maps (the effect size)
     */
    public record Result(SpanResiduals residuals, boolean whitened, PermutationResult randomisation,
            double alpha, SpanVerdict verdict, double diss) {

        /** S = Σ_c (mean_i d_ic)², in the squared unit of the maps unless {@link #whitened()}. */
        public double statistic() {
            return residuals.statistic();
        }

        public double p() {
            return randomisation.p();
        }

        /**
         * The smallest p these participants and patterns allow; when it is not below alpha the
         * test cannot say "changes" whatever the data.
         */
        public double smallestPossibleP() {
            return randomisation.exact() ? 2.0 / randomisation.patterns()
                    : 1.0 / (randomisation.patterns() + 1);
        }
    }

    /**
     * Runs the span test of DESIGN §7 on per-participant early and late maps (N × C each,
     * average reference or CSD, same participant and channel order).
     */
    public static Result run(double[][] early, double[][] late, SignFlipTest signFlips,
            double alpha, Progress progress) {
        return run(early, late, signFlips, alpha, progress, false);
    }

    /**
     * The test of DESIGN §7, or with {@code whiten} its more conservative variant that first
     * whitens the part pairs ({@link PairWhitening}; S then has no unit). The effect size is the
     * same either way.
     */
    public static Result run(double[][] early, double[][] late, SignFlipTest signFlips, double alpha,
            Progress progress, boolean whiten) {
        requireAlpha(alpha);
        // the effect size is read from the maps as measured, before any whitening
        double diss = FieldStatistics.diss(grandMean(early), grandMean(late));
        double[][][] pair = whiten ? PairWhitening.whiten(early, late) : new double[][][] {early, late};
        SpanResiduals r = new SpanResiduals(pair[0], pair[1]);
        double tolerance = TIE_TOLERANCE * r.largestPossibleStatistic();
        PermutationResult p = signFlips.run(r.participants(), r::statisticFor, tolerance, progress);
        return new Result(r, whiten, p, alpha, SpanVerdict.of(p.p(), alpha), diss);
    }

    static double[] grandMean(double[][] maps) {
        double[] m = new double[maps[0].length];
        for (double[] map : maps) {
            for (int c = 0; c < m.length; c++) {
                m[c] += map[c] / maps.length;
            }
        }
        return m;
    }

    static void requireAlpha(double alpha) {
        if (!(alpha > 0 && alpha < 1)) {
            throw new BadInputException("alpha must lie between 0 and 1, got " + alpha);
        }
    }
}
