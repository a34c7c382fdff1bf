package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonProperty;

/**
 * Line widths in points: waves (default 1 pt), axes and ticks (0.5 pt), the zero lines (0.5 pt).
 * Nothing thinner than 0.25 pt is accepted: thinner lines vanish in print.
 */
public record LineWidths(@JsonProperty("wave_pt") Double wavePt, @JsonProperty("axis_pt") Double axisPt,
        @JsonProperty("zero_pt") Double zeroPt) {

    public LineWidths {
        wavePt = SpecChecks.within(wavePt, 1.0, 0.25, 6, "lines.wave_pt", "pt");
        axisPt = SpecChecks.within(axisPt, 0.5, 0.25, 4, "lines.axis_pt", "pt");
        zeroPt = SpecChecks.within(zeroPt, 0.5, 0.25, 4, "lines.zero_pt", "pt");
    }

    public static LineWidths defaults() {
        return new LineWidths(null, null, null);
    }
}
