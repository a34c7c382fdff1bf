package org.meridian.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.BooleanSupplier;
import java.util.function.Function;
import org.meridian.core.Montage;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;

/**
 * Reads a long table (DESIGN §4): one value a row, in the columns {@code participant},
 * {@code condition}, {@code channel}, {@code time_ms} (or {@code time_s}) and {@code value}, in
 * any order and with rows in any order; other columns are ignored, a {@code # unit:} comment
 * converts as for waveform files. Every participant × condition must give a value for every
 * channel at every time, exactly once. Participants, conditions and channels keep the order in
 * which they first appear.
 */
final class LongTableReader {
    private static final int INITIAL_ROWS = 4096;

    private LongTableReader() {
    }

    /** One participant × condition of the table. */
    record Cell(String participant, String condition, Waveforms waveforms) {
    }

    static boolean isLongTableHeader(Preamble pre) {
        return pre.indexOf("participant") >= 0 && pre.indexOf("condition") >= 0
                && pre.indexOf("channel") >= 0 && pre.indexOf("value") >= 0
                && (pre.indexOf("time_ms") >= 0 || pre.indexOf("time_s") >= 0);
    }

    static List<Cell> read(Path file, BooleanSupplier cancelled) {
        String name = file.toString();
        try (LineScanner sc = new LineScanner(name, TextInput.open(file), cancelled)) {
            Preamble pre = Preamble.read(sc);
            if (!isLongTableHeader(pre)) {
                throw sc.error(0, "a long table needs the columns participant, condition, channel,"
                        + " time_ms (or time_s) and value; this header has "
                        + String.join(", ", pre.columns()));
            }
            return new Rows(sc, pre).read().assemble();
        }
    }

    /** The rows as parallel arrays, and the names they refer to. */
    private static final class Rows {
        private final LineScanner sc;
        private final Preamble pre;
        private final Names participants = new Names(s -> s.toLowerCase(Locale.ROOT));
        private final Names conditions = new Names(s -> s.toLowerCase(Locale.ROOT));
        private final Names channels = new Names(Montage::key);
        private int n;
        private int[] p = new int[INITIAL_ROWS];
        private int[] c = new int[INITIAL_ROWS];
        private int[] ch = new int[INITIAL_ROWS];
        private double[] t = new double[INITIAL_ROWS];
        private float[] v = new float[INITIAL_ROWS];
        private int[] line = new int[INITIAL_ROWS];

        Rows(LineScanner sc, Preamble pre) {
            this.sc = sc;
            this.pre = pre;
        }

        Rows read() {
            int ip = pre.indexOf("participant");
            int ic = pre.indexOf("condition");
            int ich = pre.indexOf("channel");
            int ims = pre.indexOf("time_ms");
            int it = ims >= 0 ? ims : pre.indexOf("time_s");
            double toMs = ims >= 0 ? 1.0 : 1000.0;
            int iv = pre.indexOf("value");
            double factor = pre.unit().factor();
            int width = pre.columns().size();
            while (sc.next()) {
                if (sc.cellCount() != width) {
                    if (sc.cellCount() == 1 && sc.isBlank()) {
                        continue;
                    }
                    throw WaveformReader.ragged(sc, width);
                }
                if (n == p.length) {
                    grow();
                }
                p[n] = participants.index(sc, ip, "participant");
                c[n] = conditions.index(sc, ic, "condition");
                ch[n] = channels.index(sc, ich, "channel");
                t[n] = sc.number(it) * toMs;
                v[n] = sc.value(iv, factor);
                line[n] = sc.line();
                n++;
            }
            if (n == 0) {
                throw new ReadException(sc.file(), pre.headerLine(), 0, "a header but no data rows");
            }
            return this;
        }

        private void grow() {
            int cap = p.length * 2;
            p = Arrays.copyOf(p, cap);
            c = Arrays.copyOf(c, cap);
            ch = Arrays.copyOf(ch, cap);
            t = Arrays.copyOf(t, cap);
            v = Arrays.copyOf(v, cap);
            line = Arrays.copyOf(line, cap);
        }

        List<Cell> assemble() {
            double[] times = Arrays.copyOf(t, n);
            Arrays.sort(times);
            int unique = 0;
            for (int i = 0; i < n; i++) {
                if (unique == 0 || times[i] != times[unique - 1]) {
                    times[unique++] = times[i];
                }
            }
            final double[] uniqueTimes = Arrays.copyOf(times, unique);
            TimeAxis axis = Sampling.axis(uniqueTimes, unique, (i, problem) ->
                    new ReadException(sc.file(), firstLineAt(uniqueTimes[i]), 0, problem));
            int nch = channels.size();
            int ns = unique;
            int np = participants.size();
            int nc = conditions.size();
            float[][] cells = new float[np * nc][];
            for (int r = 0; r < n; r++) {
                int cell = p[r] * nc + c[r];
                if (cells[cell] == null) {
                    cells[cell] = new float[nch * ns];
                    Arrays.fill(cells[cell], Float.NaN);
                }
                int k = ch[r] * ns + Arrays.binarySearch(uniqueTimes, t[r]);
                if (!Float.isNaN(cells[cell][k])) {
                    throw new ReadException(sc.file(), line[r], 0, describe(r) + " is given twice"
                            + " (also on line " + firstLineOf(r) + ")");
                }
                cells[cell][k] = v[r];
            }
            new Coverage(this, cells, uniqueTimes).check();
            List<Cell> out = new ArrayList<>(np * nc);
            for (int pi = 0; pi < np; pi++) {
                for (int ci = 0; ci < nc; ci++) {
                    out.add(new Cell(participants.name(pi), conditions.name(ci),
                            Waveforms.wrap(channels.names, axis, pre.unit().unit(),
                                    cells[pi * nc + ci])));
                }
            }
            return out;
        }

        private int firstLineAt(double time) {
            for (int r = 0; r < n; r++) {
                if (t[r] == time) {
                    return line[r];
                }
            }
            return 0;
        }

        private int firstLineOf(int row) {
            for (int r = 0; r < row; r++) {
                if (p[r] == p[row] && c[r] == c[row] && ch[r] == ch[row] && t[r] == t[row]) {
                    return line[r];
                }
            }
            return 0;
        }

        private String describe(int r) {
            return "participant " + participants.name(p[r]) + ", condition "
                    + conditions.name(c[r]) + ", channel " + channels.name(ch[r]) + " at "
                    + Sampling.ms(t[r]) + " ms";
        }

        String cellName(int cell) {
            int nc = conditions.size();
            return "participant " + participants.name(cell / nc) + ", condition "
                    + conditions.name(cell % nc);
        }

        String channelName(int i) {
            return channels.name(i);
        }

        String file() {
            return sc.file();
        }
    }

    /**
     * Checks that every cell has a value for every channel at every time, and says what is
     * missing: a whole cell, channels or times that another cell has, or single values.
     */
    private record Coverage(Rows rows, float[][] cells, double[] times) {
        void check() {
            int ns = times.length;
            int nch = rows.channels.size();
            for (int cell = 0; cell < cells.length; cell++) {
                float[] x = cells[cell];
                if (x == null) {
                    throw new ReadException(rows.file(), 0, 0, "no rows for "
                            + rows.cellName(cell));
                }
                List<String> lacking = new ArrayList<>();
                int firstLacking = -1;
                for (int k = 0; k < nch; k++) {
                    if (allMissing(x, k * ns, 1, ns)) {
                        lacking.add(rows.channelName(k));
                        firstLacking = firstLacking < 0 ? k : firstLacking;
                    }
                }
                if (!lacking.isEmpty()) {
                    throw new ReadException(rows.file(), 0, 0, rows.cellName(cell)
                            + " has no rows for channel " + String.join(", ", lacking)
                            + ", which " + rows.cellName(otherHavingChannel(firstLacking, ns))
                            + " has (the cells have different channel sets)");
                }
                for (int s = 0; s < ns; s++) {
                    if (allMissing(x, s, ns, nch)) {
                        throw new ReadException(rows.file(), 0, 0, rows.cellName(cell)
                                + " has no rows at " + Sampling.ms(times[s]) + " ms, which "
                                + rows.cellName(otherHavingTime(s, ns, nch))
                                + " has (the cells have different time axes)");
                    }
                }
                for (int i = 0; i < x.length; i++) {
                    if (Float.isNaN(x[i])) {
                        throw new ReadException(rows.file(), 0, 0, "no value for "
                                + rows.cellName(cell) + ", channel " + rows.channelName(i / ns)
                                + " at " + Sampling.ms(times[i % ns]) + " ms");
                    }
                }
            }
        }

        private static boolean allMissing(float[] x, int start, int stride, int count) {
            for (int i = 0; i < count; i++) {
                if (!Float.isNaN(x[start + i * stride])) {
                    return false;
                }
            }
            return true;
        }

        private int otherHavingChannel(int channel, int ns) {
            for (int cell = 0; cell < cells.length; cell++) {
                if (cells[cell] != null && !allMissing(cells[cell], channel * ns, 1, ns)) {
                    return cell;
                }
            }
            return 0;
        }

        private int otherHavingTime(int sample, int ns, int nch) {
            for (int cell = 0; cell < cells.length; cell++) {
                if (cells[cell] != null && !allMissing(cells[cell], sample, ns, nch)) {
                    return cell;
                }
            }
            return 0;
        }
    }

    /**
     * Names met in one column, numbered in order of first appearance. Rows usually repeat the
     * previous row's name, so the raw bytes of the last one are compared first.
     */
    private static final class Names {
        private final Function<String, String> key;
        private final Map<String, Integer> index = new HashMap<>();
        private final List<String> names = new ArrayList<>();
        private byte[] lastBytes;
        private int last = -1;

        Names(Function<String, String> key) {
            this.key = key;
        }

        int index(LineScanner sc, int cell, String what) {
            if (lastBytes != null && sc.cellEquals(cell, lastBytes)) {
                return last;
            }
            String name = sc.text(cell);
            if (name.isEmpty()) {
                throw sc.error(cell + 1, "empty " + what);
            }
            Integer i = index.get(key.apply(name));
            if (i == null) {
                i = names.size();
                index.put(key.apply(name), i);
                names.add(name);
            }
            lastBytes = sc.cellBytes(cell);
            last = i;
            return i;
        }

        int size() {
            return names.size();
        }

        String name(int i) {
            return names.get(i);
        }
    }
}
