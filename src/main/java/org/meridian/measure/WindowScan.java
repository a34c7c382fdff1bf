package org.meridian.measure;

/**
 * What one pass over a window's samples x[from..to] gives the measures that share it: the sums
 * of x and of |x| (the mean and the area, see {@link SegmentArea}), the zero crossings'
 * overshoot Σ −x_j·x_{j+1} / |x_j − x_{j+1}| over the intervals from ≤ j &lt; to whose ends have
 * opposite signs (the area's positive and negative parts), and the first sample with the largest
 * sign·x for one sign (the peaks, and the local peak's first guess).
 *
 * <p>The sums are kept in two halves (samples from, from + 2, … and from + 1, from + 3, …), which
 * halves the chain of dependent additions; the order of every addition is fixed, so results are
 * the same bit for bit on every run. The extreme's comparisons ride along in the same loop,
 * where the additions' latency leaves room for them.
 *
 * <p>Crossings: a wave near zero crosses it at random, every few samples if it is noisy, so a
 * test and branch at every interval is mispredicted at every crossing, which costs more than
 * the rest of the pass. The pass therefore records, without branching, every interval whose ends
 * differ in sign bit (the crossings, and intervals with a zero end, whose overshoot is 0), and a
 * second loop over those few adds their overshoot, two terms to a division. The overshoot's
 * additions are ordered too, though not one by one (see {@link #overshoot}).
 *
 * <p>Marks: every {@value #BLOCK} samples the pass also notes how far its sums (and the
 * crossings' overshoot) had come, so the running area up to any mark costs a few operations
 * instead of a walk from the window start ({@link #areaToMark}); the fractional area latency
 * uses them to skip to the stretch where its search ends.
 */
final class WindowScan {
    /** Samples between two marks. */
    static final int BLOCK = 32;
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
    /** +1 or −1: the sign whose extreme was searched. */
    final int sign;
    /** The first sample with the largest sign·x. */
    final int extremeIndex;
    /** The window's first sample; mark m is sample from + m·{@value #BLOCK}. */
    private final int from;
    /**
     * For each mark m (0 ≤ m &lt; marks, all inside the window): Σ x and Σ |x| over the samples
     * before it (from ≤ i &lt; mark), and the overshoot of the crossings before it (j + 1 ≤ mark),
     * at [3m], [3m + 1] and [3m + 2].
     */
    private final double[] markSums;
    private final int marks;

    private WindowScan(double evenSum, double oddSum, double evenAbs, double oddAbs,
            double overshoot, int sign, int extremeIndex, int from, double[] markSums, int marks) {
        this.evenSum = evenSum;
        this.oddSum = oddSum;
        this.evenAbs = evenAbs;
        this.oddAbs = oddAbs;
        this.overshoot = overshoot;
        this.sign = sign;
        this.extremeIndex = extremeIndex;
        this.from = from;
        this.markSums = markSums;
        this.marks = marks;
    }

    /** @param sign +1 to find the first largest sample, −1 the first smallest */
    static WindowScan of(double[] x, int from, int to, int sign) {
        int[] candidates = candidates(to - from + 1);
        int count = 0;
        double sum0 = 0;
        double sum1 = 0;
        double abs0 = 0;
        double abs1 = 0;
        int best = from;
        double bestValue = sign * x[from];
        // the first step compares x_from with itself, so the interval before the window never counts
        long prev = Double.doubleToRawLongBits(x[from]);
        int i = from;
        int marks = 0;
        double[] markSums = new double[3 * ((to - from + 1) / BLOCK)];
        // block by block, noting the sums at the start of every whole block; the additions are
        // the same, in the same order, as in one loop over the window
        while (i + 1 <= to) {
            if (i + BLOCK - 1 <= to) {
                markSums[3 * marks] = sum0 + sum1;
                markSums[3 * marks + 1] = abs0 + abs1;
                marks++;
            }
            for (int end = Math.min(i + BLOCK, to); i < end; i += 2) {
                double a = x[i];
                double b = x[i + 1];
                sum0 += a;
                sum1 += b;
                abs0 += Math.abs(a);
                abs1 += Math.abs(b);
                // strict comparisons keep the first of equal extremes; a before b for the same reason
                if (sign * a > bestValue) {
                    bestValue = sign * a;
                    best = i;
                }
                if (sign * b > bestValue) {
                    bestValue = sign * b;
                    best = i + 1;
                }
                long aBits = Double.doubleToRawLongBits(a);
                long bBits = Double.doubleToRawLongBits(b);
                // always write, advance only when the sign bits differ: no branch
                candidates[count] = i - 1;
                count += (int) ((prev ^ aBits) >>> 63);
                candidates[count] = i;
                count += (int) ((aBits ^ bBits) >>> 63);
                prev = bBits;
            }
        }
        if (i == to) {
            double a = x[i];
            sum0 += a;
            abs0 += Math.abs(a);
            if (sign * a > bestValue) {
                best = i;
            }
            candidates[count] = i - 1;
            count += (int) ((prev ^ Double.doubleToRawLongBits(a)) >>> 63);
        }
        double overshoot = overshoots(x, candidates, count, from, marks, markSums);
        return new WindowScan(sum0, sum1, abs0, abs1, overshoot, sign, best, from, markSums, marks);
    }

    /**
     * The crossings' overshoot over the whole window, noting at each mark m ≥ 1 the part before
     * it (intervals j &lt; mark), from the candidate intervals in order of j.
     */
    private static double overshoots(double[] x, int[] candidates, int count, int from, int marks,
            double[] markSums) {
        double total = 0;
        int c = 0;
        // one stretch per mark, the last one running to the window's end
        for (int m = 1; m <= Math.max(marks, 1); m++) {
            int end = m < marks ? from + m * BLOCK : Integer.MAX_VALUE;
            int stop = c;
            while (stop < count && candidates[stop] < end) {
                stop++;
            }
            total += overshoot(x, candidates, c, stop);
            c = stop;
            if (m < marks) {
                markSums[3 * m + 2] = total;
            }
        }
        return total;
    }

    /**
     * Σ −x_j·x_{j+1} / |x_j − x_{j+1}| over candidates[lo..hi). A candidate's ends differ in sign
     * bit, so x_j·x_{j+1} ≤ 0 and the term is ≥ 0; it is 0 when an end is zero, and skipped when
     * both are (+0 and −0). Two terms share one division, p/q + r/s = (p·s + r·q)/(q·s): a
     * division costs several multiplications, and on a noisy wave there is one per few samples.
     */
    private static double overshoot(double[] x, int[] candidates, int lo, int hi) {
        double sum = 0;
        int c = lo;
        for (; c + 1 < hi; c += 2) {
            int j = candidates[c];
            int k = candidates[c + 1];
            double p = x[j] * x[j + 1];
            double q = Math.abs(x[j] - x[j + 1]);
            double r = x[k] * x[k + 1];
            double s = Math.abs(x[k] - x[k + 1]);
            double qs = q * s;
            // a product too small for full precision (never for data stored as floats) is split
            sum -= qs >= Double.MIN_NORMAL ? (p * s + r * q) / qs : term(p, q) + term(r, s);
        }
        if (c < hi) {
            int j = candidates[c];
            sum -= term(x[j] * x[j + 1], Math.abs(x[j] - x[j + 1]));
        }
        return sum;
    }

    /** p / q, or 0 when q is 0 (ends +0 and −0). */
    private static double term(double p, double q) {
        return q > 0 ? p / q : 0;
    }

    /** The number of marks, all inside the window (none when it is shorter than a block). */
    int marks() {
        return marks;
    }

    /** The sample index of mark m. */
    int mark(int m) {
        return from + m * BLOCK;
    }

    /**
     * The area of the chosen part over the window's start .. mark m (see
     * {@link SegmentArea#fromSums}); 0 at mark 0.
     */
    double areaToMark(int m, double[] x, double dt, Polarity polarity) {
        int b = mark(m);
        return SegmentArea.fromSums(markSums[3 * m] + x[b], markSums[3 * m + 1] + Math.abs(x[b]),
                markSums[3 * m + 2], x[from], x[b], dt, polarity);
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
