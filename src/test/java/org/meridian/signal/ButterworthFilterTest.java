package org.meridian.signal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.meridian.core.BadInputException;

class ButterworthFilterTest {
    private static final double RATE = 500;

    private static double db(double powerGain) {
        return 10 * Math.log10(powerGain);
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 5, 8})
    void onePassIsThreeDecibelsDownAtTheCutoff(int order) {
        // Butterworth (1930): |H(fc)|² = 1/2, i.e. 10·log10(1/2) = −3.0103 dB, for every order
        assertThat(db(ButterworthFilter.lowPass(order, 30).design(RATE).powerGain(30, RATE)))
                .isCloseTo(-3.0103, within(1e-4));
        assertThat(db(ButterworthFilter.highPass(order, 0.5).design(RATE).powerGain(0.5, RATE)))
                .isCloseTo(-3.0103, within(1e-4));
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 4, 6})
    void forwardBackwardIsSixDecibelsDownAtTheCutoff(int order) {
        // two passes square the power gain: 20·log10(1/2) = −6.0206 dB (any DSP textbook)
        assertThat(db(ButterworthFilter.lowPass(order, 30).zeroPhasePowerGain(30, RATE)))
                .isCloseTo(-6.0206, within(1e-4));
        assertThat(db(ButterworthFilter.highPass(order, 0.1).zeroPhasePowerGain(0.1, RATE)))
                .isCloseTo(-6.0206, within(1e-4));
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 7})
    void powerGainFollowsTheButterworthFormulaAtEveryFrequency(int order) {
        double fc = 40;
        SecondOrderSections lp = ButterworthFilter.lowPass(order, fc).design(RATE);
        SecondOrderSections hp = ButterworthFilter.highPass(order, fc).design(RATE);
        for (double f : new double[] {0.5, 5, 20, 39, 41, 60, 100, 200, 249}) {
            // Butterworth (1930) |H|² = 1/(1 + (f/fc)^(2n)), with the bilinear transform's
            // frequency warping f → tan(π f / fs) (Oppenheim & Schafer, Discrete-Time Signal
            // Processing, §7.1)
            double ratio = Math.tan(Math.PI * f / RATE) / Math.tan(Math.PI * fc / RATE);
            assertThat(lp.powerGain(f, RATE)).isCloseTo(1 / (1 + Math.pow(ratio, 2 * order)), within(1e-12));
            assertThat(hp.powerGain(f, RATE)).isCloseTo(1 / (1 + Math.pow(1 / ratio, 2 * order)), within(1e-12));
        }
    }

    @Test
    void wellBelowNyquistTheDigitalResponseIsTheAnalogueOne() {
        // Butterworth (1930): |H(f)|² = 1/(1 + (f/fc)^(2n)); the warping is negligible for f ≪ fs
        int order = 4;
        double fc = 10;
        SecondOrderSections lp = ButterworthFilter.lowPass(order, fc).design(5000);
        for (double f : new double[] {1, 5, 8, 10, 12, 15, 20}) {
            double analogue = 1 / (1 + Math.pow(f / fc, 2 * order));
            assertThat(lp.powerGain(f, 5000)).isCloseTo(analogue, within(2e-3 * analogue + 1e-9));
        }
    }

    @Test
    void bandPassIsTheProductOfItsTwoEdges() {
        ButterworthFilter band = ButterworthFilter.bandPass(2, 1, 30);
        for (double f : new double[] {0.3, 1, 5, 10, 30, 80}) {
            // a cascade multiplies gains (any DSP textbook)
            double product = ButterworthFilter.highPass(2, 1).design(RATE).powerGain(f, RATE)
                    * ButterworthFilter.lowPass(2, 30).design(RATE).powerGain(f, RATE);
            assertThat(band.design(RATE).powerGain(f, RATE)).isCloseTo(product, within(1e-12));
        }
    }

    @Test
    void aSineAtTheCutoffComesOutHalfAsStrongAndInPhase() {
        double fc = 10;
        int n = 10_000;
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.sin(2 * Math.PI * fc * i / RATE);
        }
        double[] y = ButterworthFilter.lowPass(4, fc).applyZeroPhase(x, RATE);
        // fit y ≈ a·sin + b·cos over the middle, far from the edges
        double ss = 0;
        double sc = 0;
        double cc = 0;
        double ys = 0;
        double yc = 0;
        for (int i = 2000; i < 8000; i++) {
            double s = Math.sin(2 * Math.PI * fc * i / RATE);
            double c = Math.cos(2 * Math.PI * fc * i / RATE);
            ss += s * s;
            sc += s * c;
            cc += c * c;
            ys += y[i] * s;
            yc += y[i] * c;
        }
        double det = ss * cc - sc * sc;
        double a = (ys * cc - yc * sc) / det;
        double b = (yc * ss - ys * sc) / det;
        // forward–backward: amplitude gain |H(fc)|² = 1/2 (−6.02 dB) and no phase shift
        assertThat(Math.hypot(a, b)).isCloseTo(0.5, within(1e-6));
        assertThat(Math.atan2(b, a)).isCloseTo(0, within(1e-6));
    }

    @Test
    void aSymmetricPulseStaysSymmetricAndKeepsItsLatency() {
        int n = 1001;
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            double t = (i - 500) / 20.0;
            x[i] = Math.exp(-t * t / 2) + (Math.abs(i - 500) < 30 ? 0.3 : 0);
        }
        double[] y = ButterworthFilter.lowPass(4, 15).applyZeroPhase(x, RATE);
        // zero phase: a symmetric input gives a symmetric output (forward–backward filtering,
        // any DSP textbook)
        for (int k = 0; k <= 500; k++) {
            assertThat(y[500 + k]).isCloseTo(y[500 - k], within(1e-9));
        }
        int peak = 0;
        for (int i = 1; i < n; i++) {
            if (y[i] > y[peak]) {
                peak = i;
            }
        }
        assertThat(peak).isEqualTo(500);
    }

    @Test
    void edgesDoNotRing() {
        int n = 400;
        double[] constant = new double[n];
        double[] ramp = new double[n];
        for (int i = 0; i < n; i++) {
            constant[i] = 7.5;
            ramp[i] = 3 + 0.05 * i;
        }
        double[] yc = ButterworthFilter.lowPass(4, 30).applyZeroPhase(constant, RATE);
        double[] yr = ButterworthFilter.lowPass(4, 30).applyZeroPhase(ramp, RATE);
        for (int i = 0; i < n; i++) {
            // a low-pass with unit gain at 0 Hz passes a constant unchanged (common practice)
            assertThat(yc[i]).isCloseTo(7.5, within(1e-9));
            // a zero-phase low-pass passes a straight line unchanged once transients have
            // died out; the point reflection keeps the edges on the line (common practice)
            assertThat(yr[i]).isCloseTo(ramp[i], within(1e-3));
        }
    }

    @Test
    void aHighPassRemovesAConstantOffset() {
        int n = 2000;
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 40 + Math.sin(2 * Math.PI * 20 * i / RATE);
        }
        double[] y = ButterworthFilter.highPass(2, 0.5).applyZeroPhase(x, RATE);
        for (int i = 500; i < 1500; i++) {
            // Butterworth (1930): at 20 Hz a 0.5 Hz order-2 high-pass passes 1/(1 + (0.5/20)^4) of the
            // power (1 − 4e-7, twice over for two passes) and removes 0 Hz; the 1e-3 allows for the
            // slow edge transient of so low a cut-off
            assertThat(y[i]).isCloseTo(Math.sin(2 * Math.PI * 20 * i / RATE), within(1e-3));
        }
    }

    @Test
    void badSettingsAreRefusedWithTheReason() {
        assertThatThrownBy(() -> ButterworthFilter.lowPass(0, 30)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("order");
        assertThatThrownBy(() -> ButterworthFilter.lowPass(4, 300).design(RATE))
                .isInstanceOf(BadInputException.class).hasMessageContaining("Nyquist frequency 250 Hz");
        assertThatThrownBy(() -> ButterworthFilter.bandPass(2, 30, 1))
                .isInstanceOf(BadInputException.class).hasMessageContaining("lower edge");
        assertThat(ButterworthFilter.bandPass(2, 0.1, 30).describe())
                .isEqualTo("band-pass 0.1 Hz–30 Hz, Butterworth order 2, zero-phase");
    }
}
