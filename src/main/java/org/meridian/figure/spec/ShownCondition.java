package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonProperty;

/**
 * A wave shown in the figure's waveform panels: a loaded condition or a contrast written as in
 * DESIGN §6.1 (e.g. {@code rare - frequent}), the name in the legend, its colour
 * ({@code #RRGGBB}) and whether it is drawn dashed. The colour and the dash are filled in by
 * {@link FigureSpec} when left out.
 */
public record ShownCondition(@JsonProperty("wave") String wave, @JsonProperty("label") String label,
        @JsonProperty("colour") String colour, @JsonProperty("dashed") Boolean dashed) {

    public ShownCondition {
        wave = SpecChecks.required(wave, "wave");
        label = SpecChecks.text(label, wave);
        if (colour != null) {
            colour = SpecChecks.colour(colour, "colour");
        }
    }

    /** A wave with its label, colour and dash left to the defaults. */
    public static ShownCondition of(String wave) {
        return new ShownCondition(wave, null, null, null);
    }

    ShownCondition withDefaults(int index) {
        return new ShownCondition(wave, label, colour != null ? colour : ConditionPalette.colour(index),
                dashed != null ? dashed : looksLikeContrast(wave));
    }

    /** A contrast names more than one condition, e.g. {@code rare - frequent}; quotes guard names. */
    static boolean looksLikeContrast(String text) {
        boolean quoted = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\'') {
                quoted = !quoted;
            } else if (!quoted && (c == '-' || c == '+' || c == '*' || c == '/') && i > 0) {
                return true;
            }
        }
        return false;
    }
}
