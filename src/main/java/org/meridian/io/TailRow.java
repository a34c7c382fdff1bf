package org.meridian.io;

import ch.randelshofer.fastdoubleparser.JavaDoubleParser;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

/**
 * How many rows a samples-as-rows file holds, foreseen from its last line: sampling is uniform,
 * so with the first time t_0, the step Δ and the last time t_last there are
 * round((t_last − t_0) / Δ) + 1 samples. The reader uses this only to size its storage
 * ({@link ChannelColumns}); the rows are counted as they are read, and nothing depends on the
 * guess being right. Only the file's last {@value #TAIL_BYTES} bytes are read, once.
 */
final class TailRow {
    private static final int TAIL_BYTES = 1 << 16;

    private TailRow() {
    }

    /**
     * The expected number of rows, or -1 when there is no reasonable guess (a compressed file,
     * a last line that does not start with a plain number, implausible times).
     *
     * <p>A guess is accepted only if the file could hold that many rows (a row takes at least
     * two bytes per cell: one character and a delimiter or line feed) and their values fit one
     * array.
     *
     * @param times    the first {@code known} times, in ms
     * @param toMs     the factor from the file's time unit to ms
     * @param channels the number of value cells in a row
     */
    static int expectedRows(Path file, byte delimiter, double[] times, int known, double toMs,
            int channels) {
        if (known < 2) {
            return -1;
        }
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ)) {
            long size = ch.size();
            double step = (times[known - 1] - times[0]) / (known - 1);
            double last = lastFirstCell(ch, size, delimiter) * toMs;
            double rows = Math.rint((last - times[0]) / step) + 1;
            double most = Math.min(size / (2.0 * (channels + 1)) + known,
                    (double) (Integer.MAX_VALUE - 8) / channels);
            return step > 0 && rows >= known && rows <= most ? (int) rows : -1;
        } catch (IOException | RuntimeException e) {
            return -1;
        }
    }

    /** The first cell of the last line holding anything, as a number; NaN when there is none. */
    private static double lastFirstCell(FileChannel ch, long size, byte delimiter)
            throws IOException {
        ByteBuffer head = ByteBuffer.allocate(2);
        ch.read(head, 0);
        if (head.position() == 2 && (head.get(0) & 0xff) == 0x1f && (head.get(1) & 0xff) == 0x8b) {
            return Double.NaN;
        }
        int n = (int) Math.min(size, TAIL_BYTES);
        ByteBuffer tail = ByteBuffer.allocate(n);
        while (tail.hasRemaining() && ch.read(tail, size - n + tail.position()) > 0) {
            // read on until the tail is full
        }
        byte[] b = tail.array();
        int end = tail.position();
        while (end > 0 && isBlank(b[end - 1])) {
            end--;
        }
        int start = end;
        while (start > 0 && b[start - 1] != '\n') {
            start--;
        }
        if (start == 0 && n < size) {
            return Double.NaN;
        }
        int cellEnd = start;
        while (cellEnd < end && b[cellEnd] != delimiter) {
            cellEnd++;
        }
        if (cellEnd == start || !LineScanner.isPlainDecimal(b, start, cellEnd)) {
            return Double.NaN;
        }
        return JavaDoubleParser.parseDouble(b, start, cellEnd - start);
    }

    private static boolean isBlank(byte c) {
        return c == '\n' || c == '\r' || c == ' ' || c == '\t';
    }
}
