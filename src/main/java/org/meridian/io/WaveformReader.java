package org.meridian.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.BooleanSupplier;
import org.meridian.core.Montage;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;

/**
 * Reads one waveform file (one participant × one condition, DESIGN §4) in either orientation,
 * told by the first header cell:
 * <ul>
 * <li>{@code time_ms} or {@code time_s}: samples as rows; the other header cells are channel
 * labels, and each row holds a sample's time followed by one value per channel;</li>
 * <li>{@code channel}: channels as rows; the other header cells are the sample times in ms, and
 * each row holds a channel label followed by its values.</li>
 * </ul>
 * Values are converted to µV by the factor of the {@code # unit:} comment (CSD files in µV/m²
 * are kept as they are). Sampling must be uniform, see {@link Sampling}.
 */
public final class WaveformReader {
    private static final int INITIAL_ROWS = 1024;
    /** Rows parsed into one block (with 128 channels 32 KB, which stays in cache). */
    private static final int BLOCK_ROWS = 64;

    private WaveformReader() {
    }

    /** Reads a waveform file; a {@link ReadException} names the file, line and cell at fault. */
    public static Waveforms read(Path file) {
        return read(file, () -> false);
    }

    static Waveforms read(Path file, BooleanSupplier cancelled) {
        try (LineScanner sc = new LineScanner(file.toString(), TextInput.open(file), cancelled)) {
            Preamble pre = Preamble.read(sc);
            String first = pre.firstColumnKey();
            pre.requireColumns(sc);
            return switch (first) {
                case "time_ms" -> samplesAsRows(file, sc, pre, 1.0);
                case "time_s" -> samplesAsRows(file, sc, pre, 1000.0);
                case "channel" -> channelsAsRows(sc, pre);
                default -> throw sc.error(1, "the header starts with "
                        + LineScanner.quote(pre.columns().get(0)) + "; a waveform file starts with"
                        + " time_ms or time_s (samples as rows) or channel (channels as rows)");
            };
        }
    }

    /**
     * Samples as rows. Values arrive sample-major; they are parsed straight into one block of
     * {@value #BLOCK_ROWS} rows held channel-major (small enough to stay in cache while it
     * fills), and each full block's channel runs are copied into the channel-major result
     * ({@link ChannelColumns}), sized from the first block's times and the file's last time
     * ({@link TailRow}).
     */
    private static Waveforms samplesAsRows(Path file, LineScanner sc, Preamble pre, double toMs) {
        List<String> labels = labels(sc, pre.columns().subList(1, pre.columns().size()), 2);
        int channels = labels.size();
        int width = channels + 1;
        double factor = pre.unit().factor();
        double[] times = new double[INITIAL_ROWS];
        int[] lines = new int[INITIAL_ROWS];
        float[] block = new float[BLOCK_ROWS * channels];
        ChannelColumns columns = null;
        int n = 0;
        while (true) {
            if (n == times.length) {
                times = Arrays.copyOf(times, n * 2);
                lines = Arrays.copyOf(lines, n * 2);
            }
            int row = n % BLOCK_ROWS;
            int r = sc.numberRow(false, times, n, block, row, BLOCK_ROWS, channels, factor);
            if (r == NumberRows.END) {
                break;
            }
            if (r == NumberRows.SLOW) {
                if (!sc.next()) {
                    break;
                }
                if (sc.cellCount() != width) {
                    if (sc.cellCount() == 1 && sc.isBlank()) {
                        continue;
                    }
                    throw ragged(sc, width);
                }
                times[n] = sc.number(0);
                for (int c = 0; c < channels; c++) {
                    block[c * BLOCK_ROWS + row] = sc.value(c + 1, factor);
                }
            }
            times[n] *= toMs;
            lines[n] = sc.line();
            n++;
            if (row == BLOCK_ROWS - 1) {
                if (columns == null) {
                    int expected = TailRow.expectedRows(file, sc.delimiter(), times, n, toMs,
                            channels);
                    columns = new ChannelColumns(channels, expected > 0 ? expected
                            : INITIAL_ROWS);
                    if (expected > times.length) {
                        times = Arrays.copyOf(times, expected + 1);
                        lines = Arrays.copyOf(lines, expected + 1);
                    }
                }
                columns.add(block, BLOCK_ROWS, BLOCK_ROWS);
            }
        }
        if (n == 0) {
            throw new ReadException(sc.file(), pre.headerLine(), 0, "a header but no data rows");
        }
        if (columns == null) {
            columns = new ChannelColumns(channels, n);
        }
        if (n % BLOCK_ROWS != 0) {
            columns.add(block, BLOCK_ROWS, n % BLOCK_ROWS);
        }
        final int[] rowLines = lines;
        TimeAxis axis = Sampling.axis(times, n, (i, problem) ->
                new ReadException(sc.file(), rowLines[i], 1, problem));
        return Waveforms.wrap(labels, axis, pre.unit().unit(), columns.values());
    }

    /** Channels as rows: the header holds the times, each row one channel. */
    private static Waveforms channelsAsRows(LineScanner sc, Preamble pre) {
        int samples = pre.columns().size() - 1;
        double[] times = new double[samples];
        for (int s = 0; s < samples; s++) {
            times[s] = sc.number(s + 1);
        }
        int headerLine = pre.headerLine();
        TimeAxis axis = Sampling.axis(times, samples, (i, problem) ->
                new ReadException(sc.file(), headerLine, i + 2, problem));
        int width = samples + 1;
        double factor = pre.unit().factor();
        List<String> labels = new ArrayList<>();
        Map<String, Integer> seenOnLine = new HashMap<>();
        float[] byChannel = new float[16 * samples];
        while (true) {
            int c = labels.size();
            if ((c + 1) * samples > byChannel.length) {
                byChannel = Arrays.copyOf(byChannel, byChannel.length * 2);
            }
            int base = c * samples;
            int r = sc.numberRow(true, null, 0, byChannel, base, 1, samples, factor);
            if (r == NumberRows.END) {
                break;
            }
            if (r == NumberRows.SLOW) {
                if (!sc.next()) {
                    break;
                }
                if (sc.cellCount() != width) {
                    if (sc.cellCount() == 1 && sc.isBlank()) {
                        continue;
                    }
                    throw ragged(sc, width);
                }
                for (int s = 0; s < samples; s++) {
                    byChannel[base + s] = sc.value(s + 1, factor);
                }
            }
            String label = sc.text(0);
            if (label.isEmpty()) {
                throw sc.error(1, "empty channel label");
            }
            Integer previous = seenOnLine.put(Montage.key(label), sc.line());
            if (previous != null) {
                throw sc.error(1, "channel " + label + " appears twice (also on line " + previous
                        + ")");
            }
            labels.add(label);
        }
        if (labels.isEmpty()) {
            throw new ReadException(sc.file(), headerLine, 0, "a header but no data rows");
        }
        float[] values = byChannel.length == labels.size() * samples ? byChannel
                : Arrays.copyOf(byChannel, labels.size() * samples);
        return Waveforms.wrap(labels, axis, pre.unit().unit(), values);
    }

    /**
     * Where a channel label stands in a waveform file, for messages about it: {line, column}
     * of its header cell (samples as rows) or of its row's first cell (channels as rows); null
     * when the file is not a waveform file or lacks the label. Reads the file again, so it is
     * meant for the error path only.
     */
    static int[] labelPlace(Path file, String label) {
        String key = Montage.key(label);
        try (LineScanner sc = new LineScanner(file.toString(), TextInput.open(file), () -> false)) {
            Preamble pre = Preamble.read(sc);
            String first = pre.firstColumnKey();
            if (first.equals("time_ms") || first.equals("time_s")) {
                for (int i = 1; i < pre.columns().size(); i++) {
                    if (Montage.key(pre.columns().get(i)).equals(key)) {
                        return new int[] {pre.headerLine(), i + 1};
                    }
                }
            } else if (first.equals("channel")) {
                while (sc.next()) {
                    if (Montage.key(sc.text(0)).equals(key)) {
                        return new int[] {sc.line(), 1};
                    }
                }
            }
            return null;
        } catch (RuntimeException e) {
            return null;
        }
    }

    /** Channel labels from header cells: none empty, none twice (ignoring case). */
    static List<String> labels(LineScanner sc, List<String> cells, int firstColumn) {
        Map<String, Integer> seen = new HashMap<>();
        List<String> out = new ArrayList<>(cells.size());
        for (int i = 0; i < cells.size(); i++) {
            String label = cells.get(i);
            int column = firstColumn + i;
            if (label.isEmpty()) {
                throw sc.error(column, "empty channel label in the header");
            }
            Integer previous = seen.put(Montage.key(label), column);
            if (previous != null) {
                throw sc.error(column, "channel " + label + " appears twice in the header (also"
                        + " column " + previous + ")");
            }
            out.add(label);
        }
        return out;
    }

    /** A row whose cell count differs from the header's; the column is the first cell at odds. */
    static ReadException ragged(LineScanner sc, int width) {
        if (sc.isComment()) {
            return sc.commentAfterHeader();
        }
        int have = sc.cellCount();
        if (have < width) {
            return sc.error(have + 1, "the row has " + have + " cells but the header has " + width
                    + " (missing cell)");
        }
        return sc.error(width + 1, "the row has " + have + " cells but the header has " + width
                + " (extra cell" + (have - width > 1 ? "s" : "") + ")");
    }
}
