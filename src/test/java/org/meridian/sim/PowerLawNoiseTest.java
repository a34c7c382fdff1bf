package org.meridian.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.junit.jupiter.api.Test;

class PowerLawNoiseTest {

    @Test
    void fftMatchesCommonsMath() {
        int m = 64;
        SeededStream s = new SeededStream(3);
        double[] re = new double[m];
        double[] im = new double[m];
        Complex[] in = new Complex[m];
        for (int i = 0; i < m; i++) {
            re[i] = s.nextGaussian();
            im[i] = s.nextGaussian();
            in[i] = new Complex(re[i], im[i]);
        }
        new RadixTwoFft(m).inverseUnscaled(re, im);
        // reference library: Commons Math FastFourierTransformer (inverse, standard normalisation 1/M)
        Complex[] ref = new FastFourierTransformer(DftNormalization.STANDARD).transform(in, TransformType.INVERSE);
        for (int i = 0; i < m; i++) {
            assertThat(re[i]).isCloseTo(m * ref[i].getReal(), within(1e-11));
            assertThat(im[i]).isCloseTo(m * ref[i].getImaginary(), within(1e-11));
        }
    }

    @Test
    void everySampleHasUnitVarianceAndPairedSeriesAreUncorrelated() {
        int samples = 100;
        PowerLawNoise noise = new PowerLawNoise(samples, 250, 1, 1);
        assertThat(noise.gridSize()).isEqualTo(256);
        SeededStream s = new SeededStream(17);
        int reps = 4000;
        double[] sumSq = new double[samples];
        double cross = 0;
        for (int r = 0; r < reps; r++) {
            double[] pair = new double[2 * samples];
            noise.addSeries(s, 1, pair, 0);
            noise.addSeries(s, 1, pair, samples);
            for (int t = 0; t < samples; t++) {
                sumSq[t] += pair[t] * pair[t];
            }
            cross += pair[10] * pair[samples + 10] + pair[60] * pair[samples + 40];
        }
        for (int t = 0; t < samples; t++) {
            // stationarity: the variance of a normalised Gaussian series is 1 at every sample;
            // the estimate from 4000 draws has sd √(2/4000) ≈ 0.022 (textbook fact), allow 5 sd
            assertThat(sumSq[t] / reps).isCloseTo(1, within(0.11));
        }
        // independent real and imaginary parts (see the class comment): correlation ~ 0 ± 1/√(2·4000)
        assertThat(Math.abs(cross / (2 * reps))).isLessThan(0.07);
    }

    @Test
    void spectrumFallsAsOneOverFToTheExponent() {
        for (double beta : new double[] {1.0, 2.0}) {
            assertThat(spectralSlope(beta, 0.1, 2, 40)).as("beta %s", beta).isCloseTo(-beta, within(0.1));
        }
    }

    @Test
    void spectrumIsFlatBelowTheLowCorner() {
        assertThat(spectralSlope(1.0, 20, 1, 12)).isCloseTo(0, within(0.1));
    }

    /** The log–log slope of the mean periodogram between two frequencies. */
    private static double spectralSlope(double beta, double lowHz, double fromHz, double toHz) {
        int samples = 1024;
        double rate = 250;
        PowerLawNoise noise = new PowerLawNoise(samples, rate, beta, lowHz);
        SeededStream s = new SeededStream(99);
        // reference library: Commons Math FastFourierTransformer for the periodogram
        FastFourierTransformer fft = new FastFourierTransformer(DftNormalization.STANDARD);
        double[] power = new double[samples / 2];
        int reps = 64;
        for (int r = 0; r < reps; r++) {
            double[] x = new double[samples];
            noise.addSeries(s, 1, x, 0);
            Complex[] f = fft.transform(x, TransformType.FORWARD);
            for (int k = 1; k < samples / 2; k++) {
                power[k] += f[k].abs() * f[k].abs();
            }
        }
        // a power law S ∝ f^−β is a straight line of slope −β in log–log axes (definition)
        SimpleRegression reg = new SimpleRegression();
        for (int k = 1; k < samples / 2; k++) {
            double f = k * rate / samples;
            if (f >= fromHz && f <= toHz) {
                reg.addData(Math.log(f), Math.log(power[k] / reps));
            }
        }
        return reg.getSlope();
    }
}
