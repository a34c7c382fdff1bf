package org.meridian.signal;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.meridian.core.BadInputException;
import org.meridian.core.Montage;
import org.meridian.core.Waveforms;

/**
 * A new reference for potentials: every channel has the reference signal r(t) subtracted,
 * v'_c(t) = v_c(t) − r(t). The reference is either the mean of every channel (the average
 * reference; channels such as EOG can be left out of the mean, they are still re-referenced)
 * or the mean of a list of channels (one channel, or e.g. both mastoids).
 *
 * <p>Re-referencing is linear. Between references that are both linear combinations of the
 * channels present, it is reversible: going to any reference and back to the original channel
 * reference restores the data (the original reference channel must be present as the zero
 * channel; {@link #restoreOmitted} puts it back when the recording left it out). The average
 * reference discards the common signal and cannot be undone without knowing it.
 *
 * <p>Written on the command line and in specs as {@code average}, {@code Cz} or
 * {@code M1+M2}.
 */
public sealed interface Reference {

    /** The reference signal of each sample, given the data. */
    double[] signal(Waveforms w);

    /** Readable form: {@code average}, {@code average without HEOG, VEOG}, {@code M1+M2}. */
    String describe();

    /** Subtracts the reference signal from every channel. */
    default Waveforms apply(Waveforms w) {
        double[] r = signal(w);
        int n = w.sampleCount();
        float[] out = w.copyValues();
        for (int c = 0; c < w.channelCount(); c++) {
            int off = c * n;
            for (int s = 0; s < n; s++) {
                out[off + s] = (float) (out[off + s] - r[s]);
            }
        }
        return Waveforms.wrap(w.labels(), w.axis(), w.unit(), out);
    }

    /** The average reference over all channels. */
    static Reference average() {
        return new Average(Set.of());
    }

    /** The average reference over all channels but those named (which are still re-referenced). */
    static Reference averageWithout(Set<String> leftOut) {
        return new Average(leftOut);
    }

    /** The mean of the named channels (one channel, or several such as both mastoids). */
    static Reference channels(List<String> labels) {
        return new Channels(labels);
    }

    /** Reads {@code average}, {@code avg}, {@code Cz} or {@code M1+M2}. */
    static Reference parse(String text) {
        String t = text.trim();
        String lower = t.toLowerCase(Locale.ROOT);
        if (lower.equals("average") || lower.equals("avg")) {
            return average();
        }
        List<String> labels = new ArrayList<>();
        for (String part : t.split("\\+", -1)) {
            if (part.isBlank()) {
                throw new BadInputException("reference \"" + text
                        + "\" is not average, a channel or channels joined by + (e.g. M1+M2)");
            }
            labels.add(part.trim());
        }
        return channels(labels);
    }

    /**
     * Adds the recording reference that the file left out as a channel of zeros, so that it can
     * take part in a new reference (e.g. data recorded against M1 with M2 present: restore M1,
     * then re-reference to M1+M2 for linked mastoids).
     */
    static Waveforms restoreOmitted(Waveforms w, String label) {
        if (label == null || label.isBlank()) {
            throw new BadInputException("the omitted reference channel needs a label");
        }
        if (w.indexOf(label) >= 0) {
            throw new BadInputException("the omitted reference " + label
                    + " is already a channel of the data");
        }
        List<String> labels = new ArrayList<>(w.labels());
        labels.add(label.trim());
        float[] values = new float[labels.size() * w.sampleCount()];
        float[] old = w.copyValues();
        System.arraycopy(old, 0, values, 0, old.length);
        return Waveforms.wrap(labels, w.axis(), w.unit(), values);
    }

    /** The mean of all channels except the left-out ones. */
    record Average(Set<String> leftOut) implements Reference {
        public Average {
            leftOut = Set.copyOf(new LinkedHashSet<>(leftOut));
        }

        @Override
        public double[] signal(Waveforms w) {
            Set<String> keys = new LinkedHashSet<>();
            for (String l : leftOut) {
                w.requireIndex(l);
                keys.add(Montage.key(l));
            }
            List<Integer> used = new ArrayList<>();
            for (int c = 0; c < w.channelCount(); c++) {
                if (!keys.contains(Montage.key(w.label(c)))) {
                    used.add(c);
                }
            }
            if (used.isEmpty()) {
                throw new BadInputException("the average reference leaves out every channel");
            }
            return meanOf(w, used);
        }

        @Override
        public String describe() {
            return leftOut.isEmpty() ? "average"
                    : "average without " + String.join(", ", new java.util.TreeSet<>(leftOut));
        }
    }

    /** The mean of the listed channels. */
    record Channels(List<String> labels) implements Reference {
        public Channels {
            if (labels.isEmpty()) {
                throw new BadInputException("a channel reference needs at least one channel");
            }
            labels = List.copyOf(labels);
        }

        @Override
        public double[] signal(Waveforms w) {
            List<Integer> used = new ArrayList<>();
            for (String l : labels) {
                int i = w.indexOf(l);
                if (i < 0) {
                    throw new BadInputException("reference channel " + l + " is not in the data;"
                            + " if it was the recording reference, restore it as a zero channel first");
                }
                used.add(i);
            }
            return meanOf(w, used);
        }

        @Override
        public String describe() {
            return String.join("+", labels);
        }
    }

    private static double[] meanOf(Waveforms w, List<Integer> channels) {
        int n = w.sampleCount();
        double[] r = new double[n];
        for (int c : channels) {
            for (int s = 0; s < n; s++) {
                r[s] += w.value(c, s);
            }
        }
        for (int s = 0; s < n; s++) {
            r[s] /= channels.size();
        }
        return r;
    }
}
