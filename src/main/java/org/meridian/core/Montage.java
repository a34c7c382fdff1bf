package org.meridian.core;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * A set of positioned electrodes on the unit sphere, with a note of where the positions came
 * from (a standard system or a montage file). Labels are unique ignoring case; no two electrodes
 * may share a position (they would make the spline system singular). Immutable.
 */
public final class Montage {
    /** Electrodes closer than this angle (about 0.06°) count as the same position. */
    private static final double SAME_POSITION_COSINE = Math.cos(1e-3);

    private final List<Electrode> electrodes;
    private final Map<String, Electrode> byKey;
    private final String source;

    public Montage(List<Electrode> electrodes, String source) {
        this.electrodes = List.copyOf(electrodes);
        this.source = source == null ? "" : source;
        Map<String, Electrode> map = new LinkedHashMap<>();
        for (Electrode e : this.electrodes) {
            Electrode previous = map.put(key(e.label()), e);
            if (previous != null) {
                throw new BadInputException((this.source.isEmpty() ? "" : this.source + ": ")
                        + "electrode " + e.label() + " is listed twice");
            }
        }
        for (int i = 0; i < this.electrodes.size(); i++) {
            for (int j = i + 1; j < this.electrodes.size(); j++) {
                Electrode a = this.electrodes.get(i);
                Electrode b = this.electrodes.get(j);
                if (a.cosineTo(b) > SAME_POSITION_COSINE) {
                    throw new SamePositionException(this.source, a.label(), b.label());
                }
            }
        }
        this.byKey = Collections.unmodifiableMap(map);
    }

    /** The key under which labels are compared: lower case, trimmed. */
    public static String key(String label) {
        return label.trim().toLowerCase(Locale.ROOT);
    }

    public List<Electrode> electrodes() {
        return electrodes;
    }

    public int size() {
        return electrodes.size();
    }

    public String source() {
        return source;
    }

    public Optional<Electrode> find(String label) {
        return Optional.ofNullable(byKey.get(key(label)));
    }

    public boolean contains(String label) {
        return byKey.containsKey(key(label));
    }

    public List<String> labels() {
        List<String> out = new ArrayList<>(electrodes.size());
        for (Electrode e : electrodes) {
            out.add(e.label());
        }
        return out;
    }

    /** The electrodes with these labels, in the given order; unknown labels are an error. */
    public Montage select(List<String> labels) {
        List<Electrode> out = new ArrayList<>(labels.size());
        for (String l : labels) {
            out.add(find(l).orElseThrow(() -> new BadInputException(
                    "channel " + l + " has no position in the montage (" + source + ")")));
        }
        return new Montage(out, source);
    }

    @Override
    public String toString() {
        return electrodes.size() + " electrodes (" + source + ")";
    }
}
