package org.meridian.maps;

import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.font.FontRenderContext;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.meridian.core.BadInputException;

/**
 * A row of scalp maps of one montage with one shared colour scale and a single colour bar at the
 * right: every map uses the same limits, so equal colours mean equal values across the strip.
 * Each map is titled above (e.g. {@code 350 ms}). When electrode labels are drawn, the strip keeps
 * room for those that reach beyond a map's square (Iz below the head, T9/T10 beside it), so no
 * label is cut at the figure's edge or runs into the next map. Immutable.
 */
public final class MapStrip implements Drawing {
    /** Title band height as a fraction of a map's side. */
    private static final double TITLE = 0.16;
    /** Colour-bar width as a fraction of a map's side. */
    private static final double BAR = 0.5;
    /** Gap between maps as a fraction of a map's side. */
    private static final double GAP = 0.06;
    private static final Color INK = new Color(0x26, 0x26, 0x26);
    /** The map side (device units) at which the label room for the aspect ratio is measured. */
    private static final double REFERENCE_SIDE = 400;

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
        Room room = room(REFERENCE_SIDE, new FontRenderContext(null, true, true));
        return room.widthInSides(maps.size()) / room.heightInSides();
    }

    /**
     * Where map {@code i} is drawn when the strip fills the bounds: its square (title above it,
     * labels reaching beyond it), for callers that locate points on the drawn maps.
     */
    public Rectangle2D mapSquare(Rectangle2D bounds, int i, FontRenderContext frc) {
        Placement at = place(bounds, frc);
        return new Rectangle2D.Double(at.mapX(i), at.mapY(), at.side(), at.side());
    }

    @Override
    public void draw(Graphics2D target, Rectangle2D bounds) {
        int n = maps.size();
        Graphics2D g = (Graphics2D) target.create();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            Placement at = place(bounds, g.getFontRenderContext());
            double side = at.side();
            g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 1).deriveFont((float) (side * 0.07 * style.sizeFactor())));
            FontMetrics fm = g.getFontMetrics();
            for (int i = 0; i < n; i++) {
                double x = at.mapX(i);
                ScalpMap map = maps.get(i);
                g.setColor(INK);
                g.drawString(map.title(), (float) (x + (side - fm.stringWidth(map.title())) / 2),
                        (float) (at.mapY() - side * TITLE * 0.3));
                MapRenderer.draw(g, new Rectangle2D.Double(x, at.mapY(), side, side), map, limits, style);
            }
            double barX = at.mapX(n - 1) + side + Math.max(GAP, at.room().right()) * side;
            ColourBar.draw(g, new Rectangle2D.Double(barX, at.mapY() - side * TITLE * 0.5, side * BAR - side * GAP,
                    side * (1 + TITLE * 0.5)), style.scale(), limits, maps.get(0).unitLabel(), style.sizeFactor());
        } finally {
            g.dispose();
        }
    }

    /**
     * Room the electrode labels need beyond a map's square, in map sides: at the strip's left
     * and right ends, between maps (at least the usual gap) and below the maps.
     */
    private record Room(double left, double right, double between, double bottom) {
        double widthInSides(int n) {
            return left + n + (n - 1) * between + Math.max(GAP, right) + BAR - GAP;
        }

        double heightInSides() {
            return TITLE + 1 + bottom;
        }
    }

    /** The strip's geometry in given bounds: the map side, the first map's corner and the room. */
    private record Placement(double side, double x0, double mapY, Room room) {
        double mapX(int i) {
            return x0 + room.left() * side + i * side * (1 + room.between());
        }
    }

    private Room room(double side, FontRenderContext frc) {
        Rectangle2D square = new Rectangle2D.Double(0, 0, side, side);
        double left = 0;
        double right = 0;
        double bottom = 0;
        for (ScalpMap m : maps) {
            Rectangle2D labels = MapRenderer.labelBounds(square, m.layout(), style, frc);
            if (labels != null) {
                left = Math.max(left, -labels.getMinX() / side);
                right = Math.max(right, (labels.getMaxX() - side) / side);
                bottom = Math.max(bottom, (labels.getMaxY() - side) / side);
            }
        }
        // a little air beyond the outermost label
        double air = left + right + bottom > 0 ? 0.01 : 0;
        return new Room(left > 0 ? left + air : 0, right > 0 ? right + air : 0,
                Math.max(GAP, left + right + 2 * air), bottom > 0 ? bottom + air : 0);
    }

    /**
     * The largest map side whose strip fits the bounds, centred in them. Labels keep a fixed
     * size in map sides except where their fonts reach the smallest size, so the room is
     * measured again at the side found (twice suffices: a smaller side only needs more room).
     */
    private Placement place(Rectangle2D bounds, FontRenderContext frc) {
        int n = maps.size();
        Room room = room(REFERENCE_SIDE, frc);
        double side = 0;
        for (int pass = 0; pass < 3; pass++) {
            side = Math.min(bounds.getWidth() / room.widthInSides(n), bounds.getHeight() / room.heightInSides());
            Room again = room(side, frc);
            room = new Room(Math.max(room.left(), again.left()), Math.max(room.right(), again.right()),
                    Math.max(room.between(), again.between()), Math.max(room.bottom(), again.bottom()));
        }
        side = Math.min(bounds.getWidth() / room.widthInSides(n), bounds.getHeight() / room.heightInSides());
        double x0 = bounds.getX() + (bounds.getWidth() - side * room.widthInSides(n)) / 2;
        double y0 = bounds.getY() + (bounds.getHeight() - side * room.heightInSides()) / 2;
        return new Placement(side, x0, y0 + side * TITLE, room);
    }
}
