package org.meridian.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.stat.inference.TTest;
import org.junit.jupiter.api.Test;
import org.meridian.signal.Jackknife;

class JackknifeTTest {
    /** Leave-one-out latency differences (ms) of 8 participants, invented for the check. */
    private static final double[] J = {12.0, 14.5, 11.0, 13.25, 12.75, 15.0, 10.5, 13.0};

    @Test
    void theCorrectedTIsTheOrdinaryTDividedByNMinusOne() {
        int n = J.length;
        double ordinary = new TTest().t(0, J);
        // Ulrich & Miller (2001), eq. for t_c: t_c = t / (N − 1); ordinary t from Commons Math
        assertThat(JackknifeT.correctT(ordinary, n)).isCloseTo(ordinary / (n - 1), within(1e-12));
        assertThat(JackknifeT.oneSample(J, 0).t()).isCloseTo(ordinary / (n - 1), within(1e-9));
        assertThat(JackknifeT.oneSample(J, 0).degreesOfFreedom()).isEqualTo(n - 1);
    }

    @Test
    void retrievedScoresGiveTheCorrectedTWithAnOrdinaryTest() {
        double[] x = Jackknife.retrieve(J);
        // Smulders (2010): an ordinary t on retrieved scores equals the Ulrich & Miller (2001) t_c
        assertThat(new TTest().t(0, x)).isCloseTo(JackknifeT.oneSample(J, 0).t(), within(1e-9));
        // and so does its p value (Commons Math TTest)
        assertThat(new TTest().tTest(0, x)).isCloseTo(JackknifeT.oneSample(J, 0).p(), within(1e-9));
    }

    @Test
    void theJackknifeStandardErrorIsMillerPattersonAndUlrichs() {
        int n = J.length;
        double mean = 0;
        for (double j : J) {
            mean += j / n;
        }
        double ss = 0;
        for (double j : J) {
            ss += (j - mean) * (j - mean);
        }
        // Miller, Patterson & Ulrich (1998): SE_J = √((N − 1)/N · Σ (J_i − J̄)²)
        assertThat(JackknifeT.standardError(J)).isCloseTo(Math.sqrt((n - 1.0) / n * ss), within(1e-12));
    }

    @Test
    void theCorrectedFOfTwoConditionsIsTheSquaredCorrectedT() {
        double[] a = {310, 305, 320, 312, 309, 315};
        double[] b = {300, 301, 306, 303, 299, 304};
        double t = JackknifeT.paired(a, b).t();
        double ordinaryT = new TTest().pairedT(a, b);
        // Ulrich & Miller (2001): F_c = F/(N−1)²; with two conditions F = t² (textbook identity)
        assertThat(JackknifeT.correctF(ordinaryT * ordinaryT, a.length)).isCloseTo(t * t, within(1e-9));
    }
}
