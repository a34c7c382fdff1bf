package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;

/**
 * Grand-average waves at one channel, or at a region written {@code P3+Pz+P4} (the mean of its
 * channels, computed per participant before averaging, so the band is the region's own), with
 * the figure's interval bands. {@code conditions} picks some of the figure's waves by their
 * {@code wave} text (default: all of them); {@code legend} shows their names and colours above the
 * plot; {@code title} defaults to the channel or region.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record WaveformPanel(@JsonProperty("channels") String channels,
        @JsonProperty("conditions") List<String> conditions,
        @JsonProperty("title") String title,
        @JsonProperty("legend") Boolean legend,
        @JsonProperty("width") Double width) implements PanelSpec {
    public static final String TYPE = "waveforms";

    public WaveformPanel {
        channels = SpecChecks.required(channels, "channels");
        conditions = conditions == null ? null : List.copyOf(conditions);
        legend = legend != null && legend;
        width = PanelSpec.share(width, "width");
    }

    /** A panel at a channel or region showing every wave of the figure. */
    public static WaveformPanel at(String channels) {
        return new WaveformPanel(channels, null, null, null, null);
    }

    public WaveformPanel withLegend(boolean on) {
        return new WaveformPanel(channels, conditions, title, on, width);
    }

    @Override
    public boolean lettered() {
        return true;
    }
}
