package org.meridian.span;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.meridian.stats.PermutationResult;
import org.meridian.stats.Progress;
import org.meridian.stats.SignFlipTest;

class MapSwapTestTest {

    /** DISS of the means of the normalised maps, after swapping where {@code swap} says. */
    static double dissAfterSwaps(double[][] early, double[][] late, boolean[] swap) {
        int c = early[0].length;
        double[] x = new double[c];
        double[] y = new double[c];
        for (int i = 0; i < early.length; i++) {
            double[] a = FieldStatistics.normalised(swap[i] ? late[i] : early[i]);
            double[] b = FieldStatistics.normalised(swap[i] ? early[i] : late[i]);
            for (int ch = 0; ch < c; ch++) {
                x[ch] += a[ch];
                y[ch] += b[ch];
            }
        }
        return FieldStatistics.diss(x, y);
    }

    @Test
    void exactSwapDistributionMatchesSwappingTheMapsThemselves() {
        double[][][] s = SpanTestTest.twoMapStudy(6, 7, 12, new double[] {1, 0.3}, new double[] {0.3, 1}, 1.5);
        double observed = dissAfterSwaps(s[0], s[1], new boolean[7]);
        AtomicInteger reaching = new AtomicInteger();
        for (int k = 0; k < 128; k++) {
            boolean[] swap = new boolean[7];
            for (int i = 0; i < 7; i++) {
                swap[i] = ((k >> i) & 1) == 1;
            }
            if (dissAfterSwaps(s[0], s[1], swap) >= observed - 1e-12) {
                reaching.incrementAndGet();
            }
        }
        PermutationResult r = MapSwapTest.run(s[0], s[1], new SignFlipTest(16, 1, 0), Progress.NONE);
        // Murray, Brunet & Michel (2008) randomisation, by direct recomputation of every swap
        assertThat(r.observed()).isCloseTo(observed, within(1e-9));
        assertThat(r.reaching()).isEqualTo(reaching.get());
    }
}
