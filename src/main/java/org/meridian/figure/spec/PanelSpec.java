package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonSubTypes;
import com.fasterxml.jackson.annotation.JsonTypeInfo;

/**
 * One panel of a figure, told apart in JSON by its {@code type}: {@code waveforms},
 * {@code map-strip}, {@code colour-bar} or {@code span-trace}. Each takes a share of its row's width in proportion to
 * its {@code width} (default 1). To add a panel type, see the developer notes.
 */
@JsonTypeInfo(use = JsonTypeInfo.Id.NAME, include = JsonTypeInfo.As.PROPERTY, property = "type")
@JsonSubTypes({
    @JsonSubTypes.Type(value = WaveformPanel.class, name = WaveformPanel.TYPE),
    @JsonSubTypes.Type(value = MapStripPanel.class, name = MapStripPanel.TYPE),
    @JsonSubTypes.Type(value = ColourBarPanel.class, name = ColourBarPanel.TYPE),
    @JsonSubTypes.Type(value = SpanTracePanel.class, name = SpanTracePanel.TYPE)
})
public sealed interface PanelSpec permits WaveformPanel, MapStripPanel, ColourBarPanel, SpanTracePanel {

    /** The panel's share of its row's width (never null once constructed). */
    Double width();

    /** Whether the panel gets a letter when the figure's panels are lettered. */
    boolean lettered();

    static double share(Double width, String field) {
        return SpecChecks.within(width, 1, 0.05, 20, field, "");
    }
}
