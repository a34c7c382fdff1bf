package org.meridian.io;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;

/**
 * Writes a float with a fixed number of decimals straight into a byte buffer, rounded half away
 * from zero, as {@link BigDecimal#setScale(int, RoundingMode) BigDecimal} with
 * {@link RoundingMode#HALF_UP} would, but without making any object. It is exact: a float has a
 * 24-bit significand and 10^d = 2^d·5^d with 5^12 < 2^28, so for d ≤ 12 the product v·10^d is
 * exact in a double, and adding one half to it is exact below 2^52. Minus zero is written as
 * zero, so the output is byte-for-byte repeatable.
 */
final class FixedDecimals {
    static final int MAX_DECIMALS = 12;
    /** The longest text {@link #append} can write. */
    static final int MAX_CHARS = 64;
    private static final double EXACT_LIMIT = 0x1p52;
    private static final long[] POW10 = new long[MAX_DECIMALS + 1];

    static {
        POW10[0] = 1;
        for (int i = 1; i <= MAX_DECIMALS; i++) {
            POW10[i] = POW10[i - 1] * 10;
        }
    }

    private FixedDecimals() {
    }

    /** Appends {@code v} with {@code decimals} digits after the point; returns the new position. */
    static int append(float v, int decimals, byte[] out, int pos) {
        double scaled = Math.abs((double) v) * POW10[decimals];
        if (!(scaled < EXACT_LIMIT)) {
            return appendAscii(slow(v, decimals), out, pos);
        }
        long r = (long) Math.floor(scaled + 0.5);
        if (r != 0 && v < 0) {
            out[pos++] = '-';
        }
        long whole = r / POW10[decimals];
        long frac = r % POW10[decimals];
        pos = appendLong(whole, out, pos);
        if (decimals > 0) {
            out[pos++] = '.';
            for (int i = decimals - 1; i >= 0; i--) {
                out[pos + i] = (byte) ('0' + frac % 10);
                frac /= 10;
            }
            pos += decimals;
        }
        return pos;
    }

    /** The same as text (for tests and rare callers). */
    static String format(float v, int decimals) {
        byte[] b = new byte[MAX_CHARS];
        int n = append(v, decimals, b, 0);
        return new String(b, 0, n, StandardCharsets.US_ASCII);
    }

    private static String slow(float v, int decimals) {
        String s = new BigDecimal(v).setScale(decimals, RoundingMode.HALF_UP).toPlainString();
        return s.matches("-0\\.?0*") ? s.substring(1) : s;
    }

    private static int appendLong(long x, byte[] out, int pos) {
        if (x == 0) {
            out[pos] = '0';
            return pos + 1;
        }
        int digits = 0;
        for (long t = x; t > 0; t /= 10) {
            digits++;
        }
        for (int i = digits - 1; i >= 0; i--) {
            out[pos + i] = (byte) ('0' + x % 10);
            x /= 10;
        }
        return pos + digits;
    }

    private static int appendAscii(String s, byte[] out, int pos) {
        for (int i = 0; i < s.length(); i++) {
            out[pos++] = (byte) s.charAt(i);
        }
        return pos;
    }
}
