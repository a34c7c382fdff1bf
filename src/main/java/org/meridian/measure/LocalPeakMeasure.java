package org.meridian.measure;

import org.meridian.core.Unit;

/**
 * {@code local-peak} and {@code local-peak-latency}: the largest sample in the window (for
 * negative polarity the most negative) that is larger than both adjacent samples and larger
 * than the mean of the k samples on each side, k the neighbourhood in samples (DESIGN §6.3;
 * the local peak amplitude described by Luck, 2014, An Introduction to the Event-Related
 * Potential Technique). Neighbours outside the window are used where the data has them;
 * near the ends of the data the side means use the samples that exist, and the first and last
 * samples of the data never qualify. Comparisons are strict, so a flat top does not qualify.
 *
 * <p>When no sample qualifies, the window maximum is reported instead, marked with the qualifier
 * {@code window maximum} and a warning.
 */
final class LocalPeakMeasure implements Measure {
    static final String FALLBACK = "window maximum";
    private final boolean latency;

    LocalPeakMeasure(boolean latency) {
        this.latency = latency;
    }

    @Override
    public String name() {
        return latency ? "local-peak-latency" : "local-peak";
    }

    @Override
    public String unit(Unit dataUnit) {
        return latency ? "ms" : dataUnit.symbol();
    }

    @Override
    public String description() {
        return latency ? "time of the local peak"
                : "largest sample exceeding its neighbours and the mean of k samples on each side";
    }

    @Override
    public void check(MeasureSettings settings) {
        PeakMeasure.requirePeakPolarity(name(), settings);
    }

    @Override
    public int reachSamples(MeasureSettings settings, double rateHz) {
        return settings.neighbourhoodSamples(rateHz);
    }

    @Override
    public Score score(Trace t, MeasureSettings settings) {
        int k = settings.neighbourhoodSamples(t.axis().rateHz());
        int i = t.localPeakIndex(settings.polarity(), k);
        if (i >= 0) {
            return Score.of(latency ? t.timeMs(i) : t.values()[i]);
        }
        int m = t.extremeIndex(settings.polarity());
        return Score.fallback(latency ? t.timeMs(m) : t.values()[m], FALLBACK,
                "no local " + (settings.polarity() == Polarity.NEGATIVE ? "negative" : "positive")
                + " peak in the window (±" + k + " samples); the window "
                + (settings.polarity() == Polarity.NEGATIVE ? "minimum" : "maximum") + " is reported");
    }

    /** After this many candidates the side sums come from running totals instead of loops. */
    private static final int DIRECT_CHECKS = 32;
    /** Running totals are kept in one buffer per thread, so scoring allocates nothing. */
    private static final ThreadLocal<double[]> TOTALS = ThreadLocal.withInitial(() -> new double[0]);

    /**
     * The local peak's sample index, or −1 when no sample in the window qualifies. The cheap
     * tests (larger than the best so far and than both adjacent samples) come first. The side
     * means of the few samples that pass them are summed directly; once a jagged wave has
     * produced more candidates than that, running totals over the window and its neighbourhood
     * are built and each side mean costs one subtraction.
     */
    static int localPeakIndex(Trace t, Polarity polarity, int k) {
        double[] x = t.values();
        int last = x.length - 1;
        double sign = polarity.sign();
        int lo = Math.max(0, t.from() - k);
        double[] prefix = null;
        int checks = 0;
        int best = -1;
        double bestValue = Double.NEGATIVE_INFINITY;
        for (int i = Math.max(1, t.from()), end = Math.min(last - 1, t.to()); i <= end; i++) {
            double v = sign * x[i];
            if (!(v > bestValue && v > sign * x[i - 1] && v > sign * x[i + 1])) {
                continue;
            }
            int left = Math.max(0, i - k);
            int right = Math.min(last, i + k);
            boolean qualifies;
            if (prefix == null && ++checks > DIRECT_CHECKS) {
                prefix = runningTotals(x, sign, lo, Math.min(last, t.to() + k));
            }
            if (prefix != null) {
                // prefix[j] = Σ sign·x over lo .. lo + j − 1
                qualifies = v * (right - i) > prefix[right - lo + 1] - prefix[i - lo + 1]
                        && v * (i - left) > prefix[i - lo] - prefix[left - lo];
            } else {
                qualifies = exceedsSideMeans(x, i, v, sign, k);
            }
            if (qualifies) {
                best = i;
                bestValue = v;
            }
        }
        return best;
    }

    private static double[] runningTotals(double[] x, double sign, int lo, int hi) {
        double[] prefix = TOTALS.get();
        if (prefix.length < hi - lo + 2) {
            prefix = new double[hi - lo + 2];
            TOTALS.set(prefix);
        }
        prefix[0] = 0;
        for (int j = lo; j <= hi; j++) {
            prefix[j - lo + 1] = prefix[j - lo] + sign * x[j];
        }
        return prefix;
    }

    /** Whether sign·x[i] exceeds the mean of sign·x over k samples on each side (clipped to the data). */
    private static boolean exceedsSideMeans(double[] x, int i, double v, double sign, int k) {
        // the right side first: on a rising flank, where most candidates fail, it decides
        int right = Math.min(x.length - 1, i + k);
        double rightSum = 0;
        for (int j = i + 1; j <= right; j++) {
            rightSum += sign * x[j];
        }
        if (!(v * (right - i) > rightSum)) {
            return false;
        }
        int left = Math.max(0, i - k);
        double leftSum = 0;
        for (int j = left; j < i; j++) {
            leftSum += sign * x[j];
        }
        return v * (i - left) > leftSum;
    }
}
