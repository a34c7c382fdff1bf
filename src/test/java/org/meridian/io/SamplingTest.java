package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.meridian.core.TimeAxis;

class SamplingTest {
    private static final Sampling.Where ROW = (i, problem) ->
            new ReadException("f.tsv", i + 2, 1, problem);

    private static double[] uniform(double first, double step, int n) {
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = first + i * step;
        }
        return t;
    }

    @Test
    void aStepWithinTheTenthOfAPercentPasses() {
        double[] t = uniform(0, 4, 10);
        t[5] += 4 * 0.0009;
        TimeAxis a = Sampling.axis(t, t.length, ROW);
        assertThat(a.samples()).isEqualTo(10);
    }

    @Test
    void aStepBeyondTheTenthOfAPercentNamesItsRow() {
        double[] t = uniform(0, 4, 10);
        for (int i = 5; i < 10; i++) {
            t[i] += 4 * 0.0011;
        }
        assertThatThrownBy(() -> Sampling.axis(t, t.length, ROW))
                .hasMessageStartingWith("f.tsv line 7 column 1: sampling is not uniform: time"
                        + " 20.0044 ms is 4.0044 ms after the previous sample");
    }

    @Test
    void rateComesFromTheWholeSpanSoRoundedTimesGiveTheExactRate() {
        // 300 Hz written with three decimals: 0, 3.333, 6.667, 10, ...
        int n = 301;
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = Math.round(i * 1000.0 / 300 * 1000) / 1000.0;
        }
        TimeAxis a = Sampling.axis(t, n, ROW);
        assertThat(a.rateHz()).isEqualTo(300.0);
        assertThat(a.firstMs()).isEqualTo(0.0);
    }

    @Test
    void aFractionalRateIsKept() {
        double[] t = uniform(-100, 1000.0 / 512.5, 40);
        assertThat(Sampling.axis(t, t.length, ROW).rateHz()).isCloseTo(512.5,
                org.assertj.core.data.Offset.offset(1e-9));
    }

    @Test
    void secondsConvertedToMillisecondsLoseTheirBinaryNoise() {
        double[] t = {-0.2 * 1000, -0.196 * 1000, -0.192 * 1000};
        assertThat(Sampling.axis(t, 3, ROW).firstMs()).isEqualTo(-200.0);
    }

    @Test
    void aFirstTimeRoundedOffTheSampleGridIsPutBackOnIt() {
        // 300 Hz from -133.333 ms (40 steps before 0 ms, written with three decimals)
        double[] t = new double[100];
        for (int i = 0; i < t.length; i++) {
            t[i] = Math.round((i - 40) * 1000.0 / 300 * 1000) / 1000.0;
        }
        assertThat(Sampling.axis(t, t.length, ROW).firstMs()).isEqualTo(-40 * 1000.0 / 300);
    }

    @Test
    void aFirstTimeOffTheGridOnPurposeIsKept() {
        double[] t = uniform(-99.5, 4, 10);
        assertThat(Sampling.axis(t, t.length, ROW).firstMs()).isEqualTo(-99.5);
    }
}
