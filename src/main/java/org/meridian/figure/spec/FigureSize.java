package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import org.meridian.core.BadInputException;

/**
 * The figure's overall size. The width is a journal preset or custom; the height, when left
 * out, is the sum of the rows' natural heights (see {@code figure.FigureLayout}).
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record FigureSize(@JsonProperty("width_mm") FigureWidth width, @JsonProperty("height_mm") Double heightMm) {
    static final double MAX_HEIGHT_MM = 700;

    public FigureSize {
        if (width == null) {
            width = FigureWidth.TWO_COLUMN;
        }
        if (heightMm != null && (!Double.isFinite(heightMm) || heightMm < 10 || heightMm > MAX_HEIGHT_MM)) {
            throw new BadInputException("height_mm must be 10 to " + SpecChecks.number(MAX_HEIGHT_MM)
                    + " mm, got " + SpecChecks.number(heightMm));
        }
    }

    public static FigureSize defaults() {
        return new FigureSize(null, null);
    }
}
