package org.meridian.ui;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.Point;
import java.awt.RenderingHints;
import java.awt.event.InputEvent;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JComponent;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;
import org.meridian.montage.Projection;

/**
 * Every channel as a small plot at its projected place on the head (DESIGN §3 projection, nose
 * up, left on the left); channels without a position in a row along the bottom. All small plots
 * share one time and one value scale, shown once by the scale bars in the lower-left corner.
 * Clicking a small plot makes its channel the current one (Ctrl-click adds it to the selection);
 * inside a plot the time gestures of every time plot apply ({@link TimeDrag}): dragging moves the
 * time cursor, the window band's edges can be gripped and dragged, Shift-drag sweeps a new
 * window. The current channel's plot is outlined in the selection colour, the other selected
 * ones more thinly. The small plots are kept as an image; the band and the cursor are drawn over
 * it, so moving either redraws no wave.
 */
final class ScalpLayoutView extends JComponent {
    private final Workbench bench;
    private List<Slot> slots = List.of();
    private double valueLimit = 1;
    private java.awt.image.BufferedImage plots;
    private Object plotsKey;
    private Slot dragging;
    /** The small plot the time gestures refer to: the one pressed in, else the one under the mouse. */
    private Slot hovered;

    /** A small plot: its channel and its box in component pixels. */
    private record Slot(String channel, Rectangle2D box) {
    }

    ScalpLayoutView(Workbench bench) {
        this.bench = bench;
        setName("waveforms.layout");
        setOpaque(true);
        setMinimumSize(new Dimension(200, 160));
        setFocusable(true);
        MouseAdapter mouse = new MouseAdapter() {
            @Override
            public void mousePressed(MouseEvent e) {
                requestFocusInWindow();
                Slot s = slotAt(e.getPoint());
                dragging = s;
                if (s == null) {
                    return;
                }
                hovered = s;
                if ((e.getModifiersEx() & (InputEvent.CTRL_DOWN_MASK | InputEvent.META_DOWN_MASK)) != 0) {
                    bench.state().toggleChannel(s.channel());
                } else {
                    bench.state().selectChannel(s.channel());
                }
            }

            @Override
            public void mouseDragged(MouseEvent e) {
                mouseMoved(e);
            }

            @Override
            public void mouseReleased(MouseEvent e) {
                dragging = null;
            }

            @Override
            public void mouseMoved(MouseEvent e) {
                Slot s = slotAt(e.getPoint());
                if (dragging == null) {
                    hovered = s;
                }
                if (s == null) {
                    bench.pointer("", "", "");
                    return;
                }
                double t = bench.state().snap(timeAt(s, e.getX()));
                Averages.WaveAverage w = bench.model().averages().wave(bench.state().mapWave());
                String value = "";
                if (w != null && w.grand().indexOf(s.channel()) >= 0) {
                    Waveforms g = w.grand();
                    value = Texts.value(g.value(g.indexOf(s.channel()), g.axis().nearestIndex(t)),
                            g.unit().symbol());
                }
                bench.pointer(Texts.ms(t), s.channel(), value);
            }

            @Override
            public void mouseExited(MouseEvent e) {
                bench.pointer("", "", "");
            }
        };
        addMouseListener(mouse);
        addMouseMotionListener(mouse);
        // after the listener above, which chooses the plot the gesture belongs to
        new TimeDrag(this, bench.state(), x -> hovered == null ? bench.state().cursorMs() : timeAt(hovered, x),
                this::xOfTime, e -> slotAt(e.getPoint()) != null).withoutCursorOnPress().install();
    }

    /** The x pixel of a time in the plot the mouse is over (or last pressed in). */
    private double xOfTime(double ms) {
        if (hovered == null) {
            return Double.NaN;
        }
        TimeAxis axis = bench.state().axis();
        Rectangle2D b = hovered.box();
        return b.getX() + (ms - axis.firstMs()) / (axis.lastMs() - axis.firstMs()) * b.getWidth();
    }

    /** The channel of the small plot at a point, if any (for tests and clicks). */
    String channelAt(Point p) {
        Slot s = slotAt(p);
        return s == null ? null : s.channel();
    }

    /** The centre of a channel's small plot, or null (for tests). */
    Point centreOf(String channel) {
        layoutSlots();
        for (Slot s : slots) {
            if (s.channel().equalsIgnoreCase(channel)) {
                return new Point((int) s.box().getCenterX(), (int) s.box().getCenterY());
            }
        }
        return null;
    }

    /** The screen point of a time in a channel's small plot, at its middle height, or null (for tests). */
    Point pointAt(String channel, double ms) {
        layoutSlots();
        TimeAxis axis = bench.state().axis();
        for (Slot s : slots) {
            if (s.channel().equalsIgnoreCase(channel)) {
                Rectangle2D b = s.box();
                double x = b.getX() + (ms - axis.firstMs()) / (axis.lastMs() - axis.firstMs()) * b.getWidth();
                return new Point((int) Math.round(x), (int) b.getCenterY());
            }
        }
        return null;
    }

    private Slot slotAt(Point p) {
        for (Slot s : slots) {
            if (s.box().contains(p)) {
                return s;
            }
        }
        return null;
    }

    private double timeAt(Slot s, double x) {
        TimeAxis axis = bench.state().axis();
        double f = (x - s.box().getX()) / s.box().getWidth();
        return axis.firstMs() + f * (axis.lastMs() - axis.firstMs());
    }

    private void layoutSlots() {
        StudySession session = bench.model().session();
        if (session == null) {
            slots = List.of();
            return;
        }
        Montage montage = bench.model().study().montage();
        List<String> labels = bench.model().study().channelLabels();
        List<double[]> plane = new ArrayList<>();
        List<String> placed = new ArrayList<>();
        List<String> loose = new ArrayList<>();
        for (String l : labels) {
            Electrode e = montage.find(l).orElse(null);
            if (e == null) {
                loose.add(l);
            } else {
                placed.add(l);
                plane.add(Projection.toPlane(e));
            }
        }
        double spacing = nearestSpacing(plane);
        double minX = Double.MAX_VALUE;
        double maxX = -Double.MAX_VALUE;
        double minY = Double.MAX_VALUE;
        double maxY = -Double.MAX_VALUE;
        for (double[] p : plane) {
            minX = Math.min(minX, p[0] - spacing * 0.6);
            maxX = Math.max(maxX, p[0] + spacing * 0.6);
            minY = Math.min(minY, p[1] - spacing * 0.6);
            maxY = Math.max(maxY, p[1] + spacing * 0.6);
        }
        if (plane.isEmpty()) {
            minX = -1;
            maxX = 1;
            minY = -1;
            maxY = 1;
        }
        double looseRow = loose.isEmpty() ? 0 : spacing * 1.2;
        double w = getWidth();
        double h = getHeight() - 8;
        // the head is stretched to the panel (plots are wider than tall), within a factor of 2.2
        double sx = w / (maxX - minX);
        double sy = h / (maxY - minY + looseRow);
        sx = Math.min(sx, 2.2 * sy);
        sy = Math.min(sy, sx);
        double boxW = spacing * sx * 0.92;
        double boxH = spacing * sy * 0.78;
        double x0 = (w - (maxX - minX) * sx) / 2;
        double y0 = 4 + (h - (maxY - minY + looseRow) * sy) / 2;
        List<Slot> out = new ArrayList<>();
        for (int i = 0; i < placed.size(); i++) {
            double cx = x0 + (plane.get(i)[0] - minX) * sx;
            double cy = y0 + (maxY - plane.get(i)[1]) * sy;
            out.add(new Slot(placed.get(i), new Rectangle2D.Double(cx - boxW / 2, cy - boxH / 2, boxW, boxH)));
        }
        for (int i = 0; i < loose.size(); i++) {
            double cx = x0 + boxW / 2 + i * boxW * 1.1;
            double cy = y0 + (maxY - minY + looseRow * 0.5) * sy;
            out.add(new Slot(loose.get(i), new Rectangle2D.Double(cx - boxW / 2, cy - boxH / 2, boxW, boxH)));
        }
        slots = out;
    }

    private static double nearestSpacing(List<double[]> plane) {
        if (plane.size() < 2) {
            return 0.5;
        }
        double[] nearest = new double[plane.size()];
        for (int i = 0; i < plane.size(); i++) {
            double best = Double.MAX_VALUE;
            for (int j = 0; j < plane.size(); j++) {
                if (i != j) {
                    best = Math.min(best, Math.hypot(plane.get(i)[0] - plane.get(j)[0],
                            plane.get(i)[1] - plane.get(j)[1]));
                }
            }
            nearest[i] = best;
        }
        java.util.Arrays.sort(nearest);
        return Math.max(0.08, nearest[nearest.length / 2]);
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
            layoutSlots();
            double scale = g.getTransform().getScaleX();
            Object key = java.util.List.of(getWidth(), getHeight(), scale, bench.model().averages(),
                    bench.state().shownWaves(), bench.state().selectedChannels(), bench.state().polarity(), theme);
            if (plots == null || !key.equals(plotsKey)) {
                plots = drawPlots(theme, scale);
                plotsKey = key;
            }
            g.drawImage(plots, 0, 0, getWidth(), getHeight(), null);
            drawCursors(g, theme);
        } finally {
            g.dispose();
        }
    }

    /** The small plots without the cursor, at device resolution (redrawn when they change). */
    private java.awt.image.BufferedImage drawPlots(Theme theme, double scale) {
        java.awt.image.BufferedImage img = new java.awt.image.BufferedImage(
                Math.max(1, (int) Math.round(getWidth() * scale)), Math.max(1, (int) Math.round(getHeight() * scale)),
                java.awt.image.BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.scale(scale, scale);
            g.setColor(theme.plotBackground());
            g.fillRect(0, 0, getWidth(), getHeight());
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            List<Averages.WaveAverage> waves = bench.state().shownWaves().stream()
                    .map(bench.model().averages()::wave).filter(java.util.Objects::nonNull).toList();
            valueLimit = limit(waves);
            Font font = ChartStyle.font(Math.max(9f, Math.min(12f, (float) slotHeight() * 0.22f)), Font.PLAIN);
            g.setFont(font);
            for (Slot s : slots) {
                drawSlot(g, s, waves, theme);
            }
            drawScale(g, theme, waves);
        } finally {
            g.dispose();
        }
        return img;
    }

    /** The window band and the time cursor in every small plot. */
    private void drawCursors(Graphics2D g, Theme theme) {
        ViewState state = bench.state();
        TimeAxis axis = state.axis();
        double span = axis.lastMs() - axis.firstMs();
        for (Slot s : slots) {
            Rectangle2D b = s.box();
            double a = b.getX() + (state.windowStartMs() - axis.firstMs()) / span * b.getWidth();
            double e = b.getX() + (state.windowEndMs() - axis.firstMs()) / span * b.getWidth();
            g.setColor(theme.windowFill());
            g.fill(new Rectangle2D.Double(a, b.getY(), e - a, b.getHeight()));
            double cx = b.getX() + (state.cursorMs() - axis.firstMs()) / span * b.getWidth();
            g.setColor(theme.cursor());
            g.setStroke(new BasicStroke(1f));
            g.draw(new Line2D.Double(cx, b.getY(), cx, b.getMaxY()));
        }
    }

    private double slotHeight() {
        return slots.isEmpty() ? 40 : slots.get(0).box().getHeight();
    }

    private double limit(List<Averages.WaveAverage> waves) {
        double max = 0;
        for (Averages.WaveAverage w : waves) {
            float[] all = w.grand().copyValues();
            for (float v : all) {
                max = Math.max(max, Math.abs(v));
            }
        }
        return max > 0 ? max : 1;
    }

    private void drawSlot(Graphics2D g, Slot s, List<Averages.WaveAverage> waves, Theme theme) {
        ViewState state = bench.state();
        Rectangle2D b = s.box();
        TimeAxis axis = state.axis();
        double span = axis.lastMs() - axis.firstMs();
        double zeroY = b.getCenterY();
        g.setColor(theme.grid());
        g.setStroke(new BasicStroke(1f));
        g.draw(new Line2D.Double(b.getX(), zeroY, b.getMaxX(), zeroY));
        double zeroX = b.getX() + (0 - axis.firstMs()) / span * b.getWidth();
        if (zeroX > b.getX() && zeroX < b.getMaxX()) {
            g.draw(new Line2D.Double(zeroX, b.getY() + b.getHeight() * 0.2, zeroX, b.getMaxY() - b.getHeight() * 0.2));
        }
        double sign = state.polarity().inverted() ? 1 : -1;
        double k = b.getHeight() / 2 / valueLimit;
        g.setStroke(new BasicStroke(1.1f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        for (Averages.WaveAverage w : waves) {
            Waveforms gw = w.grand();
            int c = gw.indexOf(s.channel());
            if (c < 0) {
                continue;
            }
            Path2D.Double path = new Path2D.Double();
            int n = gw.sampleCount();
            for (int i = 0; i < n; i++) {
                double x = b.getX() + (double) i / (n - 1) * b.getWidth();
                double y = zeroY + sign * k * gw.value(c, i);
                if (i == 0) {
                    path.moveTo(x, y);
                } else {
                    path.lineTo(x, y);
                }
            }
            g.setColor(theme.wave(w.entry().colourIndex()));
            g.draw(path);
        }
        int rank = indexIgnoringCase(state.selectedChannels(), s.channel());
        if (rank == 0) {
            g.setColor(theme.selection());
            g.setStroke(new BasicStroke(2.2f));
            g.draw(b);
        } else if (rank > 0) {
            g.setColor(theme.selection());
            g.setStroke(new BasicStroke(1f));
            g.draw(b);
        }
        g.setColor(rank >= 0 ? theme.selection() : theme.ink());
        Font f = g.getFont();
        g.setFont(rank >= 0 ? f.deriveFont(Font.BOLD) : f);
        FontMetrics fm = g.getFontMetrics();
        g.drawString(s.channel(), (float) b.getX() + 2, (float) b.getY() + fm.getAscent());
        g.setFont(f);
    }

    private void drawScale(Graphics2D g, Theme theme, List<Averages.WaveAverage> waves) {
        if (slots.isEmpty() || waves.isEmpty()) {
            return;
        }
        String unit = waves.get(0).grand().unit().symbol();
        double boxH = slotHeight();
        double length = ScaleBar.roundLength(4 * valueLimit);
        double pixels = boxH / 2 / valueLimit * length;
        Font font = ChartStyle.tickFont();
        double x = 16;
        double y = getHeight() - 12;
        ScaleBar.draw(g, x, y, pixels, ScaleBar.label(length, unit), theme.ink(), font);
        TimeAxis axis = bench.state().axis();
        double boxW = slots.get(0).box().getWidth();
        double msLength = ScaleBar.roundLength((axis.lastMs() - axis.firstMs()) * 2);
        double w = boxW * msLength / (axis.lastMs() - axis.firstMs());
        double y2 = y - pixels - 18;
        g.setStroke(new BasicStroke(2f));
        g.draw(new Line2D.Double(x, y2, x + w, y2));
        g.drawString(ScaleBar.label(msLength, "ms"), (float) x, (float) (y2 - 4));
    }

    private static int indexIgnoringCase(List<String> list, String s) {
        for (int i = 0; i < list.size(); i++) {
            if (list.get(i).equalsIgnoreCase(s)) {
                return i;
            }
        }
        return -1;
    }

    /** The current theme's background, for the component's own background. */
    @Override
    public Color getBackground() {
        return bench.theme().plotBackground();
    }
}
