package org.meridian.maps;

import org.meridian.core.Unit;
import org.meridian.spline.Quantity;

/**
 * One computed scalp map: values on a {@link MapGrid} of pixel centres (NaN where the map has no
 * colour), the {@link MapLayout} it belongs to, the unit of its values and a title (e.g.
 * {@code 350 ms}). Immutable; drawn by {@link MapRenderer}.
 */
public final class ScalpMap {
    private final MapLayout layout;
    private final MapGrid grid;
    private final float[] values;
    private final Unit unit;
    private final String title;
    private final float minimum;
    private final float maximum;

    /** Takes ownership of {@code values} (size² floats, row-major from the top-left). */
    ScalpMap(MapLayout layout, MapGrid grid, float[] values, Unit unit, String title) {
        if (values.length != grid.pointCount()) {
            throw new IllegalArgumentException("expected " + grid.pointCount() + " values, got " + values.length);
        }
        this.layout = layout;
        this.grid = grid;
        this.values = values;
        this.unit = unit;
        this.title = title == null ? "" : title;
        float lo = Float.POSITIVE_INFINITY;
        float hi = Float.NEGATIVE_INFINITY;
        for (float v : values) {
            if (!Float.isNaN(v)) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        this.minimum = lo;
        this.maximum = hi;
    }

    public MapLayout layout() {
        return layout;
    }

    public MapGrid grid() {
        return grid;
    }

    public Unit unit() {
        return unit;
    }

    /** {@code µV} or {@code CSD (µV/m²)}. */
    public String unitLabel() {
        return Quantity.label(unit);
    }

    public String title() {
        return title;
    }

    /** The value at a grid point, NaN outside the map. */
    public float value(int column, int row) {
        return values[row * grid.size() + column];
    }

    /** A copy of all values, row-major from the top-left. */
    public float[] values() {
        return values.clone();
    }

    public float minimum() {
        return minimum;
    }

    public float maximum() {
        return maximum;
    }

    /** The largest absolute value on the map (0 for an empty map). */
    public double maxAbs() {
        return Float.isInfinite(minimum) ? 0 : Math.max(Math.abs(minimum), Math.abs(maximum));
    }
}
