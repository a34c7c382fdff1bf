package org.meridian.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class SourceComponentTest {
    private final SourceComponent c = new SourceComponent(100, 160, 200, -12);

    @Test
    void isZeroOutsideItsSpanAndReachesItsAmplitudeAtThePeak() {
        assertThat(c.valueAt(99)).isZero();
        assertThat(c.valueAt(100)).isZero();
        assertThat(c.valueAt(300)).isZero();
        assertThat(c.valueAt(400)).isZero();
        assertThat(c.valueAt(160)).isEqualTo(-12);
        assertThat(c.endMs()).isEqualTo(300);
    }

    @Test
    void risesAndFallsAsHalfCosines() {
        // a Hann half-window is half its height halfway (cos(π/2) = 0; common practice)
        assertThat(c.valueAt(130)).isCloseTo(-6, within(1e-12));
        assertThat(c.valueAt(230)).isCloseTo(-6, within(1e-12));
        // and ½(1 − cos(π/3)) = 1/4 a third of the way up
        assertThat(c.valueAt(120)).isCloseTo(-3, within(1e-12));
    }

    @Test
    void itsSlopeIsContinuousAtThePeakAndTheEnds() {
        double h = 1e-4;
        for (double t : new double[] {100, 160, 300}) {
            double left = (c.valueAt(t) - c.valueAt(t - h)) / h;
            double right = (c.valueAt(t + h) - c.valueAt(t)) / h;
            assertThat(left).as("at %s ms", t).isCloseTo(right, within(1e-3));
        }
    }

    @Test
    void shiftingAndScalingKeepTheShape() {
        SourceComponent moved = c.shifted(25).scaled(0.5);
        for (double t = 50; t < 400; t += 7) {
            assertThat(moved.valueAt(t + 25)).isCloseTo(0.5 * c.valueAt(t), within(1e-12));
        }
    }

    @Test
    void aPeakOutsideTheSpanIsRefused() {
        assertThatThrownBy(() -> new SourceComponent(100, 90, 50, 1))
                .hasMessageContaining("peak (90.0 ms) must lie after its onset (100.0 ms)");
        assertThatThrownBy(() -> new SourceComponent(100, 160, 50, 1))
                .hasMessageContaining("before its end (150.0 ms)");
    }
}
