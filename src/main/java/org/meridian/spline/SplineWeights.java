package org.meridian.spline;

/**
 * Precomputed weights that evaluate a fitted {@link SphericalSpline} at a fixed set of points
 * (the pixels of a map grid, say), for any data on the spline's montage.
 *
 * <p>Held in factored form: a points × (N + 20) matrix of single-precision rows and an
 * (N + 20) × N double-precision operator B (built by {@link SphericalSpline#weightsAt}). One map
 * v is b = B v (small) followed by the one large matrix–vector product rows · b; many maps at
 * once are one matrix–matrix product. The explicit points × N weights would cost points × N² to
 * form and no less to apply, so they are never formed for maps. Immutable and safe to share
 * between threads.
 */
public final class SplineWeights {
    private final Quantity quantity;
    private final int points;
    private final int channels;
    private final int width;
    private final float[] rows;
    private final double[][] operator;

    SplineWeights(Quantity quantity, int points, int channels, float[] rows, double[][] operator) {
        this.quantity = quantity;
        this.points = points;
        this.channels = channels;
        this.width = operator.length;
        this.rows = rows;
        this.operator = operator;
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
        float[] b = coefficients(values);
        for (int p = 0; p < points; p++) {
            out[p] = dot(rows, p * width, b, width);
        }
    }

    /** One map in a new array. */
    public float[] apply(double[] values) {
        float[] out = new float[points];
        apply(values, out);
        return out;
    }

    /**
     * Evaluates many maps at once, {@code out[f][p]} from {@code values[f][channel]}: the
     * coefficients of all maps first, then one pass over the rows in which each row serves every
     * map while it sits in the cache.
     */
    public void applyAll(double[][] values, float[][] out) {
        int frames = values.length;
        float[][] b = new float[frames][];
        for (int f = 0; f < frames; f++) {
            if (values[f].length != channels || out[f].length < points) {
                throw new IllegalArgumentException("map " + f + ": expected " + channels
                        + " values and room for " + points + " points");
            }
            b[f] = coefficients(values[f]);
        }
        for (int p = 0; p < points; p++) {
            int off = p * width;
            for (int f = 0; f < frames; f++) {
                out[f][p] = dot(rows, off, b[f], width);
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

    /** A dot product with four independent sums, so the additions overlap in the pipeline. */
    static float dot(float[] a, int offset, float[] b, int n) {
        float s0 = 0;
        float s1 = 0;
        float s2 = 0;
        float s3 = 0;
        int j = 0;
        for (; j + 3 < n; j += 4) {
            s0 += a[offset + j] * b[j];
            s1 += a[offset + j + 1] * b[j + 1];
            s2 += a[offset + j + 2] * b[j + 2];
            s3 += a[offset + j + 3] * b[j + 3];
        }
        for (; j < n; j++) {
            s0 += a[offset + j] * b[j];
        }
        return (s0 + s1) + (s2 + s3);
    }
}
