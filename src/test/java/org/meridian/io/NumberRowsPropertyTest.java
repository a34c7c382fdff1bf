package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;

import ch.randelshofer.fastdoubleparser.JavaDoubleParser;
import ch.randelshofer.fastdoubleparser.JavaFloatParser;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.meridian.core.Waveforms;

/**
 * The one-pass row reader gives bit for bit the values of the fast double parser on its own,
 * for every number form, near buffer ends, and under unit factors.
 */
class NumberRowsPropertyTest {

    /** A random decimal in one of the forms files use. */
    static String number(Random r) {
        StringBuilder sb = new StringBuilder();
        int sign = r.nextInt(4);
        sb.append(sign == 0 ? "-" : sign == 1 && r.nextInt(4) == 0 ? "+" : "");
        int whole = r.nextInt(10);
        int fraction = r.nextInt(12);
        if (whole == 0 && fraction == 0) {
            whole = 1;
        }
        for (int i = 0; i < whole; i++) {
            sb.append((char) ('0' + r.nextInt(10)));
        }
        if (fraction > 0 || r.nextInt(8) == 0) {
            sb.append('.');
        }
        for (int i = 0; i < fraction; i++) {
            sb.append((char) ('0' + r.nextInt(10)));
        }
        if (r.nextInt(5) == 0) {
            sb.append(r.nextBoolean() ? 'e' : 'E').append(r.nextBoolean() ? "-" : "")
                    .append(r.nextInt(40));
        }
        return sb.toString();
    }

    @Property(tries = 80)
    void rowsReadInOnePassMatchTheParserBitForBit(@ForAll long seed) throws IOException {
        Random r = new Random(seed);
        int channels = 1 + r.nextInt(20);
        int samples = 2 + r.nextInt(150);
        String unit = new String[] {"uV", "mV", "V", "nV"}[r.nextInt(4)];
        double factor = org.meridian.core.Unit.parse(unit).factor();
        boolean crlf = r.nextBoolean();
        List<String> cells = new ArrayList<>();
        StringBuilder sb = new StringBuilder("# unit: " + unit + "\ntime_ms");
        for (int c = 0; c < channels; c++) {
            sb.append('\t').append("E").append(c);
        }
        sb.append(crlf ? "\r\n" : "\n");
        for (int s = 0; s < samples; s++) {
            sb.append(s * 2);
            for (int c = 0; c < channels; c++) {
                String x = number(r);
                while (!Float.isFinite(reference(x, factor))) {
                    x = number(r);
                }
                cells.add(x);
                sb.append('\t').append(x);
            }
            sb.append(crlf ? "\r\n" : "\n");
        }
        Path dir = TempDirs.create();
        try {
            Path f = dir.resolve("n.tsv");
            Files.writeString(f, sb.toString(), StandardCharsets.US_ASCII);
            Waveforms w = WaveformReader.read(f);
            for (int s = 0; s < samples; s++) {
                for (int c = 0; c < channels; c++) {
                    // reference: the fast double parser on the cell alone
                    float want = reference(cells.get(s * channels + c), factor);
                    assertThat(Float.floatToIntBits(w.value(c, s)))
                            .as(cells.get(s * channels + c))
                            .isEqualTo(Float.floatToIntBits(want));
                }
            }
        } finally {
            TempDirs.delete(dir);
        }
    }

    private static float reference(String cell, double factor) {
        byte[] text = cell.getBytes(StandardCharsets.US_ASCII);
        return factor == 1.0 ? JavaFloatParser.parseFloat(text, 0, text.length)
                : (float) (JavaDoubleParser.parseDouble(text, 0, text.length) * factor);
    }

    @Example
    void eightDigitsReadsEveryLength() {
        for (int n = 1; n <= 8; n++) {
            String digits = "87654321".substring(8 - n);
            byte[] b = (digits + "\t0000000000").getBytes(StandardCharsets.US_ASCII);
            long w = EightDigits.load(b, 0);
            assertThat(EightDigits.leadingDigits(w)).isEqualTo(n);
            // reference: Long.parseLong of the same digits
            assertThat(EightDigits.value(w, n)).isEqualTo(Long.parseLong(digits));
        }
        long w = EightDigits.load("x1234567".getBytes(StandardCharsets.US_ASCII), 0);
        assertThat(EightDigits.leadingDigits(w)).isZero();
        long high = EightDigits.load(new byte[] {'1', (byte) 0xC2, '2', '3', '4', '5', '6', '7'}, 0);
        assertThat(EightDigits.leadingDigits(high)).isEqualTo(1);
    }
}
