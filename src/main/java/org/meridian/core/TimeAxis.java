package org.meridian.core;

import java.util.Locale;

/**
 * A uniform time axis: the time of the first sample in milliseconds, the sampling rate in hertz
 * and the number of samples. Sample {@code i} lies at {@code firstMs + i * 1000 / rateHz}.
 * Immutable. Two waveforms combine only when their axes are {@link #sameAs equal}.
 */
public final class TimeAxis {
    /** Relative tolerance under which two first times or two rates count as equal. */
    private static final double TOLERANCE = 1e-6;

    private final double firstMs;
    private final double rateHz;
    private final int samples;

    public TimeAxis(double firstMs, double rateHz, int samples) {
        if (!Double.isFinite(firstMs)) {
            throw new IllegalArgumentException("first sample time must be finite, got " + firstMs);
        }
        if (!(rateHz > 0) || !Double.isFinite(rateHz)) {
            throw new IllegalArgumentException("sampling rate must be positive, got " + rateHz);
        }
        if (samples < 1) {
            throw new IllegalArgumentException("a time axis needs at least one sample, got " + samples);
        }
        this.firstMs = firstMs;
        this.rateHz = rateHz;
        this.samples = samples;
    }

    public double firstMs() {
        return firstMs;
    }

    public double rateHz() {
        return rateHz;
    }

    public int samples() {
        return samples;
    }

    /** The time step between samples in milliseconds. */
    public double stepMs() {
        return 1000.0 / rateHz;
    }

    public double lastMs() {
        return timeMs(samples - 1);
    }

    /** The time of sample {@code i} in milliseconds. */
    public double timeMs(int i) {
        return firstMs + i * 1000.0 / rateHz;
    }

    /** The fractional sample index of a time; not clamped to the axis. */
    public double fractionalIndex(double timeMs) {
        return (timeMs - firstMs) * rateHz / 1000.0;
    }

    /** The index of the sample nearest to a time, clamped to the axis. */
    public int nearestIndex(double timeMs) {
        long i = Math.round(fractionalIndex(timeMs));
        return (int) Math.max(0, Math.min(samples - 1, i));
    }

    /** Whether a time lies within the axis, allowing half a sample beyond either end. */
    public boolean covers(double timeMs) {
        double f = fractionalIndex(timeMs);
        return f >= -0.5 && f <= samples - 0.5;
    }

    /** Whether two axes have the same first time, rate and sample count (within 1e-6 relative). */
    public boolean sameAs(TimeAxis other) {
        return describeDifference(other) == null;
    }

    /**
     * Says how another axis differs from this one, e.g. {@code "250 Hz vs 500 Hz"}, or returns
     * null when the two are equal. Used to build error messages that name both sides.
     */
    public String describeDifference(TimeAxis other) {
        StringBuilder sb = new StringBuilder();
        if (Math.abs(rateHz - other.rateHz) > TOLERANCE * rateHz) {
            sb.append(fmt(rateHz)).append(" Hz vs ").append(fmt(other.rateHz)).append(" Hz");
        }
        if (Math.abs(firstMs - other.firstMs) > TOLERANCE * stepMs()) {
            append(sb, "first sample " + fmt(firstMs) + " ms vs " + fmt(other.firstMs) + " ms");
        }
        if (samples != other.samples) {
            append(sb, samples + " vs " + other.samples + " samples");
        }
        return sb.length() == 0 ? null : sb.toString();
    }

    /**
     * Throws a {@link BadInputException} when the axes differ, naming both owners and the
     * difference, e.g. {@code "p01/rare and p02/rare have different time axes: 250 Hz vs 500 Hz"}.
     */
    public void requireSameAs(TimeAxis other, String thisOwner, String otherOwner) {
        String diff = describeDifference(other);
        if (diff != null) {
            throw new BadInputException(thisOwner + " and " + otherOwner
                    + " have different time axes: " + diff);
        }
    }

    private static void append(StringBuilder sb, String part) {
        if (sb.length() > 0) {
            sb.append(", ");
        }
        sb.append(part);
    }

    /** A number in the shortest plain form: 250, 3.9063, -200. */
    static String fmt(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        String s = String.format(Locale.ROOT, "%.4f", v);
        return s.replaceAll("0+$", "").replaceAll("\\.$", "");
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TimeAxis t && sameAs(t);
    }

    /**
     * Only the sample count: equality allows a tolerance on the rate and first time, so no
     * rounding of those could keep equal axes in one hash bucket.
     */
    @Override
    public int hashCode() {
        return Integer.hashCode(samples);
    }

    @Override
    public String toString() {
        return samples + " samples from " + fmt(firstMs) + " to " + fmt(lastMs()) + " ms at "
                + fmt(rateHz) + " Hz";
    }
}
