package org.meridian.maps;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.meridian.core.Montage;
import org.meridian.montage.StandardSystem;
import org.meridian.spline.Quantity;
import org.meridian.spline.SphericalSpline;
import org.meridian.spline.SplineParameters;
import org.meridian.spline.SplineWeights;
import org.meridian.spline.TestFields;
import org.meridian.spline.TestFields.Field;

class MapRasterTest {
    /** Two opposite dipolar sources of different depth: a realistic ERP-like field. */
    private static final Field TWO_SOURCES = (x, y, z) ->
            6 * Math.exp(3 * (-0.5 * x + 0.35 * y + 0.79 * z - 1)) - 4 * Math.exp(4 * (0.55 * x - 0.45 * y + 0.7 * z - 1))
            + TestFields.dipolar(2, 0, 1, 0.2).at(x, y, z);

    /**
     * The coarse-grid-and-bilinear path against the exact spline at every display pixel. Worst
     * errors reached (display 256): 0.03 % of the map's range for the dipole (coarse 64 or 80),
     * 0.10 % for the potential and 0.19 % for the CSD of the two sources (coarse 80).
     */
    @ParameterizedTest(name = "{0} {1} {2}, coarse {3}")
    @CsvSource({
        "10-20, POTENTIAL, dipole, 64", "10-10, POTENTIAL, dipole, 80", "10-10, CSD, dipole, 80",
        "10-10, POTENTIAL, two, 80", "10-10, CSD, two, 80", "10-5, POTENTIAL, two, 80", "10-5, CSD, two, 80"})
    void upsampledMapStaysWithinHalfAPercentOfTheExactSpline(String system, Quantity quantity, String field, int coarse) {
        Montage m = StandardSystem.parse(system).montage();
        SphericalSpline spline = SphericalSpline.fit(m, SplineParameters.defaults());
        MapLayout layout = new MapLayout(m, MapExtent.electrodes());
        MapRaster raster = new MapRaster(spline, quantity, layout, 256, coarse);
        Field f = field.equals("dipole") ? TestFields.dipolar(10, -1, 0.4, 0.3) : TWO_SOURCES;
        double[] v = f.on(m);
        float[] fast = new float[256 * 256];
        raster.values(v, fast);

        MapGrid display = raster.displayGrid();
        int count = 0;
        int[] inside = new int[fast.length];
        for (int p = 0; p < fast.length; p++) {
            if (!Float.isNaN(fast[p])) {
                inside[count++] = p;
            }
        }
        int[] pixels = java.util.Arrays.copyOf(inside, count);
        SplineWeights exactWeights = spline.weightsAt(quantity, display.unitVectors(pixels));
        float[] exact = exactWeights.apply(v);
        double lo = Double.MAX_VALUE;
        double hi = -Double.MAX_VALUE;
        double worst = 0;
        for (int k = 0; k < pixels.length; k++) {
            lo = Math.min(lo, exact[k]);
            hi = Math.max(hi, exact[k]);
            worst = Math.max(worst, Math.abs(exact[k] - fast[pixels[k]]));
        }
        // DESIGN §5: a coarser grid upsampled to display size may err by at most 0.5 % of the map's range
        assertThat(worst / (hi - lo)).isLessThan(0.005);
        assertThat(count).isGreaterThan(256 * 256 / 2);
    }

    @Test
    void renderColoursEveryMapPixelAndLeavesTheRestTransparent() {
        Montage m = StandardSystem.TEN_TEN.montage();
        SphericalSpline spline = SphericalSpline.fit(m, SplineParameters.defaults());
        MapRaster raster = new MapRaster(spline, Quantity.POTENTIAL, new MapLayout(m, MapExtent.head()), 128, 64);
        int[] argb = new int[128 * 128];
        int[] table = ColourScales.DIVERGING.argbTable(256);
        raster.render(TestFields.dipolar(10, -1, 0, 0).on(m), ColourLimits.symmetric(10), table, argb);
        MapGrid g = raster.displayGrid();
        for (int row = 0; row < 128; row++) {
            for (int col = 0; col < 128; col++) {
                boolean inHead = Math.hypot(g.x(col), g.y(row)) <= 1;
                assertThat(argb[row * 128 + col] != 0).isEqualTo(inHead);
            }
        }
        // a centred dipole toward the left ear: V = 3 p cosθ / (4πσR²) (bioelectric field textbook)
        // is positive on the left, drawn on the left (common practice): warm left edge, cool right
        int leftEdge = argb[64 * 128 + (int) Math.round(g.column(-0.95))];
        int rightEdge = argb[64 * 128 + (int) Math.round(g.column(0.95))];
        assertThat((leftEdge >> 16) & 0xff).isGreaterThan(leftEdge & 0xff);
        assertThat(rightEdge & 0xff).isGreaterThan((rightEdge >> 16) & 0xff);
    }

    @Test
    void renderColoursAsymmetricLimitsAsTheExactMapDoes() {
        Montage m = StandardSystem.TEN_TEN.montage();
        SphericalSpline spline = SphericalSpline.fit(m, SplineParameters.defaults());
        MapRaster raster = new MapRaster(spline, Quantity.POTENTIAL, new MapLayout(m, MapExtent.head()), 128, 64);
        double[] v = TestFields.dipolar(10, -1, 0, 0).on(m);
        float[] values = new float[128 * 128];
        raster.values(v, values);
        int[] argb = new int[128 * 128];
        int[] table = ColourScales.DIVERGING.argbTable(1024);
        ColourLimits limits = new ColourLimits(-2, 8);
        raster.render(v, limits, table, argb);
        for (int p = 0; p < values.length; p++) {
            if (!Float.isNaN(values[p])) {
                // the same colour index as ColourLimits.position gives the exact path (MapRenderer.image),
                // allowing one step for rounding in single precision
                int expected = (int) Math.round(limits.position(values[p]) * (table.length - 1));
                int got = indexOf(table, argb[p], expected);
                assertThat(Math.abs(got - expected)).isLessThanOrEqualTo(1);
            }
        }
    }

    private static int indexOf(int[] table, int colour, int near) {
        for (int d = 0; d < table.length; d++) {
            if (near - d >= 0 && table[near - d] == colour) {
                return near - d;
            }
            if (near + d < table.length && table[near + d] == colour) {
                return near + d;
            }
        }
        return -1;
    }

    @Test
    void windowPathDrawsTheRasterWithHeadAndContoursOntoAnyGraphics() {
        Montage m = StandardSystem.TEN_TEN.montage();
        SphericalSpline spline = SphericalSpline.fit(m, SplineParameters.defaults());
        MapLayout layout = new MapLayout(m, MapExtent.electrodes());
        MapRaster raster = new MapRaster(spline, Quantity.POTENTIAL, layout, 160, 64);
        double[] v = TestFields.dipolar(10, 0, 1, 0).on(m);
        java.awt.image.BufferedImage frame = raster.newImage();
        ColourLimits limits = ColourLimits.symmetric(10);
        raster.render(v, limits, ColourScales.DIVERGING.argbTable(512), frame);

        java.awt.image.BufferedImage screen = new java.awt.image.BufferedImage(200, 200, java.awt.image.BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D g = screen.createGraphics();
        g.setColor(java.awt.Color.WHITE);
        g.fillRect(0, 0, 200, 200);
        java.awt.geom.Rectangle2D bounds = new java.awt.geom.Rectangle2D.Double(0, 0, 200, 200);
        MapRenderer.drawImage(g, bounds, layout, raster.displayGrid(), frame);
        ScalpMap contours = raster.coarseMap(v, org.meridian.core.Unit.MICROVOLT);
        MapRenderer.drawContours(g, bounds, contours, limits, MapStyle.defaults());
        MapRenderer.drawHeadAndElectrodes(g, bounds, layout, MapStyle.defaults().withMarkers(false));
        g.dispose();
        java.awt.geom.AffineTransform t = MapRenderer.planeToDevice(bounds, layout);
        java.awt.geom.Point2D front = t.transform(new java.awt.geom.Point2D.Double(0.35, 0.6), null);
        java.awt.geom.Point2D back = t.transform(new java.awt.geom.Point2D.Double(0.35, -0.6), null);
        int top = screen.getRGB((int) front.getX(), (int) front.getY());
        int bottom = screen.getRGB((int) back.getX(), (int) back.getY());
        // centred dipole toward the nose: V = 3 p cosθ / (4πσR²) (bioelectric field textbook) is
        // positive at the front, drawn at the top of the map (common practice: nose up)
        assertThat((top >> 16) & 0xff).isGreaterThan((top & 0xff) + 40);
        assertThat(bottom & 0xff).isGreaterThan(((bottom >> 16) & 0xff) + 40);
        // the coarse map's contours include the zero line across the middle
        assertThat(Contours.atSteps(contours, limits.contourStep())).anyMatch(Contours.Line::zero);
    }
}
