package org.meridian.io;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;

/**
 * Reads up to eight decimal digits at once from a byte array, eight bytes as one little-endian
 * long ("SWAR": SIMD within a register), without a branch per digit.
 *
 * <p>{@link #leadingDigits} finds how many of the eight bytes are digits before the first other
 * byte: a byte x is a digit when neither x + 0x46 nor x − 0x30 sets its top bit. Carries and
 * borrows move only toward later bytes, so the bytes up to and including the first non-digit
 * are classified correctly. {@link #value} turns n ≤ 8 digits into their number by shifting
 * them to the top of the word (the bytes below become digit 0) and combining pairs, quads and
 * octets with three multiplications (Lemire, 2018, "Faster integer parsing").
 */
final class EightDigits {
    private static final VarHandle LONG_LE =
            MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.LITTLE_ENDIAN);
    private static final long TOP_BITS = 0x8080808080808080L;
    private static final long ONES = 0x0101010101010101L;
    /** Bit 4 of every byte: among the bytes 0x2D to 0x39 it is set in the digits only. */
    static final long BIT_4 = 0x1010101010101010L;

    private EightDigits() {
    }

    /** The eight bytes from {@code at} (which must leave eight bytes in the array). */
    static long load(byte[] b, int at) {
        return (long) LONG_LE.get(b, at);
    }

    /** How many bytes of the word, from its first, are ASCII digits (0 to 8). */
    static int leadingDigits(long word) {
        long other = ((word + 0x4646464646464646L) | (word - 0x3030303030303030L)) & TOP_BITS;
        return Long.numberOfTrailingZeros(other) >>> 3;
    }

    /**
     * How many bytes of the word, from its first, lie in {@code '-'} … {@code '9'} (0x2D to
     * 0x39: minus, point, slash and the digits), 0 to 8. A plain decimal cell is made of these
     * bytes only, so this finds where such a cell ends without a branch per byte; the same
     * carry argument as in {@link #leadingDigits} applies, with 0x2D as the lower bound.
     */
    static int numberBytes(long word) {
        long other = ((word + 0x4646464646464646L) | (word - 0x2D2D2D2D2D2D2D2DL)) & TOP_BITS;
        return Long.numberOfTrailingZeros(other) >>> 3;
    }

    /**
     * Where the first byte equal to {@code x} stands in the word (0 to 7), 8 when there is none:
     * a byte of {@code word ^ x…x} is zero there, and (y − 0x01…01) &amp; ~y sets the top bit of
     * the first zero byte (borrows only reach the bytes after it).
     */
    static int firstByte(long word, byte x) {
        long y = word ^ (ONES * (x & 0xFF));
        return Long.numberOfTrailingZeros((y - ONES) & ~y & TOP_BITS) >>> 3;
    }

    /** The number written by the first {@code n} bytes of the word, 1 ≤ n ≤ 8 ASCII digits. */
    static long value(long word, int n) {
        return valueOfTop(word << (8 * (8 - n)));
    }

    /**
     * The number written by the ASCII digits in the top bytes of the word, its lower bytes zero
     * (which read as leading zeros).
     */
    static long valueOfTop(long word) {
        long v = word & 0x0F0F0F0F0F0F0F0FL;
        v = (v * 2561) >>> 8;
        v = ((v & 0x00FF00FF00FF00FFL) * 6553601) >>> 16;
        return ((v & 0x0000FFFF0000FFFFL) * 42949672960001L) >>> 32;
    }
}
