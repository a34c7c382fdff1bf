package org.meridian.sim;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/**
 * One smooth deflection of a source's moment over time: zero before its onset, rising along a
 * half cosine to its amplitude at the peak time, falling along a half cosine to zero at
 * onset + width, zero afterwards:
 * <pre>
 *   m(t) = a · ½(1 − cos(π (t − onset)/(peak − onset)))        onset ≤ t ≤ peak
 *   m(t) = a · ½(1 + cos(π (t − peak)/(onset + width − peak)))  peak ≤ t ≤ onset + width
 * </pre>
 * The curve and its slope are continuous everywhere (a Hann-window shape with separate rise and
 * fall, common practice for simulated components). Times in ms, amplitude in nA·m along the
 * source's orientation (negative: the moment points the other way). Immutable.
 */
public record SourceComponent(double onsetMs, double peakMs, double widthMs, double amplitudeNAm)
        implements TimeCourse {

    public SourceComponent {
        if (!Double.isFinite(onsetMs) || !Double.isFinite(peakMs) || !Double.isFinite(widthMs)
                || !Double.isFinite(amplitudeNAm)) {
            throw new IllegalArgumentException("component parameters must be finite");
        }
        if (!(peakMs > onsetMs && peakMs < onsetMs + widthMs)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "a component's peak (%.1f ms) must lie after its onset (%.1f ms) and before "
                            + "its end (%.1f ms)", peakMs, onsetMs, onsetMs + widthMs));
        }
    }

    public double endMs() {
        return onsetMs + widthMs;
    }

    @Override
    public String kind() {
        return "raised-cosine";
    }

    @Override
    public Map<String, Double> parameters() {
        Map<String, Double> p = new LinkedHashMap<>();
        p.put("onset_ms", onsetMs);
        p.put("peak_ms", peakMs);
        p.put("width_ms", widthMs);
        p.put("amplitude_nam", amplitudeNAm);
        return p;
    }

    /** The moment in nA·m at time {@code timeMs}. */
    @Override
    public double valueAt(double timeMs) {
        if (timeMs <= onsetMs || timeMs >= endMs()) {
            return 0;
        }
        if (timeMs <= peakMs) {
            return amplitudeNAm * 0.5 * (1 - StrictMath.cos(StrictMath.PI * (timeMs - onsetMs)
                    / (peakMs - onsetMs)));
        }
        return amplitudeNAm * 0.5 * (1 + StrictMath.cos(StrictMath.PI * (timeMs - peakMs)
                / (endMs() - peakMs)));
    }

    /** The same shape moved in time by {@code deltaMs}. */
    public SourceComponent shifted(double deltaMs) {
        return new SourceComponent(onsetMs + deltaMs, peakMs + deltaMs, widthMs, amplitudeNAm);
    }

    /** The same shape with its amplitude multiplied by {@code factor}. */
    public SourceComponent scaled(double factor) {
        return new SourceComponent(onsetMs, peakMs, widthMs, amplitudeNAm * factor);
    }
}
