package org.meridian.stats;

import org.apache.commons.math3.distribution.TDistribution;
import org.meridian.core.BadInputException;

/**
 * Tests on jackknifed scores. When every one of N scores J_i comes from a leave-one-out grand
 * average, the J_i vary (N − 1) times less than individual scores would, and an ordinary test on
 * them is too liberal by that factor. Ulrich &amp; Miller (2001), following Miller, Patterson
 * &amp; Ulrich (1998), correct the statistic: t_c = t / (N − 1) and F_c = F / (N − 1)², with
 * the usual degrees of freedom. Equivalently, the jackknife standard error
 * SE_J = √((N − 1)/N · Σ (J_i − J̄)²) replaces s/√N.
 *
 * <p>Scores retrieved with {@link org.meridian.signal.Jackknife#retrieve} need no correction:
 * their ordinary t already equals t_c.
 */
public final class JackknifeT {
    private JackknifeT() {
    }

    /** A t statistic, its degrees of freedom and two-sided p value. */
    public record Result(double t, int degreesOfFreedom, double p) {
    }

    /** t_c = t / (N − 1): the t of an ordinary test on N jackknife scores, corrected. */
    public static double correctT(double t, int n) {
        requireN(n);
        return t / (n - 1);
    }

    /** F_c = F / (N − 1)²: the F of an ordinary ANOVA on N jackknife scores, corrected. */
    public static double correctF(double f, int n) {
        requireN(n);
        return f / ((double) (n - 1) * (n - 1));
    }

    /** SE_J = √((N − 1)/N · Σ (J_i − J̄)²), the jackknife standard error of the mean score. */
    public static double standardError(double[] subsampleScores) {
        int n = subsampleScores.length;
        requireN(n);
        double mean = mean(subsampleScores);
        double ss = 0;
        for (double j : subsampleScores) {
            ss += (j - mean) * (j - mean);
        }
        return Math.sqrt((n - 1.0) / n * ss);
    }

    /** One-sample test of the mean jackknife score against {@code mu}: t_c = (J̄ − μ) / SE_J. */
    public static Result oneSample(double[] subsampleScores, double mu) {
        int n = subsampleScores.length;
        double t = (mean(subsampleScores) - mu) / standardError(subsampleScores);
        return result(t, n - 1);
    }

    /**
     * Paired test of two conditions scored on the same N leave-one-out averages (e.g. the
     * latency difference of a component between conditions): the one-sample test of the
     * differences against zero.
     */
    public static Result paired(double[] a, double[] b) {
        if (a.length != b.length) {
            throw new BadInputException("a paired jackknife test needs the same participants in both"
                    + " conditions (" + a.length + " vs " + b.length + " scores)");
        }
        double[] d = new double[a.length];
        for (int i = 0; i < d.length; i++) {
            d[i] = a[i] - b[i];
        }
        return oneSample(d, 0);
    }

    private static Result result(double t, int df) {
        double p = Double.isFinite(t)
                ? 2 * new TDistribution(null, df).cumulativeProbability(-Math.abs(t))
                : (Double.isNaN(t) ? Double.NaN : 0);
        return new Result(t, df, p);
    }

    private static double mean(double[] x) {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s / x.length;
    }

    private static void requireN(int n) {
        if (n < 2) {
            throw new BadInputException("jackknife statistics need at least two participants");
        }
    }
}
