package org.meridian.maps;

import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.meridian.core.BadInputException;

/**
 * A row of scalp maps of one montage with one shared colour scale and a single colour bar at the
 * right: every map uses the same limits, so equal colours mean equal values across the strip.
 * Each map is titled above (e.g. {@code 350 ms}). Immutable.
 */
public final class MapStrip implements Drawing {
    /** Title band height as a fraction of a map's side. */
    private static final double TITLE = 0.16;
    /** Colour-bar width as a fraction of a map's side. */
    private static final double BAR = 0.5;
    /** Gap between maps as a fraction of a map's side. */
    private static final double GAP = 0.06;
    private static final Color INK = new Color(0x26, 0x26, 0x26);

    private final List<ScalpMap> maps;
    private final ColourLimits limits;
    private final MapStyle style;

    public MapStrip(List<ScalpMap> maps, ColourLimits limits, MapStyle style) {
        if (maps.isEmpty()) {
            throw new BadInputException("a map strip needs at least one map");
        }
        for (ScalpMap m : maps) {
            if (m.unit() != maps.get(0).unit()) {
                throw new BadInputException("maps in " + maps.get(0).unitLabel() + " and "
                        + m.unitLabel() + " cannot share a colour bar");
            }
        }
        this.maps = List.copyOf(maps);
        this.limits = limits;
        this.style = style;
    }

    /** A strip whose limits are symmetric and cover every map ({@link ColourLimits#automatic(List)}). */
    public static MapStrip withAutomaticLimits(List<ScalpMap> maps, MapStyle style) {
        return new MapStrip(maps, ColourLimits.automatic(maps), style);
    }

    public List<ScalpMap> maps() {
        return maps;
    }

    public ColourLimits limits() {
        return limits;
    }

    public MapStyle style() {
        return style;
    }

    @Override
    public double aspectRatio() {
        int n = maps.size();
        return (n + (n - 1) * GAP + BAR) / (1 + TITLE);
    }

    @Override
    public void draw(Graphics2D target, Rectangle2D bounds) {
        int n = maps.size();
        double side = Math.min(bounds.getWidth() / (n + (n - 1) * GAP + BAR), bounds.getHeight() / (1 + TITLE));
        double width = side * (n + (n - 1) * GAP + BAR);
        double height = side * (1 + TITLE);
        double x0 = bounds.getX() + (bounds.getWidth() - width) / 2;
        double y0 = bounds.getY() + (bounds.getHeight() - height) / 2;
        Graphics2D g = (Graphics2D) target.create();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 1).deriveFont((float) (side * 0.07 * style.sizeFactor())));
            FontMetrics fm = g.getFontMetrics();
            for (int i = 0; i < n; i++) {
                double x = x0 + i * side * (1 + GAP);
                ScalpMap map = maps.get(i);
                g.setColor(INK);
                g.drawString(map.title(), (float) (x + (side - fm.stringWidth(map.title())) / 2),
                        (float) (y0 + side * TITLE * 0.7));
                MapRenderer.draw(g, new Rectangle2D.Double(x, y0 + side * TITLE, side, side), map, limits, style);
            }
            double barX = x0 + n * side + (n - 1) * side * GAP + side * GAP;
            ColourBar.draw(g, new Rectangle2D.Double(barX, y0 + side * TITLE * 0.5, side * BAR - side * GAP,
                    side * (1 + TITLE * 0.5)), style.scale(), limits, maps.get(0).unitLabel(), style.sizeFactor());
        } finally {
            g.dispose();
        }
    }
}
