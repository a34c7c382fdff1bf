package org.meridian.figure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.stat.correlation.PearsonsCorrelation;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.SpecFiles;
import org.meridian.signal.GrandAverage;
import org.meridian.span.SpanAnalysis;

/** The span-trace panel's DISS trace: each moment's map against a reference map. */
class SpanTraceContentTest {
    private static FigureSpec spec(String panel) {
        return SpecFiles.parse("""
                {"study": "demo", "conditions": [{"wave": "rare"}],
                 "rows": [{"panels": [%s]}]}
                """.formatted(panel), "diss.json");
    }

    @Test
    void dissIsZeroAtTheReferenceAndMatchesThePearsonCorrelationElsewhere() {
        Study demo = DemoFigures.study();
        FigureContent content = FigureContent.of(spec("{\"type\": \"span-trace\", \"trace\": \"diss\", \"reference_ms\": 380}"),
                demo);
        PanelContent.SpanTrace panel = (PanelContent.SpanTrace) content.panels().get(0);
        assertThat(panel.diss()).isTrue();
        assertThat(panel.title()).isEqualTo("DISS");
        WaveTrace rare = panel.traces().get(0);
        Waveforms average = GrandAverage.of(demo, demo.conditionIndex("rare")).select(SpanAnalysis.fieldChannels(demo));
        int ref = demo.axis().nearestIndex(380);
        double[] r = new double[average.channelCount()];
        average.sampleInto(ref, r);
        for (int k = 0; k < rare.timesMs().length; k += 17) {
            int s = demo.axis().nearestIndex(rare.timesMs()[k]);
            double[] v = new double[average.channelCount()];
            average.sampleInto(s, v);
            // Lehmann & Skrandies (1980): DISS = sqrt(2 (1 − r)), r the spatial (Pearson) correlation
            // of the two maps; r from Commons Math
            double expected = Math.sqrt(2 * (1 - new PearsonsCorrelation().correlation(v, r)));
            assertThat(rare.mean()[k]).isCloseTo(expected, within(1e-6));
        }
        int at = java.util.Arrays.binarySearch(rare.timesMs(), demo.axis().timeMs(ref));
        // DISS(v, v) = 0 (Lehmann & Skrandies, 1980)
        assertThat(rare.mean()[at]).isCloseTo(0, within(1e-6));
        assertThat(content.dissScales().amplitudeFrom()).isZero();
        assertThat(content.dissScales().amplitudeTo()).isEqualTo(2);
    }

    @Test
    void withoutAReferenceTimeTheReferenceIsTheGfpMaximumInTheWindow() {
        Study demo = DemoFigures.study();
        FigureContent content = FigureContent.of(spec(
                "{\"type\": \"span-trace\", \"trace\": \"diss\", \"window_ms\": [250, 450]}"), demo);
        WaveTrace rare = ((PanelContent.SpanTrace) content.panels().get(0)).traces().get(0);
        FigureContent gfp = FigureContent.of(spec("{\"type\": \"span-trace\"}"), demo);
        WaveTrace power = ((PanelContent.SpanTrace) gfp.panels().get(0)).traces().get(0);
        int peak = -1;
        for (int k = 0; k < power.timesMs().length; k++) {
            double t = power.timesMs()[k];
            if (t >= 250 && t <= 450 && (peak < 0 || power.mean()[k] > power.mean()[peak])) {
                peak = k;
            }
        }
        // DISS(v, v) = 0 at the reference map (Lehmann & Skrandies, 1980)
        assertThat(rare.mean()[peak]).isCloseTo(0, within(1e-6));
    }

    @Test
    void settingsThatDoNotApplyAreRefused() {
        assertThatThrownBy(() -> spec("{\"type\": \"span-trace\", \"reference_ms\": 300}"))
                .isInstanceOf(BadInputException.class).hasMessageContaining("a gfp trace has none");
        assertThatThrownBy(() -> spec("{\"type\": \"span-trace\", \"trace\": \"tanova\"}"))
                .isInstanceOf(BadInputException.class).hasMessageContaining("trace must be gfp or diss");
        assertThatThrownBy(() -> FigureContent.of(spec(
                "{\"type\": \"span-trace\", \"trace\": \"diss\", \"reference_ms\": 5000}"), DemoFigures.study()))
                .isInstanceOf(BadInputException.class).hasMessageContaining("rows[0].panels[0].reference_ms");
    }
}
