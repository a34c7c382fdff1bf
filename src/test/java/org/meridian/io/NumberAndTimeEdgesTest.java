package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowable;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;

/**
 * Edge cases of numbers and sample times that the documented format ("decimal point, optional
 * sign and exponent") rules out or that no recording could give: each is a one-line error
 * naming the line and cell, never an internal failure.
 */
class NumberAndTimeEdgesTest {
    @TempDir
    Path dir;

    private Path file(String name, String text) throws IOException {
        return LoadErrors.write(dir, name, text);
    }

    private static String error(Path arg) {
        return LoadErrors.message(arg, ReadException.class);
    }

    @Test
    void sampleTimesTooCloseForAnyRateAreBadInputNamingTheRow() throws IOException {
        Path rows = file("t.tsv", "time_ms\tCz\n0\t1\n4.9e-324\t2\n");
        assertThat(error(rows)).startsWith(rows + " line 3 column 1: a step of 4.900e-324 ms gives an implausible"
                + " sampling rate (infinite)");
        Path columns = file("c.tsv", "channel\t0\t1e-320\nCz\t1\t2\n");
        assertThat(error(columns)).startsWith(columns + " line 1 column 3: a step of ");
    }

    @Test
    void implausibleButFiniteRatesAreRefusedWithAHintAboutUnits() throws IOException {
        Path tiny = file("a.tsv", "time_ms\tCz\n0\t1\n1e-300\t2\n2e-300\t3\n");
        assertThat(error(tiny)).contains(" line 3 column 1: a step of 1.000e-300 ms")
                .endsWith("are the times in ms under time_ms and in seconds under time_s?");
        // milliseconds written under time_s: a 4000 ms step, 0.25 Hz
        Path seconds = file("s.tsv", "time_s\tCz\n0\t1\n4\t2\n8\t3\n");
        assertThat(error(seconds)).contains("(0.2500 Hz)");
        // the bounds themselves are accepted: 1 Hz and 100 kHz (DESIGN §4 sets no limit; common practice)
        assertThat(StudyLoader.load(file("slow.tsv", "time_ms\tCz\n0\t1\n1000\t2\n")).axis().rateHz()).isEqualTo(1);
        assertThat(StudyLoader.load(file("fast.tsv", "time_ms\tCz\n0\t1\n0.01\t2\n")).axis().rateHz())
                .isEqualTo(100_000);
    }

    @Test
    void timesThatOverflowWhenConvertedToMsAreRefused() throws IOException {
        Path f = file("s.tsv", "time_s\tCz\n1e306\t1\n1.1e306\t2\n");
        assertThat(error(f)).isEqualTo(f + " line 2 column 1: the time is out of range after conversion to ms");
    }

    @Test
    void hexadecimalAndSuffixedNumbersAreNotDecimals() throws IOException {
        Path value = file("v.tsv", "time_ms\tFz\n0\t0x1p3\n4\t1\n");
        assertThat(error(value)).isEqualTo(value + " line 2 column 2: \"0x1p3\" is not a number");
        Path time = file("t.tsv", "time_ms\tFz\n0x0p0\t1\n4\t1\n");
        assertThat(error(time)).isEqualTo(time + " line 2 column 1: \"0x0p0\" is not a number");
        Path quoted = file("q.tsv", "time_ms\tFz\n0\t\"0x10\"\n4\t1.5d\n");
        assertThat(error(quoted)).isEqualTo(quoted + " line 2 column 2: \"0x10\" is not a number");
        Path suffix = file("d.tsv", "time_ms\tFz\n0\t1\n4\t1.5d\n");
        assertThat(error(suffix)).isEqualTo(suffix + " line 3 column 2: \"1.5d\" is not a number");
    }

    @Test
    void everyPlainDecimalFormStillReads() throws IOException {
        Study s = StudyLoader.load(file("ok.tsv", "time_ms\tFz\n0\t+1.\n4\t.5\n8\t-2.5E+1\n12\t \"3e-1\" \n"));
        float[] v = s.waveforms(0, 0).copyValues();
        assertThat(v).containsExactly(1f, 0.5f, -25f, 0.3f);
        // the syntax check itself, against the grammar [+-]?(d+(.d*)?|.d+)([eE][+-]?d+)?
        for (String ok : List.of("1", "-1", "+1", "1.", ".1", "1.5e3", "1E-3", "-0.0")) {
            byte[] b = ok.getBytes(StandardCharsets.US_ASCII);
            assertThat(LineScanner.isPlainDecimal(b, 0, b.length)).as(ok).isTrue();
        }
        for (String bad : List.of("", ".", "+", "e3", "1e", "1e+", "0x1p3", "1.5f", "NaN", "Infinity", "1..2",
                "1.2.3", "1e3.5", " 1")) {
            byte[] b = bad.getBytes(StandardCharsets.US_ASCII);
            assertThat(LineScanner.isPlainDecimal(b, 0, b.length)).as(bad).isFalse();
        }
    }

    @Test
    void aValueThatOverflowsOnlyInMicrovoltsSaysSo() throws IOException {
        Path f = file("v.tsv", "# unit: V\ntime_ms\tFz\n0\t3e35\n4\t1\n");
        assertThat(error(f)).isEqualTo(f + " line 3 column 2: \"3e35\" is out of range after conversion to µV"
                + " (values must stay within ±3.4e38 µV)");
        Path quoted = file("q.tsv", "# unit: V\ntime_ms\tFz\n0\t \"3e35\"\n4\t1\n");
        assertThat(error(quoted)).contains("is out of range after conversion to µV");
        Path plain = file("p.tsv", "time_ms\tFz\n0\t3e39\n4\t1\n");
        assertThat(error(plain)).isEqualTo(plain + " line 2 column 2: \"3e39\" is out of range");
    }

    @Test
    void aCommentAmongTheDataRowsIsExplained() throws IOException {
        String expected = ": a comment line after the header; comment lines (#) may only come before the header";
        Path rows = file("r.tsv", "# unit: uV\ntime_ms\tFz\tCz\n0\t1\t2\n# late note\n4\t1\t2\n");
        assertThat(error(rows)).isEqualTo(rows + " line 4 column 1" + expected);
        Path tabs = file("t.tsv", "time_ms\tFz\tCz\n0\t1\t2\n# a\tb\tc\n4\t1\t2\n");
        assertThat(error(tabs)).isEqualTo(tabs + " line 3 column 1" + expected);
        Path channels = file("c.tsv", "channel\t0\t4\nFz\t1\t2\n# note\n");
        assertThat(error(channels)).isEqualTo(channels + " line 3 column 1" + expected);
        Path table = file("l.tsv", "participant\tcondition\tchannel\ttime_ms\tvalue\np1\ta\tCz\t0\t1\n# x\n");
        assertThat(error(table)).isEqualTo(table + " line 3 column 1" + expected);
        Path manifest = file("study.tsv", "participant\tcondition\tfile\n# x\np1\ta\tr.tsv\n");
        assertThat(error(manifest)).isEqualTo(manifest + " line 2 column 1" + expected);
    }

    @Test
    void equalAxesHaveEqualHashes() {
        // the audit's pair: equal within the 1e-6 tolerance, rates rounding apart at 1 mHz
        TimeAxis a = new TimeAxis(0, 250.0005, 10);
        TimeAxis b = new TimeAxis(0, 250.00049999, 10);
        assertThat(a).isEqualTo(b);
        assertThat(a.hashCode()).isEqualTo(b.hashCode());
        assertThat(new java.util.HashSet<>(List.of(a, b))).hasSize(1);
    }

    @Test
    void aBadInputExceptionIsAllThatEscapes() throws IOException {
        for (String text : List.of("time_ms\tCz\n0\t1\n4.9e-324\t2\n", "time_s\tCz\n-1e308\t1\n1e308\t2\n",
                "channel\t0\t1e-320\nCz\t1\t2\n", "time_ms\tCz\n0\t1e-50\n1e-310\t2\n")) {
            Path f = file("x.tsv", text);
            assertThat(catchThrowable(() -> StudyLoader.load(f))).as(text).isInstanceOf(BadInputException.class);
        }
    }
}
