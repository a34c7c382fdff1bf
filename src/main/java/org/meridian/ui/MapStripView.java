package org.meridian.ui;

import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.Arrays;
import java.util.List;
import javax.swing.JComponent;
import org.meridian.maps.ColourLimits;
import org.meridian.maps.MapStrip;
import org.meridian.maps.MapStyle;

/**
 * The span view's map strip: maps evenly spaced across the window with one colour bar
 * ({@link MapStrip}), in the colour range of the {@link ViewState} (automatic: the map wave's
 * largest value over all samples, as the scalp map; symmetric: the strip's own largest value).
 * The strip is kept as an image at device resolution and drawn again only when what it shows
 * changes, so exposing it or a cursor step costs one copy.
 */
final class MapStripView extends JComponent {
    private final Workbench bench;
    private SpanData data;
    private BufferedImage image;
    private List<Object> imageKey;
    private SpanData imageData;
    private int draws;

    MapStripView(Workbench bench) {
        this.bench = bench;
        setName("span.strip");
        setMinimumSize(new Dimension(200, 70));
        setPreferredSize(new Dimension(600, 130));
    }

    void show(SpanData d) {
        this.data = d;
        repaint();
    }

    SpanData data() {
        return data;
    }

    /** The limits the strip is drawn with. */
    ColourLimits limits() {
        Averages.WaveAverage w = bench.model().averages().wave(data.wave());
        return bench.state().colourRange().limits(w == null ? data.stripMaxAbs() : w.maxAbs(data.quantity()),
                data.stripMaxAbs());
    }

    @Override
    protected void paintComponent(Graphics graphics) {
        Graphics2D g = (Graphics2D) graphics.create();
        try {
            double scale = g.getTransform().getScaleX();
            Theme theme = bench.theme();
            boolean empty = data == null || data.strip().isEmpty();
            MapStyle style = empty ? null : style();
            ColourLimits limits = empty ? null : limits();
            List<Object> key = Arrays.asList(getWidth(), getHeight(), scale, theme, limits, style);
            if (image == null || data != imageData || !key.equals(imageKey)) {
                image = draw(theme, scale, style, limits);
                imageKey = key;
                imageData = data;
                draws++;
            }
            g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_NEAREST_NEIGHBOR);
            g.drawImage(image, 0, 0, getWidth(), getHeight(), null);
        } finally {
            g.dispose();
        }
    }

    /** How often the strip has been drawn (for tests: a repaint with nothing changed draws none). */
    int draws() {
        return draws;
    }

    private MapStyle style() {
        int n = data.strip().size();
        double side = Math.min((getWidth() - 8) / (n + (n - 1) * 0.06 + 0.5), (getHeight() - 4) / 1.16);
        double readable = ChartStyle.tickFont().getSize2D() / (0.07 * side);
        return MapStyle.defaults().withScale(bench.state().colourScale())
                .withHighlighted(bench.state().selectedChannels())
                .withSizeFactor(Math.max(1, readable));
    }

    /**
     * The strip at device resolution: drawn again only when its data, colour limits, style, size,
     * the screen's scale or the theme change (maps with contours take tens of milliseconds).
     */
    private BufferedImage draw(Theme theme, double scale, MapStyle style, ColourLimits limits) {
        BufferedImage img = new BufferedImage(Math.max(1, (int) Math.ceil(getWidth() * scale)),
                Math.max(1, (int) Math.ceil(getHeight() * scale)), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.scale(scale, scale);
            g.setColor(theme.plotBackground());
            g.fillRect(0, 0, getWidth(), getHeight());
            if (theme != Theme.LIGHT) {
                g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
                g.setColor(theme.mapCard());
                g.fillRoundRect(3, 2, getWidth() - 6, getHeight() - 4, 14, 14);
            }
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            if (style != null) {
                new MapStrip(data.strip(), limits, style).draw(g,
                        new Rectangle2D.Double(4, 2, getWidth() - 8, getHeight() - 4));
            }
        } finally {
            g.dispose();
        }
        return img;
    }
}
