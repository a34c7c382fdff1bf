package org.meridian.measure;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.meridian.core.BadInputException;
import org.meridian.signal.NearestName;

/** The registry of measures, in the order help texts list them. */
public final class Measures {
    private static final List<Measure> ALL = List.of(
            new MeanAmplitude(),
            new PeakMeasure(false),
            new PeakMeasure(true),
            new LocalPeakMeasure(false),
            new LocalPeakMeasure(true),
            new AreaMeasure(),
            new FractionalAreaLatency(),
            new FractionalPeakLatency());

    private Measures() {
    }

    public static List<Measure> all() {
        return ALL;
    }

    public static List<String> names() {
        List<String> out = new ArrayList<>();
        for (Measure m : ALL) {
            out.add(m.name());
        }
        return out;
    }

    /**
     * The measure of a name (ignoring case).
     *
     * @throws BadInputException naming the nearest known measure when there is none
     */
    public static Measure byName(String name) {
        String wanted = name.trim().toLowerCase(Locale.ROOT);
        for (Measure m : ALL) {
            if (m.name().equals(wanted)) {
                return m;
            }
        }
        String nearest = NearestName.among(wanted, names());
        throw new BadInputException("no measure \"" + name.trim() + "\"; did you mean \"" + nearest
                + "\"? (measures: " + String.join(", ", names()) + ")");
    }
}
