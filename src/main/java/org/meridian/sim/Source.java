package org.meridian.sim;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A current dipole of a scenario: a name, its position in the head frame (metres from the
 * sphere's centre), its orientation (normalised here), its time course as a sum of
 * {@link TimeCourse}s (such as {@link SourceComponent}), a gain per condition (a condition not listed has gain 0: the source
 * is silent there) and its spread between participants. Its moment at time t in condition c is
 * gain(c) · Σ components(t) along the orientation. Immutable.
 */
public record Source(String name, Vector3 positionM, Vector3 orientation,
        List<TimeCourse> components, Map<String, Double> gains, Variability variability) {

    public Source {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a source needs a name");
        }
        orientation = orientation.unit();
        components = List.copyOf(components);
        if (components.isEmpty()) {
            throw new IllegalArgumentException("source " + name + " has no components");
        }
        Map<String, Double> copy = new LinkedHashMap<>(gains);
        for (Map.Entry<String, Double> e : copy.entrySet()) {
            if (!Double.isFinite(e.getValue())) {
                throw new IllegalArgumentException("source " + name + ": gain for "
                        + e.getKey() + " must be finite");
            }
        }
        gains = Collections.unmodifiableMap(copy);
        if (variability == null) {
            variability = Variability.NONE;
        }
    }

    /** The gain in a condition (0 when the source is silent there). */
    public double gain(String condition) {
        return gains.getOrDefault(condition, 0.0);
    }

    /** The nominal moment along the orientation at {@code timeMs} in nA·m, before the gain. */
    public double momentAt(double timeMs) {
        double sum = 0;
        for (TimeCourse c : components) {
            sum += c.valueAt(timeMs);
        }
        return sum;
    }

    /** The same source at another position (for scenarios built from others). */
    public Source at(Vector3 newPositionM) {
        return new Source(name, newPositionM, orientation, components, gains, variability);
    }

    /** The same source with other gains per condition. */
    public Source withGains(Map<String, Double> newGains) {
        return new Source(name, positionM, orientation, components, newGains, variability);
    }

    /** The same source with another spread between participants. */
    public Source withVariability(Variability v) {
        return new Source(name, positionM, orientation, components, gains, v);
    }
}
