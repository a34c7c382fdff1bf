package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class MainTest {
    @Test
    void versionAndHelpExitZero() {
        assertThat(CliRun.of("--version").exitCode()).isZero();
        assertThat(CliRun.of("--version").out()).startsWith("Meridian");
        CliRun help = CliRun.of("--help");
        assertThat(help.exitCode()).isZero();
        assertThat(help.out()).contains("montage");
    }

    @Test
    void unknownOptionIsBadInput() {
        CliRun r = CliRun.of("montage", "--sistem", "10-20");
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.err()).startsWith("error: ");
        assertThat(r.err().lines().count()).isEqualTo(1);
    }
}
