package org.meridian.ui;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.Objects;
import java.util.function.Function;
import org.meridian.core.Unit;
import org.meridian.maps.ColourBar;
import org.meridian.maps.ColourLimits;
import org.meridian.maps.ColourScale;
import org.meridian.maps.MapRaster;
import org.meridian.maps.MapRenderer;
import org.meridian.maps.MapStyle;
import org.meridian.maps.ScalpMap;

/**
 * One frame of the live scalp map through the maps package's fast path: the spline evaluated
 * on a coarse grid and upsampled to every device pixel of the map's square ({@link MapRaster},
 * so the map stays sharp on HiDPI screens), the contour lines of the coarse grid, the head and
 * electrodes ({@link MapRenderer#drawHeadAndElectrodes}) and the colour bar ({@link ColourBar}).
 *
 * <p>Only the colours and contours change from one cursor step to the next, so the head with
 * its electrodes and the colour bar are drawn once into device-resolution layers and copied
 * while they stay the same. The raster's image covers exactly the map's square and is
 * transparent outside the map, so it is copied pixel for pixel, without a clip or resampling.
 * Used on the event thread only.
 */
final class LiveMap {
    /** Colours in the lookup table from the lower to the upper limit. */
    private static final int COLOURS = 1024;

    private final MapRaster raster;
    private final BufferedImage image;
    private ColourScale tableScale;
    private int[] table;
    private Layer head;
    private Layer bar;

    LiveMap(MapRaster raster) {
        this.raster = raster;
        this.image = raster.newImage();
    }

    MapRaster raster() {
        return raster;
    }

    /** Where the map's square goes in a panel (whole device pixels), with room for the colour bar. */
    static Rectangle2D mapBounds(double width, double height, double deviceScale) {
        double barWidth = Math.max(80, Math.min(124, width * 0.24));
        double side = Math.max(10, Math.min(width - barWidth - 12, height - 12));
        side = Math.floor(side * deviceScale) / deviceScale;
        double x = Math.max(6, Math.floor((width - barWidth - side) / 2));
        double y = Math.max(6, Math.floor((height - side) / 2));
        return new Rectangle2D.Double(x, y, side, side);
    }

    /** The colour bar's place beside a map. */
    static Rectangle2D barBounds(Rectangle2D map) {
        double side = map.getWidth();
        return new Rectangle2D.Double(map.getMaxX() + 6, map.getY() + side * 0.1,
                Math.max(70, Math.min(116, side * 0.3)), side * 0.8);
    }

    /**
     * Paints a frame from one value per spline channel into the map's bounds, the colour bar
     * beside it. {@code limitsOf} chooses the colour limits, given the frame's coarse map.
     * Contour lines are left out when {@code contours} is false (while the cursor moves fast).
     */
    Frame paint(Graphics2D g, Rectangle2D bounds, double[] values, Unit unit,
            Function<ScalpMap, ColourLimits> limitsOf, MapStyle style, boolean contours) {
        ScalpMap coarse = raster.coarseMap(values, unit);
        ColourLimits limits = limitsOf.apply(coarse);
        if (style.scale() != tableScale) {
            tableScale = style.scale();
            table = tableScale.argbTable(COLOURS);
        }
        raster.render(values, limits, table, image);
        double scale = g.getTransform().getScaleX();
        copy(g, image, bounds);
        if (contours && style.contours()) {
            MapRenderer.drawContours(g, bounds, coarse, limits, style);
        }
        Key headKey = new Key(bounds, scale, style, null, null);
        if (head == null || !head.key.equals(headKey)) {
            head = Layer.draw(headKey, bounds, scale, lg -> MapRenderer.drawHeadAndElectrodes(lg, bounds, raster.layout(), style));
        }
        copy(g, head.image, bounds);
        Rectangle2D barArea = barBounds(bounds);
        Key barKey = new Key(barArea, scale, style, limits, coarse.unitLabel());
        if (bar == null || !bar.key.equals(barKey)) {
            bar = Layer.draw(barKey, barArea, scale,
                    lg -> ColourBar.draw(lg, barArea, style.scale(), limits, coarse.unitLabel(), 1.0));
        }
        copy(g, bar.image, barArea);
        return new Frame(coarse, limits);
    }

    /** Copies a device-resolution image onto its area (a 1:1 copy when the scales agree). */
    private static void copy(Graphics2D g, BufferedImage img, Rectangle2D area) {
        Object saved = g.getRenderingHint(RenderingHints.KEY_INTERPOLATION);
        g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_NEAREST_NEIGHBOR);
        g.drawImage(img, (int) Math.round(area.getX()), (int) Math.round(area.getY()),
                (int) Math.round(area.getWidth()), (int) Math.round(area.getHeight()), null);
        if (saved != null) {
            g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, saved);
        }
    }

    /** What a frame showed: the coarse map and the colour limits. */
    record Frame(ScalpMap coarse, ColourLimits limits) {
    }

    /** What a cached layer depends on. */
    private record Key(Rectangle2D area, double scale, MapStyle style, ColourLimits limits, String unit) {
        @Override
        public boolean equals(Object o) {
            return o instanceof Key k && k.area.equals(area) && k.scale == scale && k.style.equals(style)
                    && Objects.equals(k.limits, limits) && Objects.equals(k.unit, unit);
        }

        @Override
        public int hashCode() {
            return Objects.hash(area, scale, style, limits, unit);
        }
    }

    /** A transparent image of an area at device resolution, drawn once. */
    private record Layer(Key key, BufferedImage image) {
        static Layer draw(Key key, Rectangle2D area, double scale,
                java.util.function.Consumer<Graphics2D> painter) {
            int w = Math.max(1, (int) Math.round(Math.round(area.getWidth()) * scale));
            int h = Math.max(1, (int) Math.round(Math.round(area.getHeight()) * scale));
            BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB_PRE);
            Graphics2D lg = img.createGraphics();
            try {
                lg.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
                lg.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
                lg.scale(scale, scale);
                lg.translate(-Math.round(area.getX()), -Math.round(area.getY()));
                painter.accept(lg);
            } finally {
                lg.dispose();
            }
            return new Layer(key, img);
        }
    }
}
