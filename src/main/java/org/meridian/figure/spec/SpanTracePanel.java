package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;

/**
 * The global field power (GFP; Lehmann &amp; Skrandies, 1980) of grand-average waves over time, on
 * the waveform panels' time axis: how strong the scalp field is, whatever its shape — the span
 * view's trace in a figure. {@code conditions} picks some of the figure's waves by their
 * {@code wave} text (default: all of them); {@code title} defaults to "GFP".
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record SpanTracePanel(@JsonProperty("conditions") List<String> conditions,
        @JsonProperty("title") String title,
        @JsonProperty("legend") Boolean legend,
        @JsonProperty("width") Double width) implements PanelSpec {
    public static final String TYPE = "span-trace";

    public SpanTracePanel {
        conditions = conditions == null ? null : List.copyOf(conditions);
        title = SpecChecks.text(title, "GFP");
        legend = legend != null && legend;
        width = PanelSpec.share(width, "width");
    }

    @Override
    public boolean lettered() {
        return true;
    }
}
