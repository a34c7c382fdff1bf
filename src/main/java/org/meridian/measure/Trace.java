package org.meridian.measure;

import org.meridian.core.TimeAxis;

/**
 * One wave to be measured, the whole of it (measures such as the local peak look past the
 * window), and the window as an inclusive sample range {@code from..to} on its axis. The array
 * is not copied: a trace is a short-lived view handed to measures, which must not change it.
 */
public record Trace(double[] values, TimeAxis axis, int from, int to) {
    public Trace {
        if (values.length != axis.samples()) {
            throw new IllegalArgumentException(values.length + " values for " + axis.samples() + " samples");
        }
        if (from < 0 || to >= values.length || from > to) {
            throw new IllegalArgumentException("window " + from + ".." + to + " outside 0.." + (values.length - 1));
        }
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
        return best;
    }
}
