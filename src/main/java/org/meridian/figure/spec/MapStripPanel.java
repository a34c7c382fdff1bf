package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.ArrayList;
import java.util.List;
import org.meridian.core.BadInputException;

/**
 * A row of scalp maps of one wave (a condition or a contrast) at given times ({@code times_ms}) or
 * as means over windows ({@code windows_ms}: {@code [[from, to], …]}), all on the figure's shared
 * colour scale. {@code highlight} rings electrodes (e.g. the waveform panels' channels) and names
 * them; {@code title} defaults to the wave.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record MapStripPanel(@JsonProperty("condition") String condition,
        @JsonProperty("times_ms") List<Double> timesMs,
        @JsonProperty("windows_ms") List<List<Double>> windowsMs,
        @JsonProperty("highlight") List<String> highlight,
        @JsonProperty("title") String title,
        @JsonProperty("width") Double width) implements PanelSpec {
    public static final String TYPE = "map-strip";
    static final int MAX_MAPS = 24;

    public MapStripPanel {
        condition = SpecChecks.required(condition, "condition");
        if ((timesMs == null) == (windowsMs == null)) {
            throw new BadInputException("a map strip needs either times_ms or windows_ms (not both)");
        }
        if (timesMs != null) {
            if (timesMs.isEmpty() || timesMs.size() > MAX_MAPS || timesMs.stream().anyMatch(t -> t == null || !Double.isFinite(t))) {
                throw new BadInputException("times_ms must hold 1 to " + MAX_MAPS + " times in ms, got " + timesMs);
            }
            timesMs = List.copyOf(timesMs);
        } else {
            if (windowsMs.isEmpty() || windowsMs.size() > MAX_MAPS) {
                throw new BadInputException("windows_ms must hold 1 to " + MAX_MAPS + " windows, got " + windowsMs.size());
            }
            List<List<Double>> copy = new ArrayList<>();
            for (int i = 0; i < windowsMs.size(); i++) {
                copy.add(SpecChecks.range(windowsMs.get(i), "windows_ms[" + i + "]"));
            }
            windowsMs = List.copyOf(copy);
        }
        highlight = highlight == null ? List.of() : List.copyOf(highlight);
        width = PanelSpec.share(width, "width");
    }

    /** Maps of a wave at given times. */
    public static MapStripPanel atTimes(String condition, List<Double> timesMs) {
        return new MapStripPanel(condition, timesMs, null, null, null, null);
    }

    public MapStripPanel withHighlight(List<String> labels) {
        return new MapStripPanel(condition, timesMs, windowsMs, labels, title, width);
    }

    /** How many maps the strip holds. */
    public int mapCount() {
        return timesMs != null ? timesMs.size() : windowsMs.size();
    }

    @Override
    public boolean lettered() {
        return true;
    }
}
