package org.meridian.span;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.meridian.core.Study;
import org.meridian.stats.Progress;

class SpanReportTextTest {

    @Test
    void summaryHasTheDocumentedKeysAndTheTableOneRowPerSample() {
        Study s = SpanAnalysisTest.study(6, true, 9);
        SpanReport r = SpanAnalysis.run(s, "rare", p -> s.waveforms(p, 0),
                SpanSettings.window(260, 420), Progress.NONE);
        List<String> keys = SpanReportText.summary(r).stream().map(Map.Entry::getKey).toList();
        // DESIGN §9: the summary keys reference_ms, segments, diss, p, verdict
        assertThat(keys).contains("reference_ms", "segments", "diss", "p", "verdict");
        assertThat(keys).containsSubsequence("segments", "segment_1");
        Map<String, String> m = Map.ofEntries(SpanReportText.summary(r).toArray(Map.Entry[]::new));
        // issue 6: the segmentation is labelled descriptive on its own key, so that states and
        // segments stay plain numbers a script can read
        assertThat(m.get("segmentation")).startsWith("descriptive (");
        assertThat(keys).containsSubsequence("segmentation", "states", "segments");
        assertThat(m.get("states")).isEqualTo(Integer.toString(r.segmentation().k()));
        assertThat(m.get("segments")).isEqualTo(Integer.toString(r.segmentation().segments().size()));
        // the default is the test of DESIGN §7, its statistic in squared map units
        assertThat(m.get("test")).isEqualTo("span test");
        assertThat(m.get("statistic_unit")).isEqualTo("µV²");
        assertThat(m.get("verdict")).isIn("stable", "changes");
        assertThat(m.get("p")).isEqualTo(SpanReportText.number(r.test().p()));
        // 6 participants: exact, smallest p = 2/64 = 0.03125 < 0.05, so no note
        assertThat(keys).doesNotContain("note");

        String[] lines = SpanReportText.table(r).split("\n");
        int header = List.of(lines).indexOf(SpanReportText.HEADER);
        assertThat(header).isPositive();
        for (int i = 0; i < header; i++) {
            assertThat(lines[i]).startsWith("# ");
        }
        assertThat(lines).hasSize(header + 1 + 41);
        assertThat(lines[header + 1]).startsWith("260\t");
        assertThat(lines[header + 1].split("\t", -1)).hasSize(5);

        String[] matrix = SpanReportText.correlationMatrix(r).split("\n");
        assertThat(matrix).hasSize(42);
        assertThat(matrix[1].split("\t")).hasSize(42);
    }

    @Test
    void theWhitenedVariantIsNamedAndItsStatisticHasNoUnit() {
        Study s = SpanAnalysisTest.study(6, true, 9);
        SpanReport r = SpanAnalysis.run(s, "rare", p -> s.waveforms(p, 0),
                SpanSettings.window(260, 420).withWhitening(true), Progress.NONE);
        Map<String, String> m = Map.ofEntries(SpanReportText.summary(r).toArray(Map.Entry[]::new));
        assertThat(m.get("test")).contains("--whiten");
        assertThat(m.get("statistic_unit")).isEqualTo("none");
        // common practice: a squared compound unit is written in parentheses
        assertThat(SpanReportText.squared("µV/m²")).isEqualTo("(µV/m²)²");
    }

    @Test
    void numbersAreShortAndPlain() {
        // common practice: six significant digits, no trailing zeros
        assertThat(SpanReportText.number(1.0)).isEqualTo("1");
        assertThat(SpanReportText.number(0.05)).isEqualTo("0.05");
        assertThat(SpanReportText.number(2.0 / 65536)).isEqualTo("3.05176e-05");
        assertThat(SpanReportText.number(1.0 / 5001)).isEqualTo("0.00019996");
        assertThat(SpanReportText.number(123.456789)).isEqualTo("123.457");
        assertThat(SpanReportText.fixed(-0.0000001, 6)).isEqualTo("0");
    }
}
