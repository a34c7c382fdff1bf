package org.meridian.span;

/**
 * The optional first step of the span test's conservative variant ({@code span --whiten}; the
 * default test of DESIGN §7 does without it): each participant's pair of part maps [x_i y_i]
 * (C × 2) is multiplied on the right by W = T^(−1/2), where T = (1/N) Σ_i [x_i y_i]ᵀ[x_i y_i]
 * is the 2 × 2 second moment of the pairs summed over channels, and W its symmetric inverse
 * square root, so that the whitened pairs have second moment I.
 *
 * <p>Why one might want it: the test asks whether one map, at any strengths, accounts for both
 * parts. Mixing the parts by an invertible 2 × 2 matrix keeps a multiple of one map a multiple
 * of that map, so the question is unchanged. Background activity slower than the window is
 * shared by a participant's early and late parts; in the grand means it can tilt the estimated
 * ratio α_x : α_y, and the signal then leaks through P⊥ into every d_i alike. The expected T is
 * the signal's Gram matrix plus the noise's 2 × 2 covariance (summed over channels), so W
 * whitens the noise only where the noise dominates T; where the signal is strong, W mainly
 * evens out the signal of the two parts and the noise stays correlated between them. The step
 * is therefore a heuristic, not an exact correction. In the README's validation table the
 * whitened test kept false alarms at 1–4 % at two and three times the demo's noise (the test of
 * §7: 2–8.5 %) and lost power there (0.88 against 0.91 at twice the noise, peaks 80 ms apart):
 * a more conservative test, not a more exact one.
 *
 * <p>A consequence worth testing: the whitened test is invariant to any invertible mixing
 * (x, y) → (a x + c y, b x + d y) of the two parts, since [x y]A·(AᵀTA)^(−1/2) equals
 * [x y]·T^(−1/2)·R with R orthogonal, and the residuals only change sign under R. T is unchanged
 * when whole participants change sign. When T is singular (every participant's two parts are
 * exactly proportional with one common ratio) there is nothing to whiten and the maps are
 * returned as they are; their residuals are zero anyway.
 */
final class PairWhitening {
    /** det(T) below this share of trace(T)² counts as singular. */
    private static final double SINGULAR = 1e-12;

    private PairWhitening() {
    }

    /** {early, late} after whitening (new arrays; the inputs are not modified). */
    static double[][][] whiten(double[][] early, double[][] late) {
        int n = early.length;
        double txx = 0;
        double txy = 0;
        double tyy = 0;
        for (int i = 0; i < n; i++) {
            txx += SpanResiduals.dot(early[i], early[i]);
            txy += SpanResiduals.dot(early[i], late[i]);
            tyy += SpanResiduals.dot(late[i], late[i]);
        }
        txx /= n;
        txy /= n;
        tyy /= n;
        double det = txx * tyy - txy * txy;
        double tr = txx + tyy;
        if (!(det > SINGULAR * tr * tr)) {
            return new double[][][] {early, late};
        }
        // √T = (T + √det·I)/√(tr + 2√det) for a 2 × 2 symmetric positive definite T; W = (√T)⁻¹
        double sd = Math.sqrt(det);
        double norm = Math.sqrt(tr + 2 * sd);
        double a = (txx + sd) / norm;
        double b = txy / norm;
        double d = (tyy + sd) / norm;
        double inv = 1.0 / (a * d - b * b);
        double w11 = d * inv;
        double w12 = -b * inv;
        double w22 = a * inv;
        int c = early[0].length;
        double[][] x = new double[n][c];
        double[][] y = new double[n][c];
        for (int i = 0; i < n; i++) {
            for (int ch = 0; ch < c; ch++) {
                x[i][ch] = early[i][ch] * w11 + late[i][ch] * w12;
                y[i][ch] = early[i][ch] * w12 + late[i][ch] * w22;
            }
        }
        return new double[][][] {x, y};
    }
}
