package org.meridian.measure;

/**
 * The window sums that the mean and the area share, from one pass over x[from..to]: the sums of
 * x and of |x|, and the zero crossings' overshoot Σ −x_j·x_{j+1} / |x_j − x_{j+1}| over the
 * intervals from ≤ j &lt; to whose ends have opposite signs (see {@link SegmentArea}).
 *
 * <p>The sums are kept in two halves (samples from, from + 2, … and from + 1, from + 3, …), which
 * halves the chain of dependent additions; the order of every addition is fixed, so results are
 * the same bit for bit on every run.
 *
 * <p>Crossings: a wave near zero crosses it every few tens of samples at random, so a test and
 * branch at every interval is mispredicted at every crossing, which costs more than the rest of
 * the pass. The pass therefore records, without branching, every interval whose ends differ in
 * sign bit (a superset of the crossings: a zero end has a sign bit too), and a second loop over
 * those few tests x_j·x_{j+1} &lt; 0 exactly and adds the overshoot in order of j.
 */
final class WindowScan {
    /** Candidate crossings, one buffer per thread so scans allocate nothing. */
    private static final ThreadLocal<int[]> CANDIDATES = ThreadLocal.withInitial(() -> new int[0]);

    /** Σ x over samples from, from + 2, …, and over from + 1, from + 3, … */
    final double evenSum;
    final double oddSum;
    /** Σ |x| over the same halves. */
    final double evenAbs;
    final double oddAbs;
    /** Σ −x_j·x_{j+1} / |x_j − x_{j+1}| over from ≤ j &lt; to where x_j·x_{j+1} &lt; 0, in order of j. */
    final double overshoot;

    private WindowScan(double evenSum, double oddSum, double evenAbs, double oddAbs, double overshoot) {
        this.evenSum = evenSum;
        this.oddSum = oddSum;
        this.evenAbs = evenAbs;
        this.oddAbs = oddAbs;
        this.overshoot = overshoot;
    }

    static WindowScan of(double[] x, int from, int to) {
        double sum0 = 0;
        double sum1 = 0;
        double abs0 = 0;
        double abs1 = 0;
        double overshoot = 0;
        // prev·a is x_from² ≥ 0 on the first step, so the interval before the window never counts
        double prev = x[from];
        int i = from;
        for (; i + 1 <= to; i += 2) {
            double a = x[i];
            double b = x[i + 1];
            sum0 += a;
            sum1 += b;
            abs0 += Math.abs(a);
            abs1 += Math.abs(b);
            double pa = prev * a;
            if (pa < 0) {
                overshoot -= pa / Math.abs(prev - a);
            }
            double ab = a * b;
            if (ab < 0) {
                overshoot -= ab / Math.abs(a - b);
            }
            prev = b;
        }
        if (i == to) {
            double a = x[i];
            sum0 += a;
            abs0 += Math.abs(a);
            double pa = prev * a;
            if (pa < 0) {
                overshoot -= pa / Math.abs(prev - a);
            }
        }
        return new WindowScan(sum0, sum1, abs0, abs1, overshoot);
    }

    private static int[] candidates(int length) {
        int[] buffer = CANDIDATES.get();
        if (buffer.length < length) {
            buffer = new int[length];
            CANDIDATES.set(buffer);
        }
        return buffer;
    }
}
