package org.meridian.maps;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.awt.geom.PathIterator;
import java.awt.geom.Path2D;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.Montage;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.montage.StandardSystem;
import org.meridian.spline.SplineParameters;
import org.meridian.spline.Quantity;

/** Contours, limits, moments and regions. */
class MapPartsTest {

    /** A map on a full 41 × 41 grid over [−1, 1]² with values f(x, y). */
    private static ScalpMap mapOf(java.util.function.DoubleBinaryOperator f) {
        MapLayout layout = new MapLayout(StandardSystem.TEN_TWENTY.montage(), MapExtent.head());
        MapGrid grid = MapGrid.pixels(41, 1.0);
        float[] v = new float[41 * 41];
        for (int row = 0; row < 41; row++) {
            for (int col = 0; col < 41; col++) {
                v[row * 41 + col] = (float) f.applyAsDouble(grid.x(col), grid.y(row));
            }
        }
        return new ScalpMap(layout, grid, v, Unit.MICROVOLT, "");
    }

    private static List<double[]> points(Path2D path) {
        List<double[]> out = new ArrayList<>();
        double[] c = new double[6];
        for (PathIterator it = path.getPathIterator(null); !it.isDone(); it.next()) {
            int type = it.currentSegment(c);
            out.add(new double[] {c[0], c[1], type});
        }
        return out;
    }

    @Test
    void contourOfALinearFieldIsTheExactStraightLine() {
        ScalpMap map = mapOf((x, y) -> 2 * x + y);
        Path2D line = Contours.trace(map, 0.7);
        List<double[]> pts = points(line);
        assertThat(pts).hasSizeGreaterThan(10);
        for (double[] p : pts) {
            // marching squares interpolates linearly along cell edges, so it is exact for a linear field
            assertThat(2 * p[0] + p[1]).isCloseTo(0.7, within(1e-5));
        }
        // one connected polyline: a single moveTo
        assertThat(pts.stream().filter(p -> p[2] == PathIterator.SEG_MOVETO).count()).isEqualTo(1);
    }

    @Test
    void contourOfARadialFieldIsOneClosedLoopOnTheCircle() {
        ScalpMap map = mapOf((x, y) -> x * x + y * y);
        List<double[]> pts = points(Contours.trace(map, 0.25));
        double step = 2.0 / 41;
        for (double[] p : pts) {
            // the circle of radius 0.5; linear interpolation of x² + y² errs by at most step²/4
            assertThat(Math.hypot(p[0], p[1])).isCloseTo(0.5, within(step * step));
        }
        assertThat(pts.stream().filter(p -> p[2] == PathIterator.SEG_MOVETO).count()).isEqualTo(1);
        double[] first = pts.get(0);
        double[] last = pts.get(pts.size() - 1);
        assertThat(Math.hypot(first[0] - last[0], first[1] - last[1])).isLessThan(1e-9);
    }

    @Test
    void contourLevelsAreRoundStepsAndZeroIsMarked() {
        ScalpMap map = mapOf((x, y) -> 5 * x);
        List<Contours.Line> lines = Contours.atSteps(map, 2);
        assertThat(lines).extracting(Contours.Line::level).containsExactly(-4.0, -2.0, 0.0, 2.0, 4.0);
        assertThat(lines).filteredOn(Contours.Line::zero).hasSize(1);
    }

    @Test
    void noContoursBeyondFixedColourLimits() {
        // common practice: lines mark values the colour bar can show; saturated areas get none
        ScalpMap map = mapOf((x, y) -> 5 * x);
        assertThat(Contours.atSteps(map, 1, -2, 2)).extracting(Contours.Line::level)
                .containsExactly(-2.0, -1.0, 0.0, 1.0, 2.0);
        assertThat(Contours.atSteps(map, 2, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY))
                .extracting(Contours.Line::level).containsExactly(-4.0, -2.0, 0.0, 2.0, 4.0);
    }

    @Test
    void automaticLimitsAreSymmetricAndRound() {
        // common practice: symmetric limits about zero, rounded up to 1, 2, 2.5 or 5 × 10^k steps
        assertThat(ColourLimits.automatic(7.3)).isEqualTo(ColourLimits.symmetric(8));
        assertThat(ColourLimits.automatic(0.93)).isEqualTo(ColourLimits.symmetric(1));
        assertThat(ColourLimits.automatic(2400)).isEqualTo(ColourLimits.symmetric(2500));
        assertThat(ColourLimits.automatic(0)).isEqualTo(ColourLimits.symmetric(1));
        assertThat(ColourLimits.symmetric(10).ticks()).containsExactly(-10.0, -5.0, 0.0, 5.0, 10.0);
        assertThat(ColourLimits.symmetric(8).ticks()).containsExactly(-8.0, -6.0, -4.0, -2.0, 0.0, 2.0, 4.0, 6.0, 8.0);
        assertThat(ColourLimits.symmetric(10).contourStep()).isEqualTo(2.0);
        assertThat(ColourLimits.symmetric(1).format(-0.5)).isEqualTo("\u22120.5");
        assertThat(ColourLimits.parse("±5")).isEqualTo(ColourLimits.symmetric(5));
        assertThat(ColourLimits.parse("+-2.5")).isEqualTo(ColourLimits.symmetric(2.5));
        assertThat(ColourLimits.parse("auto")).isNull();
        assertThatThrownBy(() -> ColourLimits.parse("big")).isInstanceOf(BadInputException.class)
                .hasMessage("colour limits \"big\" are not auto, ±X (e.g. ±5) or LOWER:UPPER (e.g. -2:8)");
    }

    @Test
    void fixedLimitsMayBeAsymmetricWithZeroKeepingTheMiddleColour() {
        ColourLimits l = ColourLimits.parse("-2:8");
        assertThat(l).isEqualTo(new ColourLimits(-2, 8));
        assertThat(ColourLimits.parse(" \u22122 : 8 ")).isEqualTo(l);
        assertThat(ColourLimits.parse("2.5:1e1")).isEqualTo(new ColourLimits(2.5, 10));
        // Moreland (2009): a diverging scale's neutral middle marks the critical value, here zero;
        // M = max(|−2|, |8|) = 8 and position = (v + M) / 2M
        assertThat(l.halfRange()).isEqualTo(8);
        assertThat(l.position(0)).isEqualTo(0.5);
        assertThat(l.position(8)).isEqualTo(1.0);
        assertThat(l.position(-2)).isEqualTo(6.0 / 16);
        assertThat(l.position(-7)).as("clamped to the lower limit").isEqualTo(6.0 / 16);
        assertThat(l.position(12)).isEqualTo(1.0);
        assertThat(ColourLimits.symmetric(8).position(-2)).isEqualTo(l.position(-2));
        assertThat(new ColourLimits(2, 8).position(2)).isEqualTo(10.0 / 16);
        // the bar runs linearly from the lower to the upper limit
        assertThat(l.barFraction(3)).isEqualTo(0.5);
        assertThat(l.barFraction(-2)).isZero();
        // common practice: round ticks 1, 2, 2.5 or 5 × 10^k that land on both limits
        assertThat(l.ticks()).containsExactly(-2.0, 0.0, 2.0, 4.0, 6.0, 8.0);
        for (String bad : List.of("8:-2", "3:3", "1:", ":3", "a:b", "1:NaN", "0x1p3:9", "-2:8:9")) {
            assertThatThrownBy(() -> ColourLimits.parse(bad)).as(bad).isInstanceOf(BadInputException.class)
                    .hasMessageContaining("\"" + bad + "\"");
        }
        assertThatThrownBy(() -> ColourLimits.parse("1e999:2")).isInstanceOf(BadInputException.class)
                .hasMessage("colour limit 1e999 is too large");
    }

    @Test
    void windowEdgesSnapToTheNearestSampleWithTiesGoingInside() {
        TimeAxis axis = new TimeAxis(0, 500, 100);
        MapMoment.Window w = (MapMoment.Window) MapMoment.window(3, 11);
        // DESIGN §6.3: 3 ms lies halfway between samples 1 (2 ms) and 2 (4 ms): the tie goes inside, to 2
        assertThat(w.firstSample(axis)).isEqualTo(2);
        assertThat(w.lastSample(axis)).isEqualTo(5);
        assertThat(((MapMoment.Window) MapMoment.window(2.9, 11.1)).firstSample(axis)).isEqualTo(1);
        Waveforms data = new Waveforms(List.of("Cz"), axis, Unit.MICROVOLT, ramp(100));
        assertThat(w.valuesOf(data, new int[] {0})[0]).isCloseTo((2 + 3 + 4 + 5) / 4.0, within(1e-9));
        assertThatThrownBy(() -> MapMoment.at(500).valuesOf(data, new int[] {0}))
                .isInstanceOf(BadInputException.class).hasMessage("time 500 ms is outside the data (0 to 198 ms)");
        assertThatThrownBy(() -> MapMoment.window(20, 10)).isInstanceOf(BadInputException.class);
    }

    private static float[] ramp(int n) {
        float[] v = new float[n];
        for (int i = 0; i < n; i++) {
            v[i] = i;
        }
        return v;
    }

    @Test
    void regionOfARingOfElectrodesIsRoundAndOneSidedMontagesStayCovered() {
        MapLayout tenTwenty = new MapLayout(StandardSystem.TEN_TWENTY.montage(), MapExtent.electrodes(0.05));
        for (int k = 0; k < 36; k++) {
            double phi = Math.toRadians(10 * k);
            // the 10-20 ring lies on the unit circle, and so does the rim between its electrodes
            assertThat(tenTwenty.region().rimAt(phi)).isCloseTo(1.05, within(1e-6));
        }
        Montage left = StandardSystem.TEN_TEN.montage().select(List.of("F3", "F5", "C3", "C5", "P3", "P5", "FC3", "CP5"));
        MapLayout leftOnly = new MapLayout(left, MapExtent.electrodes());
        for (int i = 0; i < leftOnly.electrodeCount(); i++) {
            double[] p = leftOnly.position(i);
            assertThat(leftOnly.region().contains(p[0], p[1])).isTrue();
        }
        assertThat(leftOnly.region().contains(0.5, 0)).isFalse();
        assertThat(MapExtent.parse("electrodes:0.1").margin()).isEqualTo(0.1);
        assertThatThrownBy(() -> MapExtent.parse("everywhere")).isInstanceOf(BadInputException.class);
    }

    @Test
    void mapsNeedFourPositionedChannels() {
        Montage three = StandardSystem.TEN_TWENTY.montage().select(List.of("Fz", "Cz", "Pz"));
        assertThatThrownBy(() -> MapMaker.of(three, SplineParameters.defaults(), Quantity.POTENTIAL, MapExtent.head(), 32))
                .isInstanceOf(BadInputException.class).hasMessageStartingWith("maps, CSD and channel repair need at least 4");
    }
}
