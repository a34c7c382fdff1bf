package org.meridian.io;

import ch.randelshofer.fastdoubleparser.JavaDoubleParser;
import ch.randelshofer.fastdoubleparser.JavaFloatParser;

/**
 * The fast path of the waveform readers: a data row read in one pass over its bytes, finding
 * cells and parsing their numbers at the same time.
 *
 * <p>It takes plain decimal numbers (optional sign, digits with an optional point, an optional
 * exponent) and computes a value directly only where one IEEE operation gives the correctly
 * rounded result (Clinger, 1990, "How to read floating point numbers accurately"): a float from
 * a significand m ≤ 2^24 and 10^|p| with |p| ≤ 10 (both exact in float), a double from
 * m ≤ 2^53 and |p| ≤ 22. The commonest cell, [-]digits[.digits] with at most 7 digits, is read
 * eight bytes at a time ({@link EightDigits}). Any other number of plain form goes to the fast
 * double parser. Values are therefore bit for bit those the parser alone would give.
 *
 * <p>Anything unusual on a line (a blank or quoted cell, text, a missing or extra cell, a blank
 * line, NaN, a value out of range) makes the row {@link #SLOW}: the caller then reads the line
 * through {@link LineScanner#next()} and the cell methods, which explain any problem.
 */
final class NumberRows {
    /** A row was read. */
    static final int ROW = 1;
    /** The input is exhausted. */
    static final int END = 0;
    /** The line is not a plain row of numbers; read it the general way. */
    static final int SLOW = -1;
    /** The buffer ended inside the row. */
    static final int MORE = -2;

    private static final long FLOAT_EXACT = 1L << 24;
    private static final long DOUBLE_EXACT = 1L << 53;
    private static final int MAX_DIGITS = 18;
    /** The eight-byte path reads two words from a cell's start: it needs this many bytes. */
    private static final int EIGHT_BYTE_REACH = 18;
    private static final float[] FLOAT_POW10 = {1e0f, 1e1f, 1e2f, 1e3f, 1e4f, 1e5f, 1e6f, 1e7f,
        1e8f, 1e9f, 1e10f};
    private static final double[] DOUBLE_POW10 = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9,
        1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};
    private static final long[] LONG_POW10 = {1, 10, 100, 1000, 10000, 100000, 1000000, 10000000};

    private final Cursor cursor = new Cursor();
    /** Where the last cell ended, or why it could not be read ({@link #SLOW}, {@link #MORE}). */
    private int cellEnd;
    private int labelEnd;

    /** The result of scanning one number: where it ended, its significand and power of ten. */
    static final class Cursor {
        int end;
        long significand;
        int power;
        boolean negative;
    }

    /**
     * Reads one row from {@code b[from …]}: its first cell a number (stored in
     * {@code first[firstAt]}) or, when {@code labelFirst}, a label (its end then in
     * {@link #labelEnd}), then {@code count} numbers as floats times {@code factor} into
     * {@code dest[off + k · stride]}. Returns the index of the row's line feed, or {@link #SLOW} or
     * {@link #MORE}.
     */
    int row(byte[] b, int from, int lim, byte d, boolean labelFirst, double[] first, int firstAt,
            float[] dest, int off, int stride, int count, double factor) {
        int i = from;
        if (labelFirst) {
            while (i < lim && b[i] != d && b[i] != '\n') {
                i++;
            }
            if (i >= lim) {
                return MORE;
            }
            if (b[i] != d) {
                return SLOW;
            }
            labelEnd = i;
        } else {
            Cursor c = cursor;
            int e = scan(b, i, lim, c);
            if (e < 0) {
                return e;
            }
            double t = toDouble(c, b, i);
            if (b[e] != d || !Double.isFinite(t)) {
                return SLOW;
            }
            first[firstAt] = t;
            i = e;
        }
        boolean plainFloats = factor == 1.0;
        for (int k = 0; k < count; k++) {
            int start = i + 1;
            byte stop = k < count - 1 ? d : (byte) '\n';
            float v = plainFloats && start + EIGHT_BYTE_REACH <= lim ? eightByteCell(b, start, stop)
                    : Float.NaN;
            if (v != v) {
                v = otherCell(b, start, lim, stop, factor);
                if (v != v) {
                    return cellEnd;
                }
            }
            dest[off + k * stride] = v;
            i = cellEnd;
        }
        if (b[i] == '\r') {
            if (i + 1 >= lim) {
                return MORE;
            }
            if (b[i + 1] != '\n') {
                return SLOW;
            }
            i++;
        }
        return i;
    }

    /** Where the label of the last row read with {@code labelFirst} ended. */
    int labelEnd() {
        return labelEnd;
    }

    /**
     * The commonest cell, read eight bytes at a time: [-]digits[.digits] with at most 7 digits
     * in all, followed by {@code stop} or a carriage return, so that m / 10^k is exact. Sets
     * {@link #cellEnd}; NaN when the cell is anything else.
     */
    private float eightByteCell(byte[] b, int j, byte stop) {
        // signs come at random in data: no branch on them, the sign bit is set at the end
        int negative = b[j] == '-' ? 1 : 0;
        j += negative;
        long w = EightDigits.load(b, j);
        int whole = EightDigits.leadingDigits(w);
        if (whole == 0 || whole > 7) {
            return Float.NaN;
        }
        long m = EightDigits.value(w, whole);
        int end = j + whole;
        int fraction = 0;
        if (b[end] == '.') {
            long w2 = EightDigits.load(b, end + 1);
            fraction = EightDigits.leadingDigits(w2);
            if (whole + fraction > 7) {
                return Float.NaN;
            }
            if (fraction > 0) {
                m = m * LONG_POW10[fraction] + EightDigits.value(w2, fraction);
            }
            end += 1 + fraction;
        }
        byte t = b[end];
        if (t != stop && t != '\r') {
            return Float.NaN;
        }
        cellEnd = end;
        float f = (float) m / FLOAT_POW10[fraction];
        return Float.intBitsToFloat(Float.floatToRawIntBits(f) | (negative << 31));
    }

    /**
     * Any other cell of plain form (near the end of the buffer, with an exponent or many
     * digits, or under a unit factor); kept out of the hot loop on purpose. Sets
     * {@link #cellEnd}; NaN when the row cannot be read here.
     */
    private float otherCell(byte[] b, int start, int lim, byte stop, double factor) {
        Cursor c = cursor;
        int e = scan(b, start, lim, c);
        if (e < 0) {
            cellEnd = e;
            return Float.NaN;
        }
        byte t = b[e];
        float v = toFloat(c, factor, b, start);
        if ((t != stop && t != '\r') || !Float.isFinite(v)) {
            cellEnd = SLOW;
            return Float.NaN;
        }
        cellEnd = e;
        return v;
    }

    /**
     * Scans a plain number from {@code i}; returns the index after it, {@link #SLOW} when the text
     * there is not a plain number of at most 18 digits, or {@link #MORE} when the buffer ends.
     */
    static int scan(byte[] b, int i, int lim, Cursor c) {
        boolean negative = false;
        if (i < lim && (b[i] == '-' || b[i] == '+')) {
            negative = b[i] == '-';
            i++;
        }
        long m = 0;
        int digits = 0;
        int fraction = 0;
        boolean point = false;
        for (; i < lim; i++) {
            int ch = b[i];
            if (ch >= '0' && ch <= '9') {
                if (++digits > MAX_DIGITS) {
                    return SLOW;
                }
                m = m * 10 + (ch - '0');
                if (point) {
                    fraction++;
                }
            } else if (ch == '.' && !point) {
                point = true;
            } else {
                break;
            }
        }
        if (i >= lim) {
            return MORE;
        }
        if (digits == 0) {
            return SLOW;
        }
        int exponent = 0;
        if (b[i] == 'e' || b[i] == 'E') {
            i++;
            boolean minus = false;
            if (i < lim && (b[i] == '-' || b[i] == '+')) {
                minus = b[i] == '-';
                i++;
            }
            int expDigits = 0;
            for (; i < lim && b[i] >= '0' && b[i] <= '9'; i++) {
                if (++expDigits > 4) {
                    return SLOW;
                }
                exponent = exponent * 10 + (b[i] - '0');
            }
            if (i >= lim) {
                return MORE;
            }
            if (expDigits == 0) {
                return SLOW;
            }
            exponent = minus ? -exponent : exponent;
        }
        c.end = i;
        c.significand = m;
        c.power = exponent - fraction;
        c.negative = negative;
        return i;
    }

    /**
     * The float a scanned number stands for, times {@code factor}; see the class comment. Not
     * finite when the number is out of range.
     */
    static float toFloat(Cursor c, double factor, byte[] b, int start) {
        long m = c.significand;
        int p = c.power;
        if (factor == 1.0) {
            if (m <= FLOAT_EXACT && p >= -10 && p <= 10) {
                float f = p < 0 ? m / FLOAT_POW10[-p] : m * FLOAT_POW10[p];
                return c.negative ? -f : f;
            }
            try {
                return JavaFloatParser.parseFloat(b, start, c.end - start);
            } catch (NumberFormatException e) {
                return Float.NaN;
            }
        }
        return (float) (toDouble(c, b, start) * factor);
    }

    /** The double a scanned number stands for; not finite when out of range. */
    static double toDouble(Cursor c, byte[] b, int start) {
        long m = c.significand;
        int p = c.power;
        if (m <= DOUBLE_EXACT && p >= -22 && p <= 22) {
            double d = p < 0 ? m / DOUBLE_POW10[-p] : m * DOUBLE_POW10[p];
            return c.negative ? -d : d;
        }
        try {
            return JavaDoubleParser.parseDouble(b, start, c.end - start);
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }
}
