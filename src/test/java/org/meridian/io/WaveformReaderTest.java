package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.Waveforms;

class WaveformReaderTest {
    @TempDir
    Path dir;

    /** A value that differs for every channel and sample, written exactly with two decimals. */
    private static float expected(int channel, int sample) {
        return (channel * 1000 + sample) / 4f - 300;
    }

    private Path samplesAsRows(int samples, int channels, int oddRow) throws IOException {
        StringBuilder sb = new StringBuilder("time_ms");
        for (int c = 0; c < channels; c++) {
            sb.append('\t').append("E").append(c + 1);
        }
        sb.append('\n');
        for (int s = 0; s < samples; s++) {
            if (s == oddRow) {
                sb.append("\n   \n");
            }
            sb.append(s * 2);
            for (int c = 0; c < channels; c++) {
                String v = Float.toString(expected(c, s));
                // one row takes the general path: a quoted cell, blanks, an exponent
                sb.append('\t').append(s == oddRow ? " \"" + v + "\" " : v);
            }
            sb.append(s % 3 == 0 ? "\r\n" : "\n");
        }
        Path f = dir.resolve("w" + samples + ".tsv");
        Files.writeString(f, sb.toString());
        return f;
    }

    @Test
    void rowsAroundBlockBoundariesLandInTheirPlace() throws IOException {
        for (int samples : new int[] {2, 63, 64, 65, 128, 129, 1000}) {
            Waveforms w = WaveformReader.read(samplesAsRows(samples, 7, samples / 2));
            assertThat(w.sampleCount()).isEqualTo(samples);
            assertThat(w.axis().rateHz()).isEqualTo(500.0);
            for (int c = 0; c < 7; c++) {
                for (int s = 0; s < samples; s++) {
                    assertThat(w.value(c, s)).as("channel %d sample %d of %d", c, s, samples)
                            .isEqualTo(expected(c, s));
                }
            }
        }
    }

    @Test
    void bothOrientationsGiveTheSameWaveforms() throws IOException {
        Waveforms rows = WaveformReader.read(samplesAsRows(70, 3, -1));
        StringBuilder sb = new StringBuilder("channel");
        for (int s = 0; s < 70; s++) {
            sb.append(',').append(s * 2);
        }
        sb.append('\n');
        for (int c = 0; c < 3; c++) {
            sb.append("E").append(c + 1);
            for (int s = 0; s < 70; s++) {
                sb.append(',').append(expected(c, s));
            }
            sb.append('\n');
        }
        Path f = dir.resolve("channels.csv");
        Files.writeString(f, sb.toString());
        Waveforms columns = WaveformReader.read(f);
        assertThat(columns.describeLayoutDifference(rows)).isNull();
        assertThat(columns.copyValues()).isEqualTo(rows.copyValues());
    }
}
