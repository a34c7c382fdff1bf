package org.meridian.io;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;

/** Generates samples-as-rows waveform files of invented data for the benchmarks. */
final class BenchFiles {
    private BenchFiles() {
    }

    /**
     * Writes a file of {@code channels} channels at 1000 Hz from -200 ms, values with four
     * decimals of a few tens of µV, until it holds at least {@code minBytes} (or exactly
     * {@code samples} rows when {@code samples > 0}). Returns the file's size.
     */
    static long write(Path file, int channels, int samples, long minBytes, long seed)
            throws IOException {
        Random r = new Random(seed);
        long written = 0;
        try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(file), 1 << 16)) {
            StringBuilder head = new StringBuilder("# unit: uV\ntime_ms");
            for (int c = 0; c < channels; c++) {
                head.append("\tE").append(c + 1);
            }
            head.append('\n');
            byte[] h = head.toString().getBytes(StandardCharsets.US_ASCII);
            out.write(h);
            written += h.length;
            byte[] row = new byte[32 + channels * FixedDecimals.MAX_CHARS];
            for (int s = 0; samples > 0 ? s < samples : written < minBytes; s++) {
                byte[] t = Integer.toString(s - 200).getBytes(StandardCharsets.US_ASCII);
                System.arraycopy(t, 0, row, 0, t.length);
                int pos = t.length;
                for (int c = 0; c < channels; c++) {
                    row[pos++] = '\t';
                    pos = FixedDecimals.append((float) (r.nextGaussian() * 15), 4, row, pos);
                }
                row[pos++] = '\n';
                out.write(row, 0, pos);
                written += pos;
            }
        }
        return written;
    }
}
