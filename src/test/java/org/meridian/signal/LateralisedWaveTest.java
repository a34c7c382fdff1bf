package org.meridian.signal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;
import org.meridian.testing.StudyFixtures;

class LateralisedWaveTest {
    private static final TimeAxis AXIS = new TimeAxis(0, 100, 30);
    private static final List<String> LABELS = List.of("PO7", "Pz", "PO8", "P3", "P4", "HEOG", "C5");

    @Test
    void pairsAreTheHomologuesPresentUnderTheRightHemisphereLabel() {
        assertThat(LateralisedWave.pairs(LABELS)).extracting(p -> p[0] + "/" + p[1])
                .containsExactly("PO7/PO8", "P3/P4");
    }

    @Test
    void bothHemifieldsAverageContraMinusIpsi() {
        Study study = StudyFixtures.randomStudy(3, List.of("left", "right"), LABELS, AXIS, 5);
        LateralisedWave lat = LateralisedWave.of(ConditionExpression.condition("left"),
                ConditionExpression.condition("right"));
        Waveforms w = lat.forParticipant(study, 1);
        assertThat(w.labels()).containsExactly("PO8", "P4");
        Waveforms l = study.waveforms(1, 0);
        Waveforms r = study.waveforms(1, 1);
        for (int s = 0; s < AXIS.samples(); s++) {
            // contralateral − ipsilateral, averaged over hemifields: ½[(L@PO8 − L@PO7) + (R@PO7 − R@PO8)]
            // (the double subtraction of Coles, 1989)
            double expected = 0.5 * ((l.value(2, s) - l.value(0, s)) + (r.value(0, s) - r.value(2, s)));
            assertThat((double) w.value(0, s)).isCloseTo(expected, within(1e-5));
        }
        assertThat(lat.name()).isEqualTo("contra-ipsi(left: left, right: right)");
    }

    @Test
    void oneHemifieldAloneIsItsContraMinusIpsi() {
        Study study = StudyFixtures.randomStudy(2, List.of("left", "right"), LABELS, AXIS, 8);
        Waveforms right = study.waveforms(0, 1);
        Waveforms w = LateralisedWave.single(ConditionExpression.condition("right"),
                LateralisedWave.Hemifield.RIGHT).forParticipant(study, 0);
        // right-hemifield stimulus: the left hemisphere (P3) is contralateral
        assertThat((double) w.value(1, 4)).isCloseTo(right.value(3, 4) - right.value(4, 4), within(1e-5));
    }

    @Test
    void aSymmetricScalpGivesNoLateralisation() {
        Waveforms sym = StudyFixtures.waves(List.of("PO7", "PO8"), AXIS, List.of(t -> t / 10, t -> t / 10));
        Waveforms out = LateralisedWave.of(ConditionExpression.condition("a"), ConditionExpression.condition("b"))
                .compute(sym, sym);
        for (int s = 0; s < AXIS.samples(); s++) {
            assertThat(out.value(0, s)).isZero();
        }
    }

    @Test
    void dataWithoutPairsIsRefused() {
        Waveforms mid = StudyFixtures.waves(List.of("Fz", "Cz"), AXIS, List.of(t -> 1, t -> 2));
        assertThatThrownBy(() -> LateralisedWave.single(ConditionExpression.condition("a"),
                LateralisedWave.Hemifield.LEFT).compute(mid, null))
                .isInstanceOf(BadInputException.class).hasMessageContaining("homologous");
    }
}
