package org.meridian.maps;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.montage.StandardSystem;
import org.meridian.spline.Quantity;
import org.meridian.spline.SphericalSpline;
import org.meridian.spline.SplineKernel;
import org.meridian.spline.SplineParameters;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Speed of map making (targets in DESIGN §5 and the maps issue):
 * <ul>
 *   <li>{@code setup256Channels}: fitting the spline to 256 channels and preparing a 256 × 256
 *       live map (the {@link MapRaster}: weights at the 80 × 80 coarse nodes, the display's
 *       interpolation cells and region runs) (target ≤ 50 ms);
 *   <li>{@code setup256ChannelsExactGrid}: the same fit with weights at every pixel of a
 *       256 × 256 grid, as exports use ({@link MapMaker});
 *   <li>{@code frame128ChannelsRaster}: one 256 × 256 display frame for 128 channels by the fast
 *       path, an 80 × 80 coarse grid upsampled bilinearly and coloured (target ≤ 1 ms);
 *   <li>{@code frame128ChannelsExact}: the same frame from precomputed weights at every pixel;
 *   <li>{@code frame128ChannelsDirectSeries}: the same frame summing the Legendre series of g
 *       per pixel and channel with no precomputation, the baseline for the ratios.
 * </ul>
 * Run: {@code mvn -q -Pbench test-compile exec:exec -Dbench=MapBench -Djmh.args="-f 1 -wi 2 -i 3"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3)
@Measurement(iterations = 5)
public class MapBench {
    private static final int DISPLAY = 256;

    private Montage channels256;
    private Montage channels128;
    private SphericalSpline spline128;
    private MapRaster raster128;
    private MapMaker exact128;
    private double[] values128;
    private int[] argb;
    private int[] colourTable;
    private ColourLimits limits;
    private double[][] pixelVectors;
    private SplineKernel kernel;

    /** n positions spread evenly over the 10-5 list (front to back, left to right). */
    static Montage evenlyChosen(int n) {
        List<Electrode> all = StandardSystem.TEN_FIVE.montage().electrodes();
        List<Electrode> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            out.add(all.get((int) ((long) i * all.size() / n)));
        }
        return new Montage(out, n + " of the 10-5 positions");
    }

    @Setup
    public void setUp() {
        channels256 = evenlyChosen(256);
        channels128 = evenlyChosen(128);
        spline128 = SphericalSpline.fit(channels128, SplineParameters.defaults());
        MapLayout layout = new MapLayout(channels128, MapExtent.electrodes());
        raster128 = new MapRaster(spline128, Quantity.POTENTIAL, layout, DISPLAY, 80);
        exact128 = new MapMaker(spline128, Quantity.POTENTIAL, layout, DISPLAY);
        Random random = new Random(1);
        values128 = new double[128];
        for (int i = 0; i < values128.length; i++) {
            values128[i] = 5 * random.nextGaussian();
        }
        argb = new int[DISPLAY * DISPLAY];
        colourTable = ColourScales.DIVERGING.argbTable(1024);
        limits = ColourLimits.symmetric(10);
        MapGrid grid = exact128.grid();
        List<double[]> inside = new ArrayList<>();
        for (int row = 0; row < DISPLAY; row++) {
            for (int col = 0; col < DISPLAY; col++) {
                if (layout.region().contains(grid.x(col), grid.y(row))) {
                    inside.add(org.meridian.montage.Projection.toSphere(grid.x(col), grid.y(row)));
                }
            }
        }
        pixelVectors = inside.toArray(new double[0][]);
        kernel = new SplineKernel(4, 50);
    }

    @Benchmark
    public MapRaster setup256Channels() {
        SphericalSpline spline = SphericalSpline.fit(channels256, SplineParameters.defaults());
        return new MapRaster(spline, Quantity.POTENTIAL, new MapLayout(channels256, MapExtent.electrodes()), DISPLAY, 80);
    }

    @Benchmark
    public MapMaker setup256ChannelsExactGrid() {
        return MapMaker.of(channels256, SplineParameters.defaults(), Quantity.POTENTIAL, MapExtent.electrodes(), DISPLAY);
    }

    @Benchmark
    public int[] frame128ChannelsRaster() {
        raster128.render(values128, limits, colourTable, argb);
        return argb;
    }

    @Benchmark
    public ScalpMap frame128ChannelsExact() {
        return exact128.map(values128, org.meridian.core.Unit.MICROVOLT, "");
    }

    @Benchmark
    public float[] frame128ChannelsDirectSeries() {
        double[] c = spline128.coefficients(values128);
        List<Electrode> es = channels128.electrodes();
        float[] out = new float[pixelVectors.length];
        for (int p = 0; p < pixelVectors.length; p++) {
            double[] r = pixelVectors[p];
            double sum = c[es.size()];
            for (int j = 0; j < es.size(); j++) {
                Electrode e = es.get(j);
                sum += c[j] * kernel.g(r[0] * e.x() + r[1] * e.y() + r[2] * e.z());
            }
            out[p] = (float) sum;
        }
        return out;
    }
}
