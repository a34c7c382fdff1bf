package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonValue;
import com.fasterxml.jackson.databind.JsonNode;
import java.util.Locale;
import org.meridian.core.BadInputException;

/**
 * A figure's width: a journal preset ({@code "one-column"}, 85 mm; {@code "two-column"}, 175 mm)
 * or a number of millimetres (20 to 500). Written back the way it was given.
 *
 * @param preset the preset's name, or null for a custom width
 */
public record FigureWidth(double mm, String preset) {
    private static final String ONE_COLUMN_NAME = "one-column";
    private static final String TWO_COLUMN_NAME = "two-column";
    public static final FigureWidth ONE_COLUMN = new FigureWidth(85, "one-column");
    public static final FigureWidth TWO_COLUMN = new FigureWidth(175, "two-column");
    static final double MIN_MM = 20;
    static final double MAX_MM = 500;

    public FigureWidth {
        if (preset != null && !preset.equals(ONE_COLUMN_NAME) && !preset.equals(TWO_COLUMN_NAME)) {
            throw new BadInputException("width_mm preset must be one-column or two-column, got \"" + preset + "\"");
        }
        if (!Double.isFinite(mm) || mm < MIN_MM || mm > MAX_MM) {
            throw new BadInputException("width_mm must be " + SpecChecks.number(MIN_MM) + " to "
                    + SpecChecks.number(MAX_MM) + " mm, got " + SpecChecks.number(mm));
        }
    }

    /** A custom width in millimetres. */
    public static FigureWidth mm(double mm) {
        return new FigureWidth(mm, null);
    }

    @JsonCreator(mode = JsonCreator.Mode.DELEGATING)
    static FigureWidth fromJson(JsonNode node) {
        if (node.isNumber()) {
            return mm(node.doubleValue());
        }
        if (node.isTextual()) {
            String name = node.textValue().trim().toLowerCase(Locale.ROOT);
            if (name.equals(ONE_COLUMN_NAME)) {
                return ONE_COLUMN;
            }
            if (name.equals(TWO_COLUMN_NAME)) {
                return TWO_COLUMN;
            }
        }
        throw new BadInputException("width_mm must be a number of mm or one-column (85 mm) or two-column (175 mm), got "
                + node);
    }

    @JsonValue
    Object toJson() {
        return preset != null ? preset : (Object) mm;
    }
}
