package org.meridian.stats;

/**
 * A statistic as a function of a sign pattern s ∈ {−1, +1}^N, one sign per participant: the
 * value of the test statistic after participant i's contribution has been multiplied by s_i.
 * The all-plus pattern gives the observed value. Implementations precompute whatever does not
 * depend on the signs, so that one pattern costs one signed sum.
 */
@FunctionalInterface
public interface SignFlipStatistic {
    /**
     * The statistic under one pattern; {@code signs} holds exactly ±1.0 and must not be kept or
     * modified.
     */
    double value(double[] signs);
}
