package org.meridian.signal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;
import org.meridian.testing.StudyFixtures;

class BaselineTest {
    private static final TimeAxis AXIS = new TimeAxis(-200, 500, 500);

    @Test
    void preStimulusBaselineUsesEverySampleBeforeZero() {
        Waveforms w = StudyFixtures.waves(List.of("Cz", "Pz"), AXIS,
                List.of(t -> 5 + Math.sin(t / 10), t -> t < 0 ? -3 : 10));
        Waveforms b = Baseline.preStimulus(w);
        // samples −200 … −2 ms: 100 of them; 0 ms is not part of the baseline
        double mean = 0;
        for (int s = 0; s < 100; s++) {
            mean += b.value(0, s) / 100.0;
        }
        // baseline correction leaves the baseline with mean zero (definition, common practice)
        assertThat(mean).isCloseTo(0, within(1e-5));
        assertThat((double) b.value(1, 99)).isCloseTo(0, within(1e-6));
        assertThat((double) b.value(1, 100)).isCloseTo(13, within(1e-5));
    }

    @Test
    void aWindowBaselineRemovesAnOffsetExactly() {
        Waveforms w = StudyFixtures.wave("Cz", AXIS, t -> 7 + 0.01 * t);
        Waveforms b = Baseline.correct(w, TimeWindow.parse("-100:100"));
        // the mean of a line over a window symmetric about 0 is its value at 0 (geometry)
        for (int s = 0; s < AXIS.samples(); s++) {
            assertThat((double) b.value(0, s)).isCloseTo(0.01 * AXIS.timeMs(s), within(1e-5));
        }
    }

    @Test
    void dataWithoutAPreStimulusPeriodIsRefused() {
        Waveforms w = StudyFixtures.wave("Cz", new TimeAxis(0, 500, 100), t -> 1);
        assertThatThrownBy(() -> Baseline.preStimulus(w)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("no samples before 0 ms");
    }
}
