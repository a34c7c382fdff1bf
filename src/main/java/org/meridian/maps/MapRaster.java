package org.meridian.maps;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.util.Arrays;
import org.meridian.core.Unit;
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
    private final Quantity quantity;
    private final int size;
    private final MapGrid display;
    private final MapGrid coarse;
    private final int span;
    private final int[] nodes;
    private final SplineWeights weights;
    /** Per display column: the coarse column left of it and the fraction toward the next. */
    private final int[] columnCell;
    private final float[] columnFraction;
    /** Per display row: the coarse row above it and the fraction toward the next. */
    private final int[] rowCell;
    private final float[] rowFraction;
    /** Per display row: runs of map pixels as [first, end) column pairs. */
    private final int[][] runs;

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
        this.quantity = quantity;
        this.size = displaySize;
        double h = layout.viewHalfWidth();
        this.display = MapGrid.pixels(displaySize, h);
        this.coarse = MapGrid.nodes(coarseSize, h);
        this.span = coarseSize;
        this.columnCell = new int[displaySize];
        this.columnFraction = new float[displaySize];
        this.rowCell = new int[displaySize];
        this.rowFraction = new float[displaySize];
        for (int i = 0; i < displaySize; i++) {
            double c = coarse.column(display.x(i));
            int c0 = Math.max(0, Math.min(coarseSize - 2, (int) Math.floor(c)));
            columnCell[i] = c0;
            columnFraction[i] = (float) (c - c0);
            double r = coarse.row(display.y(i));
            int r0 = Math.max(0, Math.min(coarseSize - 2, (int) Math.floor(r)));
            rowCell[i] = r0;
            rowFraction[i] = (float) (r - r0);
        }
        MapRegion region = layout.region();
        boolean[] needed = new boolean[coarseSize * coarseSize];
        this.runs = new int[displaySize][];
        int[] buffer = new int[displaySize + 2];
        for (int row = 0; row < displaySize; row++) {
            int count = 0;
            boolean open = false;
            for (int col = 0; col < displaySize; col++) {
                boolean in = region.contains(display.x(col), display.y(row));
                if (in) {
                    int base = rowCell[row] * coarseSize + columnCell[col];
                    needed[base] = true;
                    needed[base + 1] = true;
                    needed[base + coarseSize] = true;
                    needed[base + coarseSize + 1] = true;
                }
                if (in != open) {
                    buffer[count++] = col;
                    open = in;
                }
            }
            if (open) {
                buffer[count++] = displaySize;
            }
            runs[row] = Arrays.copyOf(buffer, count);
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

    /**
     * A new ARGB image of the display whose pixels are the array {@link #render(double[],
     * ColourLimits, int[], BufferedImage)} writes, so a frame needs no copy; draw it with
     * {@link MapRenderer#drawImage} and {@link #displayGrid()}.
     */
    public BufferedImage newImage() {
        return new BufferedImage(size, size, BufferedImage.TYPE_INT_ARGB);
    }

    /** Renders straight into an image from {@link #newImage()}. */
    public void render(double[] channelValues, ColourLimits limits, int[] colourTable, BufferedImage image) {
        int[] pixels = ((DataBufferInt) image.getRaster().getDataBuffer()).getData();
        render(channelValues, limits, colourTable, pixels);
    }

    /**
     * The coarse grid's values as a map (NaN at nodes the display does not need), for contour
     * lines over the display image; {@code dataUnit} is the unit of the channel values.
     */
    public ScalpMap coarseMap(double[] channelValues, Unit dataUnit) {
        float[] grid = coarseValues(channelValues);
        float[] values = new float[grid.length];
        Arrays.fill(values, Float.NaN);
        for (int node : nodes) {
            values[node] = grid[node];
        }
        return new ScalpMap(layout, coarse, values, quantity.outputUnit(dataUnit), "");
    }

    /** How many coarse nodes are evaluated per frame. */
    public int nodeCount() {
        return nodes.length;
    }

    /** The upsampled values at every display pixel (NaN outside the map), size² floats. */
    public void values(double[] channelValues, float[] out) {
        float[] grid = coarseValues(channelValues);
        Arrays.fill(out, 0, size * size, Float.NaN);
        for (int row = 0; row < size; row++) {
            int[] r = runs[row];
            int top = rowCell[row] * span;
            float w = rowFraction[row];
            for (int k = 0; k < r.length; k += 2) {
                for (int col = r[k]; col < r[k + 1]; col++) {
                    out[row * size + col] = interpolate(grid, top + columnCell[col], columnFraction[col], w);
                }
            }
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
        // colour index of v: ColourLimits.position(v) · (entries − 1), clamped to the limits'
        float half = (float) limits.halfRange();
        float scale = (float) ((colourTable.length - 1) / (2 * limits.halfRange()));
        int first = (int) Math.round(limits.position(limits.lower()) * (colourTable.length - 1));
        int last = (int) Math.round(limits.position(limits.upper()) * (colourTable.length - 1));
        for (int row = 0; row < size; row++) {
            int[] r = runs[row];
            int top = rowCell[row] * span;
            float w = rowFraction[row];
            int offset = row * size;
            for (int k = 0; k < r.length; k += 2) {
                for (int col = r[k]; col < r[k + 1]; col++) {
                    float v = interpolate(grid, top + columnCell[col], columnFraction[col], w);
                    int i = (int) ((v + half) * scale + 0.5f);
                    argb[offset + col] = colourTable[i < first ? first : (i > last ? last : i)];
                }
            }
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

    private float interpolate(float[] grid, int b, float u, float w) {
        float top = grid[b] + u * (grid[b + 1] - grid[b]);
        float bottom = grid[b + span] + u * (grid[b + span + 1] - grid[b + span]);
        return top + w * (bottom - top);
    }
}
