package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MontageCommandTest {
    @Test
    void writesTheTenTwentyPositionsToStandardOutput() {
        CliRun r = CliRun.of("montage", "--system", "10-20");
        assertThat(r.exitCode()).isZero();
        assertThat(r.out().lines().filter(l -> !l.startsWith("#"))).first().isEqualTo("label\tx\ty\tz");
        assertThat(r.out()).contains("Cz\t0.000000\t0.000000\t1.000000");
        assertThat(r.out().lines().filter(l -> !l.startsWith("#")).count()).isEqualTo(22);
    }

    @Test
    void writesToAFileAtomically(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("ten-five.tsv");
        CliRun r = CliRun.of("montage", "--system", "10-5", "-o", out.toString());
        assertThat(r.exitCode()).isZero();
        assertThat(Files.readAllLines(out)).hasSize(347);
        try (var files = Files.list(dir)) {
            assertThat(files).containsExactly(out);
        }
    }

    @Test
    void unknownSystemIsAOneLineErrorWithExitTwo() {
        CliRun r = CliRun.of("montage", "--system", "10-15");
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.err().strip()).startsWith("error: option --system").doesNotContain("\n");
    }

    @Test
    void missingFolderIsAnError(@TempDir Path dir) {
        CliRun r = CliRun.of("montage", "--system", "10-5", "-o", dir.resolve("no/such/x.tsv").toString());
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.err()).startsWith("error: ").contains("does not exist");
    }
}
