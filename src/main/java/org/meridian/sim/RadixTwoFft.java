package org.meridian.sim;

/**
 * An in-place complex discrete Fourier transform of a power-of-two length (iterative radix-2
 * Cooley–Tukey, 1965), computing X_k = Σ_j x_j · exp(+2πi jk/M) — the inverse transform
 * without the 1/M factor. Twiddle factors come from {@link StrictMath}, and everything else is
 * plain arithmetic, so results are the same to the last bit on every machine.
 */
final class RadixTwoFft {
    private final int size;
    private final double[] cos;
    private final double[] sin;

    RadixTwoFft(int size) {
        if (size < 2 || Integer.bitCount(size) != 1) {
            throw new IllegalArgumentException("FFT length must be a power of two ≥ 2, got " + size);
        }
        this.size = size;
        this.cos = new double[size / 2];
        this.sin = new double[size / 2];
        for (int j = 0; j < size / 2; j++) {
            double a = 2 * StrictMath.PI * j / size;
            cos[j] = StrictMath.cos(a);
            sin[j] = StrictMath.sin(a);
        }
    }

    int size() {
        return size;
    }

    /** Transforms (re, im) in place with the positive exponent sign. */
    void inverseUnscaled(double[] re, double[] im) {
        if (re.length != size || im.length != size) {
            throw new IllegalArgumentException("expected arrays of length " + size);
        }
        for (int i = 1, j = 0; i < size; i++) {
            int bit = size >> 1;
            for (; (j & bit) != 0; bit >>= 1) {
                j ^= bit;
            }
            j ^= bit;
            if (i < j) {
                double t = re[i];
                re[i] = re[j];
                re[j] = t;
                t = im[i];
                im[i] = im[j];
                im[j] = t;
            }
        }
        for (int len = 2; len <= size; len <<= 1) {
            int half = len >> 1;
            int step = size / len;
            for (int start = 0; start < size; start += len) {
                for (int k = 0; k < half; k++) {
                    double wr = cos[k * step];
                    double wi = sin[k * step];
                    int a = start + k;
                    int b = a + half;
                    double xr = re[b] * wr - im[b] * wi;
                    double xi = re[b] * wi + im[b] * wr;
                    re[b] = re[a] - xr;
                    im[b] = im[a] - xi;
                    re[a] += xr;
                    im[a] += xi;
                }
            }
        }
    }
}
