package org.meridian.io;

import ch.randelshofer.fastdoubleparser.JavaDoubleParser;
import ch.randelshofer.fastdoubleparser.JavaFloatParser;
import java.io.Closeable;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;

/**
 * The byte-level tokenizer under every reader: it walks a stream line by line (LF or CRLF, a
 * UTF-8 byte-order mark skipped) and, once the delimiter is known, splits each line into cells
 * in the same pass, recording only where each cell starts and ends. Numbers are parsed straight
 * from those bytes with the fast double parser, so no String is made for a numeric cell. Rows
 * made only of plain numbers take a faster road still, {@link #numberRow} ({@link NumberRows}),
 * which finds and parses the cells in one pass; this class's cell methods read everything else
 * and describe every problem.
 *
 * <p>Lines and columns are counted from 1; a column is a cell. Every problem is reported as a
 * {@link ReadException} naming the file, the line and the cell.
 */
final class LineScanner implements Closeable {
    private static final int INITIAL_BUFFER = 1 << 16;
    /** A longer line means this is not a text table (or not one we can use). */
    private static final int MAX_LINE_BYTES = 1 << 26;
    private static final int CANCEL_CHECK_MASK = 1023;
    private static final int QUOTE_LIMIT = 40;

    private final String file;
    private final InputStream in;
    private final BooleanSupplier cancelled;
    private byte[] buf = new byte[INITIAL_BUFFER];
    private int pos;
    private int limit;
    private boolean eof;
    private boolean started;
    private int line;
    private int lineStart;
    private int lineEnd;
    private boolean splitting;
    private byte delimiter;
    private int cells;
    private int[] starts = new int[64];
    private int[] ends = new int[64];
    private final NumberRows rows = new NumberRows();

    /**
     * @param file      the file as the user knows it, for messages
     * @param in        the bytes; closed with the scanner
     * @param cancelled asked every thousand lines; when true, reading stops with a
     *                  {@link CancellationException}
     */
    LineScanner(String file, InputStream in, BooleanSupplier cancelled) {
        this.file = file;
        this.in = in;
        this.cancelled = cancelled;
    }

    String file() {
        return file;
    }

    /** The current line number (1-based); 0 before the first line. */
    int line() {
        return line;
    }

    /** From now on, lines are split into cells at this byte. */
    void splitAt(byte d) {
        this.delimiter = d;
        this.splitting = true;
    }

    byte delimiter() {
        return delimiter;
    }

    /** Splits the current line again (after the delimiter became known on it). */
    void resplit() {
        cells = 0;
        int cellStart = lineStart;
        for (int i = lineStart; i < lineEnd; i++) {
            if (buf[i] == delimiter) {
                addCell(cellStart, i);
                cellStart = i + 1;
            }
        }
        addCell(cellStart, lineEnd);
    }

    /**
     * Moves to the next line; false at the end of the input. When a delimiter is set, the line
     * is split into cells on the way.
     */
    boolean next() {
        if ((line & CANCEL_CHECK_MASK) == 0 && cancelled.getAsBoolean()) {
            throw new CancellationException("loading cancelled");
        }
        if (!started) {
            start();
        }
        while (true) {
            byte[] b = buf;
            int lim = limit;
            int i = pos;
            cells = 0;
            int cellStart = i;
            if (splitting) {
                byte d = delimiter;
                for (; i < lim; i++) {
                    byte c = b[i];
                    if (c == '\n') {
                        break;
                    }
                    if (c == d) {
                        addCell(cellStart, i);
                        cellStart = i + 1;
                    }
                }
            } else {
                while (i < lim && b[i] != '\n') {
                    i++;
                }
            }
            if (i < lim || eof) {
                if (i >= lim && pos >= lim) {
                    return false;
                }
                lineStart = pos;
                int end = i;
                if (end > lineStart && b[end - 1] == '\r') {
                    end--;
                }
                lineEnd = end;
                if (splitting) {
                    addCell(Math.min(cellStart, end), end);
                } else {
                    addCell(lineStart, end);
                }
                pos = i < lim ? i + 1 : lim;
                line++;
                return true;
            }
            refill();
        }
    }

    private void start() {
        started = true;
        while (!eof && limit < 3) {
            fill();
        }
        if (limit >= 3 && (buf[0] & 0xff) == 0xEF && (buf[1] & 0xff) == 0xBB
                && (buf[2] & 0xff) == 0xBF) {
            pos = 3;
        }
    }

    private void refill() {
        if (pos > 0) {
            System.arraycopy(buf, pos, buf, 0, limit - pos);
            limit -= pos;
            pos = 0;
        }
        if (limit == buf.length) {
            if (buf.length >= MAX_LINE_BYTES) {
                throw new ReadException(file, line + 1, 0, "the line is longer than "
                        + (MAX_LINE_BYTES >> 20) + " MB; is this a text table?");
            }
            buf = Arrays.copyOf(buf, buf.length * 2);
        }
        fill();
    }

    private void fill() {
        try {
            int r = in.read(buf, limit, buf.length - limit);
            if (r < 0) {
                eof = true;
            } else {
                limit += r;
            }
        } catch (IOException e) {
            throw TextInput.failure(file, line + 1, e);
        }
    }

    private void addCell(int s, int e) {
        if (cells == starts.length) {
            starts = Arrays.copyOf(starts, cells * 2);
            ends = Arrays.copyOf(ends, cells * 2);
        }
        starts[cells] = s;
        ends[cells] = e;
        cells++;
    }

    /**
     * Reads the next line in one pass if it is a plain row of {@code 1 + count} cells: the first
     * a number (stored in {@code first[firstAt]}) or, when {@code labelFirst}, a label (then
     * available as {@link #text text(0)}), followed by {@code count} numbers stored as floats
     * times {@code factor} in {@code dest[off + k · stride]}. Returns {@link NumberRows#ROW},
     * {@link NumberRows#END}, or {@link NumberRows#SLOW} when the line must be read with
     * {@link #next()} instead (it is then left unread).
     */
    int numberRow(boolean labelFirst, double[] first, int firstAt, float[] dest, int off,
            int stride, int count, double factor) {
        if ((line & CANCEL_CHECK_MASK) == 0 && cancelled.getAsBoolean()) {
            throw new CancellationException("loading cancelled");
        }
        if (!started) {
            start();
        }
        while (true) {
            if (pos >= limit && eof) {
                return NumberRows.END;
            }
            int nl = rows.row(buf, pos, limit, delimiter, labelFirst, first, firstAt, dest, off,
                    stride, count, factor);
            if (nl >= 0) {
                if (labelFirst) {
                    cells = 1;
                    starts[0] = pos;
                    ends[0] = rows.labelEnd();
                }
                lineStart = pos;
                lineEnd = nl > pos && buf[nl - 1] == '\r' ? nl - 1 : nl;
                pos = nl + 1;
                line++;
                return NumberRows.ROW;
            }
            if (nl != NumberRows.MORE) {
                return nl;
            }
            if (eof) {
                return NumberRows.SLOW;
            }
            refill();
        }
    }

    int cellCount() {
        return cells;
    }

    /** Whether the current line holds nothing but spaces and tabs. */
    boolean isBlank() {
        for (int i = lineStart; i < lineEnd; i++) {
            if (buf[i] != ' ' && buf[i] != '\t') {
                return false;
            }
        }
        return true;
    }

    /** Whether the current line's first non-blank byte is {@code #}. */
    boolean isComment() {
        for (int i = lineStart; i < lineEnd; i++) {
            if (buf[i] != ' ' && buf[i] != '\t') {
                return buf[i] == '#';
            }
        }
        return false;
    }

    /** The whole current line as text. */
    String lineText() {
        return new String(buf, lineStart, lineEnd - lineStart, StandardCharsets.UTF_8);
    }

    /** How often a byte occurs in the current line. */
    int count(byte b) {
        int n = 0;
        for (int i = lineStart; i < lineEnd; i++) {
            if (buf[i] == b) {
                n++;
            }
        }
        return n;
    }

    /** A cell as text, without surrounding blanks and without enclosing double quotes. */
    String text(int cell) {
        int s = starts[cell];
        int e = ends[cell];
        while (s < e && isSpace(buf[s])) {
            s++;
        }
        while (e > s && isSpace(buf[e - 1])) {
            e--;
        }
        if (e - s >= 2 && buf[s] == '"' && buf[e - 1] == '"') {
            s++;
            e--;
        }
        return new String(buf, s, e - s, StandardCharsets.UTF_8);
    }

    /** Whether a cell holds exactly these bytes (no trimming): a cheap check for repeats. */
    boolean cellEquals(int cell, byte[] bytes) {
        int s = starts[cell];
        int len = ends[cell] - s;
        return len == bytes.length && Arrays.equals(buf, s, s + len, bytes, 0, len);
    }

    /** A copy of a cell's raw bytes. */
    byte[] cellBytes(int cell) {
        return Arrays.copyOfRange(buf, starts[cell], ends[cell]);
    }

    /** A cell as a finite double. */
    double number(int cell) {
        int s = starts[cell];
        int e = ends[cell];
        if (e > s && !isPlainDecimal(buf, s, e)) {
            return numberSlow(cell);
        }
        if (e > s) {
            try {
                double v = JavaDoubleParser.parseDouble(buf, s, e - s);
                if (Double.isFinite(v)) {
                    return v;
                }
            } catch (NumberFormatException ignored) {
                // described below
            }
        }
        throw numberError(cell);
    }

    /**
     * A cell as a finite float, multiplied by {@code factor} (a unit conversion). With factor 1
     * the decimal text is rounded to float once, directly.
     */
    float value(int cell, double factor) {
        int s = starts[cell];
        int e = ends[cell];
        if (e > s && isPlainDecimal(buf, s, e)) {
            double d = Double.NaN;
            try {
                if (factor == 1.0) {
                    float v = JavaFloatParser.parseFloat(buf, s, e - s);
                    if (Float.isFinite(v)) {
                        return v;
                    }
                } else {
                    d = JavaDoubleParser.parseDouble(buf, s, e - s);
                    float v = (float) (d * factor);
                    if (Float.isFinite(v)) {
                        return v;
                    }
                }
            } catch (NumberFormatException ignored) {
                // described below
            }
            if (Double.isFinite(d)) {
                throw convertedOutOfRange(cell);
            }
            throw numberError(cell);
        }
        double v = numberSlow(cell) * factor;
        if (Float.isFinite((float) v)) {
            return (float) v;
        }
        throw factor == 1.0 ? error(cell + 1, quote(text(cell)) + " is out of range")
                : convertedOutOfRange(cell);
    }

    /** A number that fits a double but not, once converted to µV, a float. */
    private ReadException convertedOutOfRange(int cell) {
        return error(cell + 1, quote(text(cell)) + " is out of range after conversion to µV"
                + " (values must stay within ±3.4e38 µV)");
    }

    /** A cell's number when it has blanks or quotes around it. */
    private double numberSlow(int cell) {
        String t = text(cell);
        if (t.isEmpty()) {
            throw error(cell + 1, "empty cell where a number is expected");
        }
        byte[] b = t.getBytes(StandardCharsets.UTF_8);
        if (isPlainDecimal(b, 0, b.length)) {
            try {
                double v = JavaDoubleParser.parseDouble(b, 0, b.length);
                if (Double.isFinite(v)) {
                    return v;
                }
            } catch (NumberFormatException ignored) {
                // described below
            }
        }
        throw numberError(cell);
    }

    /**
     * Whether {@code b[s, e)} is a plain decimal number, the only form the files may use:
     * {@code [+-]? (digits [. digits?] | . digits) ([eE] [+-]? digits)?}. This keeps out what
     * the Java syntax the parser follows would also allow: hexadecimal ({@code 0x1p3}), type
     * suffixes ({@code 1.5f}), {@code NaN} and {@code Infinity}.
     */
    static boolean isPlainDecimal(byte[] b, int s, int e) {
        int i = s;
        if (i < e && (b[i] == '+' || b[i] == '-')) {
            i++;
        }
        int digits = 0;
        while (i < e && b[i] >= '0' && b[i] <= '9') {
            i++;
            digits++;
        }
        if (i < e && b[i] == '.') {
            i++;
            while (i < e && b[i] >= '0' && b[i] <= '9') {
                i++;
                digits++;
            }
        }
        if (digits == 0) {
            return false;
        }
        if (i < e && (b[i] == 'e' || b[i] == 'E')) {
            i++;
            if (i < e && (b[i] == '+' || b[i] == '-')) {
                i++;
            }
            int exponent = 0;
            while (i < e && b[i] >= '0' && b[i] <= '9') {
                i++;
                exponent++;
            }
            if (exponent == 0) {
                return false;
            }
        }
        return i == e;
    }

    private ReadException numberError(int cell) {
        if (isComment()) {
            return commentAfterHeader();
        }
        String t = text(cell);
        if (t.isEmpty()) {
            return error(cell + 1, "empty cell where a number is expected");
        }
        String lower = t.toLowerCase(Locale.ROOT).replaceFirst("^[+-]", "");
        if (lower.equals("nan") || lower.equals("inf") || lower.equals("infinity")) {
            return error(cell + 1, quote(t) + " is not a finite number (NaN and infinite values"
                    + " are not allowed)");
        }
        if (t.matches("[+-]?[0-9.]+([eE][+-]?[0-9]+)?")) {
            try {
                if (Math.abs(Double.parseDouble(t)) > Float.MAX_VALUE) {
                    return error(cell + 1, quote(t) + " is out of range");
                }
            } catch (NumberFormatException ignored) {
                // not a number after all; fall through
            }
        }
        if (t.matches("[+-]?[0-9]*,[0-9]+([eE][+-]?[0-9]+)?")) {
            return error(cell + 1, quote(t) + " is not a number (the decimal mark must be a"
                    + " point)");
        }
        return error(cell + 1, quote(t) + " is not a number");
    }

    /** A {@code #} line among the data rows: comments belong before the header only. */
    ReadException commentAfterHeader() {
        return error(1, "a comment line after the header; comment lines (#) may only come"
                + " before the header");
    }

    ReadException error(int column, String problem) {
        return new ReadException(file, line, column, problem);
    }

    /** A cell's text in quotes for a message, shortened when long. */
    static String quote(String t) {
        String s = t.length() > QUOTE_LIMIT ? t.substring(0, QUOTE_LIMIT) + "…" : t;
        return "\"" + s + "\"";
    }

    private static boolean isSpace(byte b) {
        return b == ' ' || b == '\t';
    }

    @Override
    public void close() {
        try {
            in.close();
        } catch (IOException ignored) {
            // read-only input: nothing is lost by a failed close
        }
    }
}
