package org.meridian.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class TruthJsonTest {

    @Test
    @SuppressWarnings("unchecked")
    void theDemoTruthIsWellFormedJsonHoldingEveryParticipantsDraws() {
        Simulation sim = Simulator.simulate(ListeningDemo.scenario(), ListeningDemo.SEED);
        String text = TruthJson.of(sim.truth());
        // the JSON grammar of RFC 8259, read by a strict parser
        Map<String, Object> root = (Map<String, Object>) MiniJson.parse(text);
        assertThat(((Number) root.get("seed")).longValue()).isEqualTo(ListeningDemo.SEED);
        Map<String, Object> head = (Map<String, Object>) root.get("head_model");
        assertThat(head.get("kind")).isEqualTo("homogeneous sphere");
        assertThat((Double) head.get("radius_m")).isEqualTo(0.09);
        assertThat((Double) head.get("series_tolerance")).isEqualTo(1e-10);
        assertThat((List<Object>) root.get("channels")).hasSize(64);
        List<Object> sources = (List<Object>) root.get("sources");
        assertThat(sources).hasSize(6);
        List<Object> participants = (List<Object>) root.get("participants");
        assertThat(participants).hasSize(16);
        Map<String, Object> p5 = (Map<String, Object>) participants.get(4);
        GroundTruth.ParticipantTruth truth5 = sim.truth().participants().get(4);
        assertThat(p5.get("name")).isEqualTo("p05");
        assertThat(((Map<String, Object>) p5.get("trials")).get("rare"))
                .isEqualTo((double) truth5.trials().get(1));
        Map<String, Object> draw = (Map<String, Object>) ((List<Object>) p5.get("sources")).get(5);
        GroundTruth.SourceDraw d = truth5.sources().get(5);
        assertThat(draw.get("name")).isEqualTo(d.source());
        List<Object> pos = (List<Object>) draw.get("position_m");
        assertThat((Double) pos.get(1)).isCloseTo(d.positionM().y(), within(5e-6));
        assertThat((Double) draw.get("latency_shift_ms")).isCloseTo(d.latencyShiftMs(), within(5e-3));
    }

    @Test
    void numbersHaveFixedDecimalsAndNoExponent() {
        assertThat(TruthJson.num(0.1 + 0.2, 4)).isEqualTo("0.3");
        assertThat(TruthJson.num(-200, 3)).isEqualTo("-200");
        assertThat(TruthJson.num(-0.00001, 4)).isEqualTo("0");
        assertThat(TruthJson.num(1234567.891, 2)).isEqualTo("1234567.89");
        assertThat(TruthJson.num(2.5e-7, 8)).isEqualTo("0.00000025");
        assertThat(TruthJson.sci(1e-10)).isEqualTo("1e-10");
        assertThat(TruthJson.sci(2.5e-9)).isEqualTo("2.5e-9");
    }

    @Test
    void stringsAreEscaped() {
        assertThat(TruthJson.str("a\"b\\c\nd\u0001")).isEqualTo("\"a\\\"b\\\\c\\nd\\u0001\"");
        assertThat(MiniJson.parse(TruthJson.str("a\"b\\c\nd\u0001"))).isEqualTo("a\"b\\c\nd\u0001");
    }
}
