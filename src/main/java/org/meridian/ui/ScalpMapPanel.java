package org.meridian.ui;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.Point;
import java.awt.RenderingHints;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.geom.AffineTransform;
import java.awt.geom.NoninvertibleTransformException;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.util.Optional;
import javax.swing.BorderFactory;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import org.meridian.core.Waveforms;
import org.meridian.maps.ColourBar;
import org.meridian.maps.ColourLimits;
import org.meridian.maps.MapGrid;
import org.meridian.maps.MapMaker;
import org.meridian.maps.MapMoment;
import org.meridian.maps.MapRaster;
import org.meridian.maps.MapRenderer;
import org.meridian.maps.MapStyle;
import org.meridian.maps.ScalpMap;

/**
 * The scalp map of the map wave at the time cursor (or the window's mean), potential or CSD,
 * with its colour bar; above it, which wave, quantity and time it shows. Hovering names the
 * nearest electrode and the value under the mouse; clicking an electrode makes its channel the
 * current one; the selected channels are marked on the map.
 *
 * <p>A frame is one matrix–vector product on the live grid of {@link StudySession#LIVE_RESOLUTION}
 * pixels (precomputed weights) drawn by the same {@link MapRenderer} as every figure, so a
 * frame costs about a millisecond and scrubbing stays smooth.
 */
final class ScalpMapPanel extends JPanel {
    private final Workbench bench;
    private final JComboBox<String> wave = new JComboBox<>();
    private final JComboBox<MapMomentMode> moment = new JComboBox<>(MapMomentMode.values());
    private final JLabel timeLabel = new JLabel(" ");
    private final Canvas canvas = new Canvas();
    private boolean updating;
    private ScalpMap current;
    private ColourLimits limits;
    private LiveMap live;
    private String pendingRaster;
    private String currentTitle = "";
    /** True while the cursor moves faster than {@value #SETTLE_MS} ms a step: frames skip contours. */
    private boolean scrubbing;
    private long lastCursorNanos;
    private final javax.swing.Timer settle;
    static final int SETTLE_MS = 150;
    private Rectangle2D mapBounds = new Rectangle2D.Double();

    ScalpMapPanel(Workbench bench) {
        super(new BorderLayout());
        this.bench = bench;
        setName("map");
        setMinimumSize(new Dimension(220, 220));
        JPanel header = new JPanel(new BorderLayout());
        header.setBorder(BorderFactory.createEmptyBorder(2, 6, 0, 6));
        JPanel row = new JPanel(new WrapLayout(4, 2));
        JLabel title = new JLabel("Scalp map");
        title.putClientProperty("FlatLaf.styleClass", "h4");
        row.add(title);
        wave.setName("map.wave");
        wave.setToolTipText("The wave the scalp map and the span view show");
        wave.addActionListener(e -> {
            if (!updating && wave.getSelectedItem() != null) {
                bench.state().setMapWave((String) wave.getSelectedItem());
            }
        });
        moment.setName("map.moment");
        moment.setToolTipText("Map at the time cursor, or the mean over the window");
        moment.addActionListener(e -> {
            if (!updating) {
                bench.state().setMoment((MapMomentMode) moment.getSelectedItem());
            }
        });
        row.add(wave);
        row.add(moment);
        header.add(row, BorderLayout.NORTH);
        timeLabel.setName("map.time");
        timeLabel.setHorizontalAlignment(JLabel.CENTER);
        timeLabel.setFont(timeLabel.getFont().deriveFont(Font.BOLD, timeLabel.getFont().getSize2D() + 1f));
        header.add(timeLabel, BorderLayout.SOUTH);
        add(header, BorderLayout.NORTH);
        canvas.setName("map.canvas");
        add(canvas, BorderLayout.CENTER);

        settle = new javax.swing.Timer(SETTLE_MS, e -> {
            scrubbing = false;
            canvas.repaint();
        });
        settle.setRepeats(false);
        bench.state().addListener((s, what) -> {
            if (what.contains(ViewState.Aspect.CURSOR)) {
                long now = System.nanoTime();
                scrubbing = now - lastCursorNanos < SETTLE_MS * 1_000_000L;
                lastCursorNanos = now;
                settle.restart();
            }
            if (what.contains(ViewState.Aspect.WAVES) || what.contains(ViewState.Aspect.MAP_WAVE)
                    || what.contains(ViewState.Aspect.MOMENT)) {
                refreshControls();
            }
            updateLabel();
            canvas.repaint();
        });
        bench.model().addListener((m, what) -> {
            if (what.contains(ViewModel.Change.CATALOGUE) || what.contains(ViewModel.Change.SESSION)) {
                refreshControls();
            }
            updateLabel();
            canvas.repaint();
        });
        bench.addThemeListener(t -> canvas.repaint());
    }

    /** The text above the map, e.g. {@code rare − frequent · Potential · 352 ms}. */
    String timeText() {
        return timeLabel.getText();
    }

    /** The screen point of an electrode on the map (for tests), or null. */
    Point electrodePoint(String label) {
        StudySession s = bench.model().session();
        if (s == null || !s.hasMaps()) {
            return null;
        }
        int i = s.layout().labels().stream().map(String::toLowerCase).toList().indexOf(label.toLowerCase());
        if (i < 0) {
            return null;
        }
        double[] p = s.layout().position(i);
        Point2D d = MapRenderer.planeToDevice(mapBounds, s.layout()).transform(new Point2D.Double(p[0], p[1]), null);
        return new Point((int) Math.round(d.getX()), (int) Math.round(d.getY()));
    }

    Canvas canvas() {
        return canvas;
    }

    /** The unit of the map last drawn, as its colour bar names it (for tests), or "". */
    String unitText() {
        return current == null ? "" : current.unitLabel();
    }

    /** The colour limits of the map last drawn, or null. */
    ColourLimits limits() {
        return limits;
    }

    private void refreshControls() {
        updating = true;
        try {
            wave.removeAllItems();
            for (WaveEntry e : bench.model().catalogue()) {
                wave.addItem(e.name());
            }
            wave.setSelectedItem(bench.state().mapWave());
            moment.setSelectedItem(bench.state().moment());
        } finally {
            updating = false;
        }
    }

    private void updateLabel() {
        ViewState s = bench.state();
        String when = s.moment() == MapMomentMode.CURSOR ? Texts.ms(s.cursorMs())
                : "mean " + Texts.window(s.windowStartMs(), s.windowEndMs());
        timeLabel.setText(s.mapWave() + "  ·  " + s.quantity().word() + "  ·  " + when);
    }

    /** The wave the map shows now, or null. */
    private Averages.WaveAverage mapWave() {
        return bench.model().averages().wave(bench.state().mapWave());
    }

    /** The quantity the map can show now (the potential when the study has no CSD). */
    private MapQuantity quantity(StudySession session) {
        MapQuantity q = bench.state().quantity();
        return q == MapQuantity.CSD && !session.hasCsd() ? MapQuantity.POTENTIAL : q;
    }

    private MapMoment moment() {
        ViewState s = bench.state();
        return s.moment() == MapMomentMode.CURSOR ? MapMoment.at(s.cursorMs())
                : MapMoment.window(s.windowStartMs(), s.windowEndMs());
    }

    /** The colour limits of a frame, by the state's colour range (a locked limit as set). */
    private ColourLimits limitsOf(Averages.WaveAverage w, MapQuantity q, ScalpMap frame) {
        return bench.state().colourRange().limits(w.maxAbs(q), frame.maxAbs());
    }

    /** Builds the raster of a display size in the background, once; the canvas repaints when done. */
    private void requestRaster(StudySession session, MapQuantity q, int pixels) {
        String key = q + "@" + pixels;
        if (key.equals(pendingRaster)) {
            return;
        }
        pendingRaster = key;
        bench.tasks().submit("map.raster", "Preparing the scalp map",
                p -> session.raster(q.quantity(), pixels), r -> {
                    pendingRaster = null;
                    canvas.repaint();
                }, t -> {
                    pendingRaster = null;
                    bench.report(t);
                });
    }

    /** Draws a full map (not the raster path) with its colour bar beside it, laid out as a live frame. */
    static void paintFrame(Graphics2D g, Rectangle2D bounds, ScalpMap map, ColourLimits limits, MapStyle style) {
        MapRenderer.draw(g, bounds, map, limits, style);
        ColourBar.draw(g, LiveMap.barBounds(bounds), style.scale(), limits, map.unitLabel(), 1.0);
    }

    /** The map, its colour bar and the electrodes; hover and click go to the state. */
    final class Canvas extends JComponent {
        Canvas() {
            setOpaque(true);
            setFocusable(true);
            MouseAdapter mouse = new MouseAdapter() {
                @Override
                public void mouseMoved(MouseEvent e) {
                    hover(e.getPoint());
                }

                @Override
                public void mousePressed(MouseEvent e) {
                    requestFocusInWindow();
                }

                @Override
                public void mouseClicked(MouseEvent e) {
                    electrodeAt(e.getPoint()).ifPresent(label -> {
                        if (e.isControlDown() || e.isMetaDown()) {
                            bench.state().toggleChannel(label);
                        } else {
                            bench.state().selectChannel(label);
                        }
                    });
                }

                @Override
                public void mouseExited(MouseEvent e) {
                    bench.pointer("", "", "");
                }
            };
            addMouseListener(mouse);
            addMouseMotionListener(mouse);
        }

        @Override
        protected void paintComponent(Graphics graphics) {
            Graphics2D g = (Graphics2D) graphics.create();
            try {
                Theme theme = bench.theme();
                g.setColor(theme.plotBackground());
                g.fillRect(0, 0, getWidth(), getHeight());
                g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
                g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
                if (theme != Theme.LIGHT) {
                    g.setColor(theme.mapCard());
                    g.fillRoundRect(3, 3, getWidth() - 6, getHeight() - 6, 14, 14);
                }
                StudySession session = bench.model().session();
                if (session != null && !session.hasMaps()) {
                    g.setColor(theme.mapInk());
                    g.drawString("No scalp map: " + session.whyNoMaps(), 8, 20);
                    return;
                }
                Averages.WaveAverage w = mapWave();
                if (session == null || w == null) {
                    current = null;
                    return;
                }
                paintMap(g, session, w);
            } finally {
                g.dispose();
            }
        }

        /**
         * One frame: through the raster of this panel's size in device pixels when it is built,
         * else (for the moments until it is) the full map of the precomputed live grid.
         */
        private void paintMap(Graphics2D g, StudySession session, Averages.WaveAverage w) {
            MapQuantity q = quantity(session);
            double scale = g.getTransform().getScaleX();
            mapBounds = LiveMap.mapBounds(getWidth(), getHeight(), scale);
            int pixels = (int) Math.round(mapBounds.getWidth() * scale);
            MapStyle style = MapStyle.defaults().withScale(bench.state().colourScale())
                    .withHighlighted(bench.state().selectedChannels());
            MapMoment m = moment();
            currentTitle = m.label();
            double[] values = m.valuesOf(w.grand(), session.spline().rowsIn(w.grand()));
            MapRaster raster = session.rasterIfBuilt(q.quantity(), pixels);
            if (raster != null) {
                if (live == null || live.raster() != raster) {
                    live = new LiveMap(raster);
                }
                LiveMap.Frame f = live.paint(g, mapBounds, values, w.grand().unit(),
                        coarse -> limitsOf(w, q, coarse), style, !scrubbing);
                current = f.coarse();
                limits = f.limits();
                return;
            }
            requestRaster(session, q, pixels);
            MapMaker maker = session.maker(q.quantity(), StudySession.LIVE_RESOLUTION);
            current = maker.map(values, w.grand().unit(), m.label());
            limits = limitsOf(w, q, current);
            paintFrame(g, mapBounds, current, limits, style);
        }

        private Optional<String> electrodeAt(Point p) {
            StudySession s = bench.model().session();
            if (s == null || !s.hasMaps() || mapBounds.isEmpty()) {
                return Optional.empty();
            }
            double tolerance = Math.max(6, mapBounds.getWidth() * 0.03);
            return MapRenderer.electrodeAt(mapBounds, s.layout(), p, tolerance);
        }

        /** Names the electrode under the mouse with its value, or the map's value between electrodes. */
        private void hover(Point p) {
            if (current == null || mapBounds.isEmpty()) {
                return;
            }
            String unit = current.unitLabel().startsWith("CSD") ? "µV/m²" : current.unitLabel();
            Optional<String> electrode = electrodeAt(p);
            Averages.WaveAverage w = mapWave();
            if (electrode.isPresent() && w != null) {
                Waveforms field = w.field(quantity(bench.model().session()));
                int row = field.indexOf(electrode.get());
                if (row >= 0) {
                    double v = moment().valuesOf(field, new int[] {row})[0];
                    bench.pointer(currentTitle, electrode.get(), Texts.value(v, unit));
                    return;
                }
            }
            AffineTransform t = MapRenderer.planeToDevice(mapBounds, current.layout());
            Point2D plane;
            try {
                plane = t.inverseTransform(p, null);
            } catch (NoninvertibleTransformException e) {
                return;
            }
            MapGrid grid = current.grid();
            int col = (int) Math.round(grid.column(plane.getX()));
            int row = (int) Math.round(grid.row(plane.getY()));
            if (col < 0 || row < 0 || col >= grid.size() || row >= grid.size()
                    || Float.isNaN(current.value(col, row))) {
                bench.pointer(currentTitle, "", "");
                return;
            }
            bench.pointer(currentTitle, "", Texts.value(current.value(col, row), unit));
        }
    }
}
