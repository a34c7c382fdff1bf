package org.meridian.maps;

import org.meridian.montage.Projection;

/**
 * A square grid of points in the projected plane, {@code size} × {@code size}, row 0 at the top
 * (the nose side, +y) and column 0 at the left (−x). Point (column i, row j) lies at
 * x = x₀ + i·step, y = −x₀ − j·step with x₀ = −halfWidth + offset. Two arrangements:
 * {@link #pixels} puts the points at the centres of size² square pixels tiling the square
 * [−h, h]² (an image); {@link #nodes} puts them on its corners and edges (for interpolation).
 * Immutable.
 */
public final class MapGrid {
    private final int size;
    private final double halfWidth;
    private final double first;
    private final double step;

    private MapGrid(int size, double halfWidth, double first, double step) {
        if (size < 2) {
            throw new IllegalArgumentException("a map grid needs at least 2 × 2 points, got " + size);
        }
        this.size = size;
        this.halfWidth = halfWidth;
        this.first = first;
        this.step = step;
    }

    /** Pixel centres of a size × size image of the square [−h, h]². */
    public static MapGrid pixels(int size, double halfWidth) {
        double step = 2 * halfWidth / size;
        return new MapGrid(size, halfWidth, -halfWidth + step / 2, step);
    }

    /** size × size nodes spanning [−h, h]², the outer ones on the square's edges. */
    public static MapGrid nodes(int size, double halfWidth) {
        return new MapGrid(size, halfWidth, -halfWidth, 2 * halfWidth / (size - 1));
    }

    public int size() {
        return size;
    }

    public int pointCount() {
        return size * size;
    }

    public double halfWidth() {
        return halfWidth;
    }

    public double step() {
        return step;
    }

    public double x(int column) {
        return first + column * step;
    }

    public double y(int row) {
        return -first - row * step;
    }

    /** The fractional column of a plane x (0 at the first column). */
    public double column(double x) {
        return (x - first) / step;
    }

    /** The fractional row of a plane y (0 at the first row). */
    public double row(double y) {
        return (-first - y) / step;
    }

    /** The unit vectors {x, y, z} on the head of the given points (index = row · size + column). */
    public double[][] unitVectors(int[] points) {
        double[][] out = new double[points.length][];
        for (int k = 0; k < points.length; k++) {
            int p = points[k];
            out[k] = Projection.toSphere(x(p % size), y(p / size));
        }
        return out;
    }
}
