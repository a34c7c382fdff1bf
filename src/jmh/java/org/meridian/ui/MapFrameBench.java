package org.meridian.ui;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.maps.MapMoment;
import org.meridian.maps.MapStyle;
import org.meridian.maps.ScalpMap;
import org.meridian.montage.StandardSystem;
import org.meridian.spline.Quantity;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * The scalp map's repaint path while scrubbing: one operation is one step of the time cursor
 * across 500 samples of a 128-channel grand average, painted offscreen exactly as
 * {@code ScalpMapPanel} paints a frame — the moment's values, then {@link LiveMap#paint}: the
 * raster of the map's square in device pixels (coarse grid of {@value StudySession#COARSE_NODES}
 * nodes upsampled), the contour lines, head, electrodes and the colour bar — into a panel of
 * 440 × 360 pixels at scale 1 and at scale 2 (a HiDPI screen: four times the pixels). Without
 * contour lines is the frame drawn while scrubbing; with them, the frame once the cursor rests.
 * Frames per second = 1000 / (ms per operation); the target is ≥ 60.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class MapFrameBench {
    private static final int CHANNELS = 128;
    private static final int SAMPLES = 500;
    private static final int WIDTH = 440;
    private static final int HEIGHT = 360;

    @Param({"1", "2"})
    public int scale;

    @Param({"POTENTIAL", "CSD"})
    public Quantity quantity;

    /** Contour lines: left out while the cursor moves fast, drawn when it rests. */
    @Param({"false", "true"})
    public boolean contours;

    private LiveMap live;
    private Rectangle2D bounds;
    private int[] rows;
    private Waveforms grand;
    private MapStyle style;
    private org.meridian.maps.ColourLimits limits;
    private BufferedImage screen;
    private Graphics2D g;
    private int sample;

    @Setup(Level.Trial)
    public void setUp() {
        Montage montage = montage128();
        grand = smoothWaves(montage);
        Study study = Study.builder("bench").montage(montage).add("p01", "c", grand).build();
        StudySession session = StudySession.of(study, null, "bench");
        bounds = LiveMap.mapBounds(WIDTH, HEIGHT, scale);
        live = new LiveMap(session.raster(quantity, (int) Math.round(bounds.getWidth() * scale)));
        rows = session.spline().rowsIn(grand);
        style = MapStyle.defaults().withHighlighted(List.of("Pz"));
        limits = org.meridian.maps.ColourLimits.automatic(quantity == Quantity.CSD ? 400 : 8);
        screen = new BufferedImage(WIDTH * scale, HEIGHT * scale, BufferedImage.TYPE_INT_RGB);
        g = screen.createGraphics();
        g.scale(scale, scale);
    }

    @Benchmark
    public ScalpMap cursorStep() {
        sample = (sample + 1) % SAMPLES;
        MapMoment m = MapMoment.at(grand.axis().timeMs(sample));
        double[] values = m.valuesOf(grand, rows);
        g.setColor(java.awt.Color.WHITE);
        g.fillRect(0, 0, WIDTH, HEIGHT);
        return live.paint(g, bounds, values, grand.unit(), coarse -> limits, style, contours).coarse();
    }

    /** 128 positions of the 10-5 system spread over the head (every k-th above the lower ring). */
    static Montage montage128() {
        List<Electrode> upper = new ArrayList<>();
        for (Electrode e : StandardSystem.TEN_FIVE.montage().electrodes()) {
            if (e.z() > -0.05) {
                upper.add(e);
            }
        }
        List<Electrode> chosen = new ArrayList<>();
        for (int i = 0; i < CHANNELS; i++) {
            chosen.add(upper.get((int) ((long) i * upper.size() / CHANNELS)));
        }
        return new Montage(chosen, "128 of the 10-5 positions");
    }

    /** Two smooth scalp patterns with different time courses, so every frame differs. */
    private static Waveforms smoothWaves(Montage montage) {
        TimeAxis axis = new TimeAxis(-200, 500, SAMPLES);
        float[] v = new float[montage.size() * SAMPLES];
        for (int c = 0; c < montage.size(); c++) {
            Electrode e = montage.electrodes().get(c);
            for (int s = 0; s < SAMPLES; s++) {
                double t = axis.timeMs(s) / 1000;
                v[c * SAMPLES + s] = (float) (6 * e.z() * Math.sin(2 * Math.PI * 2 * t)
                        + 3 * e.y() * Math.cos(2 * Math.PI * 3 * t) + 2 * e.x() * e.y());
            }
        }
        List<String> labels = new ArrayList<>();
        for (Electrode e : montage.electrodes()) {
            labels.add(e.label());
        }
        return Waveforms.wrap(labels, axis, Unit.MICROVOLT, v);
    }
}
