package org.meridian.montage;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;

class SphereFitTest {
    @Test
    void recoversCentreAndRadiusOfANoisySphere() {
        // Synthetic check (common practice): points on a known sphere (centre (3, -7, 40) mm,
        // radius 92 mm, upper cap like a cap of electrodes) with 0.5 mm Gaussian noise.
        SplittableRandom rnd = new SplittableRandom(7);
        double[][] pts = new double[120][];
        for (int i = 0; i < pts.length; i++) {
            double theta = Math.acos(rnd.nextDouble(-0.3, 1.0));
            double phi = rnd.nextDouble(0, 2 * Math.PI);
            double r = 92 + 0.5 * gaussian(rnd);
            pts[i] = new double[] {3 + r * Math.sin(theta) * Math.cos(phi),
                -7 + r * Math.sin(theta) * Math.sin(phi), 40 + r * Math.cos(theta)};
        }
        SphereFit f = SphereFit.fit(pts);
        assertThat(f.cx()).isCloseTo(3, within(0.3));
        assertThat(f.cy()).isCloseTo(-7, within(0.3));
        assertThat(f.cz()).isCloseTo(40, within(0.3));
        assertThat(f.radius()).isCloseTo(92, within(0.3));
        assertThat(f.rms()).isCloseTo(0.5, within(0.15));
    }

    @Test
    void measuredMontageIsCentredAndNormalised() {
        Montage standard = StandardSystem.TEN_TWENTY.montage();
        List<String> labels = new ArrayList<>();
        double[][] pts = new double[standard.size()][];
        for (int i = 0; i < standard.size(); i++) {
            Electrode e = standard.electrodes().get(i);
            labels.add(e.label());
            pts[i] = new double[] {10 + 85 * e.x(), 20 + 85 * e.y(), -5 + 85 * e.z()};
        }
        Montage m = SphereFit.montageFromMeasured(labels, pts, "test");
        for (int i = 0; i < standard.size(); i++) {
            Electrode a = standard.electrodes().get(i);
            Electrode b = m.electrodes().get(i);
            assertThat(a.cosineTo(b)).as(a.label()).isCloseTo(1.0, within(1e-9));
        }
    }

    @Test
    void coplanarPositionsAreRejected() {
        double[][] flat = {{0, 0, 0}, {1, 0, 0}, {0, 1, 0}, {1, 1, 0}, {2, 1, 0}};
        assertThatThrownBy(() -> SphereFit.montageFromMeasured(
                List.of("a", "b", "c", "d", "e"), flat, "flat.tsv"))
                .isInstanceOf(BadInputException.class)
                .hasMessageContaining("flat.tsv");
    }

    private static double gaussian(SplittableRandom rnd) {
        double u = rnd.nextDouble();
        double v = rnd.nextDouble();
        return Math.sqrt(-2 * Math.log(1 - u)) * Math.cos(2 * Math.PI * v);
    }
}
