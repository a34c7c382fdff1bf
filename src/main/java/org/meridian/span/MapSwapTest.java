package org.meridian.span;

import org.meridian.stats.PermutationResult;
import org.meridian.stats.Progress;
import org.meridian.stats.SignFlipTest;

/**
 * The naive comparison the span test is validated against, and deliberately not offered to
 * users: swap each participant's normalised early and late maps (the topographic randomisation
 * used to compare two conditions, Murray, Brunet &amp; Michel, 2008, "Topographic ERP analyses:
 * a step-by-step tutorial review", Brain Topography 20:249–264).
 *
 * <p>Statistic: DISS(X, Y) with X and Y the means of the normalised early maps x̂_i and late
 * maps ŷ_i. A swap in participant i exchanges x̂_i and ŷ_i. Writing m_i = (x̂_i + ŷ_i)/2,
 * h_i = (x̂_i − ŷ_i)/2, M = mean m_i and H(s) = (1/N) Σ s_i h_i, a swap pattern s gives
 * X* = M + H, Y* = M − H and r(X*, Y*) = (|M|² − |H|²) / √(|X*|² |Y*|²) with
 * |X*|², |Y*|² = |M|² + |H|² ± 2 M·H, all from the Gram matrix of the h_i.
 *
 * <p>Why it is not used for a span: the normalisation is not linear, and its bias depends on the
 * signal-to-noise ratio of each part. When a peak is not centred on the split, one part is
 * strong and the other weak; with spatially structured noise their normalised means point in
 * systematically different directions even if one map produces both, and swapping, which
 * assumes the two parts are exchangeable, reads that difference as a change of map.
 */
final class MapSwapTest {
    private MapSwapTest() {
    }

    /** Runs the swap test on per-participant early and late mean maps (N × C each). */
    static PermutationResult run(double[][] early, double[][] late, SignFlipTest swaps, Progress progress) {
        int n = early.length;
        int c = early[0].length;
        double[][] h = new double[n][c];
        double[] m = new double[c];
        for (int i = 0; i < n; i++) {
            double[] x = FieldStatistics.normalised(early[i]);
            double[] y = FieldStatistics.normalised(late[i]);
            for (int ch = 0; ch < c; ch++) {
                h[i][ch] = 0.5 * (x[ch] - y[ch]);
                m[ch] += 0.5 * (x[ch] + y[ch]) / n;
            }
        }
        double mm = SpanResiduals.dot(m, m);
        double[] gram = new double[n * n];
        double[] mh = new double[n];
        for (int i = 0; i < n; i++) {
            mh[i] = SpanResiduals.dot(m, h[i]);
            for (int j = 0; j < n; j++) {
                gram[i * n + j] = SpanResiduals.dot(h[i], h[j]);
            }
        }
        SwapStatistic stat = new SwapStatistic(n, gram, mh, mm);
        // DISS lies in [0, 2]: ties are judged on that scale
        return swaps.run(n, stat::value, SpanTest.TIE_TOLERANCE * 2.0, progress);
    }

    /** DISS(M + H, M − H) as a function of the swap pattern. */
    private record SwapStatistic(int n, double[] gram, double[] mh, double mm) {
        double value(double[] s) {
            double hh = 0;
            double mDotH = 0;
            for (int i = 0; i < n; i++) {
                double row = 0;
                for (int j = 0; j < n; j++) {
                    row += gram[i * n + j] * s[j];
                }
                hh += s[i] * row;
                mDotH += s[i] * mh[i];
            }
            hh /= (double) n * n;
            mDotH /= n;
            double xx = mm + hh + 2 * mDotH;
            double yy = mm + hh - 2 * mDotH;
            double r = (mm - hh) / Math.sqrt(Math.max(xx * yy, Double.MIN_NORMAL));
            return FieldStatistics.dissFromCorrelation(r);
        }
    }
}
