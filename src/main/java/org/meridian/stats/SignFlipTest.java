package org.meridian.stats;

import java.util.SplittableRandom;

/**
 * The sign-flip randomisation test for N participants: under the null hypothesis each
 * participant's contribution is symmetric about zero, so flipping its sign leaves the
 * distribution of the data unchanged, and the observed statistic is one draw from its values
 * over all 2^N sign patterns.
 * <ul>
 * <li>N ≤ {@code exactUpTo} (16 by default): all 2^N patterns are enumerated (pattern k flips
 *     participant i when bit i of k is set, so k = 0 is the identity), and
 *     p = #{s : S*(s) ≥ S} / 2^N, the identity included, so p ≥ 2^−N.</li>
 * <li>otherwise m patterns are drawn at random (each sign a fair coin, with replacement, from a
 *     seeded generator, so a run is repeatable) and p = (b + 1)/(m + 1), b the number of drawn
 *     patterns with S* ≥ S (Phipson &amp; Smyth, 2010, "Permutation p-values should never be
 *     zero", Statistical Applications in Genetics and Molecular Biology 9(1):39). This p never
 *     falls below 1/(m + 1) and keeps the test exact at every level.</li>
 * </ul>
 * "S* ≥ S" is decided with a tie tolerance: a pattern whose statistic falls short of S by no
 * more than {@code tieTolerance} counts as reaching it. Patterns that give mathematically equal
 * statistics (s and −s for an even statistic, participants whose contributions are equal) can
 * differ in the last bits after rounding; counting them on one side by chance would make the
 * exact p depend on the order of summation. The caller sets the tolerance on the scale of its
 * statistic.
 */
public final class SignFlipTest {
    /** Block of patterns between progress reports and cancellation checks. */
    private static final int BLOCK = 1024;

    private final int exactUpTo;
    private final int randomPatterns;
    private final long seed;

    /**
     * @param exactUpTo      enumerate every pattern when N is at most this (at most 30)
     * @param randomPatterns m, the number of random patterns otherwise (at least 1)
     * @param seed           seed of the random patterns
     */
    public SignFlipTest(int exactUpTo, int randomPatterns, long seed) {
        if (exactUpTo < 0 || exactUpTo > 30) {
            throw new IllegalArgumentException("exact enumeration is limited to 0..30 participants, got "
                    + exactUpTo);
        }
        if (randomPatterns < 1) {
            throw new IllegalArgumentException("need at least one random pattern, got " + randomPatterns);
        }
        this.exactUpTo = exactUpTo;
        this.randomPatterns = randomPatterns;
        this.seed = seed;
    }

    /** Exact up to 16 participants, else {@code randomPatterns} random patterns. */
    public static SignFlipTest withRandomPatterns(int randomPatterns, long seed) {
        return new SignFlipTest(16, randomPatterns, seed);
    }

    public boolean isExactFor(int participants) {
        return participants <= exactUpTo;
    }

    /** How many patterns a test of this many participants will evaluate. */
    public long patternCount(int participants) {
        return isExactFor(participants) ? 1L << participants : randomPatterns;
    }

    public int randomPatterns() {
        return randomPatterns;
    }

    public long seed() {
        return seed;
    }

    /**
     * Runs the test.
     *
     * @param participants N, at least 1
     * @param statistic    the statistic as a function of the sign pattern
     * @param tieTolerance a pattern with S* ≥ S − tieTolerance counts as reaching S (≥ 0)
     * @param progress     told of the patterns done; cancellation is checked between blocks
     */
    public PermutationResult run(int participants, SignFlipStatistic statistic,
            double tieTolerance, Progress progress) {
        if (participants < 1) {
            throw new IllegalArgumentException("a sign-flip test needs at least one participant");
        }
        if (!(tieTolerance >= 0) || Double.isInfinite(tieTolerance)) {
            throw new IllegalArgumentException("tie tolerance must be finite and ≥ 0, got " + tieTolerance);
        }
        double[] signs = new double[participants];
        java.util.Arrays.fill(signs, 1.0);
        double observed = statistic.value(signs);
        if (!Double.isFinite(observed)) {
            throw new IllegalArgumentException("the observed statistic is not finite: " + observed);
        }
        double threshold = observed - tieTolerance;
        return isExactFor(participants)
                ? exact(participants, statistic, observed, threshold, signs, progress)
                : random(participants, statistic, observed, threshold, signs, progress);
    }

    private static PermutationResult exact(int n, SignFlipStatistic statistic, double observed,
            double threshold, double[] signs, Progress progress) {
        long total = 1L << n;
        long reaching = 0;
        for (long start = 0; start < total; start += BLOCK) {
            progress.checkCancelled();
            long end = Math.min(total, start + BLOCK);
            for (long k = start; k < end; k++) {
                for (int i = 0; i < n; i++) {
                    signs[i] = ((k >>> i) & 1L) == 0 ? 1.0 : -1.0;
                }
                if (statistic.value(signs) >= threshold) {
                    reaching++;
                }
            }
            progress.update(end, total);
        }
        return new PermutationResult(observed, (double) reaching / total, reaching, total, true);
    }

    private PermutationResult random(int n, SignFlipStatistic statistic, double observed,
            double threshold, double[] signs, Progress progress) {
        SplittableRandom rnd = new SplittableRandom(seed);
        long reaching = 0;
        for (int start = 0; start < randomPatterns; start += BLOCK) {
            progress.checkCancelled();
            int end = Math.min(randomPatterns, start + BLOCK);
            for (int k = start; k < end; k++) {
                drawSigns(rnd, signs);
                if (statistic.value(signs) >= threshold) {
                    reaching++;
                }
            }
            progress.update(end, randomPatterns);
        }
        double p = (reaching + 1.0) / (randomPatterns + 1.0);
        return new PermutationResult(observed, p, reaching, randomPatterns, false);
    }

    /** Fills {@code signs} with fair ±1 coins, 64 participants per random long. */
    static void drawSigns(SplittableRandom rnd, double[] signs) {
        long bits = 0;
        for (int i = 0; i < signs.length; i++) {
            if ((i & 63) == 0) {
                bits = rnd.nextLong();
            }
            signs[i] = (bits & 1L) == 0 ? 1.0 : -1.0;
            bits >>>= 1;
        }
    }
}
