package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The reader's storage: blocks of rows in, one exact channel-major array out. */
class ChannelColumnsTest {
    @TempDir
    Path dir;

    /** Value of channel c at sample s in these tests. */
    private static float v(int c, int s) {
        return c * 1000 + s;
    }

    /** Feeds samples 0 … n-1 of 3 channels in blocks of 4 rows (stride 4) and returns the array. */
    private static float[] feed(int capacity, int n) {
        int channels = 3;
        ChannelColumns cols = new ChannelColumns(channels, capacity);
        float[] block = new float[4 * channels];
        for (int first = 0; first < n; first += 4) {
            int rows = Math.min(4, n - first);
            for (int c = 0; c < channels; c++) {
                for (int r = 0; r < rows; r++) {
                    block[c * 4 + r] = v(c, first + r);
                }
            }
            cols.add(block, 4, rows);
        }
        assertThat(cols.samples()).isEqualTo(n);
        return cols.values();
    }

    private static void assertChannelMajor(float[] values, int n) {
        assertThat(values).hasSize(3 * n);
        for (int c = 0; c < 3; c++) {
            for (int s = 0; s < n; s++) {
                // common practice: channel-major, channel c's sample s at c * n + s
                assertThat(values[c * n + s]).isEqualTo(v(c, s));
            }
        }
    }

    @Test
    void anExactGuessNeedsNoCopy() {
        assertChannelMajor(feed(10, 10), 10);
    }

    @Test
    void tooHighAGuessIsTrimmed() {
        assertChannelMajor(feed(50, 10), 10);
    }

    @Test
    void tooLowAGuessGrows() {
        assertChannelMajor(feed(1, 37), 37);
        assertChannelMajor(feed(7, 1000), 1000);
    }

    private Path write(String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, text, StandardCharsets.US_ASCII);
        return f;
    }

    @Test
    void theLastTimeForetellsTheRowCount() throws IOException {
        double[] first = {-100, -98, -96, -94};
        StringBuilder sb = new StringBuilder("time_ms\tFz\n");
        for (int s = 0; s < 250; s++) {
            sb.append(-100 + 2 * s).append("\t1.5\n");
        }
        Path f = write("a.tsv", sb + "\n  \r\n");
        // reference: 250 rows were written (trailing blank lines do not count)
        assertThat(TailRow.expectedRows(f, (byte) '\t', first, 4, 1.0, 1)).isEqualTo(250);
        // the same times written in seconds
        Path s = write("b.tsv", sb.toString().replace("time_ms", "time_s")
                .replace("-100\t", "-0.1\t").replace("398\t", "0.398\t"));
        assertThat(TailRow.expectedRows(s, (byte) '\t', first, 4, 1000.0, 1)).isEqualTo(250);
    }

    @Test
    void noGuessWithoutAReadableLastTime() throws IOException {
        double[] first = {0, 2, 4};
        Path text = write("c.tsv", "time_ms\tFz\n0\t1\n2\t1\n4\t1\nend\t1\n");
        assertThat(TailRow.expectedRows(text, (byte) '\t', first, 3, 1.0, 1)).isEqualTo(-1);
        Path gz = dir.resolve("d.tsv.gz");
        try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(gz))) {
            out.write("time_ms\tFz\n0\t1\n2\t1\n4\t1\n".getBytes(StandardCharsets.US_ASCII));
        }
        assertThat(TailRow.expectedRows(gz, (byte) '\t', first, 3, 1.0, 1)).isEqualTo(-1);
        Path backwards = write("e.tsv", "time_ms\tFz\n0\t1\n2\t1\n4\t1\n-50\t1\n");
        assertThat(TailRow.expectedRows(backwards, (byte) '\t', first, 3, 1.0, 1)).isEqualTo(-1);
        // a last time far beyond what the file's bytes could hold is no guess either
        Path far = write("f.tsv", "time_ms\tFz\n0\t1\n2\t1\n4\t1\n9000000\t1\n");
        assertThat(TailRow.expectedRows(far, (byte) '\t', first, 3, 1.0, 1)).isEqualTo(-1);
    }
}
