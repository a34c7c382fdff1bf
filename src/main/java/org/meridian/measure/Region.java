package org.meridian.measure;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.meridian.core.BadInputException;
import org.meridian.core.Waveforms;
import org.meridian.montage.Labels;
import org.meridian.signal.NearestName;

/**
 * A channel, or a region of channels written {@code P3+Pz+P4}: measured as the mean wave of its
 * channels (the channels are averaged first, then measured) and reported under the joined label,
 * spelt as in the data. Immutable.
 */
public record Region(String label, List<String> channels) {

    public Region {
        channels = List.copyOf(channels);
        if (channels.isEmpty()) {
            throw new IllegalArgumentException("a region needs at least one channel");
        }
    }

    /**
     * Reads {@code Pz} or {@code P3+Pz+P4} against the channels of the data (ignoring case).
     *
     * @throws BadInputException for an unknown channel, naming the nearest one
     */
    public static Region parse(String text, List<String> dataLabels) {
        List<String> chosen = new ArrayList<>();
        for (String part : text.split("\\+", -1)) {
            String wanted = part.trim();
            if (wanted.isEmpty()) {
                throw new BadInputException("channel list \"" + text + "\" has an empty name"
                        + " (join a region's channels with +, e.g. P3+Pz+P4)");
            }
            String found = null;
            for (String l : dataLabels) {
                if (l.equalsIgnoreCase(wanted)) {
                    found = l;
                }
            }
            if (found == null) {
                throw new BadInputException("no channel " + wanted + nearestHint(wanted, dataLabels));
            }
            if (chosen.contains(found)) {
                throw new BadInputException("region " + text + " names " + found + " twice");
            }
            chosen.add(found);
        }
        return new Region(String.join("+", chosen), chosen);
    }

    /** Every channel of the data, one region each. */
    public static List<Region> eachChannel(List<String> dataLabels) {
        List<Region> out = new ArrayList<>();
        for (String l : dataLabels) {
            out.add(new Region(l, List.of(l)));
        }
        return out;
    }

    /** The channel indices of this region in a set of waveforms. */
    public int[] indices(Waveforms w) {
        int[] idx = new int[channels.size()];
        for (int i = 0; i < idx.length; i++) {
            idx[i] = w.requireIndex(channels.get(i));
        }
        return idx;
    }

    /**
     * The region's mean wave over samples {@code first .. first + dst.length − 1} into
     * {@code dst}, given its channel indices.
     */
    public static void meanInto(Waveforms w, int[] indices, int first, double[] dst) {
        meanInto(w, indices, first, dst, new float[dst.length]);
    }

    /** As {@link #meanInto(Waveforms, int[], int, double[])}, with a buffer of dst.length floats. */
    static void meanInto(Waveforms w, int[] indices, int first, double[] dst, float[] buffer) {
        // the floats are copied in bulk first and converted from cache (see Waveforms.channelInto)
        w.channelInto(indices[0], first, buffer);
        for (int s = 0; s < dst.length; s++) {
            dst[s] = buffer[s];
        }
        if (indices.length == 1) {
            return;
        }
        for (int k = 1; k < indices.length; k++) {
            w.channelInto(indices[k], first, buffer);
            for (int s = 0; s < dst.length; s++) {
                dst[s] += buffer[s];
            }
        }
        for (int s = 0; s < dst.length; s++) {
            dst[s] /= indices.length;
        }
    }

    private static String nearestHint(String wanted, List<String> labels) {
        String best = NearestName.among(wanted, labels);
        int bestDistance = best == null ? Integer.MAX_VALUE
                : Labels.editDistance(wanted.toLowerCase(Locale.ROOT), best.toLowerCase(Locale.ROOT));
        return best != null && bestDistance <= Math.max(1, wanted.length() / 2)
                ? "; did you mean " + best + "?" : " (channels: " + abbreviate(labels) + ")";
    }

    private static String abbreviate(List<String> items) {
        return items.size() <= 10 ? String.join(", ", items)
                : String.join(", ", items.subList(0, 10)) + " and " + (items.size() - 10) + " more";
    }

    @Override
    public String toString() {
        return label;
    }
}
