package org.meridian.span;

import java.util.Locale;
import org.meridian.core.BadInputException;
import org.meridian.core.TimeAxis;
import org.meridian.signal.TimeWindow;

/**
 * A window [a, b] ms of a time axis with its split into an early and a late part, as sample
 * indices (inclusive). Window edges snap as {@link TimeWindow} snaps them: to the nearest
 * sample, a tie going toward the inside of the window (DESIGN §6.3).
 *
 * <p>The split is fixed before the data are looked at: either the middle of the window, where
 * each part gets the same number of samples (the middle sample of an odd count belongs to
 * neither part), or a time T the researcher names, where the early part holds the samples
 * before the sample nearest to T and the late part that sample and the ones after it. A split
 * chosen by looking for the largest difference would make the span test meaningless, so there
 * is deliberately no way to ask for one.
 *
 * @param axis       the time axis the indices refer to
 * @param first      first sample of the window
 * @param earlyLast  last sample of the early part
 * @param lateFirst  first sample of the late part
 * @param last       last sample of the window
 * @param splitMs    the split time: the given T, or the middle of the window's first and last
 *                   sample times
 * @param middle     whether the split is the default middle one
 */
public record SpanWindow(TimeAxis axis, int first, int earlyLast, int lateFirst, int last,
        double splitMs, boolean middle) {

    /** Tolerance (in samples) under which a split time counts as exactly half-way between samples. */
    private static final double HALF_TOLERANCE = 1e-9;

    public SpanWindow {
        if (!(first <= earlyLast && earlyLast < lateFirst && lateFirst <= last
                && first >= 0 && last < axis.samples())) {
            throw new IllegalArgumentException("inconsistent window samples " + first + ".."
                    + earlyLast + " | " + lateFirst + ".." + last + " on " + axis);
        }
    }

    /** The window split at its middle; {@code option} names the window in errors. */
    public static SpanWindow middle(TimeAxis axis, TimeWindow window, String option) {
        TimeWindow.SampleRange r = snap(axis, window, option);
        int n = r.length();
        if (n < 2) {
            throw new BadInputException(option + ": the window " + window + " ms holds " + n
                    + " sample; the span needs at least 2");
        }
        int half = n / 2;
        double split = 0.5 * (axis.timeMs(r.from()) + axis.timeMs(r.to()));
        return new SpanWindow(axis, r.from(), r.from() + half - 1, r.to() - half + 1, r.to(), split, true);
    }

    /**
     * The window split at {@code splitMs}: the late part starts at the sample nearest to it (a
     * tie goes late).
     */
    public static SpanWindow splitAt(TimeAxis axis, TimeWindow window, double splitMs,
            String windowOption, String splitOption) {
        TimeWindow.SampleRange r = snap(axis, window, windowOption);
        int k = (int) Math.floor(axis.fractionalIndex(splitMs) + 0.5 + HALF_TOLERANCE);
        if (!Double.isFinite(splitMs) || k <= r.from() || k > r.to()) {
            throw new BadInputException(splitOption + ": " + fmt(splitMs) + " ms must leave samples on "
                    + "both sides inside the window " + fmt(axis.timeMs(r.from())) + ".."
                    + fmt(axis.timeMs(r.to())) + " ms");
        }
        return new SpanWindow(axis, r.from(), k - 1, k, r.to(), splitMs, false);
    }

    private static TimeWindow.SampleRange snap(TimeAxis axis, TimeWindow window, String option) {
        try {
            return window.resolve(axis);
        } catch (BadInputException e) {
            throw new BadInputException(option + ": " + e.getMessage(), e);
        }
    }

    /** Samples in the window. */
    public int size() {
        return last - first + 1;
    }

    public double startMs() {
        return axis.timeMs(first);
    }

    public double endMs() {
        return axis.timeMs(last);
    }

    /** Whether a time falls inside the window (half a sample beyond either edge included). */
    public boolean contains(double timeMs) {
        double f = axis.fractionalIndex(timeMs);
        return f >= first - 0.5 && f <= last + 0.5;
    }

    /** "a..b" of the sample times of the early part. */
    public String earlyRangeMs() {
        return fmt(axis.timeMs(first)) + ".." + fmt(axis.timeMs(earlyLast));
    }

    /** "a..b" of the sample times of the late part. */
    public String lateRangeMs() {
        return fmt(axis.timeMs(lateFirst)) + ".." + fmt(axis.timeMs(last));
    }

    /** Times for messages and summaries: plain, up to 3 decimals. */
    static String fmt(double ms) {
        if (ms == Math.rint(ms) && Math.abs(ms) < 1e12) {
            return Long.toString((long) ms);
        }
        String s = String.format(Locale.ROOT, "%.3f", ms);
        return s.replaceAll("0+$", "").replaceAll("\\.$", "");
    }
}
