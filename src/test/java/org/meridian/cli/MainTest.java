package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.Callable;
import org.junit.jupiter.api.Test;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

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

    /** A command that fails the way a bug or an exhausted heap would. */
    @Command(name = "fail")
    static final class Failing implements Callable<Integer> {
        @Parameters(index = "0")
        String how;

        @Override
        public Integer call() {
            if (how.equals("memory")) {
                throw new OutOfMemoryError("Java heap space");
            }
            throw new IllegalStateException("broken\ninvariant");
        }
    }

    private static CliRun failing(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out), new PrintWriter(err), new Failing());
        return new CliRun(code, out.toString(), err.toString());
    }

    @Test
    void anInternalFailureIsOneLineWithExitOneAndNoTrace() {
        CliRun r = failing("fail", "bug");
        assertThat(r.exitCode()).isEqualTo(Main.EXIT_INTERNAL);
        // common practice: one diagnostic line per failure, the details behind a flag
        assertThat(r.err()).isEqualTo("error: internal failure: java.lang.IllegalStateException: broken invariant"
                + " (run again with --debug for details)" + System.lineSeparator());
    }

    @Test
    void debugBeforeOrAfterTheCommandPrintsTheStackTrace() {
        for (String[] args : new String[][] {{"--debug", "fail", "bug"}, {"fail", "--debug", "bug"}}) {
            CliRun r = failing(args);
            assertThat(r.exitCode()).isEqualTo(Main.EXIT_INTERNAL);
            assertThat(r.err()).startsWith("error: internal failure: java.lang.IllegalStateException")
                    .contains("\tat org.meridian.cli.MainTest$Failing.call").doesNotContain("--debug for details");
        }
    }

    @Test
    void badInputHasNoTraceUnlessAskedFor() {
        CliRun plain = CliRun.of("info", "no/such/study");
        assertThat(plain.exitCode()).isEqualTo(Main.EXIT_BAD_INPUT);
        assertThat(plain.err().lines().count()).isEqualTo(1);
        CliRun debug = CliRun.of("info", "--debug", "no/such/study");
        assertThat(debug.exitCode()).isEqualTo(Main.EXIT_BAD_INPUT);
        assertThat(debug.err()).contains("\tat org.meridian.");
    }

    @Test
    void runningOutOfMemoryIsOneLineSuggestingLess() {
        CliRun r = failing("fail", "memory");
        assertThat(r.exitCode()).isEqualTo(Main.EXIT_INTERNAL);
        assertThat(r.err().lines().count()).isEqualTo(1);
        assertThat(r.err()).startsWith("error: out of memory (").contains("--resolution").contains("-Xmx");
        assertThat(failing("--debug", "fail", "memory").err()).contains("\tat org.meridian.cli.MainTest$Failing.call");
    }
}
