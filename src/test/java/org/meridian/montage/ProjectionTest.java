package org.meridian.montage;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.meridian.core.Electrode;

class ProjectionTest {
    private static double[] plane(String label) {
        return Projection.toPlane(Labels.standardPosition(label).orElseThrow());
    }

    @Test
    void equatorBecomesTheUnitCircleNoseUpLeftOnTheLeft() {
        // Azimuthal equidistant projection (Snyder, 1987, "Map projections: a working manual"):
        // distance from the centre proportional to the angle from the centre point.
        assertThat(plane("Cz")).containsExactly(new double[] {0, 0}, within(1e-12));
        assertThat(plane("Fpz")).containsExactly(new double[] {0, 1}, within(1e-12));
        assertThat(plane("T7")).containsExactly(new double[] {-1, 0}, within(1e-12));
        assertThat(plane("T8")).containsExactly(new double[] {1, 0}, within(1e-12));
        assertThat(plane("Oz")).containsExactly(new double[] {0, -1}, within(1e-12));
        assertThat(plane("C3")).containsExactly(new double[] {-0.5, 0}, within(1e-12));
        assertThat(Math.hypot(plane("Nz")[0], plane("Nz")[1])).isCloseTo(1.25, within(1e-12));
    }

    @Test
    void inverseRecoversEveryPosition() {
        for (Electrode e : StandardSystem.TEN_FIVE.montage().electrodes()) {
            double[] p = Projection.toPlane(e);
            double[] back = Projection.toSphere(p[0], p[1]);
            assertThat(back).as(e.label()).containsExactly(new double[] {e.x(), e.y(), e.z()},
                    within(1e-12));
        }
    }
}
