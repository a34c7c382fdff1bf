package org.meridian.spline;

import org.meridian.core.Waveforms;

/**
 * A linear map from the channels of a montage to a set of output channels, in double
 * precision: the spline's value (or CSD) at the outputs' positions as a weighted sum of the
 * input channels, W = K·A (+ a₀ for the potential) with K the kernel at the outputs and [A; a₀]
 * the spline's solution operator. Used where the output goes back into a study (CSD of every
 * channel, channel repair), so that a whole waveform is one matrix product. Immutable.
 */
public final class ChannelTransform {
    private final double[][] weights;

    ChannelTransform(double[][] weights) {
        this.weights = weights;
    }

    public int outputCount() {
        return weights.length;
    }

    public int inputCount() {
        return weights.length == 0 ? 0 : weights[0].length;
    }

    public double weight(int output, int input) {
        return weights[output][input];
    }

    /** The outputs for one set of input values. */
    public double[] apply(double[] values) {
        double[] out = new double[weights.length];
        for (int o = 0; o < weights.length; o++) {
            double sum = 0;
            double[] w = weights[o];
            for (int i = 0; i < w.length; i++) {
                sum += w[i] * values[i];
            }
            out[o] = sum;
        }
        return out;
    }

    /**
     * Applies the map to every sample of a waveform set: the inputs are the rows {@code rows}
     * of {@code source} (in the order of the spline's channels); the result is outputs × samples,
     * channel-major, as {@link Waveforms} holds it.
     */
    public float[] apply(Waveforms source, int[] rows) {
        int inputs = inputCount();
        if (rows.length != inputs) {
            throw new IllegalArgumentException("expected " + inputs + " input rows, got " + rows.length);
        }
        int samples = source.sampleCount();
        double[][] in = new double[inputs][samples];
        for (int i = 0; i < inputs; i++) {
            source.channelInto(rows[i], in[i]);
        }
        float[] out = new float[weights.length * samples];
        double[] acc = new double[samples];
        for (int o = 0; o < weights.length; o++) {
            java.util.Arrays.fill(acc, 0);
            double[] w = weights[o];
            for (int i = 0; i < inputs; i++) {
                double wi = w[i];
                double[] x = in[i];
                for (int s = 0; s < samples; s++) {
                    acc[s] += wi * x[s];
                }
            }
            int off = o * samples;
            for (int s = 0; s < samples; s++) {
                out[off + s] = (float) acc[s];
            }
        }
        return out;
    }
}
