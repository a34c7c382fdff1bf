package org.meridian.measure;

import org.meridian.core.TimeAxis;

/**
 * One wave to be measured, the whole of it (measures such as the local peak look past the
 * window), and the window as an inclusive sample range {@code from..to} on its axis.
 *
 * <p>The array is not copied: a trace is a short-lived view handed to measures, which must not
 * change it. Results that several measures share (the window's sums, see {@link WindowScan},
 * its extremes and the local peak) are computed once per trace and remembered, so scoring every
 * measure on one trace does not repeat the same scans.
 */
public final class Trace {
    private final double[] values;
    private final TimeAxis axis;
    private final int from;
    private final int to;

    /** The polarity whose extreme the shared scan looks for. */
    private final Polarity expected;
    private WindowScan scan;
    /** The extreme of the other polarity, −1 until searched. */
    private int otherExtreme = -1;
    private Polarity localFor;
    private int localK;
    private int local;

    public Trace(double[] values, TimeAxis axis, int from, int to) {
        this(values, axis, from, to, Polarity.POSITIVE);
    }

    /**
     * A trace whose measures will mostly ask for {@code expected}'s extreme: the shared scan
     * finds that one on its way, any other is searched separately.
     */
    Trace(double[] values, TimeAxis axis, int from, int to, Polarity expected) {
        if (values.length != axis.samples()) {
            throw new IllegalArgumentException(values.length + " values for " + axis.samples() + " samples");
        }
        if (from < 0 || to >= values.length || from > to) {
            throw new IllegalArgumentException("window " + from + ".." + to + " outside 0.."
                    + (values.length - 1));
        }
        this.values = values;
        this.axis = axis;
        this.from = from;
        this.to = to;
        this.expected = expected;
    }

    /** The whole wave (not a copy; do not change it). */
    public double[] values() {
        return values;
    }

    public TimeAxis axis() {
        return axis;
    }

    /** The first sample index of the window. */
    public int from() {
        return from;
    }

    /** The last sample index of the window (inclusive). */
    public int to() {
        return to;
    }

    /** The time of a sample in ms. */
    public double timeMs(int sample) {
        return axis.timeMs(sample);
    }

    public double stepMs() {
        return axis.stepMs();
    }

    /**
     * The window sample with the largest value of polarity·x (the first one on ties): the
     * most positive sample for positive polarity, the most negative for negative polarity.
     */
    public int extremeIndex(Polarity polarity) {
        if (polarity.sign() == expected.sign()) {
            return scan().extremeIndex;
        }
        if (otherExtreme < 0) {
            otherExtreme = firstExtreme(polarity.sign());
        }
        return otherExtreme;
    }

    private int firstExtreme(int sign) {
        int best = from;
        double bestValue = sign * values[from];
        for (int i = from + 1; i <= to; i++) {
            double v = sign * values[i];
            if (v > bestValue) {
                bestValue = v;
                best = i;
            }
        }
        return best;
    }

    /** The mean of the window's samples, ends included. */
    double windowMean() {
        WindowScan s = scan();
        return (s.evenSum + s.oddSum) / (to - from + 1);
    }

    /** The local peak's sample index with a neighbourhood of k samples, or −1 when none qualifies. */
    int localPeakIndex(Polarity polarity, int k) {
        if (localFor != polarity || localK != k) {
            local = LocalPeakMeasure.localPeakIndex(this, polarity, k);
            localFor = polarity;
            localK = k;
        }
        return local;
    }

    /** The window's area of the chosen part of the wave, in µV·ms (see {@link AreaMeasure}). */
    double area(Polarity polarity) {
        return SegmentArea.sum(scan(), values, from, to, stepMs(), polarity);
    }

    /**
     * Where a search along the running area of the chosen part may start: the last of the
     * scan's marks (every {@value WindowScan#BLOCK} samples) before the first one at which
     * direction × the running area reaches {@code target}, so that between the window's start
     * and that mark the running area stays below the target (up to rounding). The window's
     * start when the first stretch already reaches it.
     */
    int areaSearchStart(Polarity polarity, double direction, double target) {
        WindowScan s = scan();
        int start = from;
        for (int m = 1; m < s.marks(); m++) {
            if (direction * s.areaToMark(m, values, stepMs(), polarity) >= target) {
                break;
            }
            start = s.mark(m);
        }
        return start;
    }

    /** The running area of the chosen part from the window's start to a mark or the window's start. */
    double areaTo(int mark, Polarity polarity) {
        WindowScan s = scan();
        return mark == from ? 0 : s.areaToMark((mark - from) / WindowScan.BLOCK, values, stepMs(), polarity);
    }

    /** The window's shared one-pass results, scanned on first use. */
    private WindowScan scan() {
        if (scan == null) {
            scan = WindowScan.of(values, from, to, expected.sign());
        }
        return scan;
    }
}
