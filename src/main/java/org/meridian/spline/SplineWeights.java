package org.meridian.spline;

/**
 * Precomputed weights that evaluate a fitted {@link SphericalSpline} at a fixed set of points
 * (the pixels of a map grid, say), for any data on the spline's montage.
 *
 * <p>Held in factored form: a points × (N + 20) matrix K of single-precision weights and an
 * (N + 20) × N double-precision operator B (built by {@link SphericalSpline#weightsAt}). One map
 * v is b = B v (small) followed by the one large matrix–vector product K b; many maps at once
 * are one matrix–matrix product. The explicit points × N weights would cost points × N² to
 * form and no less to apply, so they are never formed for maps.
 *
 * <p>K is stored column by column, one array per column, and the product runs over blocks of
 * {@value #BLOCK} points as a sum of scaled columns, so the inner loop is a contiguous
 * multiply–add over two distinct arrays that the JIT compiles to vector instructions (one flat
 * array with offsets measured five times slower), and the block's results stay in the
 * first-level cache. Immutable and safe to share between threads.
 */
public final class SplineWeights {
    static final int BLOCK = 2048;

    private final Quantity quantity;
    private final int points;
    private final int channels;
    private final int width;
    private final float[][] columns;
    private final double[][] operator;

    SplineWeights(Quantity quantity, int points, int channels, float[][] columns, double[][] operator) {
        this.quantity = quantity;
        this.points = points;
        this.channels = channels;
        this.width = operator.length;
        this.columns = columns;
        this.operator = operator;
    }

    /**
     * The memory the single-precision weights of {@code points} points take for a montage of
     * {@code channels} channels: points × (N + 20) floats (the operator B is small beside it).
     */
    public static long bytesFor(long points, int channels) {
        return points * (channels + LowDegree.COUNT) * Float.BYTES;
    }

    public Quantity quantity() {
        return quantity;
    }

    public int pointCount() {
        return points;
    }

    public int channelCount() {
        return channels;
    }

    /** Evaluates one map: {@code out[p]} for every point from one value per spline channel. */
    public void apply(double[] values, float[] out) {
        if (values.length != channels || out.length < points) {
            throw new IllegalArgumentException("expected " + channels + " values and room for "
                    + points + " points, got " + values.length + " and " + out.length);
        }
        multiply(coefficients(values), out);
    }

    /** One map in a new array. */
    public float[] apply(double[] values) {
        float[] out = new float[points];
        apply(values, out);
        return out;
    }

    /** Evaluates many maps at once, {@code out[f][p]} from {@code values[f][channel]}. */
    public void applyAll(double[][] values, float[][] out) {
        for (int f = 0; f < values.length; f++) {
            if (values[f].length != channels || out[f].length < points) {
                throw new IllegalArgumentException("map " + f + ": expected " + channels
                        + " values and room for " + points + " points");
            }
        }
        float[][] b = new float[values.length][];
        for (int f = 0; f < values.length; f++) {
            b[f] = coefficients(values[f]);
        }
        // block by block, so each block of the weights is read once from memory for all maps
        for (int start = 0; start < points; start += BLOCK) {
            int end = Math.min(points, start + BLOCK);
            for (int f = 0; f < values.length; f++) {
                multiplyBlock(b[f], out[f], start, end);
            }
        }
    }

    /** out = K b. */
    private void multiply(float[] b, float[] out) {
        for (int start = 0; start < points; start += BLOCK) {
            multiplyBlock(b, out, start, Math.min(points, start + BLOCK));
        }
    }

    private void multiplyBlock(float[] b, float[] out, int start, int end) {
        java.util.Arrays.fill(out, start, end, 0f);
        for (int j = 0; j < width; j++) {
            float bj = b[j];
            float[] column = columns[j];
            for (int p = start; p < end; p++) {
                out[p] += column[p] * bj;
            }
        }
    }

    /** b = B v, rounded to single precision for the large product. */
    private float[] coefficients(double[] values) {
        float[] b = new float[width];
        for (int i = 0; i < width; i++) {
            double[] row = operator[i];
            double sum = 0;
            for (int j = 0; j < channels; j++) {
                sum += row[j] * values[j];
            }
            b[i] = (float) sum;
        }
        return b;
    }
}
