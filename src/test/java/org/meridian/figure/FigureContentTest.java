package org.meridian.figure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.apache.commons.math3.stat.descriptive.moment.StandardDeviation;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;
import org.meridian.figure.spec.SpecFiles;
import org.meridian.maps.ColourLimits;
import org.meridian.maps.ScalpMap;

class FigureContentTest {
    private static final String WAVES_ONLY = """
            {"study": "%s", "intervals": {"kind": "%s"},
             "conditions": [{"wave": "frequent"}, {"wave": "rare"}, {"wave": "rare - frequent"}],
             "rows": [{"panels": [{"type": "waveforms", "channels": "P3+Pz+P4"}]}]}
            """;

    private static FigureContent wavesAt(String kind) {
        return FigureContent.of(SpecFiles.parse(WAVES_ONLY.formatted(DemoFigures.STUDY, kind), "w.json"),
                DemoFigures.study());
    }

    /** Each participant's mean of P3, Pz and P4 at one sample, for a wave given per participant. */
    private static double[] regionMeans(java.util.function.IntFunction<Waveforms> wave, int sample) {
        Study s = DemoFigures.study();
        double[] out = new double[s.participants().size()];
        for (int p = 0; p < out.length; p++) {
            Waveforms w = wave.apply(p);
            out[p] = (w.value(w.requireIndex("P3"), sample) + w.value(w.requireIndex("Pz"), sample)
                    + w.value(w.requireIndex("P4"), sample)) / 3;
        }
        return out;
    }

    private static double tHalfWidth(double[] values) {
        DescriptiveStatistics d = new DescriptiveStatistics(values);
        // Student t-interval: t(0.975; N−1) · s / √N (Commons Math's t distribution and statistics)
        return new TDistribution(values.length - 1).inverseCumulativeProbability(0.975)
                * d.getStandardDeviation() / Math.sqrt(values.length);
    }

    @Test
    void aRegionsWaveIsTheMeanOfItsChannelsWithTheTIntervalOfTheParticipantsRegionMeans() {
        Study s = DemoFigures.study();
        int rare = s.conditionIndex("rare");
        WaveTrace trace = ((PanelContent.Waveforms) wavesAt("across-participants").panels().get(0)).traces().get(1);
        int sample = s.axis().nearestIndex(400);
        int k = (int) Math.round((400 - trace.timesMs()[0]) / s.axis().stepMs());
        double[] means = regionMeans(p -> s.waveforms(p, rare), sample);
        assertThat(trace.mean()[k]).isCloseTo(new DescriptiveStatistics(means).getMean(), within(1e-4));
        assertThat(trace.upper()[k] - trace.mean()[k]).isCloseTo(tHalfWidth(means), within(1e-4));
        assertThat(trace.mean()[k] - trace.lower()[k]).isCloseTo(tHalfWidth(means), within(1e-4));
    }

    @Test
    void conditionsShownTogetherGetTheWithinParticipantIntervalAndTheContrastItsOwnTInterval() {
        Study s = DemoFigures.study();
        int rare = s.conditionIndex("rare");
        int frequent = s.conditionIndex("frequent");
        PanelContent.Waveforms panel = (PanelContent.Waveforms) wavesAt("within-participants").panels().get(0);
        int sample = s.axis().nearestIndex(350);
        int k = (int) Math.round((350 - panel.traces().get(0).timesMs()[0]) / s.axis().stepMs());
        double[] a = regionMeans(p -> s.waveforms(p, rare), sample);
        double[] b = regionMeans(p -> s.waveforms(p, frequent), sample);
        double[] difference = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            difference[i] = a[i] - b[i];
        }
        // Cousineau (2005) with Morey's (2008) correction, two conditions: the t-interval of the
        // difference divided by √2
        double within = tHalfWidth(difference) / Math.sqrt(2);
        for (int t = 0; t < 2; t++) {
            WaveTrace trace = panel.traces().get(t);
            assertThat(trace.upper()[k] - trace.mean()[k]).isCloseTo(within, within(1e-4));
        }
        WaveTrace contrast = panel.traces().get(2);
        assertThat(contrast.dashed()).isTrue();
        assertThat(contrast.mean()[k]).isCloseTo(new DescriptiveStatistics(difference).getMean(), within(1e-4));
        assertThat(contrast.upper()[k] - contrast.mean()[k]).isCloseTo(tHalfWidth(difference), within(1e-4));
    }

    @Test
    void aSpanTraceIsTheGlobalFieldPowerOfTheGrandAverage() {
        String json = """
                {"study": "s", "conditions": [{"wave": "rare"}, {"wave": "frequent"}],
                 "rows": [{"panels": [{"type": "span-trace", "conditions": ["rare"]}]}]}
                """;
        FigureContent content = FigureContent.of(SpecFiles.parse(json, "g.json"), DemoFigures.study());
        PanelContent.SpanTrace panel = (PanelContent.SpanTrace) content.panels().get(0);
        WaveTrace gfp = panel.traces().get(0);
        Study s = DemoFigures.study();
        int sample = s.axis().nearestIndex(390);
        int k = (int) Math.round((390 - gfp.timesMs()[0]) / s.axis().stepMs());
        double[] map = new double[s.channelLabels().size()];
        for (int c = 0; c < map.length; c++) {
            double sum = 0;
            for (int p = 0; p < s.participants().size(); p++) {
                sum += s.waveforms(p, s.conditionIndex("rare")).value(c, sample);
            }
            map[c] = sum / s.participants().size();
        }
        // Lehmann & Skrandies (1980): GFP is the population standard deviation across channels
        // (Commons Math StandardDeviation without the bias correction); the demo has 64 positioned channels
        assertThat(gfp.mean()[k]).isCloseTo(new StandardDeviation(false).evaluate(map), within(1e-4));
        assertThat(gfp.hasBand()).isFalse();
        assertThat(panel.title()).isEqualTo("GFP");
        assertThat(content.gfpScales().amplitudeFrom()).isZero();
        assertThat(content.gfpScales().amplitudeLabel()).isEqualTo("GFP (µV)");
    }

    @Test
    void excludedParticipantsAreLeftOutOfAveragesAndBands() {
        Study s = DemoFigures.study();
        String json = WAVES_ONLY.formatted(DemoFigures.STUDY, "across-participants")
                .replace("\"intervals\"", "\"excluded_participants\": [\"p01\", \"p02\"], \"intervals\"");
        FigureContent content = FigureContent.of(SpecFiles.parse(json, "x.json"), s);
        WaveTrace trace = ((PanelContent.Waveforms) content.panels().get(0)).traces().get(1);
        int sample = s.axis().nearestIndex(400);
        int k = (int) Math.round((400 - trace.timesMs()[0]) / s.axis().stepMs());
        double[] all = regionMeans(p -> s.waveforms(p, s.conditionIndex("rare")), sample);
        double[] kept = java.util.Arrays.copyOfRange(all, 2, all.length);
        assertThat(trace.mean()[k]).isCloseTo(new DescriptiveStatistics(kept).getMean(), within(1e-4));
        assertThat(trace.upper()[k] - trace.mean()[k]).isCloseTo(tHalfWidth(kept), within(1e-4));
        assertThatThrownBy(() -> FigureContent.of(SpecFiles.parse(json.replace("p02", "p99"), "x.json"), s))
                .isInstanceOf(BadInputException.class).hasMessageContaining("p99");
    }

    @Test
    void withoutIntervalsNoBandIsDrawn() {
        PanelContent.Waveforms panel = (PanelContent.Waveforms) wavesAt("none").panels().get(0);
        assertThat(panel.traces()).noneMatch(WaveTrace::hasBand);
    }

    @Test
    void sharedScalesCoverEveryWaveAndMap() {
        FigureContent content = DemoFigures.drawing().content();
        WaveScales w = content.waveScales();
        for (PanelContent c : content.panels()) {
            if (c instanceof PanelContent.Waveforms panel) {
                for (WaveTrace t : panel.traces()) {
                    for (int i = 0; i < t.mean().length; i++) {
                        assertThat(t.lower()[i]).isGreaterThanOrEqualTo(w.amplitudeFrom());
                        assertThat(t.upper()[i]).isLessThanOrEqualTo(w.amplitudeTo());
                    }
                }
            }
        }
        // the range is a whole number of steps
        assertThat(Math.abs(w.amplitudeFrom() / w.amplitudeStep() - Math.rint(w.amplitudeFrom() / w.amplitudeStep())))
                .isLessThan(1e-9);
        PanelContent.MapStrip strip = (PanelContent.MapStrip) content.panels().get(3);
        assertThat(content.mapScales().limits()).isEqualTo(ColourLimits.automatic(strip.maps()));
        assertThat(strip.maps()).extracting(ScalpMap::title)
                .containsExactly("280 ms", "310 ms", "340 ms", "370 ms", "400 ms");
        assertThat(strip.highlight()).containsExactlyInAnyOrder("FCz", "Cz", "Pz");
        assertThat(w.marksMs()).singleElement().satisfies(m -> assertThat(m).containsExactly(280, 400));
    }

    @Test
    void amplitudeStepsAreOneTwoOrFiveTimesAPowerOfTen() {
        // −6…8 in steps of 2 is 7 steps; −8…8 would be 8, so −6.5…7.5 takes steps of 5
        assertThat(FigureScales.amplitudeStep(-5.5, 7)).isEqualTo(2);
        assertThat(FigureScales.amplitudeStep(-6.5, 7.5)).isEqualTo(5);
        assertThat(FigureScales.amplitudeStep(-3, 4)).isEqualTo(1);
        assertThat(FigureScales.amplitudeStep(-0.3, 0.9)).isEqualTo(0.2);
        assertThat(FigureScales.amplitudeStep(-20, 45)).isEqualTo(10);
    }

    private static String loadError(Path dir, String from, String to) throws Exception {
        Path spec = dir.resolve("fig.json");
        Files.writeString(spec, DemoFigures.specJson(DemoFigures.STUDY.toAbsolutePath().toString()).replace(from, to));
        try {
            Figures.load(spec);
        } catch (BadInputException e) {
            assertThat(e.getMessage()).doesNotContain("\n").startsWith(spec.toString() + ": ");
            return e.getMessage().substring(spec.toString().length() + 2);
        }
        throw new AssertionError("no error for " + to);
    }

    @Test
    void aSpecNamingWhatTheStudyLacksFailsNamingItAndWhere(@TempDir Path dir) throws Exception {
        assertThat(loadError(dir, "\"channels\": \"Cz\"", "\"channels\": \"Czz\""))
                .startsWith("rows[0].panels[1].channels: no channel Czz").contains("Cz");
        assertThat(loadError(dir, "{\"wave\": \"frequent\"}", "{\"wave\": \"standard\"}"))
                .startsWith("conditions[0].wave: ").contains("standard");
        assertThat(loadError(dir, "\"condition\": \"rare - frequent\"", "\"condition\": \"rare - oddball\""))
                .startsWith("rows[1].panels[0].condition: ").contains("oddball");
        assertThat(loadError(dir, "\"highlight\": [\"FCz\", \"Cz\", \"Pz\"]", "\"highlight\": [\"FCz\", \"Cx\"]"))
                .startsWith("rows[1].panels[0].highlight: no channel Cx");
        assertThat(loadError(dir, "[280, 310, 340, 370, 400]", "[280, 900]"))
                .startsWith("rows[1].panels[0]: time 900 ms is outside the data");
        assertThat(loadError(dir, "\"maps\": {\"resolution\": 48},", "\"waveforms\": {\"time_ms\": [-500, 800]},"))
                .startsWith("waveforms.time_ms");
    }

    @Test
    void aColourBarNeedsMaps() {
        String json = """
                {"study": "s", "rows": [{"panels": [{"type": "colour-bar"}]}]}
                """;
        assertThatThrownBy(() -> FigureContent.of(SpecFiles.parse(json, "c.json"), DemoFigures.study()))
                .isInstanceOf(BadInputException.class)
                .hasMessage("rows[0].panels[0]: a colour bar needs a map strip in the figure");
    }
}
