package org.meridian.stats;

/**
 * The outcome of a randomisation test.
 *
 * @param observed  the statistic of the data (the identity pattern)
 * @param p         the p-value: for an exact test the share of all patterns whose statistic
 *                  reaches the observed one (the identity included); for random patterns
 *                  (b + 1)/(m + 1) (Phipson &amp; Smyth, 2010)
 * @param reaching  how many of the counted patterns reached the observed statistic (b)
 * @param patterns  how many patterns were counted (2^N when exact, m when random)
 * @param exact     whether every pattern was enumerated
 */
public record PermutationResult(double observed, double p, long reaching, long patterns,
        boolean exact) {

    public PermutationResult {
        if (!(p > 0 && p <= 1)) {
            throw new IllegalArgumentException("a randomisation p-value lies in (0, 1], got " + p);
        }
        if (reaching < 0 || reaching > patterns || patterns < 1) {
            throw new IllegalArgumentException(reaching + " of " + patterns + " patterns");
        }
    }

    /** The smallest p-value this test could have given. */
    public double smallestPossibleP() {
        return exact ? 1.0 / patterns : 1.0 / (patterns + 1);
    }
}
