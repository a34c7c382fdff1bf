package org.meridian.signal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;
import org.meridian.testing.StudyFixtures;

class ReferenceTest {
    private static final TimeAxis AXIS = new TimeAxis(-100, 250, 100);
    private static final List<String> LABELS = List.of("Fz", "Cz", "Pz", "M2", "HEOG");

    /** Invented "true" potentials against an ideal distant reference, one shape per channel. */
    private static Waveforms truth(double shift) {
        return StudyFixtures.waves(LABELS, AXIS, List.of(
                t -> Math.sin(t / 40) + shift,
                t -> 2 * Math.cos(t / 55) - 1,
                t -> 0.01 * t + shift,
                t -> -0.5 + 0.3 * Math.sin(t / 13),
                t -> 4 * Math.exp(-t * t / 2000)));
    }

    private static void assertSame(Waveforms a, Waveforms b, double tol) {
        assertThat(a.labels()).isEqualTo(b.labels());
        for (int c = 0; c < a.channelCount(); c++) {
            for (int s = 0; s < a.sampleCount(); s++) {
                assertThat((double) a.value(c, s)).isCloseTo(b.value(c, s), within(tol));
            }
        }
    }

    @Test
    void averageReferenceMakesEverySamplesChannelMeanZero() {
        Waveforms avg = Reference.average().apply(truth(3));
        for (int s = 0; s < avg.sampleCount(); s++) {
            double sum = 0;
            for (int c = 0; c < avg.channelCount(); c++) {
                sum += avg.value(c, s);
            }
            // definition of the average reference: Σ_c (v_c − v̄) = 0 (textbook identity)
            assertThat(sum / avg.channelCount()).isCloseTo(0, within(1e-6));
        }
    }

    @Test
    void channelsLeftOutOfTheAverageAreStillReReferenced() {
        Waveforms data = truth(0);
        Waveforms avg = Reference.averageWithout(Set.of("heog")).apply(data);
        for (int s = 0; s < data.sampleCount(); s++) {
            double mean = 0;
            for (int c = 0; c < 4; c++) {
                mean += data.value(c, s) / 4.0;
            }
            // v' = v − mean of the EEG channels, for every channel (common practice)
            assertThat((double) avg.value(4, s)).isCloseTo(data.value(4, s) - mean, within(1e-5));
            assertThat((double) avg.value(0, s)).isCloseTo(data.value(0, s) - mean, within(1e-5));
        }
    }

    @Test
    void reReferencingIsLinear() {
        Waveforms x = truth(0);
        Waveforms y = truth(5);
        float[] combo = new float[x.channelCount() * x.sampleCount()];
        float[] xv = x.copyValues();
        float[] yv = y.copyValues();
        for (int i = 0; i < combo.length; i++) {
            combo[i] = 2 * xv[i] - 0.5f * yv[i];
        }
        for (Reference r : List.of(Reference.average(), Reference.parse("M2"), Reference.parse("Fz+M2"))) {
            Waveforms left = r.apply(x.withValues(x.unit(), combo));
            float[] rx = r.apply(x).copyValues();
            float[] ry = r.apply(y).copyValues();
            float[] right = new float[combo.length];
            for (int i = 0; i < combo.length; i++) {
                right[i] = 2 * rx[i] - 0.5f * ry[i];
            }
            // subtraction of a linear combination of channels is linear (textbook identity)
            assertSame(left, x.withValues(x.unit(), right), 1e-4);
        }
    }

    @Test
    void goingToAnyReferenceAndBackToTheRecordingReferenceRestoresTheData() {
        // recorded against Cz: Cz is the zero channel
        Waveforms recorded = Reference.parse("Cz").apply(truth(1));
        for (Reference r : List.of(Reference.average(), Reference.parse("M2"), Reference.parse("Fz+Pz"))) {
            Waveforms back = Reference.parse("Cz").apply(r.apply(recorded));
            // (v − r) − (v_Cz − r) = v − v_Cz: the reference signal cancels (textbook identity)
            assertSame(back, recorded, 1e-5);
        }
        // and two steps are one: to M2 then to Fz+Pz is to Fz+Pz directly
        assertSame(Reference.parse("Fz+Pz").apply(Reference.parse("M2").apply(recorded)),
                Reference.parse("Fz+Pz").apply(recorded), 1e-5);
    }

    @Test
    void restoringTheOmittedRecordingReferenceAllowsLinkedMastoids() {
        // truth: M1 and M2 both carry signal; the recording used M1 and left it out of the file
        List<String> withM1 = List.of("Fz", "Cz", "M1", "M2");
        Waveforms truth = StudyFixtures.waves(withM1, AXIS, List.of(
                t -> Math.sin(t / 30), t -> 1 + t / 300, t -> 0.7 * Math.cos(t / 20), t -> -0.4));
        Waveforms recorded = Reference.parse("M1").apply(truth).select(List.of("Fz", "Cz", "M2"));
        Waveforms restored = Reference.restoreOmitted(recorded, "M1");
        assertThat(restored.labels()).containsExactly("Fz", "Cz", "M2", "M1");
        Waveforms linked = Reference.parse("M1+M2").apply(restored);
        Waveforms expected = Reference.parse("M1+M2").apply(truth).select(restored.labels());
        // v − (v_M1 + v_M2)/2 from any reference: the linked-mastoid reference (common practice)
        assertSame(linked, expected, 1e-5);
    }

    @Test
    void mistakesAreNamed() {
        Waveforms data = truth(0);
        assertThatThrownBy(() -> Reference.parse("M1").apply(data)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("reference channel M1 is not in the data");
        assertThatThrownBy(() -> Reference.restoreOmitted(data, "cz")).isInstanceOf(BadInputException.class)
                .hasMessageContaining("already a channel");
        assertThatThrownBy(() -> Reference.parse("M1+")).isInstanceOf(BadInputException.class);
        assertThat(Reference.parse("AVG")).isEqualTo(Reference.average());
        assertThat(Reference.parse(" M1 + M2 ").describe()).isEqualTo("M1+M2");
    }
}
