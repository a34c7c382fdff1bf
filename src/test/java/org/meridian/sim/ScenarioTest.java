package org.meridian.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class ScenarioTest {
    private final Scenario demo = ListeningDemo.scenario();

    @Test
    void aGainForAConditionTheScenarioLacksIsRefused() {
        Source s = demo.sources().get(5);
        assertThatThrownBy(() -> demo.withSources(List.of(s.withGains(Map.of("rar", 1.0)))))
                .hasMessage("source late-parietal has a gain for condition rar, which the scenario lacks");
    }

    @Test
    void sourcesNeedUniqueNamesAndAPlaceInsideTheSphere() {
        Source s = demo.sources().get(0);
        assertThatThrownBy(() -> demo.withSources(List.of(s, s))).hasMessageContaining("listed twice");
        assertThatThrownBy(() -> demo.withSources(List.of(s.at(new Vector3(0, 0, 0.0899)))))
                .hasMessageContaining("99.9 % of the radius");
    }

    @Test
    void variantsKeepEverythingElse() {
        Scenario small = demo.withParticipants(4).withNoise(NoiseModel.NONE);
        assertThat(small.participants()).isEqualTo(4);
        assertThat(small.noise().silent()).isTrue();
        assertThat(small.sources()).isEqualTo(demo.sources());
        assertThat(small.conditionNames()).containsExactly("frequent", "rare");
        assertThat(demo.noise().scaled(0.5).singleTrialRmsUv()).isEqualTo(9);
    }

    @Test
    void conditionsKeepAtLeastOneTrial() {
        assertThat(new ConditionSpec("a", 10, 0.01).maxRejected()).isEqualTo(9);
        assertThat(new ConditionSpec("a", 100, 0.8).maxRejected()).isEqualTo(20);
        assertThat(new ConditionSpec("a", 5, 1).maxRejected()).isZero();
        assertThatThrownBy(() -> new ConditionSpec("a", 0, 1)).hasMessageContaining("at least one trial");
    }
}
