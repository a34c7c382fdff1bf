package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.Waveforms;

class LineScannerTest {
    @TempDir
    Path dir;

    private static LineScanner scanner(byte[] bytes) {
        return new LineScanner("t", new ByteArrayInputStream(bytes), () -> false);
    }

    @Test
    void byteOrderMarkAndCrlfAreInvisible() {
        byte[] text = "\uFEFFtime_ms,Cz\r\n0,1.5\r\n4,\"2\"\r\n".getBytes(StandardCharsets.UTF_8);
        LineScanner sc = scanner(text);
        Preamble pre = Preamble.read(sc);
        assertThat(pre.columns()).containsExactly("time_ms", "Cz");
        assertThat(sc.delimiter()).isEqualTo((byte) ',');
        assertThat(sc.next()).isTrue();
        assertThat(sc.value(1, 1.0)).isEqualTo(1.5f);
        assertThat(sc.next()).isTrue();
        assertThat(sc.value(1, 1.0)).isEqualTo(2f);
        assertThat(sc.next()).isFalse();
    }

    @Test
    void lastLineWithoutLineEndIsRead() {
        LineScanner sc = scanner("a\tb\n1\t2".getBytes(StandardCharsets.UTF_8));
        Preamble.read(sc);
        assertThat(sc.next()).isTrue();
        assertThat(sc.number(1)).isEqualTo(2.0);
        assertThat(sc.line()).isEqualTo(2);
        assertThat(sc.next()).isFalse();
    }

    @Test
    void delimiterIsTheMostFrequentOfTheThree() {
        LineScanner sc = scanner("time_ms;F,z;Cz;Pz\n".getBytes(StandardCharsets.UTF_8));
        Preamble pre = Preamble.read(sc);
        assertThat(pre.columns()).containsExactly("time_ms", "F,z", "Cz", "Pz");
    }

    @Test
    void linesLongerThanTheBufferAreReadWhole() throws IOException {
        int samples = 20000;
        StringBuilder sb = new StringBuilder("channel");
        for (int s = 0; s < samples; s++) {
            sb.append('\t').append(s * 2);
        }
        sb.append("\nCz");
        for (int s = 0; s < samples; s++) {
            sb.append('\t').append(s % 97 - 48.25);
        }
        sb.append('\n');
        Path f = dir.resolve("long.tsv");
        Files.writeString(f, sb.toString());
        Waveforms w = WaveformReader.read(f);
        assertThat(w.sampleCount()).isEqualTo(samples);
        assertThat(w.axis().rateHz()).isEqualTo(500.0);
        assertThat(w.value(0, 12345)).isEqualTo(12345 % 97 - 48.25f);
    }

    @Test
    void cancellationIsAskedWhileReading() {
        StringBuilder sb = new StringBuilder("time_ms\tCz\n");
        for (int i = 0; i < 5000; i++) {
            sb.append(i).append("\t1\n");
        }
        AtomicInteger asked = new AtomicInteger();
        LineScanner sc = new LineScanner("t", new ByteArrayInputStream(
                sb.toString().getBytes(StandardCharsets.UTF_8)), () -> asked.incrementAndGet() > 2);
        assertThatThrownBy(() -> {
            while (sc.next()) {
                // reading on until cancelled
            }
        }).isInstanceOf(CancellationException.class);
        assertThat(sc.line()).isLessThan(5000);
    }

    @Test
    void signsExponentsAndSurroundingBlanksParse() {
        LineScanner sc = scanner("a,b,c,d,e\n-1.5e-3, 2 ,+7,.5,\"3\"\n".getBytes(
                StandardCharsets.UTF_8));
        Preamble.read(sc);
        sc.next();
        assertThat(sc.number(0)).isEqualTo(-1.5e-3);
        assertThat(sc.number(1)).isEqualTo(2.0);
        assertThat(sc.number(2)).isEqualTo(7.0);
        assertThat(sc.number(3)).isEqualTo(0.5);
        assertThat(sc.number(4)).isEqualTo(3.0);
    }

    @Test
    void unitConversionMultipliesInDoublePrecision() {
        LineScanner sc = scanner("a\tb\n1.2345678e-5\t-3e-9\n".getBytes(StandardCharsets.UTF_8));
        Preamble.read(sc);
        sc.next();
        assertThat(sc.value(0, 1e6)).isEqualTo((float) (1.2345678e-5 * 1e6));
        assertThat(sc.value(1, 1e6)).isEqualTo((float) (-3e-9 * 1e6));
    }
}
