package org.meridian.maps;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.Montage;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.montage.StandardSystem;
import org.meridian.spline.Quantity;
import org.meridian.spline.SplineParameters;
import org.meridian.spline.TestFields;

class MapMakerTest {
    private static final Montage TEN_TEN = StandardSystem.TEN_TEN.montage();

    private static double[] random(int n, long seed) {
        Random r = new Random(seed);
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = 5 * r.nextGaussian();
        }
        return v;
    }

    @Test
    void mapOfValuesPlusAConstantIsTheMapPlusThatConstant() {
        MapMaker maker = MapMaker.of(TEN_TEN, SplineParameters.defaults(), Quantity.POTENTIAL, MapExtent.electrodes(), 64);
        double[] v = random(TEN_TEN.size(), 1);
        double[] shifted = v.clone();
        for (int i = 0; i < shifted.length; i++) {
            shifted[i] += 3.25;
        }
        float[] a = maker.map(v, Unit.MICROVOLT, "").values();
        float[] b = maker.map(shifted, Unit.MICROVOLT, "").values();
        int compared = 0;
        for (int p = 0; p < a.length; p++) {
            assertThat(Float.isNaN(a[p])).isEqualTo(Float.isNaN(b[p]));
            if (!Float.isNaN(a[p])) {
                // the spline reproduces constants exactly through c₀ (Perrin et al., 1989)
                assertThat((double) b[p]).isCloseTo(a[p] + 3.25, within(1e-3));
                compared++;
            }
        }
        assertThat(compared).isGreaterThan(2000);
    }

    @Test
    void headExtentStopsAtTheOutlineAndElectrodeExtentCoversEveryElectrode() {
        double[] v = random(TEN_TEN.size(), 2);
        ScalpMap head = MapMaker.of(TEN_TEN, SplineParameters.defaults(), Quantity.POTENTIAL, MapExtent.head(), 80)
                .map(v, Unit.MICROVOLT, "");
        MapGrid g = head.grid();
        for (int row = 0; row < g.size(); row++) {
            for (int col = 0; col < g.size(); col++) {
                double r = Math.hypot(g.x(col), g.y(row));
                if (r > 1 + 1.6 * g.step()) {
                    assertThat(head.value(col, row)).isNaN();
                } else if (r < 1) {
                    assertThat(head.value(col, row)).isNotNaN();
                }
            }
        }
        MapLayout layout = new MapLayout(TEN_TEN, MapExtent.electrodes());
        for (int i = 0; i < layout.electrodeCount(); i++) {
            double[] p = layout.position(i);
            assertThat(layout.region().contains(p[0], p[1])).as(TEN_TEN.labels().get(i)).isTrue();
        }
        // the 10-10 positions reach 22.5° below the equator (radius 1.25); the margin adds at most 0.06
        assertThat(layout.region().halfWidth()).isBetween(1.25, 1.25 + 0.06 + 1e-9);
    }

    @Test
    void manyMapsAtOnceEqualMapsOneByOneAndWindowsAreMeans() {
        MapMaker maker = MapMaker.of(TEN_TEN, SplineParameters.defaults(), Quantity.CSD, MapExtent.electrodes(), 48);
        TimeAxis axis = new TimeAxis(0, 1000, 5);
        int n = TEN_TEN.size();
        float[] values = new float[n * 5];
        Random r = new Random(3);
        for (int i = 0; i < values.length; i++) {
            values[i] = (float) r.nextGaussian();
        }
        Waveforms w = new Waveforms(TEN_TEN.labels(), axis, Unit.MICROVOLT, values);
        List<ScalpMap> maps = maker.maps(w, List.of(MapMoment.at(2), MapMoment.window(1, 3)));
        assertThat(maps.get(0).title()).isEqualTo("2 ms");
        assertThat(maps.get(1).title()).isEqualTo("1–3 ms");
        assertThat(maps.get(1).unitLabel()).isEqualTo("CSD (µV/m²)");
        double[] at2 = new double[n];
        double[] mean = new double[n];
        for (int c = 0; c < n; c++) {
            at2[c] = w.value(c, 2);
            mean[c] = (w.value(c, 1) + w.value(c, 2) + w.value(c, 3)) / 3.0;
        }
        float[] one = maker.map(at2, Unit.MICROVOLT, "").values();
        float[] windowMean = maker.map(mean, Unit.MICROVOLT, "").values();
        float[] batchOne = maps.get(0).values();
        float[] batchWindow = maps.get(1).values();
        for (int p = 0; p < one.length; p++) {
            if (!Float.isNaN(one[p])) {
                assertThat(batchOne[p]).isEqualTo(one[p]);
                assertThat((double) batchWindow[p]).isCloseTo(windowMean[p], within(1e-3 * Math.abs(windowMean[p]) + 1e-2));
            }
        }
    }

    @Test
    void csdMapsOfCsdDataAreRefused() {
        MapMaker maker = MapMaker.of(TEN_TEN, SplineParameters.defaults(), Quantity.CSD, MapExtent.head(), 32);
        assertThatThrownBy(() -> maker.map(new double[TEN_TEN.size()], Unit.MICROVOLT_PER_SQUARE_METRE, ""))
                .isInstanceOf(BadInputException.class).hasMessageContaining("already CSD");
    }

    @Test
    void weightMemoryIsPixelsTimesColumnsOfFloats() {
        // arithmetic: 256² pixels × (64 channels + 20 low-degree columns) × 4 bytes per float
        assertThat(MapMaker.weightBytes(256, 64)).isEqualTo(65536L * 84 * 4);
        // 2048² pixels of 345 channels (the audit's failing case): 6.1 GB
        assertThat(MapMaker.weightBytes(2048, 345)).isEqualTo(4194304L * 365 * 4);
        long budget = 3L << 30;
        int r = MapMaker.largestResolution(345, budget);
        assertThat(MapMaker.weightBytes(r, 345)).isLessThanOrEqualTo(budget);
        assertThat(MapMaker.weightBytes(r + 1, 345)).isGreaterThan(budget);
        assertThat(MapMaker.largestResolution(64, MapMaker.weightBytes(256, 64))).isEqualTo(256);
    }
}
