package org.meridian.maps;

import java.util.Arrays;
import org.meridian.spline.Quantity;
import org.meridian.spline.SphericalSpline;
import org.meridian.spline.SplineWeights;

/**
 * The fast path for a live map: fills an ARGB pixel array of a square display, size × size
 * pixels covering the layout's view square ({@link MapLayout#viewHalfWidth}, the same square
 * {@link MapRenderer} fills), from one value per channel.
 *
 * <p>The spline is evaluated exactly on a coarse grid of nodes (e.g. 80 × 80, only the nodes the
 * map needs) by one matrix–vector product, then upsampled bilinearly to the display: the node
 * cell and weights of every display pixel are precomputed. DESIGN §5 allows this when the error
 * against the exact spline at display resolution stays within 0.5 % of the map's range;
 * {@code MapRasterTest} checks it. Pixels outside the map's region are left transparent (0).
 * Immutable apart from the arrays the caller passes in; safe to share between threads.
 */
public final class MapRaster {
    private final MapLayout layout;
    private final int size;
    private final MapGrid display;
    private final MapGrid coarse;
    private final int[] nodes;
    private final SplineWeights weights;
    private final int[] pixels;
    private final int[] cell;
    private final float[] fx;
    private final float[] fy;
    private final int span;

    /**
     * @param displaySize pixels across the display square
     * @param coarseSize  nodes across the coarse grid (64–96 recommended)
     */
    public MapRaster(SphericalSpline spline, Quantity quantity, MapLayout layout, int displaySize, int coarseSize) {
        if (displaySize < 8 || coarseSize < 4) {
            throw new IllegalArgumentException("display needs ≥ 8 pixels and the coarse grid ≥ 4 nodes, got "
                    + displaySize + " and " + coarseSize);
        }
        this.layout = layout;
        this.size = displaySize;
        double h = layout.viewHalfWidth();
        this.display = MapGrid.pixels(displaySize, h);
        this.coarse = MapGrid.nodes(coarseSize, h);
        this.span = coarseSize;
        MapRegion region = layout.region();
        int[] inside = new int[displaySize * displaySize];
        int count = 0;
        for (int row = 0; row < displaySize; row++) {
            for (int col = 0; col < displaySize; col++) {
                if (region.contains(display.x(col), display.y(row))) {
                    inside[count++] = row * displaySize + col;
                }
            }
        }
        this.pixels = Arrays.copyOf(inside, count);
        this.cell = new int[count];
        this.fx = new float[count];
        this.fy = new float[count];
        boolean[] needed = new boolean[coarseSize * coarseSize];
        for (int k = 0; k < count; k++) {
            int p = pixels[k];
            double c = coarse.column(display.x(p % displaySize));
            double r = coarse.row(display.y(p / displaySize));
            int c0 = Math.max(0, Math.min(coarseSize - 2, (int) Math.floor(c)));
            int r0 = Math.max(0, Math.min(coarseSize - 2, (int) Math.floor(r)));
            fx[k] = (float) (c - c0);
            fy[k] = (float) (r - r0);
            int base = r0 * coarseSize + c0;
            cell[k] = base;
            needed[base] = true;
            needed[base + 1] = true;
            needed[base + coarseSize] = true;
            needed[base + coarseSize + 1] = true;
        }
        int n = 0;
        int[] list = new int[needed.length];
        for (int i = 0; i < needed.length; i++) {
            if (needed[i]) {
                list[n++] = i;
            }
        }
        this.nodes = Arrays.copyOf(list, n);
        this.weights = spline.weightsAt(quantity, coarse.unitVectors(nodes));
    }

    public MapLayout layout() {
        return layout;
    }

    /** Pixels across (and down) the display square. */
    public int size() {
        return size;
    }

    /** The display's pixel grid (pixel centres in plane units). */
    public MapGrid displayGrid() {
        return display;
    }

    /** How many coarse nodes are evaluated per frame. */
    public int nodeCount() {
        return nodes.length;
    }

    /** The upsampled values at every display pixel (NaN outside the map), size² floats. */
    public void values(double[] channelValues, float[] out) {
        float[] grid = coarseValues(channelValues);
        Arrays.fill(out, Float.NaN);
        for (int k = 0; k < pixels.length; k++) {
            out[pixels[k]] = interpolate(grid, k);
        }
    }

    /**
     * Colours the display: {@code argb[p]} for every pixel, from a colour table such as
     * {@link ColourScale#argbTable}; pixels outside the map become 0 (transparent).
     */
    public void render(double[] channelValues, ColourLimits limits, int[] colourTable, int[] argb) {
        if (argb.length < size * size) {
            throw new IllegalArgumentException("need " + size * size + " pixels, got " + argb.length);
        }
        float[] grid = coarseValues(channelValues);
        Arrays.fill(argb, 0, size * size, 0);
        float lower = (float) limits.lower();
        float scale = (float) ((colourTable.length - 1) / (limits.upper() - limits.lower()));
        int last = colourTable.length - 1;
        for (int k = 0; k < pixels.length; k++) {
            float v = interpolate(grid, k);
            int i = (int) ((v - lower) * scale + 0.5f);
            argb[pixels[k]] = colourTable[i < 0 ? 0 : (i > last ? last : i)];
        }
    }

    private float[] coarseValues(double[] channelValues) {
        float[] atNodes = weights.apply(channelValues);
        float[] grid = new float[span * span];
        for (int i = 0; i < nodes.length; i++) {
            grid[nodes[i]] = atNodes[i];
        }
        return grid;
    }

    private float interpolate(float[] grid, int k) {
        int b = cell[k];
        float u = fx[k];
        float w = fy[k];
        float top = grid[b] + u * (grid[b + 1] - grid[b]);
        float bottom = grid[b + span] + u * (grid[b + span + 1] - grid[b + span]);
        return top + w * (bottom - top);
    }
}
