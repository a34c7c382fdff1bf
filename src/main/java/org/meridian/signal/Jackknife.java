package org.meridian.signal;

import org.meridian.core.BadInputException;

/**
 * The jackknife for ERP measures (Miller, Patterson &amp; Ulrich, 1998): a measure that is
 * unreliable on one participant's noisy wave (an onset or a fractional-peak latency, say) is
 * scored instead on the N leave-one-out grand averages, J_i being the score of the average of
 * every participant but i. The retrieved individual scores of Smulders (2010),
 * x_i = N · J̄ − (N − 1) · J_i, have the mean J̄ and N − 1 times the spread of the J_i, so they
 * enter ordinary statistics as if they were individual scores. Statistics computed directly on
 * the J_i need the correction in {@link org.meridian.stats.JackknifeT} instead.
 *
 * <p>Leave-one-out averages are unweighted: participant i's average is
 * (S − x_i) / (N − 1), with S the sum over the N participants.
 */
public final class Jackknife {
    private Jackknife() {
    }

    /**
     * The leave-one-out averages of N series at once: row i is the mean of every row of
     * {@code series} but row i. All rows must have the same length; needs N ≥ 2.
     */
    public static double[][] leaveOneOutAverages(double[][] series) {
        double[][] out = new double[series.length][series.length == 0 ? 0 : series[0].length];
        leaveOneOutAveragesInto(series, out);
        return out;
    }

    /** As {@link #leaveOneOutAverages}, into {@code out} (same shape as {@code series}). */
    public static void leaveOneOutAveragesInto(double[][] series, double[][] out) {
        int n = series.length;
        if (n < 2) {
            throw new BadInputException("the jackknife needs at least two participants");
        }
        int len = series[0].length;
        double[] sum = new double[len];
        for (double[] row : series) {
            if (row.length != len) {
                throw new IllegalArgumentException("series of different lengths");
            }
            for (int s = 0; s < len; s++) {
                sum[s] += row[s];
            }
        }
        for (int i = 0; i < n; i++) {
            for (int s = 0; s < len; s++) {
                out[i][s] = (sum[s] - series[i][s]) / (n - 1);
            }
        }
    }

    /** Smulders (2010): x_i = N · J̄ − (N − 1) · J_i from the leave-one-out scores J_i. */
    public static double[] retrieve(double[] subsampleScores) {
        int n = subsampleScores.length;
        if (n < 2) {
            throw new BadInputException("the jackknife needs at least two participants");
        }
        double mean = 0;
        for (double j : subsampleScores) {
            mean += j;
        }
        mean /= n;
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = n * mean - (n - 1) * subsampleScores[i];
        }
        return out;
    }
}
