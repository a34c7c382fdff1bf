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
import org.meridian.montage.ChannelPositions;
import org.meridian.signal.Processing.BaselineChoice;
import org.meridian.signal.Processing.ReferenceChoice;
import org.meridian.testing.StudyFixtures;

class ProcessingTest {
    private static final TimeAxis AXIS = new TimeAxis(-200, 250, 250);
    private static final List<String> LABELS = List.of("Fz", "Cz", "Pz", "TP10", "HEOG");

    /** A study of random waves whose channels are placed as the loader would place them. */
    private static Study study(long seed) {
        Study raw = StudyFixtures.randomStudy(4, List.of("rare", "common"), LABELS, AXIS, seed);
        ChannelPositions.Resolution r = ChannelPositions.resolve(LABELS, null);
        Study.Builder b = Study.builder(raw.name()).montage(r.montage()).placements(r.placements());
        for (int p = 0; p < raw.participants().size(); p++) {
            for (int c = 0; c < raw.conditions().size(); c++) {
                b.add(raw.participants().get(p), raw.conditions().get(c), raw.waveforms(p, c),
                        raw.trials(p, c).orElse(-1));
            }
        }
        return b.build();
    }

    private static Processing everything() {
        return Processing.none().withRestoredReference("TP9").withReference(ReferenceChoice.parse("TP9+TP10"))
                .withLowPass(30).withHighPass(0.5).withFilterOrder(2)
                .withBaseline(BaselineChoice.parse("-200:0"));
    }

    private static void assertClose(Waveforms a, Waveforms b, double tol) {
        assertThat(a.labels()).isEqualTo(b.labels());
        for (int c = 0; c < a.channelCount(); c++) {
            for (int s = 0; s < a.sampleCount(); s++) {
                assertThat((double) a.value(c, s)).isCloseTo(b.value(c, s), within(tol));
            }
        }
    }

    @Test
    void nothingAskedForLeavesTheStudyAlone() {
        Study s = study(1);
        assertThat(Processing.none().isNone()).isTrue();
        assertThat(Processing.none().apply(s)).isSameAs(s);
        assertThat(Processing.none().describe()).isEqualTo("none");
        // an order alone filters nothing
        assertThat(Processing.none().withFilterOrder(6).isNone()).isTrue();
        assertThat(Processing.none().withFilterOrder(6)).isEqualTo(Processing.none());
    }

    @Test
    void theAverageReferenceLeavesUnpositionedChannelsOutOfTheMean() {
        Study s = study(2);
        Study avg = Processing.none().withReference(ReferenceChoice.average()).apply(s);
        Waveforms before = s.waveforms(0, 0);
        Waveforms after = avg.waveforms(0, 0);
        for (int t = 0; t < AXIS.samples(); t++) {
            double scalpMean = 0;
            double original = 0;
            for (int c = 0; c < 4; c++) {
                scalpMean += after.value(c, t) / 4.0;
                original += before.value(c, t) / 4.0;
            }
            // definition of the average reference over the scalp channels: Σ_c (v_c − v̄) = 0
            // (textbook identity); EOG is re-referenced to the same mean (common practice)
            assertThat(scalpMean).isCloseTo(0, within(1e-5));
            assertThat((double) after.value(4, t)).isCloseTo(before.value(4, t) - original, within(1e-4));
        }
        Study all = Processing.none().withReference(ReferenceChoice.averageOfAll()).apply(s);
        for (int t = 0; t < AXIS.samples(); t++) {
            double mean = 0;
            for (int c = 0; c < 5; c++) {
                mean += all.waveforms(1, 1).value(c, t) / 5.0;
            }
            // the same identity over every channel
            assertThat(mean).isCloseTo(0, within(1e-5));
        }
    }

    @Test
    void aRestoredReferenceWithoutAPositionStillJoinsTheAverage() {
        Study s = study(7);
        Study avg = Processing.none().withRestoredReference("REF").withReference(ReferenceChoice.average()).apply(s);
        assertThat(avg.unpositionedChannels()).containsExactly("HEOG", "REF");
        Waveforms w = avg.waveforms(3, 0);
        for (int t = 0; t < AXIS.samples(); t++) {
            double mean = 0;
            for (String l : List.of("Fz", "Cz", "Pz", "TP10", "REF")) {
                mean += w.value(w.indexOf(l), t) / 5.0;
            }
            // Σ_c (v_c − v̄) = 0 over the scalp channels and the restored reference (textbook identity)
            assertThat(mean).isCloseTo(0, within(1e-5));
        }
    }

    @Test
    void processingIsLinearSoItCommutesWithGrandAveragesAndContrasts() {
        Study s = study(3);
        Processing p = everything();
        Study processed = p.apply(s);
        ConditionExpression contrast = ConditionExpression.parse("rare - common", s);
        Waveforms processedThenAveraged = contrast.grandAverage(processed);
        List<String> unpositioned = s.unpositionedChannels();
        Waveforms averagedThenProcessed = p.apply(contrast.grandAverage(s), unpositioned);
        // restore, re-reference, filter and baseline are each linear and time-invariant in the
        // participant index, so P(Σ w_i x_i) = Σ w_i P(x_i) (superposition, any linear-systems text)
        assertClose(processedThenAveraged, averagedThenProcessed, 2e-4);
    }

    @Test
    void theStepsRunInTheDocumentedOrderWithTheExistingOperations() {
        Study s = study(4);
        Waveforms in = s.waveforms(2, 1);
        Waveforms byHand = Reference.restoreOmitted(in, "TP9");
        byHand = Reference.parse("TP9+TP10").apply(byHand);
        byHand = ButterworthFilter.bandPass(2, 0.5, 30).applyZeroPhase(byHand);
        byHand = Baseline.correct(byHand, TimeWindow.parse("-200:0"));
        Study out = everything().apply(s);
        // common practice: reference, then filter, then baseline on the filtered data
        assertClose(out.waveforms(2, 1), byHand, 1e-6);
        // the restored reference is a standard site, so it joins the montage (10-5 positions)
        assertThat(out.channelLabels()).containsExactly("Fz", "Cz", "Pz", "TP10", "HEOG", "TP9");
        assertThat(out.montage().contains("TP9")).isTrue();
        assertThat(out.unpositionedChannels()).containsExactly("HEOG");
        assertThat(out.trials(2, 1)).isEqualTo(s.trials(2, 1));
        // baseline correction leaves the baseline with mean zero (definition, common practice)
        TimeWindow.SampleRange r = TimeWindow.parse("-200:0").resolve(AXIS);
        double mean = 0;
        for (int t = r.from(); t <= r.to(); t++) {
            mean += out.waveforms(2, 1).value(0, t) / r.length();
        }
        assertThat(mean).isCloseTo(0, within(1e-5));
    }

    @Test
    void referenceAndFilterCommute() {
        Waveforms w = study(5).waveforms(1, 0);
        ButterworthFilter f = ButterworthFilter.lowPass(4, 20);
        Reference r = Reference.parse("Cz");
        // a channel mix at each sample and a per-channel filter are both linear: AB = BA
        // (textbook identity for operators acting on different indices)
        assertClose(f.applyZeroPhase(r.apply(w)), r.apply(f.applyZeroPhase(w)), 1e-4);
    }

    @Test
    void theCaptionNamesEveryStepInOrder() {
        assertThat(everything().describe()).isEqualTo("TP9 restored as the zero reference channel; "
                + "reference mean of TP9+TP10; band-pass 0.5 Hz–30 Hz, Butterworth order 2, zero-phase; "
                + "baseline -200:0 ms");
        assertThat(Processing.none().withReference(ReferenceChoice.average()).withLowPass(30)
                .withBaseline(BaselineChoice.preStimulus()).describe())
                .isEqualTo("average reference; low-pass 30 Hz, Butterworth order 4, zero-phase; "
                        + "baseline before 0 ms");
        assertThat(ReferenceChoice.parse("Cz").describe()).isEqualTo("reference Cz");
    }

    @Test
    void writtenFormsReadBack() {
        for (String t : List.of("none", "average", "average-all", "Cz", "M1+M2")) {
            assertThat(ReferenceChoice.parse(t).text()).isEqualTo(t);
        }
        assertThat(ReferenceChoice.parse("AVG")).isEqualTo(ReferenceChoice.average());
        assertThat(BaselineChoice.parse("PRE").text()).isEqualTo("pre");
        assertThat(BaselineChoice.parse(" -100:0 ").text()).isEqualTo("-100:0");
    }

    @Test
    void mistakesAreRefusedWhenTheyAreMade() {
        assertThatThrownBy(() -> Processing.none().withLowPass(-3)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("low-pass cut-off");
        assertThatThrownBy(() -> Processing.none().withLowPass(10).withHighPass(20))
                .isInstanceOf(BadInputException.class).hasMessageContaining("lower edge");
        assertThatThrownBy(() -> Processing.none().withFilterOrder(40)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("filter order");
        assertThatThrownBy(() -> BaselineChoice.parse("early")).isInstanceOf(BadInputException.class);
        assertThatThrownBy(() -> ReferenceChoice.parse("M1+")).isInstanceOf(BadInputException.class);
        Study s = study(6);
        assertThatThrownBy(() -> Processing.none().withReference(ReferenceChoice.parse("M1")).apply(s))
                .isInstanceOf(BadInputException.class).hasMessageContaining("restore it");
        assertThatThrownBy(() -> Processing.none().withLowPass(200).apply(s))
                .isInstanceOf(BadInputException.class).hasMessageContaining("Nyquist");
        assertThatThrownBy(() -> Processing.none().withRestoredReference("cz").apply(s))
                .isInstanceOf(BadInputException.class).hasMessageContaining("already a channel");
    }
}
