package org.meridian.measure;

import org.meridian.core.TimeAxis;

/**
 * One wave to be measured, the whole of it (measures such as the local peak look past the
 * window), and the window as an inclusive sample range {@code from..to} on its axis.
 *
 * <p>The array is not copied: a trace is a short-lived view handed to measures, which must not
 * change it. Results that several measures share (the extreme sample, the local peak, the area)
 * are computed once per trace and remembered, so scoring every measure on one trace does not
 * repeat the same scans.
 */
public final class Trace {
    private final double[] values;
    private final TimeAxis axis;
    private final int from;
    private final int to;

    private Polarity extremeFor;
    private int extreme;
    private Polarity localFor;
    private int localK;
    private int local;
    private Polarity areaFor;
    private double area;

    public Trace(double[] values, TimeAxis axis, int from, int to) {
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
        if (extremeFor != polarity) {
            int sign = polarity.sign();
            int best = from;
            double bestValue = sign * values[from];
            for (int i = from + 1; i <= to; i++) {
                double v = sign * values[i];
                if (v > bestValue) {
                    bestValue = v;
                    best = i;
                }
            }
            extreme = best;
            extremeFor = polarity;
        }
        return extreme;
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
        if (areaFor != polarity) {
            area = SegmentArea.sum(values, from, to, stepMs(), polarity);
            areaFor = polarity;
        }
        return area;
    }
}
