package org.meridian.ui;

import org.meridian.spline.Quantity;

/**
 * What the scalp map and the span view show: the interpolated potential, or the current source
 * density estimate CSD = −∇²V of the surface Laplacian (DESIGN §5), in µV/m².
 */
public enum MapQuantity {
    POTENTIAL("Potential", "µV"),
    CSD("CSD", "CSD (µV/m²)");

    private final String word;
    private final String unitLabel;

    MapQuantity(String word, String unitLabel) {
        this.word = word;
        this.unitLabel = unitLabel;
    }

    /** The word on the toggle: {@code Potential} or {@code CSD}. */
    public String word() {
        return word;
    }

    /** The label of values in this quantity: {@code µV} or {@code CSD (µV/m²)}. */
    public String unitLabel() {
        return unitLabel;
    }

    /** The spline's quantity behind this choice. */
    public Quantity quantity() {
        return this == POTENTIAL ? Quantity.POTENTIAL : Quantity.CSD;
    }

    public MapQuantity other() {
        return this == POTENTIAL ? CSD : POTENTIAL;
    }
}
