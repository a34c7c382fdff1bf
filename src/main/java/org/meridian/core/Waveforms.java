package org.meridian.core;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Channels × samples of one participant and condition (or of a grand average): unique channel
 * labels (compared ignoring case), a {@link TimeAxis}, a {@link Unit}, and the values as floats
 * held channel-major in one array, so channel {@code c}, sample {@code s} is at
 * {@code c * samples + s}. Immutable: the public constructor copies the values, and no method
 * hands out the internal array.
 */
public final class Waveforms {
    private final List<String> labels;
    private final Map<String, Integer> index;
    private final TimeAxis axis;
    private final Unit unit;
    private final float[] values;

    /** Copies {@code values}; its length must be channels × samples. */
    public Waveforms(List<String> labels, TimeAxis axis, Unit unit, float[] values) {
        this(values.clone(), labels, axis, unit);
    }

    private Waveforms(float[] values, List<String> labels, TimeAxis axis, Unit unit) {
        this.labels = Collections.unmodifiableList(new ArrayList<>(labels));
        this.axis = axis;
        this.unit = unit;
        this.values = values;
        if (labels.isEmpty()) {
            throw new IllegalArgumentException("waveforms need at least one channel");
        }
        if (values.length != (long) labels.size() * axis.samples()) {
            throw new IllegalArgumentException("expected " + labels.size() + " × " + axis.samples()
                    + " values, got " + values.length);
        }
        Map<String, Integer> map = new HashMap<>(labels.size() * 2);
        for (int i = 0; i < labels.size(); i++) {
            Integer previous = map.put(Montage.key(labels.get(i)), i);
            if (previous != null) {
                throw new BadInputException("channel " + labels.get(i) + " appears twice (as "
                        + labels.get(previous) + " and " + labels.get(i) + ")");
            }
        }
        this.index = map;
    }

    /**
     * Takes ownership of {@code values} without copying: for readers and computations that have
     * just filled a fresh array and will not touch it again.
     */
    public static Waveforms wrap(List<String> labels, TimeAxis axis, Unit unit, float[] values) {
        return new Waveforms(values, labels, axis, unit);
    }

    public List<String> labels() {
        return labels;
    }

    public String label(int channel) {
        return labels.get(channel);
    }

    public int channelCount() {
        return labels.size();
    }

    public int sampleCount() {
        return axis.samples();
    }

    public TimeAxis axis() {
        return axis;
    }

    public Unit unit() {
        return unit;
    }

    /** The index of a channel (ignoring case), or -1. */
    public int indexOf(String label) {
        Integer i = index.get(Montage.key(label));
        return i == null ? -1 : i;
    }

    /** The index of a channel, or a {@link BadInputException} naming the missing label. */
    public int requireIndex(String label) {
        int i = indexOf(label);
        if (i < 0) {
            throw new BadInputException("no channel " + label + " (channels are "
                    + abbreviate(labels) + ")");
        }
        return i;
    }

    public float value(int channel, int sample) {
        return values[channel * axis.samples() + sample];
    }

    /** A copy of one channel's samples. */
    public float[] channel(int channel) {
        int n = axis.samples();
        return Arrays.copyOfRange(values, channel * n, channel * n + n);
    }

    /** Copies one channel's samples into {@code dst} as doubles. */
    public void channelInto(int channel, double[] dst) {
        int n = axis.samples();
        int off = channel * n;
        for (int s = 0; s < n; s++) {
            dst[s] = values[off + s];
        }
    }

    /**
     * Copies samples {@code firstSample .. firstSample + dst.length − 1} of one channel into
     * {@code dst}. A plain array copy moves many samples per instruction, which keeps more memory
     * reads in flight than a loop that converts as it goes: the faster way to take windows out of
     * many large studies.
     *
     * @throws IndexOutOfBoundsException when the channel or the span lies outside the data
     */
    public void channelInto(int channel, int firstSample, float[] dst) {
        int n = axis.samples();
        Objects.checkIndex(channel, labels.size());
        Objects.checkFromIndexSize(firstSample, dst.length, n);
        System.arraycopy(values, channel * n + firstSample, dst, 0, dst.length);
    }

    /** Copies the values at one sample (one value per channel, a map) into {@code dst}. */
    public void sampleInto(int sample, double[] dst) {
        int n = axis.samples();
        for (int c = 0; c < labels.size(); c++) {
            dst[c] = values[c * n + sample];
        }
    }

    /** A copy of all values, channel-major. */
    public float[] copyValues() {
        return values.clone();
    }

    /** Same labels and axis with other values (copied); the unit may change. */
    public Waveforms withValues(Unit newUnit, float[] newValues) {
        return new Waveforms(labels, axis, newUnit, newValues);
    }

    /** The chosen channels, in the given order. */
    public Waveforms select(List<String> chosen) {
        int n = axis.samples();
        float[] out = new float[chosen.size() * n];
        for (int i = 0; i < chosen.size(); i++) {
            System.arraycopy(values, requireIndex(chosen.get(i)) * n, out, i * n, n);
        }
        return wrap(chosen, axis, unit, out);
    }

    /**
     * Says how another set of waveforms differs in layout (channels, their order, time axis,
     * unit), or returns null when the layouts agree. Values are not compared.
     */
    public String describeLayoutDifference(Waveforms other) {
        List<String> missing = new ArrayList<>();
        for (String l : labels) {
            if (other.indexOf(l) < 0) {
                missing.add(l);
            }
        }
        List<String> extra = new ArrayList<>();
        for (String l : other.labels) {
            if (indexOf(l) < 0) {
                extra.add(l);
            }
        }
        if (!missing.isEmpty() || !extra.isEmpty()) {
            StringBuilder sb = new StringBuilder("different channels:");
            if (!missing.isEmpty()) {
                sb.append(" second lacks ").append(abbreviate(missing));
            }
            if (!extra.isEmpty()) {
                sb.append(missing.isEmpty() ? "" : ";").append(" second adds ").append(abbreviate(extra));
            }
            return sb.toString();
        }
        String axisDiff = axis.describeDifference(other.axis);
        if (axisDiff != null) {
            return "different time axes: " + axisDiff;
        }
        if (unit != other.unit) {
            return "different units: " + unit.symbol() + " vs " + other.unit.symbol();
        }
        for (int i = 0; i < labels.size(); i++) {
            if (!Montage.key(labels.get(i)).equals(Montage.key(other.labels.get(i)))) {
                return "channels in a different order (position " + (i + 1) + ": "
                        + labels.get(i) + " vs " + other.labels.get(i) + ")";
            }
        }
        return null;
    }

    /** The same channels in the order of {@code order}'s labels (which must hold the same set). */
    public Waveforms reorderedLike(Waveforms order) {
        return select(order.labels());
    }

    static String abbreviate(List<String> items) {
        if (items.size() <= 8) {
            return String.join(", ", items);
        }
        return String.join(", ", items.subList(0, 8)) + " and " + (items.size() - 8) + " more";
    }

    @Override
    public String toString() {
        return labels.size() + " channels × " + axis + " (" + unit.symbol() + ")";
    }
}
