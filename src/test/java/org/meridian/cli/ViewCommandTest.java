package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** The view command's option errors, found before any window opens. */
class ViewCommandTest {
    @Test
    void anUnknownThemeIsAOneLineErrorWithExitTwo() {
        CliRun r = CliRun.of("view", "--theme", "purple");
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.err().strip()).isEqualTo("error: option --theme: expected light or dark, got purple");
    }

    @Test
    void aWindowThatIsNotTwoTimesIsAnError() {
        CliRun r = CliRun.of("view", "--window", "300");
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.err().strip()).startsWith("error: ").contains("300").doesNotContain("\n");
    }

    @Test
    void helpNamesTheOptions() {
        CliRun r = CliRun.of("view", "--help");
        assertThat(r.exitCode()).isZero();
        assertThat(r.out()).contains("--window", "--cursor", "--channel", "--conditions", "--map", "--theme");
    }
}
