package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;
import org.meridian.core.BadInputException;

/**
 * A row of panels, left to right. Its height is {@code height_mm} when given; otherwise the
 * layout gives it its natural height (see {@code figure.FigureLayout}). When the figure's own
 * height is given, all rows are scaled to fill it.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record PanelRow(@JsonProperty("height_mm") Double heightMm, @JsonProperty("panels") List<PanelSpec> panels) {

    public PanelRow {
        if (heightMm != null) {
            SpecChecks.within(heightMm, 0, 5, FigureSize.MAX_HEIGHT_MM, "height_mm", "mm");
        }
        if (panels == null || panels.isEmpty()) {
            throw new BadInputException("a row needs at least one panel");
        }
        panels = List.copyOf(panels);
    }

    public static PanelRow of(PanelSpec... panels) {
        return new PanelRow(null, List.of(panels));
    }
}
