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
 * m ≤ 2^53 and |p| ≤ 22. The commonest cell, [-]digits.[digits] in at most eight bytes, is read
 * as one eight-byte word in a loop of its own ({@link #pointCells}, {@link EightDigits}); other
 * short cells also from one word ({@link #wordCell}). Any other number of plain form goes to
 * the fast double parser. Values are therefore bit for bit those of a correctly rounding parser
 * ({@code Float.parseFloat}, or {@code Double.parseDouble} times the unit factor).
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
    /** The word path reads one word from the cell's start and the byte after it. */
    private static final int WORD_REACH = 9;
    private static final float[] FLOAT_POW10 = {1e0f, 1e1f, 1e2f, 1e3f, 1e4f, 1e5f, 1e6f, 1e7f,
        1e8f, 1e9f, 1e10f};
    private static final double[] DOUBLE_POW10 = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9,
        1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};

    private final Cursor cursor = new Cursor();
    /** Where the last cell ended, or why it could not be read ({@link #SLOW}, {@link #MORE}). */
    private int cellEnd;
    private int labelEnd;
    /** How many cells the last {@link #pointCells} call read. */
    private int cellsDone;
    /** The number of decimals {@link #pointCells} expects: that of the last cell it read. */
    private int decimals = 1;
    /** 10^decimals and its negative, the divisors of {@link #pointCells}. */
    private final float[] scales = new float[2];

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
        int last = count - 1;
        int k = 0;
        int o = off;
        if (factor == 1.0) {
            i = pointCells(b, i, lim, d, dest, off, stride, last);
            k = cellsDone;
            o += k * stride;
        }
        for (; k < count; k++) {
            int start = i + 1;
            byte stop = k < last ? d : (byte) '\n';
            float v = Float.NaN;
            int end = start;
            if (start + WORD_REACH <= lim) {
                long w = EightDigits.load(b, start);
                int length = EightDigits.numberBytes(w);
                end = start + length;
                byte t = b[end];
                if (t == stop || t == '\r' && k == last) {
                    v = wordCell(w, length, factor);
                }
            }
            if (v != v) {
                v = otherCell(b, start, lim, stop, factor);
                if (v != v) {
                    return cellEnd;
                }
                end = cellEnd;
            }
            dest[o] = v;
            o += stride;
            i = end;
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
     * The bulk of a row read without unit conversion: from the delimiter at {@code i}, up to
     * {@code max} cells of the commonest form, [-][digits].digits in at most eight bytes and
     * followed by the delimiter, stored as floats in {@code dest[o + k · stride]}. Stops at the
     * first cell of any other form (and near the end of the buffer), leaving it to the careful
     * path. Returns the index of the delimiter after the last cell read and sets
     * {@link #cellsDone}.
     *
     * <p>Written for few operations per value, and without a branch that depends on the data of
     * an ordinary file. The cell's end is where its word first holds a byte outside '-' … '9'
     * ({@link EightDigits#numberBytes}); the word is shifted so that the cell's last byte is its
     * top byte. Files write every value with the same number of decimals f, so the point is
     * expected f bytes below the top (f is taken from the first cell that disagrees and kept),
     * and closing its gap takes masks that stay the same from cell to cell. Of the bytes then
     * left below the top, the digits are exactly those with bit 4 set (the other bytes of the
     * range, minus, point and slash, lack it), so one mask test checks them all, the sign byte
     * excepted; masking the sign byte away leaves the significand's digits with zeros below. At
     * most 7 digits remain, m < 2^24, and m / ±10^f with f ≤ 7 is one correctly rounded division
     * of exact operands (Clinger, 1990), hence the float nearest the decimal; dividing by −10^f
     * for a minus gives the sign (and −0 for a negative zero) at no extra cost.
     */
    private int pointCells(byte[] b, int i, int lim, byte d, float[] dest, int o, int stride,
            int max) {
        int safe = lim - WORD_REACH;
        int k = 0;
        int f = decimals;
        long fraction = -1L << (64 - (f << 3));
        int pointAt = 56 - (f << 3);
        float[] scales = this.scales;
        scales[0] = FLOAT_POW10[f];
        scales[1] = -FLOAT_POW10[f];
        while (k < max && i < safe) {
            long w = EightDigits.load(b, i + 1);
            int length = EightDigits.numberBytes(w);
            int end = i + 1 + length;
            int below = 64 - (length << 3);
            long top = w << below;
            if (((top >>> pointAt) & 0xFF) != '.') {
                int point = EightDigits.firstByte(w, (byte) '.');
                int g = length - 1 - point;
                if (point >= length || g < 1 || g == f) {
                    break;
                }
                // another number of decimals: take this cell's and read it again
                f = g;
                fraction = -1L << (64 - (f << 3));
                pointAt = 56 - (f << 3);
                scales[0] = FLOAT_POW10[f];
                scales[1] = -FLOAT_POW10[f];
                continue;
            }
            long digits = (top & fraction) | ((top << 8) & ~fraction);
            int negative = ((int) w & 0xFF ^ '-') - 1 >>> 31;
            // the bytes that must be digits: from below the top down to the sign, if any
            long need = -1L << (below + 8 + (negative << 3));
            // (an empty cell, length 0, must not pass: its shifts would wrap around)
            if ((digits & EightDigits.BIT_4 & need) != (EightDigits.BIT_4 & need)
                    | length <= f | b[end] != d) {
                break;
            }
            dest[o] = (float) EightDigits.valueOfTop(digits & need) / scales[negative];
            o += stride;
            i = end;
            k++;
        }
        decimals = f;
        cellsDone = k;
        return i;
    }

    /**
     * A cell of at most eight bytes, all of them minus, point or digit, read from the word
     * {@code w} that holds it ({@code length} bytes, see {@link EightDigits#numberBytes}):
     * [-]digits[.[digits]] as float times {@code factor}, or NaN when the bytes are not of that
     * form. Without a point the digits form m ≤ 99 999 999, which one conversion rounds
     * correctly; with a point there are at most 7 digits and m / 10^k is one correctly rounded
     * division of exact operands (Clinger, 1990). The sign costs no branch: a leading minus
     * shifts the word by one byte and sets the sign bit at the end.
     */
    private static float wordCell(long w, int length, double factor) {
        // 1 when the first byte is a minus, with no branch: signs come at random in data
        int negative = ((int) (w & 0xFF) ^ '-') - 1 >>> 31;
        long body = w >>> (negative << 3);
        int n = length - negative;
        int whole = EightDigits.leadingDigits(body);
        if (whole == 0) {
            return Float.NaN;
        }
        long digits = body;
        int count = n;
        int fraction = 0;
        if (whole != n) {
            // the point must follow the whole digits; closing its gap lets one conversion read
            // whole and fraction digits together (the byte shifted in at the top is 0)
            if (((body >>> (whole << 3)) & 0xFF) != '.') {
                return Float.NaN;
            }
            long below = (1L << (whole << 3)) - 1;
            digits = (body & below) | ((body >>> 8) & ~below);
            count = n - 1;
            if (EightDigits.leadingDigits(digits) < count) {
                return Float.NaN;
            }
            fraction = count - whole;
        }
        long m = EightDigits.value(digits, count);
        if (factor == 1.0) {
            float f = (float) m / FLOAT_POW10[fraction];
            return Float.intBitsToFloat(Float.floatToRawIntBits(f) | (negative << 31));
        }
        double x = (double) m / DOUBLE_POW10[fraction];
        return (float) ((negative != 0 ? -x : x) * factor);
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
        if ((t != stop && (t != '\r' || stop != '\n')) || !Float.isFinite(v)) {
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
