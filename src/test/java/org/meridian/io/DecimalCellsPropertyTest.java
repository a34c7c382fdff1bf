package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowable;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.zip.GZIPOutputStream;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;

/**
 * Every value the waveform reader produces equals, bit for bit, what the JDK's own parsers make
 * of the same cell: {@code Float.parseFloat} without a unit factor (the decimal rounded once to
 * float), {@code (float) (Double.parseDouble(cell) · factor)} with one. The cells are drawn to
 * hit every branch of the one-word path of {@link NumberRows} (signs, points at every place,
 * lengths around eight bytes) as well as exponents and long significands, and cells made only of
 * minus, point, slash and digits that are not numbers must still be refused with their place.
 */
class DecimalCellsPropertyTest {

    /** A plain decimal of the files' grammar, mostly a few bytes long. */
    static String cell(Random r) {
        while (true) {
            StringBuilder sb = new StringBuilder();
            int sign = r.nextInt(6);
            sb.append(sign < 2 ? "-" : sign == 2 ? "+" : "");
            boolean many = r.nextInt(10) == 0;
            int whole = many ? r.nextInt(20) : r.nextInt(8);
            int fraction = many ? r.nextInt(20) : r.nextInt(8);
            for (int i = 0; i < whole; i++) {
                sb.append((char) ('0' + r.nextInt(10)));
            }
            if (fraction > 0 || r.nextInt(6) == 0) {
                sb.append('.');
            }
            for (int i = 0; i < fraction; i++) {
                sb.append((char) ('0' + r.nextInt(10)));
            }
            if (r.nextInt(12) == 0) {
                sb.append(r.nextBoolean() ? 'e' : 'E').append(r.nextInt(3) == 0 ? "-" : "")
                        .append(r.nextInt(50));
            }
            String s = sb.toString();
            if (whole + fraction > 0 && Float.isFinite(Float.parseFloat(s))) {
                return s;
            }
        }
    }

    @Property(tries = 60)
    void everyValueEqualsTheJdkParserBitForBit(@ForAll long seed) throws IOException {
        Random r = new Random(seed);
        int channels = 1 + r.nextInt(40);
        int samples = 2 + r.nextInt(200);
        String unit = new String[] {"uV", "uV", "mV", "V", "nV"}[r.nextInt(5)];
        double factor = Unit.parse(unit).factor();
        String newline = r.nextInt(4) == 0 ? "\r\n" : "\n";
        List<String> cells = new ArrayList<>();
        StringBuilder sb = new StringBuilder("# unit: " + unit + "\ntime_ms");
        for (int c = 0; c < channels; c++) {
            sb.append("\tE").append(c);
        }
        sb.append(newline);
        for (int s = 0; s < samples; s++) {
            sb.append(s * 4 - 100);
            for (int c = 0; c < channels; c++) {
                String x = cell(r);
                while (!Float.isFinite(reference(x, factor))) {
                    x = cell(r);
                }
                cells.add(x);
                sb.append('\t').append(x);
            }
            sb.append(newline);
        }
        Path dir = TempDirs.create();
        try {
            Path f = dir.resolve("cells.tsv");
            Files.writeString(f, sb.toString(), StandardCharsets.US_ASCII);
            Waveforms w = WaveformReader.read(f);
            assertThat(w.sampleCount()).isEqualTo(samples);
            for (int s = 0; s < samples; s++) {
                for (int c = 0; c < channels; c++) {
                    String x = cells.get(s * channels + c);
                    // reference: the JDK's Float.parseFloat / Double.parseDouble of the cell
                    assertThat(Float.floatToIntBits(w.value(c, s))).as(x)
                            .isEqualTo(Float.floatToIntBits(reference(x, factor)));
                }
            }
        } finally {
            TempDirs.delete(dir);
        }
    }

    private static float reference(String cell, double factor) {
        return factor == 1.0 ? Float.parseFloat(cell)
                : (float) (Double.parseDouble(cell) * factor);
    }

    @Example
    void cellsOfNumberCharactersThatAreNoNumbersAreRefusedWithTheirPlace() throws IOException {
        // each bad cell sits in the middle of a long row, where the one-word path reads it
        String[] bad = {"1.-5", "--1", "1..2", "1/2", "-", ".", "-.", "12-", "1.2.3", "/5", "-/1",
            "1-2.5", "-1.2/", "12.34.5", "1-"};
        Path dir = TempDirs.create();
        try {
            for (String x : bad) {
                StringBuilder sb = new StringBuilder("time_ms");
                for (int c = 0; c < 12; c++) {
                    sb.append("\tE").append(c);
                }
                sb.append('\n');
                for (int s = 0; s < 3; s++) {
                    sb.append(s * 4);
                    for (int c = 0; c < 12; c++) {
                        sb.append('\t').append(s == 1 && c == 6 ? x : "-12.3456");
                    }
                    sb.append('\n');
                }
                Path f = dir.resolve("bad.tsv");
                Files.writeString(f, sb.toString(), StandardCharsets.US_ASCII);
                Throwable t = catchThrowable(() -> WaveformReader.read(f));
                assertThat(t).as(x).isInstanceOf(ReadException.class);
                // common practice: the cell is named by line and column, counted from 1
                assertThat(t.getMessage()).as(x).isEqualTo(f + " line 3 column 8: \"" + x
                        + "\" is not a number");
            }
        } finally {
            TempDirs.delete(dir);
        }
    }

    @Example
    void anEmptyCellBeforeADecimalIsRefusedWhateverTheDelimiter() throws IOException {
        // a semicolon has bit 4 set like a digit: an empty cell must still not read as one
        Path dir = TempDirs.create();
        try {
            for (String d : new String[] {"\t", ",", ";"}) {
                StringBuilder sb = new StringBuilder("time_ms");
                for (int c = 0; c < 12; c++) {
                    sb.append(d).append('E').append(c);
                }
                sb.append('\n');
                for (int s = 0; s < 3; s++) {
                    sb.append(s * 4);
                    for (int c = 0; c < 12; c++) {
                        sb.append(d).append(s == 1 && c == 6 ? "" : s == 1 && c == 7 ? "12.3456"
                                : "-12.3456");
                    }
                    sb.append('\n');
                }
                Path f = dir.resolve("empty.txt");
                Files.writeString(f, sb.toString(), StandardCharsets.US_ASCII);
                Throwable t = catchThrowable(() -> WaveformReader.read(f));
                // common practice: the cell is named by line and column, counted from 1
                assertThat(t).as(d).isInstanceOf(ReadException.class).hasMessage(f
                        + " line 3 column 8: empty cell where a number is expected");
            }
        } finally {
            TempDirs.delete(dir);
        }
    }

    @Example
    void aCompressedFileLongerThanTheFirstGuessGrowsItsStorage() throws IOException {
        // no size can be foreseen from a gzip file's last line: storage grows as rows arrive
        int channels = 5;
        int samples = 3001;
        StringBuilder sb = new StringBuilder("time_s");
        for (int c = 0; c < channels; c++) {
            sb.append("\tE").append(c);
        }
        sb.append('\n');
        for (int s = 0; s < samples; s++) {
            sb.append(s / 500.0);
            for (int c = 0; c < channels; c++) {
                sb.append('\t').append(c * 10000 + s).append(".5");
            }
            sb.append('\n');
        }
        Path dir = TempDirs.create();
        try {
            Path f = dir.resolve("long.tsv.gz");
            try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(f))) {
                out.write(sb.toString().getBytes(StandardCharsets.US_ASCII));
            }
            Waveforms w = WaveformReader.read(f);
            assertThat(w.sampleCount()).isEqualTo(samples);
            assertThat(w.axis().rateHz()).isEqualTo(500.0);
            for (int c = 0; c < channels; c++) {
                for (int s = 0; s < samples; s += 97) {
                    // reference: the value written, c * 10000 + s + 0.5, exact in float
                    assertThat(w.value(c, s)).isEqualTo(c * 10000 + s + 0.5f);
                }
            }
        } finally {
            TempDirs.delete(dir);
        }
    }
}
