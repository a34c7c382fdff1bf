package org.meridian.maps;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.font.FontRenderContext;
import java.awt.geom.AffineTransform;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.BadInputException;
import org.meridian.core.Montage;
import org.meridian.core.Unit;
import org.meridian.figure.ExportFormat;
import org.meridian.montage.StandardSystem;
import org.meridian.spline.Quantity;
import org.meridian.spline.SplineParameters;
import org.meridian.spline.TestFields;

class MapRenderingTest {
    private static final Montage TEN_TEN = StandardSystem.TEN_TEN.montage();

    /** Writes a one-map strip as PNG and reads it back, with the map's plane-to-pixel transform. */
    private static BufferedImage renderPng(ScalpMap map, Path file, int dpi, AffineTransform[] toPixel) throws Exception {
        MapStrip strip = new MapStrip(List.of(map), ColourLimits.symmetric(10), MapStyle.defaults().withContours(false)
                .withMarkers(false));
        double widthPt = 300;
        ExportFormat.PNG.write(strip, file, widthPt / ExportFormat.PT_PER_MM, dpi);
        BufferedImage image = ImageIO.read(file.toFile());
        double heightPt = widthPt / strip.aspectRatio();
        Rectangle2D square = strip.mapSquare(new Rectangle2D.Double(0, 0, widthPt, heightPt), 0,
                new FontRenderContext(null, true, true));
        AffineTransform t = AffineTransform.getScaleInstance(dpi / 72.0, dpi / 72.0);
        t.concatenate(MapRenderer.planeToDevice(square, map.layout()));
        toPixel[0] = t;
        return image;
    }

    private static int pixel(BufferedImage image, AffineTransform toPixel, double x, double y) {
        Point2D p = toPixel.transform(new Point2D.Double(x, y), null);
        return image.getRGB((int) p.getX(), (int) p.getY()) & 0xffffff;
    }

    private static boolean warm(int rgb) {
        return ((rgb >> 16) & 0xff) > (rgb & 0xff) + 60;
    }

    private static boolean cool(int rgb) {
        return (rgb & 0xff) > ((rgb >> 16) & 0xff) + 60;
    }

    @Test
    void dipolarFieldHasItsPositivePoleOnTheExpectedSideOfThePng(@TempDir Path dir) throws Exception {
        MapMaker maker = MapMaker.of(TEN_TEN, SplineParameters.defaults(), Quantity.POTENTIAL, MapExtent.head(), 200);
        AffineTransform[] t = new AffineTransform[1];

        // a centred dipole toward the left ear: V = 3 p cosθ / (4πσR²) (bioelectric field
        // textbook) is positive on the left
        ScalpMap left = maker.map(TestFields.dipolar(10, -1, 0, 0).on(TEN_TEN), Unit.MICROVOLT, "left");
        BufferedImage image = renderPng(left, dir.resolve("left.png"), 144, t);
        // common practice: maps are drawn nose up with left on the left, so the positive (warm)
        // pole is at the left of the image
        assertThat(warm(pixel(image, t[0], -0.7, 0))).isTrue();
        assertThat(cool(pixel(image, t[0], 0.7, 0))).isTrue();
        Point2D leftPixel = t[0].transform(new Point2D.Double(-0.7, 0), null);
        Point2D rightPixel = t[0].transform(new Point2D.Double(0.7, 0), null);
        assertThat(leftPixel.getX()).isLessThan(rightPixel.getX());

        // a dipole toward the nose: positive at the front (same closed form), drawn at the top
        // of the image (common practice: nose up)
        ScalpMap front = maker.map(TestFields.dipolar(10, 0, 1, 0).on(TEN_TEN), Unit.MICROVOLT, "front");
        image = renderPng(front, dir.resolve("front.png"), 144, t);
        assertThat(warm(pixel(image, t[0], 0, 0.7))).isTrue();
        assertThat(cool(pixel(image, t[0], 0, -0.7))).isTrue();
        Point2D top = t[0].transform(new Point2D.Double(0, 0.7), null);
        assertThat(top.getY()).isLessThan(image.getHeight() / 2.0);
        // outside the head outline the page stays white
        assertThat(pixel(image, t[0], 1.0, 1.0)).isEqualTo(0xffffff);
    }

    @Test
    void vectorFormatsAreWrittenWithTheUnitOnTheColourBar(@TempDir Path dir) throws Exception {
        MapMaker maker = MapMaker.of(TEN_TEN, SplineParameters.defaults(), Quantity.CSD, MapExtent.electrodes(), 96);
        ScalpMap map = maker.map(TestFields.dipolar(10, 0, 1, 0).on(TEN_TEN), Unit.MICROVOLT, "300 ms");
        MapStrip strip = MapStrip.withAutomaticLimits(List.of(map, map), MapStyle.defaults().withLabels(true));
        Path svg = dir.resolve("maps.svg");
        ExportFormat.of(svg).write(strip, svg, 400 / ExportFormat.PT_PER_MM, 150);
        String text = Files.readString(svg, StandardCharsets.UTF_8);
        assertThat(text).startsWith("<?xml").contains("<svg").contains("CSD (µV/m²)").contains("300 ms");
        Path pdf = dir.resolve("maps.pdf");
        ExportFormat.of(pdf).write(strip, pdf, 400 / ExportFormat.PT_PER_MM, 150);
        assertThat(new String(Files.readAllBytes(pdf), 0, 5, StandardCharsets.ISO_8859_1)).isEqualTo("%PDF-");
        try (var files = Files.list(dir)) {
            // written through AtomicFiles: no temporary file left behind
            assertThat(files.map(p -> p.getFileName().toString())).containsExactlyInAnyOrder("maps.svg", "maps.pdf");
        }
        assertThatThrownBy(() -> ExportFormat.of(dir.resolve("maps.gif"))).isInstanceOf(BadInputException.class)
                .hasMessageEndingWith("maps.gif: the figure must be a .svg, .pdf, .png or .tiff file");
    }

    @Test
    void electrodeLabelsStayInsideTheFigure() {
        MapMaker maker = MapMaker.of(TEN_TEN, SplineParameters.defaults(), Quantity.POTENTIAL, MapExtent.electrodes(), 64);
        ScalpMap map = maker.map(TestFields.dipolar(10, 0, 1, 0).on(TEN_TEN), Unit.MICROVOLT, "300 ms");
        MapStrip strip = new MapStrip(List.of(map, map, map), ColourLimits.symmetric(10),
                MapStyle.defaults().withLabels(true));
        int width = 900;
        int height = (int) Math.floor(width / strip.aspectRatio());
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, width, height);
        Rectangle2D bounds = new Rectangle2D.Double(0, 0, width, height);
        strip.draw(g, bounds);
        FontRenderContext frc = g.getFontRenderContext();
        g.dispose();
        Rectangle2D previous = null;
        for (int i = 0; i < 3; i++) {
            Rectangle2D square = strip.mapSquare(bounds, i, frc);
            Rectangle2D labels = MapRenderer.labelBounds(square, map.layout(), strip.style(), frc);
            // Iz's label lies below the head and T9/T10's beside it: all inside the figure
            assertThat(bounds.contains(labels)).as("map " + i + ": " + labels).isTrue();
            if (previous != null) {
                // and no label reaches the neighbouring map's labels
                assertThat(labels.getMinX()).isGreaterThanOrEqualTo(previous.getMaxX());
            }
            previous = labels;
        }
        // the Iz label is drawn inside its box: dark ink pixels (all channels low, unlike any map colour)
        Rectangle2D iz = MapRenderer.labelBounds(strip.mapSquare(bounds, 0, frc), map.layout(),
                MapStyle.defaults().withHighlighted(List.of("Iz")), frc);
        int ink = 0;
        for (int y = (int) iz.getMinY(); y < Math.min(height, iz.getMaxY()); y++) {
            for (int x = (int) iz.getMinX(); x < iz.getMaxX(); x++) {
                int rgb = image.getRGB(x, y);
                ink += ((rgb >> 16) & 0xff) < 80 && ((rgb >> 8) & 0xff) < 80 && (rgb & 0xff) < 80 ? 1 : 0;
            }
        }
        assertThat(iz.getMaxY()).isLessThanOrEqualTo(height);
        assertThat(ink).isGreaterThan(5);
    }

    @Test
    void clickingNearAMarkerFindsItsElectrode() {
        MapLayout layout = new MapLayout(TEN_TEN, MapExtent.electrodes());
        Rectangle2D bounds = new Rectangle2D.Double(10, 20, 300, 300);
        double[] cz = layout.position(TEN_TEN.labels().indexOf("Cz"));
        Point2D at = MapRenderer.planeToDevice(bounds, layout).transform(new Point2D.Double(cz[0], cz[1]), null);
        assertThat(MapRenderer.electrodeAt(bounds, layout, new Point2D.Double(at.getX() + 2, at.getY() - 1), 6))
                .contains("Cz");
        assertThat(MapRenderer.electrodeAt(bounds, layout, new Point2D.Double(15, 25), 6)).isEmpty();
    }
}
