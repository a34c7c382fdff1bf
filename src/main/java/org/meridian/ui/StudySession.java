package org.meridian.ui;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;
import org.meridian.maps.MapExtent;
import org.meridian.maps.MapLayout;
import org.meridian.maps.MapMaker;
import org.meridian.maps.MapRaster;
import org.meridian.signal.ConditionExpression;
import org.meridian.signal.ConditionWave;
import org.meridian.span.SpanAnalysis;
import org.meridian.spline.Quantity;
import org.meridian.spline.SphericalSpline;
import org.meridian.spline.SplineParameters;
import org.meridian.spline.SurfaceLaplacian;

/**
 * An opened study with everything that depends on it alone, built once off the event thread:
 * the loaded conditions as waves, the scalp field's channels (the positioned ones), the spherical
 * spline fitted to their positions and the surface Laplacian it gives ({@link SurfaceLaplacian}),
 * and the map layout. Immutable; {@link #hasMaps()} is false when fewer than four channels have a position,
 * and then the map, strip and CSD stay empty with a note saying why.
 */
public final class StudySession {
    /**
     * Pixels across the live map's grid: Java2D upsamples it bilinearly to the panel (DESIGN §5
     * allows a coarse grid upsampled smoothly), which keeps a frame to about a millisecond.
     */
    public static final int LIVE_RESOLUTION = 128;

    private final Study study;
    private final Path source;
    private final String title;
    private final List<ConditionWave> conditions;
    private final List<String> fieldChannels;
    private final SphericalSpline spline;
    private final MapLayout layout;
    private final SurfaceLaplacian csd;
    private final Map<String, MapMaker> makers = new ConcurrentHashMap<>();
    private final Map<String, MapRaster> rasters = new java.util.LinkedHashMap<>(8, 0.75f, true);

    private StudySession(Study study, Path source, String title) {
        this.study = study;
        this.source = source;
        this.title = title;
        List<ConditionWave> c = new ArrayList<>();
        for (String name : study.conditions()) {
            c.add(ConditionExpression.condition(name));
        }
        this.conditions = List.copyOf(c);
        this.fieldChannels = List.copyOf(SpanAnalysis.fieldChannels(study));
        if (study.montage().size() >= SphericalSpline.MIN_CHANNELS) {
            this.csd = new SurfaceLaplacian(study.montage(), SplineParameters.defaults());
            this.spline = csd.spline();
            this.layout = new MapLayout(spline.montage(), MapExtent.electrodes());
        } else {
            this.spline = null;
            this.layout = null;
            this.csd = null;
        }
    }

    /** Builds a session (fits the spline): call off the event thread. */
    public static StudySession of(Study study, Path source, String title) {
        return new StudySession(study, source, title);
    }

    public Study study() {
        return study;
    }

    /** The file or folder it was opened from; empty for the simulated demo. */
    public Optional<Path> source() {
        return Optional.ofNullable(source);
    }

    /** The name in the title bar. */
    public String title() {
        return title;
    }

    /** The loaded conditions, in the study's order. */
    public List<ConditionWave> conditions() {
        return conditions;
    }

    /** The channels of the scalp field: the positioned ones, or all when none has a position. */
    public List<String> fieldChannels() {
        return fieldChannels;
    }

    public boolean hasMaps() {
        return spline != null;
    }

    /** Whether the CSD can be shown: maps exist and the data is a potential, not CSD already. */
    public boolean hasCsd() {
        return csd != null && study.unit() == org.meridian.core.Unit.MICROVOLT;
    }

    /** Why there are no maps, for the empty map panel. */
    public String whyNoMaps() {
        return study.montage().size() + " of " + study.channelLabels().size()
                + " channels have a position; a scalp map needs at least " + SphericalSpline.MIN_CHANNELS;
    }

    /** The spline over the positioned channels (present when {@link #hasMaps()}). */
    public SphericalSpline spline() {
        return spline;
    }

    public MapLayout layout() {
        return layout;
    }

    /**
     * Map weights of a quantity at a resolution (pixels across the map's square), built on first
     * use and kept: the live map and the map strip use {@link #LIVE_RESOLUTION}. The first call may take tens of milliseconds:
     * make it off the event thread ({@link #warmUp}).
     */
    public MapMaker maker(Quantity quantity, int resolution) {
        if (layout == null) {
            throw new IllegalStateException(whyNoMaps());
        }
        return makers.computeIfAbsent(quantity + "@" + resolution,
                k -> new MapMaker(spline, quantity, layout, resolution));
    }

    /** Nodes across the live map's coarse grid (the maps package's recommendation, 64–96). */
    public static final int COARSE_NODES = 80;

    /**
     * The live map's raster for a display of {@code pixels} across, built on first use (tens of
     * milliseconds: call off the event thread) and kept with the few last used.
     */
    public MapRaster raster(Quantity quantity, int pixels) {
        String key = quantity + "@" + pixels;
        synchronized (rasters) {
            MapRaster r = rasters.get(key);
            if (r != null) {
                return r;
            }
        }
        MapRaster built = new MapRaster(spline, quantity, layout, pixels, COARSE_NODES);
        synchronized (rasters) {
            rasters.put(key, built);
            while (rasters.size() > 4) {
                rasters.remove(rasters.keySet().iterator().next());
            }
        }
        return built;
    }

    /** The raster when it is built already, else null (never builds: safe on the event thread). */
    public MapRaster rasterIfBuilt(Quantity quantity, int pixels) {
        synchronized (rasters) {
            return rasters.get(quantity + "@" + pixels);
        }
    }

    /** Builds the map weights the window needs at once; call off the event thread. */
    public void warmUp() {
        warmUpAsync().join();
    }

    /**
     * Starts building the map weights the window needs (potential and CSD) on the common pool and
     * returns at once, so that the caller can compute averages meanwhile; join the result.
     */
    public CompletableFuture<Void> warmUpAsync() {
        if (layout == null) {
            return CompletableFuture.completedFuture(null);
        }
        CompletableFuture<?> potential = CompletableFuture.runAsync(() -> maker(Quantity.POTENTIAL, LIVE_RESOLUTION));
        CompletableFuture<?> csdWeights = hasCsd()
                ? CompletableFuture.runAsync(() -> maker(Quantity.CSD, LIVE_RESOLUTION))
                : CompletableFuture.completedFuture(null);
        return CompletableFuture.allOf(potential, csdWeights);
    }

    /**
     * The CSD of the positioned channels of a set of waveforms, as waveforms of those channels
     * in µV/m² (the surface Laplacian at the electrodes, DESIGN §5).
     */
    public Waveforms csdOf(Waveforms potential) {
        if (csd == null) {
            throw new IllegalStateException(whyNoMaps());
        }
        return csd.of(potential);
    }
}
