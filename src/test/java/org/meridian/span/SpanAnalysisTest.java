package org.meridian.span;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.Montage;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.montage.StandardSystem;
import org.meridian.stats.Progress;

class SpanAnalysisTest {
    private static final TimeAxis AXIS = new TimeAxis(-100, 250, 200);

    /**
     * 10-20 channels plus an unpositioned HEOG; map a peaks at 300 ms, map b (if given) at
     * {@code secondPeakMs}, with independent noise per participant.
     */
    static Study study(int participants, boolean secondMap, long seed) {
        Montage m = StandardSystem.TEN_TWENTY.montage();
        List<String> labels = new ArrayList<>(m.labels());
        labels.add("HEOG");
        int c = labels.size();
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] a = FieldStatisticsTest.randomMap(rnd, c, 0, 1);
        double[] b = FieldStatisticsTest.randomMap(rnd, c, 0, 1);
        Study.Builder sb = Study.builder("synthetic").montage(m);
        for (int p = 0; p < participants; p++) {
            float[] v = new float[c * AXIS.samples()];
            for (int t = 0; t < AXIS.samples(); t++) {
                double ms = AXIS.timeMs(t);
                double ga = 5 * Math.exp(-0.5 * Math.pow((ms - 300) / 30, 2));
                double gb = secondMap ? 5 * Math.exp(-0.5 * Math.pow((ms - 380) / 30, 2)) : 0;
                for (int ch = 0; ch < c; ch++) {
                    v[ch * AXIS.samples() + t] = (float) (ga * a[ch] + gb * b[ch]
                            + 0.8 * FieldStatisticsTest.gaussian(rnd));
                }
            }
            sb.add("p" + (p + 1), "rare", new Waveforms(labels, AXIS, Unit.MICROVOLT, v));
        }
        return sb.build();
    }

    @Test
    void reportsTraceSegmentsAndTestOverThePositionedChannels() {
        Study s = study(12, true, 3);
        SpanReport r = SpanAnalysis.run(s, "rare", p -> s.waveforms(p, 0),
                SpanSettings.window(260, 420), Progress.NONE);
        assertThat(r.leftOut()).containsExactly("HEOG");
        assertThat(r.channels()).hasSize(s.channelLabels().size() - 1);
        assertThat(r.window().earlyRangeMs()).isEqualTo("260..336");
        assertThat(r.window().lateRangeMs()).isEqualTo("344..420");
        assertThat(r.trace().size()).isEqualTo(41);
        // two maps peaking 80 ms apart: the test must see the change and the descriptive
        // segmentation must find at least two states
        assertThat(r.test().verdict()).isEqualTo(SpanVerdict.CHANGES);
        assertThat(r.test().randomisation().exact()).isTrue();
        assertThat(r.segmentation().k()).isGreaterThanOrEqualTo(2);
        assertThat(r.participants()).hasSize(12);
    }

    @Test
    void theTestRunsOnTheParticipantsPartMapsAsMeasuredUnlessWhiteningIsAsked() {
        Study s = study(8, true, 7);
        SpanReport r = SpanAnalysis.run(s, "rare", p -> s.waveforms(p, 0),
                SpanSettings.window(260, 420), Progress.NONE);
        // the part maps recomputed here: each participant's positioned channels averaged over
        // 260..336 and 344..420 ms, then average-referenced (DESIGN §7)
        int n = 8;
        double[][] early = new double[n][];
        double[][] late = new double[n][];
        for (int p = 0; p < n; p++) {
            Waveforms w = s.waveforms(p, 0).select(r.channels());
            early[p] = partMean(w, 260, 336);
            late[p] = partMean(w, 344, 420);
        }
        SpanResiduals expected = new SpanResiduals(early, late);
        assertThat(r.test().whitened()).isFalse();
        assertThat(r.test().statistic()).isCloseTo(expected.statistic(), within(1e-9 * expected.statistic()));
        SpanReport w = SpanAnalysis.run(s, "rare", p -> s.waveforms(p, 0),
                SpanSettings.window(260, 420).withWhitening(true), Progress.NONE);
        assertThat(w.test().whitened()).isTrue();
        assertThat(w.test().diss()).isEqualTo(r.test().diss());
        assertThat(w.test().statistic()).isNotCloseTo(r.test().statistic(), within(1e-3 * r.test().statistic()));
    }

    private static double[] partMean(Waveforms w, double fromMs, double toMs) {
        double[] m = new double[w.channelCount()];
        for (int c = 0; c < m.length; c++) {
            int count = 0;
            for (int t = 0; t < w.sampleCount(); t++) {
                double ms = w.axis().timeMs(t);
                if (ms >= fromMs - 1e-9 && ms <= toMs + 1e-9) {
                    m[c] += w.value(c, t);
                    count++;
                }
            }
            m[c] /= count;
        }
        double mean = java.util.Arrays.stream(m).average().orElseThrow();
        for (int c = 0; c < m.length; c++) {
            m[c] -= mean;
        }
        return m;
    }

    @Test
    void oneMapIsStableAndTheReferenceTimeIsHonoured() {
        Study s = study(20, false, 4);
        SpanReport r = SpanAnalysis.run(s, "rare", p -> s.waveforms(p, 0),
                SpanSettings.window(240, 360).withReferenceMs(300).withSplitMs(320), Progress.NONE);
        assertThat(r.trace().referenceMs()).isEqualTo(300.0);
        assertThat(r.window().lateRangeMs()).isEqualTo("320..360");
        assertThat(r.test().randomisation().exact()).isFalse();
        assertThat(r.test().verdict()).isEqualTo(SpanVerdict.STABLE);
    }

    @Test
    void csdIsAnalysedAtThePositionedChannelsInMicrovoltsPerSquareMetre() {
        Study s = study(8, true, 6);
        SpanReport r = SpanAnalysis.run(s, "rare", p -> s.waveforms(p, 0),
                SpanSettings.window(260, 420).withCsd(true), Progress.NONE);
        // DESIGN §5: CSD is −∇²V in µV/m² at the positioned channels only
        assertThat(r.unit()).isEqualTo(Unit.MICROVOLT_PER_SQUARE_METRE);
        assertThat(r.leftOut()).containsExactly("HEOG");
        assertThat(r.channels()).hasSize(s.montage().size());
        assertThat(r.test().verdict()).isEqualTo(SpanVerdict.CHANGES);
        String summary = SpanReportText.summaryLines(r, "");
        assertThat(summary).contains("maps: CSD (µV/m²)");
    }

    @Test
    void aReferenceTimeOutsideTheWindowIsRefused() {
        Study s = study(3, false, 5);
        assertThatThrownBy(() -> SpanAnalysis.run(s, "rare", p -> s.waveforms(p, 0),
                SpanSettings.window(240, 360).withReferenceMs(500), Progress.NONE))
                .isInstanceOf(BadInputException.class)
                .hasMessage("option --reference-time: 500 ms lies outside the window 240..360 ms");
    }
}
