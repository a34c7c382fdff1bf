package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SpanCommandTest {
    private static final String DEMO = "samples/two-tone-listening";

    @Test
    void withoutOutputTheTableFollowsTheSummaryAsCommentLines() {
        CliRun r = CliRun.of("span", DEMO, "--condition", "rare", "--window", "260:460");
        assertThat(r.exitCode()).as(r.err()).isZero();
        List<String> lines = r.out().lines().toList();
        int header = lines.indexOf("time_ms\tgfp\tcorr\tdiss\tstate");
        assertThat(header).isPositive();
        assertThat(lines.subList(0, header)).allMatch(l -> l.startsWith("# "));
        assertThat(lines.subList(0, header)).contains("# condition: rare", "# window_ms: 260..460",
                "# participants: 16", "# unit: uV");
        // issue 6 (descriptive, labelled so) with plain numbers in states and segments
        assertThat(lines.subList(0, header)).contains(
                "# segmentation: descriptive (states chosen by cross-validation among 1..8)",
                "# test: span test", "# statistic_unit: µV²");
        assertThat(lines.subList(0, header)).anyMatch(l -> l.matches("# segments: \\d+"));
        assertThat(lines.subList(0, header)).anyMatch(l -> l.matches("# states: \\d+"));
        // DESIGN §9 summary keys
        for (String key : List.of("reference_ms", "segments", "diss", "p", "verdict")) {
            assertThat(lines).anyMatch(l -> l.startsWith("# " + key + ": "));
        }
        // 260..460 ms at 250 Hz: 51 samples
        assertThat(lines.size() - header - 1).isEqualTo(51);
        assertThat(lines.get(header + 1)).startsWith("260\t");
    }

    @Test
    void withOutputTheSummaryGoesToStandardOutput(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("span.tsv");
        Path matrix = dir.resolve("matrix.tsv");
        CliRun r = CliRun.of("span", DEMO, "--condition", "rare - frequent", "--window", "260:460",
                "--split", "360", "--reference-time", "300", "--matrix", matrix.toString(),
                "-o", out.toString());
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.out()).contains("condition: rare - frequent\n", "split_ms: 360 (given)\n",
                "reference_ms: 300\n", "verdict: ");
        assertThat(r.out()).doesNotContain("# ");
        String table = Files.readString(out);
        assertThat(table).contains("# condition: rare - frequent\n", "time_ms\tgfp\tcorr\tdiss\tstate\n");
        assertThat(Files.readAllLines(matrix)).hasSize(52);
    }

    @Test
    void whitenRunsTheConservativeVariant(@TempDir Path dir) {
        Path out = dir.resolve("span.tsv");
        CliRun r = CliRun.of("span", DEMO, "--condition", "rare", "--window", "260:460", "--whiten",
                "-o", out.toString());
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.out()).contains("test: span test, whitened part pairs (--whiten; conservative variant)\n",
                "statistic_unit: none\n");
    }

    @Test
    void csdIsAnalysedInMicrovoltsPerSquareMetre() {
        CliRun r = CliRun.of("span", DEMO, "--condition", "rare", "--window", "260:460", "--csd");
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.out()).contains("# maps: CSD (µV/m²)\n", "# unit: uV/m2\n",
                "# statistic_unit: (µV/m²)²\n");
    }

    @Test
    void badOptionsAreOneLineErrorsNamingTheOption(@TempDir Path dir) throws IOException {
        CliRun window = CliRun.of("span", DEMO, "--condition", "rare", "--window", "250-450");
        assertThat(window.exitCode()).isEqualTo(Main.EXIT_BAD_INPUT);
        assertThat(window.err()).startsWith("error: option --window: ").doesNotContain("\tat ");
        CliRun beyond = CliRun.of("span", DEMO, "--condition", "rare", "--window", "260:2000");
        assertThat(beyond.err()).startsWith("error: option --window: window 260:2000 ms lies outside the data");
        CliRun condition = CliRun.of("span", DEMO, "--condition", "rarre", "--window", "260:460");
        assertThat(condition.exitCode()).isEqualTo(Main.EXIT_BAD_INPUT);
        assertThat(condition.err()).startsWith("error: option --condition: ");
        CliRun split = CliRun.of("span", DEMO, "--condition", "rare", "--window", "260:460", "--split", "600");
        assertThat(split.err()).startsWith("error: option --split: 600 ms");
        CliRun alpha = CliRun.of("span", DEMO, "--condition", "rare", "--window", "260:460", "--alpha", "2");
        assertThat(alpha.err()).startsWith("error: option --alpha: ");

        Path file = dir.resolve("one.tsv");
        Files.writeString(file, "time_ms\tCz\tPz\tFz\n0\t1\t2\t3\n4\t2\t3\t1\n");
        CliRun overwrite = CliRun.of("span", file.toString(), "--condition", "x", "--window", "0:4",
                "-o", file.toString());
        assertThat(overwrite.exitCode()).isEqualTo(Main.EXIT_BAD_INPUT);
        assertThat(overwrite.err()).contains("option -o: ").contains("is an input file of the study");
        assertThat(Files.readString(file)).startsWith("time_ms\tCz");
    }
}
