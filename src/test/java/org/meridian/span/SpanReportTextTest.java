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
        assertThat(m.get("segments")).endsWith("(descriptive)");
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
