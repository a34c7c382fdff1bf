package org.meridian.maps;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.meridian.core.Montage;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.spline.Quantity;
import org.meridian.spline.SphericalSpline;
import org.meridian.spline.SplineParameters;
import org.meridian.spline.SplineWeights;

/**
 * Computes scalp maps of one montage at full resolution: a {@link MapGrid} of pixels over the
 * layout's region, each pixel mapped back onto the head ({@code Projection.toSphere}), and the
 * spline weights of those pixels precomputed once ({@link SplineWeights}), so that a map is one
 * matrix–vector product and a run of maps one matrix–matrix product. Pixels within 1.5 pixels
 * outside the region are computed too, so a renderer can clip the image to the exact outline
 * without fringes. Immutable and safe to share between threads.
 */
public final class MapMaker {
    private final SphericalSpline spline;
    private final Quantity quantity;
    private final MapLayout layout;
    private final MapGrid grid;
    private final int[] computed;
    private final SplineWeights weights;

    /**
     * @param resolution pixels across the map's square (e.g. 256)
     */
    public MapMaker(SphericalSpline spline, Quantity quantity, MapLayout layout, int resolution) {
        if (!spline.montage().labels().equals(layout.montage().labels())) {
            throw new IllegalArgumentException("the spline and the layout have different montages");
        }
        this.spline = spline;
        this.quantity = quantity;
        this.layout = layout;
        MapRegion region = layout.region();
        double h = region.halfWidth();
        this.grid = MapGrid.pixels(resolution, h + 2 * h / resolution);
        double fringe = 1.5 * grid.step();
        int[] inside = new int[grid.pointCount()];
        int count = 0;
        for (int row = 0; row < resolution; row++) {
            for (int col = 0; col < resolution; col++) {
                if (region.contains(grid.x(col), grid.y(row), fringe)) {
                    inside[count++] = row * resolution + col;
                }
            }
        }
        this.computed = Arrays.copyOf(inside, count);
        this.weights = spline.weightsAt(quantity, grid.unitVectors(computed));
    }

    /** Fits the spline and builds everything for maps of this montage. */
    public static MapMaker of(Montage montage, SplineParameters parameters, Quantity quantity,
            MapExtent extent, int resolution) {
        return new MapMaker(SphericalSpline.fit(montage, parameters), quantity,
                new MapLayout(montage, extent), resolution);
    }

    /**
     * The most memory the weights of a map maker take: every pixel of the resolution² grid
     * ({@link SplineWeights#bytesFor}); the pixels outside the region, not computed, make the
     * true figure about a quarter smaller.
     */
    public static long weightBytes(int resolution, int channels) {
        return SplineWeights.bytesFor((long) resolution * resolution, channels);
    }

    /** The largest resolution whose weights ({@link #weightBytes}) fit in a number of bytes. */
    public static int largestResolution(int channels, long bytes) {
        int r = (int) Math.min(Integer.MAX_VALUE, (long) Math.sqrt((double) bytes / weightBytes(1, channels)));
        while (r > 0 && weightBytes(r, channels) > bytes) {
            r--;
        }
        return r;
    }

    public SphericalSpline spline() {
        return spline;
    }

    public Quantity quantity() {
        return quantity;
    }

    public MapLayout layout() {
        return layout;
    }

    public MapGrid grid() {
        return grid;
    }

    /** One map from one value per montage channel, in montage order. */
    public ScalpMap map(double[] values, Unit dataUnit, String title) {
        Unit unit = quantity.outputUnit(dataUnit);
        float[] out = new float[computed.length];
        weights.apply(values, out);
        return new ScalpMap(layout, grid, scatter(out), unit, title);
    }

    /** Many maps at once (one matrix–matrix product); {@code frames[f]} in montage order. */
    public List<ScalpMap> maps(double[][] frames, Unit dataUnit, List<String> titles) {
        if (titles.size() != frames.length) {
            throw new IllegalArgumentException(frames.length + " maps but " + titles.size() + " titles");
        }
        Unit unit = quantity.outputUnit(dataUnit);
        float[][] out = new float[frames.length][computed.length];
        weights.applyAll(frames, out);
        List<ScalpMap> maps = new ArrayList<>(frames.length);
        for (int f = 0; f < frames.length; f++) {
            maps.add(new ScalpMap(layout, grid, scatter(out[f]), unit, titles.get(f)));
        }
        return maps;
    }

    /** Maps of waveforms at the given moments (times or window means), labelled by the moments. */
    public List<ScalpMap> maps(Waveforms waveforms, List<MapMoment> moments) {
        int[] rows = spline.rowsIn(waveforms);
        double[][] frames = new double[moments.size()][];
        List<String> titles = new ArrayList<>(moments.size());
        for (int i = 0; i < frames.length; i++) {
            frames[i] = moments.get(i).valuesOf(waveforms, rows);
            titles.add(moments.get(i).label());
        }
        return maps(frames, waveforms.unit(), titles);
    }

    private float[] scatter(float[] inside) {
        float[] full = new float[grid.pointCount()];
        Arrays.fill(full, Float.NaN);
        for (int k = 0; k < computed.length; k++) {
            full[computed[k]] = inside[k];
        }
        return full;
    }
}
