package org.meridian.spline;

import org.meridian.core.BadInputException;
import org.meridian.core.Unit;

/**
 * What a spline evaluation yields at a point of the scalp.
 *
 * <ul>
 *   <li>{@link #POTENTIAL}: the interpolated value itself, c₀ + Σ c<sub>j</sub> g<sub>m</sub>(r·r<sub>j</sub>),
 *       in the unit of the data (µV for potentials; CSD data interpolated as it is stays in µV/m²).
 *   <li>{@link #CSD}: the current source density estimate CSD = −∇²V in µV/m², with
 *       ∇²V = Σ c<sub>j</sub> h<sub>m</sub>(r·r<sub>j</sub>) / R² the surface Laplacian of the
 *       spline on a sphere of radius R (Perrin et al., 1989). Sources are positive, so a positive
 *       potential maximum keeps its sign. The sign itself is applied in one place only,
 *       {@code SphericalSpline.kernelFactor}.
 * </ul>
 */
public enum Quantity {
    POTENTIAL,
    CSD;

    /**
     * The unit of this quantity computed from data in {@code dataUnit}.
     *
     * @throws BadInputException for the CSD of data that already is CSD
     */
    public Unit outputUnit(Unit dataUnit) {
        if (this == POTENTIAL) {
            return dataUnit;
        }
        if (dataUnit != Unit.MICROVOLT) {
            throw new BadInputException("the data is already CSD (" + dataUnit.symbol()
                    + "); its CSD cannot be taken again");
        }
        return Unit.MICROVOLT_PER_SQUARE_METRE;
    }

    /**
     * The label every map, colour bar and table uses for values in a unit: {@code µV}, or
     * {@code CSD (µV/m²)}.
     */
    public static String label(Unit unit) {
        return unit == Unit.MICROVOLT_PER_SQUARE_METRE ? "CSD (" + unit.symbol() + ")" : unit.symbol();
    }
}
