package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;
import java.util.Locale;
import org.meridian.core.BadInputException;

/**
 * A span trace of grand-average waves over time, on the waveform panels' time axis — the span
 * view's traces in a figure. {@code trace} is {@code gfp} (default): the global field power (GFP;
 * Lehmann &amp; Skrandies, 1980), how strong the scalp field is whatever its shape; or
 * {@code diss}: the global dissimilarity of each moment's map to a reference map (0 same shape,
 * 2 inverted; Lehmann &amp; Skrandies, 1980), the reference being each wave's map at
 * {@code reference_ms}, or else at its GFP maximum inside {@code window_ms} (default: the whole
 * time axis). {@code conditions} picks some of the figure's waves by their {@code wave} text
 * (default: all of them); {@code title} defaults to "GFP" or "DISS".
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record SpanTracePanel(@JsonProperty("trace") String trace,
        @JsonProperty("conditions") List<String> conditions,
        @JsonProperty("title") String title,
        @JsonProperty("legend") Boolean legend,
        @JsonProperty("window_ms") List<Double> windowMs,
        @JsonProperty("reference_ms") Double referenceMs,
        @JsonProperty("width") Double width) implements PanelSpec {
    public static final String TYPE = "span-trace";
    public static final String GFP = "gfp";
    public static final String DISS = "diss";

    public SpanTracePanel {
        trace = SpecChecks.text(trace, GFP).toLowerCase(Locale.ROOT);
        if (!trace.equals(GFP) && !trace.equals(DISS)) {
            throw new BadInputException("trace must be gfp or diss, got \"" + trace + "\"");
        }
        if (trace.equals(GFP) && (windowMs != null || referenceMs != null)) {
            throw new BadInputException("window_ms and reference_ms choose the reference map of a diss trace;"
                    + " a gfp trace has none");
        }
        conditions = conditions == null ? null : List.copyOf(conditions);
        title = SpecChecks.text(title, trace.equals(GFP) ? "GFP" : "DISS");
        legend = legend != null && legend;
        windowMs = SpecChecks.range(windowMs, "window_ms");
        width = PanelSpec.share(width, "width");
    }

    /** A GFP trace of all the figure's waves. */
    public static SpanTracePanel gfp(boolean legend) {
        return new SpanTracePanel(null, null, null, legend, null, null, null);
    }

    /** A DISS trace of all the figure's waves, against each wave's map at its GFP maximum in a window. */
    public static SpanTracePanel diss(boolean legend, List<Double> windowMs) {
        return new SpanTracePanel(DISS, null, null, legend, windowMs, null, null);
    }

    public boolean isDiss() {
        return trace.equals(DISS);
    }

    @Override
    public boolean lettered() {
        return true;
    }
}
