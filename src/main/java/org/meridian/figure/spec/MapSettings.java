package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import org.meridian.core.BadInputException;
import org.meridian.maps.ColourScales;
import org.meridian.maps.MapExtent;

/**
 * What every map strip of a figure shares, so that one colour bar serves them all: the quantity
 * ({@code potential} or {@code csd}), the colour scale (default {@code diverging}, or the
 * colour-blind-safe {@code blue-yellow}), the colour limit ±{@code limit} (default: rounded to
 * cover every map), how far the colour reaches ({@code electrodes}, {@code electrodes:MARGIN} or
 * {@code head}), contour lines, electrode markers, and pixels across each map.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record MapSettings(@JsonProperty("quantity") MapQuantity quantity,
        @JsonProperty("colour_scale") String colourScale,
        @JsonProperty("limit") Double limit,
        @JsonProperty("extent") String extent,
        @JsonProperty("contours") Boolean contours,
        @JsonProperty("markers") Boolean markers,
        @JsonProperty("resolution") Integer resolution) {

    public MapSettings {
        quantity = quantity == null ? MapQuantity.POTENTIAL : quantity;
        colourScale = ColourScales.byName(SpecChecks.text(colourScale, ColourScales.DIVERGING.name())).name();
        if (limit != null && (!(limit > 0) || !Double.isFinite(limit))) {
            throw new BadInputException("maps.limit must be a positive number (the scale runs from −limit to +limit), got "
                    + limit);
        }
        extent = SpecChecks.text(extent, "electrodes");
        MapExtent.parse(extent);
        contours = contours == null || contours;
        markers = markers == null || markers;
        resolution = resolution == null ? 256 : resolution;
        if (resolution < 32 || resolution > 1024) {
            throw new BadInputException("maps.resolution must be 32 to 1024 pixels, got " + resolution);
        }
    }

    public static MapSettings defaults() {
        return new MapSettings(null, null, null, null, null, null, null);
    }
}
