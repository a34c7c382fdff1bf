package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonProperty;
import org.meridian.figure.FigureFonts;

/**
 * Fonts: one family; tick labels, legends and map times at {@code size_pt} (default 7 pt), axis
 * labels and panel titles at {@code label_pt} (8 pt), panel letters in bold at
 * {@code letter_pt} (9 pt) — within the 7–9 pt most journals ask for at print size.
 */
public record Typography(@JsonProperty("family") String family, @JsonProperty("size_pt") Double sizePt,
        @JsonProperty("label_pt") Double labelPt, @JsonProperty("letter_pt") Double letterPt) {

    public Typography {
        family = SpecChecks.text(family, FigureFonts.DEFAULT_FAMILY);
        FigureFonts.requireAvailable(family);
        sizePt = SpecChecks.within(sizePt, 7, 4, 24, "font.size_pt", "pt");
        labelPt = SpecChecks.within(labelPt, 8, 4, 24, "font.label_pt", "pt");
        letterPt = SpecChecks.within(letterPt, 9, 4, 36, "font.letter_pt", "pt");
    }

    public static Typography defaults() {
        return new Typography(null, null, null, null);
    }
}
