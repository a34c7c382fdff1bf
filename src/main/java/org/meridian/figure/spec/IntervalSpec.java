package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonProperty;

/** The interval bands: their kind and confidence level (default 0.95), and how opaque the band is. */
public record IntervalSpec(@JsonProperty("kind") IntervalKind kind, @JsonProperty("level") Double level,
        @JsonProperty("opacity") Double opacity) {

    public IntervalSpec {
        kind = kind == null ? IntervalKind.WITHIN_PARTICIPANTS : kind;
        level = SpecChecks.within(level, 0.95, 0.5, 0.999, "intervals.level", "");
        opacity = SpecChecks.within(opacity, 0.2, 0.05, 1, "intervals.opacity", "");
    }

    public static IntervalSpec defaults() {
        return new IntervalSpec(null, null, null);
    }
}
