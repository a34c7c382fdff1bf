package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonProperty;
import org.meridian.spline.Quantity;

/** What the maps show: the spline-interpolated potential, or the CSD (DESIGN §5). */
public enum MapQuantity {
    @JsonProperty("potential") POTENTIAL(Quantity.POTENTIAL),
    @JsonProperty("csd") CSD(Quantity.CSD);

    private final Quantity quantity;

    MapQuantity(Quantity quantity) {
        this.quantity = quantity;
    }

    public Quantity quantity() {
        return quantity;
    }
}
