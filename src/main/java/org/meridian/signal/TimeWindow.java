package org.meridian.signal;

import java.util.Locale;
import org.meridian.core.BadInputException;
import org.meridian.core.TimeAxis;

/**
 * A time window [start, end] in milliseconds, inclusive at both ends, written {@code start:end}
 * (e.g. {@code 300:500}, {@code -100:0}). On a sampled axis each edge snaps to the nearest
 * sample; an edge exactly half-way between two samples goes toward the inside of the window, so
 * a window never grows beyond what was asked. A window that reaches past the data is an error
 * that names the window and the data range. Immutable.
 */
public record TimeWindow(double startMs, double endMs) {
    /** Ties are decided with this tolerance in samples, so 301 ms at 500 Hz counts as a tie. */
    private static final double TIE_TOLERANCE = 1e-9;

    public TimeWindow {
        if (!Double.isFinite(startMs) || !Double.isFinite(endMs)) {
            throw new BadInputException("window " + format(startMs) + ":" + format(endMs)
                    + " ms: both edges must be finite numbers");
        }
        if (!(startMs < endMs)) {
            throw new BadInputException("window " + format(startMs) + ":" + format(endMs)
                    + " ms: the start must come before the end");
        }
    }

    /**
     * Reads {@code start:end} in milliseconds.
     *
     * @throws BadInputException naming the text when it is not two numbers joined by a colon
     */
    public static TimeWindow parse(String text) {
        String t = text.trim();
        int colon = t.indexOf(':', 1);
        if (colon < 0) {
            throw new BadInputException("window \"" + text + "\" is not START:END in ms (e.g. 300:500)");
        }
        double a = number(t.substring(0, colon), text);
        double b = number(t.substring(colon + 1), text);
        return new TimeWindow(a, b);
    }

    private static double number(String part, String whole) {
        try {
            return Double.parseDouble(part.trim());
        } catch (NumberFormatException e) {
            throw new BadInputException("window \"" + whole + "\": \"" + part.trim()
                    + "\" is not a number of milliseconds");
        }
    }

    /** The first sample index inside the window (ties toward the inside), not clamped. */
    public int firstIndex(TimeAxis axis) {
        return (int) Math.floor(axis.fractionalIndex(startMs) + 0.5 + TIE_TOLERANCE);
    }

    /** The last sample index inside the window (ties toward the inside), not clamped. */
    public int lastIndex(TimeAxis axis) {
        return (int) Math.ceil(axis.fractionalIndex(endMs) - 0.5 - TIE_TOLERANCE);
    }

    /**
     * The snapped sample range of this window on an axis.
     *
     * @throws BadInputException when the window reaches beyond the data or holds no sample
     */
    public SampleRange resolve(TimeAxis axis) {
        int from = firstIndex(axis);
        int to = lastIndex(axis);
        if (from < 0 || to > axis.samples() - 1) {
            throw new BadInputException("window " + this + " ms lies outside the data ("
                    + format(axis.firstMs()) + ".." + format(axis.lastMs()) + " ms)");
        }
        if (from > to) {
            throw new BadInputException("window " + this + " ms holds no sample at "
                    + format(axis.rateHz()) + " Hz");
        }
        return new SampleRange(from, to);
    }

    /** The inclusive sample range {@code from..to} of a window on an axis. */
    public record SampleRange(int from, int to) {
        public SampleRange {
            if (from < 0 || to < from) {
                throw new IllegalArgumentException("bad sample range " + from + ".." + to);
            }
        }

        public int length() {
            return to - from + 1;
        }
    }

    /** {@code start:end} in the shortest plain number form, as in the measure table. */
    @Override
    public String toString() {
        return format(startMs) + ":" + format(endMs);
    }

    /** A number of milliseconds in the shortest plain form: 300, -100, 352.5. */
    public static String format(double ms) {
        if (ms == Math.rint(ms) && Math.abs(ms) < 1e15) {
            return Long.toString((long) ms);
        }
        String s = String.format(Locale.ROOT, "%.6f", ms);
        return s.replaceAll("0+$", "").replaceAll("\\.$", "");
    }
}
