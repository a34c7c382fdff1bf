package org.meridian.ui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.sim.ListeningDemo;
import org.meridian.sim.Simulator;

class StudyOpenerTest {
    private static Study study;

    @BeforeAll
    static void simulate() {
        study = Simulator.simulate(ListeningDemo.scenario(3), 5).study();
    }

    @Test
    void aTwoConditionStudyOpensOnItsDifferenceWaveInTheLateWindowAtPz() {
        StudyOpener.Opened o = StudyOpener.prepare(StudySession.of(study, null, "three"),
                ViewOptions.defaults(), IntervalKind.WITHIN, Tasks.TaskProgress.NONE);
        ViewDefaults d = o.defaults();
        assertThat(d.windowStartMs()).isEqualTo(300);
        assertThat(d.windowEndMs()).isEqualTo(500);
        assertThat(d.cursorMs()).isEqualTo(400);
        assertThat(d.channels()).containsExactly("Pz");
        assertThat(d.shownWaves()).containsExactly("frequent", "rare", "rare - frequent");
        assertThat(d.mapWave()).isEqualTo("rare - frequent");
        assertThat(o.averages().wave("rare - frequent")).isNotNull();
        assertThat(o.entries()).extracting(WaveEntry::contrast).containsExactly(false, false, true);
    }

    @Test
    void theViewOptionsChooseWindowCursorChannelWavesAndMap() {
        ViewOptions options = new ViewOptions(OptionalDouble.of(260), OptionalDouble.of(460),
                OptionalDouble.of(352), "cz", List.of("rare", "frequent - rare"), "frequent - rare");
        StudyOpener.Opened o = StudyOpener.prepare(StudySession.of(study, null, "three"), options,
                IntervalKind.NONE, Tasks.TaskProgress.NONE);
        assertThat(o.defaults().channels()).containsExactly("Cz");
        assertThat(o.defaults().shownWaves()).containsExactly("rare", "frequent - rare");
        assertThat(o.defaults().mapWave()).isEqualTo("frequent - rare");
        assertThat(o.averages().wave("frequent")).isNull();
    }

    @Test
    void optionsOutsideTheStudyAreErrorsNamingTheOption() {
        ViewOptions late = new ViewOptions(OptionalDouble.of(700), OptionalDouble.of(1000),
                OptionalDouble.empty(), "", List.of(), "");
        assertThatThrownBy(() -> StudyOpener.defaults(study, late, List.of("rare"), "rare"))
                .isInstanceOf(BadInputException.class).hasMessage("option --window: 1000 ms lies outside the data (-200 to 800 ms)");
        ViewOptions channel = new ViewOptions(OptionalDouble.empty(), OptionalDouble.empty(),
                OptionalDouble.empty(), "Xz", List.of(), "");
        assertThatThrownBy(() -> StudyOpener.defaults(study, channel, List.of("rare"), "rare"))
                .isInstanceOf(BadInputException.class).hasMessage("option --channel: the study has no channel Xz");
    }

    @Test
    void aManifestIsTitledByItsFolder() {
        assertThat(StudyOpener.titleOf(Path.of("data", "oddball", "study.tsv"))).isEqualTo("oddball");
        assertThat(StudyOpener.titleOf(Path.of("data", "p01_rare.tsv"))).isEqualTo("p01_rare.tsv");
    }

    @Test
    void theSpanTestSeesOnlyTheIncludedParticipants() {
        Study two = SpanPanel.included(study, Set.of("p02"));
        assertThat(two.participants()).containsExactly("p01", "p03");
        assertThat(two.waveforms("p03", "rare")).isSameAs(study.waveforms("p03", "rare"));
        assertThat(SpanPanel.included(study, Set.of())).isSameAs(study);
    }
}
