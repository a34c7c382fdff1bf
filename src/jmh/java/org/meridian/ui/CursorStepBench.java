package org.meridian.ui;

import java.awt.Color;
import java.awt.Component;
import java.awt.Container;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.image.BufferedImage;
import java.lang.reflect.InvocationTargetException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.RepaintManager;
import javax.swing.SwingUtilities;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

/**
 * What the screen does for one step of the time cursor: one operation moves the cursor by one
 * sample (on the event thread, as the → key does) and then paints every component that asked to
 * be repainted, as Swing's repaint manager would — the scalp map, the waveform view (its chart
 * with the cursor overlay, or the scalp layout), the span view's traces and correlation matrix,
 * the measures table's value-at-cursor column and the map's time label. The panels are those of
 * the window, laid out as in it (1340 × 900 pixels), on a 128-channel study of 8 participants
 * and 2 conditions over 500 samples, with the difference wave shown. Painting goes into an
 * offscreen image through a repaint manager that records the requests, so the benchmark runs
 * without a display. Frames per second = 1000 / (ms per operation); the target is ≥ 60 while
 * scrubbing.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class CursorStepBench {
    private static final int PARTICIPANTS = 8;
    private static final int SAMPLES = 500;
    private static final int WIDTH = 1340;
    private static final int HEIGHT = 900;

    /** The waveform view's mode: one channel with bands, the scalp layout, or all channels + GFP. */
    @Param({"ONE_CHANNEL", "LAYOUT", "BUTTERFLY"})
    public WaveformMode mode;

    private Workbench bench;
    private JPanel root;
    private Recorder recorder;
    private RepaintManager saved;
    private BufferedImage screen;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        if (System.getenv("DISPLAY") == null) {
            System.setProperty("java.awt.headless", "true");
        }
        Study study = study128();
        StudyOpener.Opened opened = StudyOpener.prepare(StudySession.of(study, null, "bench"),
                new ViewOptions(OptionalDouble.of(300), OptionalDouble.of(500), OptionalDouble.of(300),
                        "Pz", List.of(), ""), IntervalKind.WITHIN, Tasks.TaskProgress.NONE);
        screen = new BufferedImage(WIDTH, HEIGHT, BufferedImage.TYPE_INT_RGB);
        onEdt(() -> {
            Theme.LIGHT.install();
            saved = RepaintManager.currentManager(null);
            recorder = new Recorder();
            RepaintManager.setCurrentManager(recorder);
            bench = new Workbench(Theme.LIGHT);
            WaveformPanel waves = new WaveformPanel(bench);
            SpanPanel span = new SpanPanel(bench);
            ScalpMapPanel map = new ScalpMapPanel(bench);
            MeasuresPanel measures = new MeasuresPanel(bench);
            root = new JPanel(null);
            place(root, waves, 0, 0, 900, 440);
            place(root, span, 0, 440, 900, 460);
            place(root, map, 900, 0, 440, 450);
            place(root, measures, 900, 450, 440, 450);
            bench.model().open(opened.session(), opened.entries(), opened.averages(), opened.defaults());
            waves.setMode(mode);
        });
        // the first paints ask for the map's raster; wait for it and for the span view and measures
        for (int i = 0; i < 3; i++) {
            waitUntil(() -> !bench.tasks().isRunning("span") && !bench.tasks().isRunning("measures")
                    && !bench.tasks().isRunning("averages") && !bench.tasks().isRunning("map.raster"));
            onEdt(() -> {
                layOut(root);
                paintAll();
            });
        }
    }

    @TearDown(Level.Trial)
    public void tearDown() throws Exception {
        onEdt(() -> RepaintManager.setCurrentManager(saved));
    }

    @Benchmark
    public int cursorStep() throws Exception {
        int[] painted = new int[1];
        onEdt(() -> {
            ViewState s = bench.state();
            if (s.cursorSample() >= s.axis().samples() - 1) {
                s.setCursorMs(s.axis().firstMs());
            } else {
                s.stepCursor(1);
            }
            painted[0] = recorder.paintDirty(root, screen);
        });
        return painted[0];
    }

    /** Records repaint requests instead of scheduling them, and paints them on demand. */
    private static final class Recorder extends RepaintManager {
        private final Map<JComponent, Rectangle> dirty = new LinkedHashMap<>();

        @Override
        public void addDirtyRegion(JComponent c, int x, int y, int w, int h) {
            if (w <= 0 || h <= 0) {
                return;
            }
            dirty.merge(c, new Rectangle(x, y, w, h), Rectangle::union);
        }

        @Override
        public void addInvalidComponent(JComponent invalidComponent) {
            // layout is left as set up: a cursor step changes no sizes
        }

        /** Paints every recorded region into the screen image; returns how many components. */
        int paintDirty(JComponent root, BufferedImage screen) {
            List<Map.Entry<JComponent, Rectangle>> todo = new ArrayList<>(dirty.entrySet());
            dirty.clear();
            for (Map.Entry<JComponent, Rectangle> e : todo) {
                JComponent c = e.getKey();
                if (!SwingUtilities.isDescendingFrom(c, root) || !shown(c, root)) {
                    continue;
                }
                Rectangle r = e.getValue().intersection(new Rectangle(0, 0, c.getWidth(), c.getHeight()));
                if (r.isEmpty()) {
                    continue;
                }
                java.awt.Point at = SwingUtilities.convertPoint(c, 0, 0, root);
                Graphics2D g = screen.createGraphics();
                try {
                    g.translate(at.x, at.y);
                    g.clipRect(r.x, r.y, r.width, r.height);
                    c.paint(g);
                } finally {
                    g.dispose();
                }
            }
            return todo.size();
        }
    }

    /** Whether a component and its parents up to the root are visible (a hidden card is not painted). */
    private static boolean shown(Component c, Component root) {
        for (Component k = c; k != null && k != root; k = k.getParent()) {
            if (!k.isVisible()) {
                return false;
            }
        }
        return true;
    }

    private void paintAll() {
        recorder.dirty.clear();
        Graphics2D g = screen.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, WIDTH, HEIGHT);
            root.paint(g);
        } finally {
            g.dispose();
        }
    }

    private static void place(JPanel root, JComponent c, int x, int y, int w, int h) {
        c.setBounds(x, y, w, h);
        root.add(c);
    }

    /** Lays out a tree without a screen (validate needs a native peer). */
    private static void layOut(Component c) {
        if (c instanceof Container k) {
            k.doLayout();
            for (Component child : k.getComponents()) {
                layOut(child);
            }
        }
    }

    private void waitUntil(BooleanSupplier done) throws Exception {
        long until = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        boolean[] ok = new boolean[1];
        while (System.nanoTime() < until) {
            onEdt(() -> ok[0] = done.getAsBoolean());
            if (ok[0]) {
                return;
            }
            Thread.sleep(20);
        }
        throw new IllegalStateException("the window's background work did not finish");
    }

    private static void onEdt(Runnable r) throws InterruptedException, InvocationTargetException {
        SwingUtilities.invokeAndWait(r);
    }

    /**
     * 128 channels ({@link MapFrameBench#montage128}), 8 participants, conditions "rare" and
     * "frequent": a central-parietal late positivity larger in "rare", a frontal negativity
     * earlier, each participant scaled and shifted a little, so every frame differs.
     */
    static Study study128() {
        Montage montage = MapFrameBench.montage128();
        TimeAxis axis = new TimeAxis(-200, 500, SAMPLES);
        List<String> labels = new ArrayList<>();
        for (Electrode e : montage.electrodes()) {
            labels.add(e.label());
        }
        Study.Builder b = Study.builder("bench").montage(montage);
        for (int p = 0; p < PARTICIPANTS; p++) {
            for (String condition : new String[] {"rare", "frequent"}) {
                double late = condition.equals("rare") ? 9 : 4;
                double gain = 0.8 + 0.05 * p;
                double shift = 8 * (p - PARTICIPANTS / 2.0);
                float[] v = new float[montage.size() * SAMPLES];
                for (int c = 0; c < montage.size(); c++) {
                    Electrode e = montage.electrodes().get(c);
                    for (int s = 0; s < SAMPLES; s++) {
                        double t = axis.timeMs(s);
                        double p3 = late * Math.exp(-Math.pow((t - 360 - shift) / 70, 2)) * (0.4 + e.z() - 0.6 * e.y());
                        double n1 = -5 * Math.exp(-Math.pow((t - 110 - shift / 2) / 30, 2)) * (0.5 + e.y());
                        v[c * SAMPLES + s] = (float) (gain * (p3 + n1) + 0.3 * Math.sin(0.05 * s + c + p));
                    }
                }
                b.add(String.format("p%02d", p + 1), condition, Waveforms.wrap(labels, axis, Unit.MICROVOLT, v));
            }
        }
        return b.build();
    }
}
