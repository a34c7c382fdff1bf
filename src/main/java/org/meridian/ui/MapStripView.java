package org.meridian.ui;

import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import javax.swing.JComponent;
import org.meridian.maps.ColourLimits;
import org.meridian.maps.MapStrip;
import org.meridian.maps.MapStyle;

/**
 * The span view's map strip: maps evenly spaced across the window with one colour bar
 * ({@link MapStrip}), in the colour range of the {@link ViewState} (automatic: the map wave's
 * largest value over all samples, as the scalp map; symmetric: the strip's own largest value).
 */
final class MapStripView extends JComponent {
    private final Workbench bench;
    private SpanData data;

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
        ColourRange r = bench.state().colourRange();
        return switch (r.mode()) {
            case AUTO -> ColourLimits.automatic(w == null ? data.stripMaxAbs() : w.maxAbs(data.quantity()));
            case SYMMETRIC -> ColourLimits.automatic(data.stripMaxAbs());
            case LOCKED -> ColourLimits.symmetric(r.limit());
        };
    }

    @Override
    protected void paintComponent(Graphics graphics) {
        Graphics2D g = (Graphics2D) graphics.create();
        try {
            Theme theme = bench.theme();
            g.setColor(theme.plotBackground());
            g.fillRect(0, 0, getWidth(), getHeight());
            if (theme != Theme.LIGHT) {
                g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
                g.setColor(theme.mapCard());
                g.fillRoundRect(3, 2, getWidth() - 6, getHeight() - 4, 14, 14);
            }
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            if (data == null || data.strip().isEmpty()) {
                return;
            }
            int n = data.strip().size();
            double w = getWidth() - 8;
            double h = getHeight() - 4;
            double side = Math.min(w / (n + (n - 1) * 0.06 + 0.5), h / 1.16);
            double readable = ChartStyle.tickFont().getSize2D() / (0.07 * side);
            MapStyle style = MapStyle.defaults().withScale(bench.state().colourScale())
                    .withHighlighted(bench.state().selectedChannels())
                    .withSizeFactor(Math.max(1, readable));
            new MapStrip(data.strip(), limits(), style).draw(g, new Rectangle2D.Double(4, 2, w, h));
        } finally {
            g.dispose();
        }
    }
}
