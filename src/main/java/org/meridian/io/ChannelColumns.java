package org.meridian.io;

import java.util.Arrays;

/**
 * The values of a samples-as-rows file as they arrive, a block of rows at a time, kept
 * channel-major in one array: channel c's samples start at c · capacity. The capacity is the
 * number of samples the reader expects ({@link TailRow}); when the file holds more, the array
 * grows (each channel's run moved once), and when it holds fewer, {@link #values()} copies the
 * runs into an array of the exact size. With a right expectation neither happens, and every
 * value is copied once, from a block still in cache.
 */
final class ChannelColumns {
    private final int channels;
    private float[] values;
    private int capacity;
    private int samples;

    /**
     * @param channels the number of channels, at least 1
     * @param capacity the number of samples expected, at least 1
     */
    ChannelColumns(int channels, int capacity) {
        if (channels < 1 || capacity < 1) {
            throw new IllegalArgumentException("channels " + channels + ", capacity " + capacity);
        }
        this.channels = channels;
        this.capacity = capacity;
        this.values = new float[Math.multiplyExact(channels, capacity)];
    }

    /**
     * Appends {@code rows} samples from a block that holds them channel-major: channel c's run
     * starts at {@code c · stride}.
     */
    void add(float[] block, int stride, int rows) {
        if (samples + rows > capacity) {
            grow(Math.max(samples + rows, capacity + (capacity >> 1)));
        }
        for (int c = 0; c < channels; c++) {
            System.arraycopy(block, c * stride, values, c * capacity + samples, rows);
        }
        samples += rows;
    }

    /** The number of samples stored. */
    int samples() {
        return samples;
    }

    /** The values, channel-major, exactly channels × samples long (the array itself if full). */
    float[] values() {
        if (samples == capacity) {
            return values;
        }
        if (samples == 0) {
            return new float[0];
        }
        float[] exact = Arrays.copyOf(values, Math.multiplyExact(channels, samples));
        for (int c = 1; c < channels; c++) {
            System.arraycopy(values, c * capacity, exact, c * samples, samples);
        }
        return exact;
    }

    private void grow(int newCapacity) {
        float[] grown = new float[Math.multiplyExact(channels, newCapacity)];
        for (int c = 0; c < channels; c++) {
            System.arraycopy(values, c * capacity, grown, c * newCapacity, samples);
        }
        values = grown;
        capacity = newCapacity;
    }
}
