package org.meridian.sim;

/**
 * Stationary Gaussian noise with a power spectrum shaped like 1/f^β, generated in the frequency
 * domain as in Timmer &amp; König (1995, "On generating power law noise", A&amp;A 300, 707):
 * independent Gaussian Fourier coefficients whose variance follows the wanted spectrum, then one
 * inverse FFT.
 *
 * <p>On a circular grid of M = the smallest power of two ≥ 2·(samples) points at the sampling
 * rate f_s, bin k (1 ≤ k &lt; M, frequency f_k = min(k, M − k)·f_s/M) gets the complex
 * coefficient σ_k (g + i h), g and h independent standard normal, with
 * σ_k² ∝ max(f_k, f_low)^(−β); there is no 0 Hz bin. The real and imaginary parts of the inverse
 * transform z_t = Σ_k Z_k e^(2πi kt/M) are then two independent stationary Gaussian series, each
 * with variance Σ_k σ_k² (the cross-covariance Σ σ_k² sin(2πk(u − t)/M) cancels between k and
 * M − k), normalised here to 1. The first {@code samples} points of each are used; taking M at
 * least twice the length keeps the wrap-around of the circular grid out of the epoch. Below
 * f_low the spectrum is flat, as after a high-pass filter at recording; the lowest frequency
 * present is f_s/M.
 */
final class PowerLawNoise {
    private final int samples;
    private final RadixTwoFft fft;
    private final double[] sigma;
    private final double[] re;
    private final double[] im;
    private boolean hasSpare;

    /**
     * @param samples  length of each series
     * @param rateHz   sampling rate
     * @param exponent β: 0 white, 1 "pink" (1/f), 2 "brown"
     * @param lowHz    the spectrum is flat below this frequency
     */
    PowerLawNoise(int samples, double rateHz, double exponent, double lowHz) {
        if (samples < 1) {
            throw new IllegalArgumentException("samples must be positive, got " + samples);
        }
        if (!(exponent >= 0 && exponent <= 3)) {
            throw new IllegalArgumentException("spectral exponent must lie in [0, 3], got " + exponent);
        }
        if (!(lowHz > 0)) {
            throw new IllegalArgumentException("low corner must be positive, got " + lowHz);
        }
        this.samples = samples;
        int m = Math.max(2, Integer.highestOneBit(Math.max(1, 2 * samples - 1)) << 1);
        this.fft = new RadixTwoFft(m);
        this.sigma = new double[m];
        double total = 0;
        for (int k = 1; k < m; k++) {
            double f = Math.min(k, m - k) * rateHz / m;
            double power = StrictMath.pow(Math.max(f, lowHz), -exponent);
            sigma[k] = power;
            total += power;
        }
        for (int k = 1; k < m; k++) {
            sigma[k] = StrictMath.sqrt(sigma[k] / total);
        }
        this.re = new double[m];
        this.im = new double[m];
    }

    int samples() {
        return samples;
    }

    /** The length of the circular grid (a power of two, at least twice {@link #samples}). */
    int gridSize() {
        return fft.size();
    }

    /**
     * Writes one series of unit variance times {@code scale} into {@code out[offset …]}, adding
     * it to what is there. Series come in pairs from one transform: every second call uses no
     * random numbers.
     */
    void addSeries(SeededStream random, double scale, double[] out, int offset) {
        if (!hasSpare) {
            re[0] = 0;
            im[0] = 0;
            for (int k = 1; k < re.length; k++) {
                re[k] = sigma[k] * random.nextGaussian();
                im[k] = sigma[k] * random.nextGaussian();
            }
            fft.inverseUnscaled(re, im);
            for (int t = 0; t < samples; t++) {
                out[offset + t] += scale * re[t];
            }
            hasSpare = true;
        } else {
            for (int t = 0; t < samples; t++) {
                out[offset + t] += scale * im[t];
            }
            hasSpare = false;
        }
    }

    /** Forgets a pending second series, so the next call starts a fresh pair. */
    void reset() {
        hasSpare = false;
    }
}
