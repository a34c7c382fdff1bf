package org.meridian.span;

import org.meridian.core.BadInputException;

/**
 * The per-participant residuals of the span test (DESIGN §7): how far each participant's early
 * and late maps depart from one common map.
 *
 * <p>Participant i has an early map x_i and a late map y_i over the same C channels (average
 * reference, or CSD). With the grand means x̄ = (1/N) Σ x_i and ȳ = (1/N) Σ y_i:
 * <ul>
 * <li>u is the leading left singular vector of the C × 2 matrix [x̄ ȳ], the common map
 *     direction (the eigenvector of x̄x̄ᵀ + ȳȳᵀ with the largest eigenvalue);</li>
 * <li>α_x = x̄·u and α_y = ȳ·u are the amplitudes of that map in the two parts;</li>
 * <li>d_i = P⊥(α_x·y_i − α_y·x_i) / √(α_x² + α_y²), with P⊥ v = v − (u·v) u.</li>
 * </ul>
 * If every x_i and y_i is a multiple of one map m (any amplitudes, any signs) plus noise that is
 * symmetric about zero, α_x·y_i − α_y·x_i carries m only along u, which P⊥ removes, and the d_i
 * are noise centred on 0. A second map that changes the early-to-late ratio survives P⊥. The
 * statistic is S = Σ_c (mean_i d_ic)² = |d̄|².
 *
 * <p>A property used in the tests: d̄ = P⊥(α_x ȳ − α_y x̄)/|α| is exactly σ₂·u₂, so S equals
 * the squared second singular value of [x̄ ȳ], the part of the two grand means that no single
 * map explains. The sign of u is arbitrary; flipping it flips every d_i and leaves S and the
 * sign-flip null unchanged.
 *
 * <p>Residuals smaller than 10⁻⁹ of the largest input map are rounding, not data (the maps are
 * exactly proportional), and are set to 0 so that S = 0 and p = 1.
 */
public final class SpanResiduals {
    /** Below this share of the largest input map a residual is rounding. */
    private static final double ROUNDING = 1e-9;

    private final int participants;
    private final int channels;
    private final double[] earlyMean;
    private final double[] lateMean;
    private final double[] commonMap;
    private final double alphaEarly;
    private final double alphaLate;
    private final double[][] residuals;
    private final double[] gram;
    private final double statistic;

    /**
     * @param early x_i, one map per participant (N × C); not modified
     * @param late  y_i, in the same participant and channel order
     */
    public SpanResiduals(double[][] early, double[][] late) {
        participants = early.length;
        if (participants < 2) {
            throw new BadInputException("the span test needs at least 2 participants, got " + participants);
        }
        if (late.length != participants) {
            throw new IllegalArgumentException(participants + " early maps but " + late.length + " late maps");
        }
        channels = early[0].length;
        if (channels < 3) {
            throw new BadInputException("the span test needs at least 3 channels, got " + channels);
        }
        for (int i = 0; i < participants; i++) {
            if (early[i].length != channels || late[i].length != channels) {
                throw new IllegalArgumentException("participant " + i + " has maps of "
                        + early[i].length + " and " + late[i].length + " channels, expected " + channels);
            }
        }
        earlyMean = meanMap(early);
        lateMean = meanMap(late);

        // leading eigenvector (wx, wy) of B = [x̄ ȳ]ᵀ[x̄ ȳ]; then u = (wx x̄ + wy ȳ)/|…| and
        // (α_x, α_y) = √λ₁ (wx, wy)
        double a = dot(earlyMean, earlyMean);
        double b = dot(earlyMean, lateMean);
        double c = dot(lateMean, lateMean);
        double lambda1 = 0.5 * (a + c) + Math.hypot(0.5 * (a - c), b);
        if (!(lambda1 > 0)) {
            throw new BadInputException("the grand-mean maps of both parts of the window are flat; "
                    + "there is no map whose span could be tested");
        }
        double wx;
        double wy;
        if (a >= c) {
            wx = lambda1 - c;
            wy = b;
        } else {
            wx = b;
            wy = lambda1 - a;
        }
        double wn = Math.hypot(wx, wy);
        if (wn == 0) {
            // x̄ ⟂ ȳ with equal norms: every direction of their plane leads; take x̄'s
            wx = 1;
            wn = 1;
        }
        wx /= wn;
        wy /= wn;
        commonMap = new double[channels];
        for (int ch = 0; ch < channels; ch++) {
            commonMap[ch] = wx * earlyMean[ch] + wy * lateMean[ch];
        }
        double un = Math.sqrt(dot(commonMap, commonMap));
        for (int ch = 0; ch < channels; ch++) {
            commonMap[ch] /= un;
        }
        alphaEarly = dot(earlyMean, commonMap);
        alphaLate = dot(lateMean, commonMap);
        double norm = Math.hypot(alphaEarly, alphaLate);

        residuals = new double[participants][channels];
        double largestInput = 0;
        double largestResidual = 0;
        for (int i = 0; i < participants; i++) {
            double[] d = residuals[i];
            for (int ch = 0; ch < channels; ch++) {
                d[ch] = (alphaEarly * late[i][ch] - alphaLate * early[i][ch]) / norm;
            }
            double along = dot(d, commonMap);
            for (int ch = 0; ch < channels; ch++) {
                d[ch] -= along * commonMap[ch];
            }
            largestInput = Math.max(largestInput, Math.max(norm(early[i]), norm(late[i])));
            largestResidual = Math.max(largestResidual, norm(d));
        }
        if (largestResidual <= ROUNDING * largestInput) {
            for (double[] d : residuals) {
                java.util.Arrays.fill(d, 0.0);
            }
        }
        gram = new double[participants * participants];
        for (int i = 0; i < participants; i++) {
            for (int j = i; j < participants; j++) {
                double g = dot(residuals[i], residuals[j]);
                gram[i * participants + j] = g;
                gram[j * participants + i] = g;
            }
        }
        double[] plus = new double[participants];
        java.util.Arrays.fill(plus, 1.0);
        statistic = statisticFor(plus);
    }

    /**
     * S*(s) = |(1/N) Σ_i s_i d_i|² = (1/N²) Σ_ij s_i s_j (d_i·d_j), from the precomputed Gram
     * matrix of the residuals: N² operations a pattern, whatever the channel count.
     */
    public double statisticFor(double[] signs) {
        int n = participants;
        double q = 0;
        for (int i = 0; i < n; i++) {
            double row = 0;
            int off = i * n;
            for (int j = 0; j < n; j++) {
                row += gram[off + j] * signs[j];
            }
            q += signs[i] * row;
        }
        return Math.max(0.0, q) / ((double) n * n);
    }

    /**
     * The largest value S* can take over all sign patterns is at most ((1/N) Σ |d_i|)²; ties
     * are judged on this scale.
     */
    public double largestPossibleStatistic() {
        double sum = 0;
        for (double[] d : residuals) {
            sum += norm(d);
        }
        return (sum / participants) * (sum / participants);
    }

    /** S = |d̄|², the observed statistic. */
    public double statistic() {
        return statistic;
    }

    public int participants() {
        return participants;
    }

    public int channels() {
        return channels;
    }

    /** u, the common map direction (unit length; its sign is arbitrary). */
    public double[] commonMap() {
        return commonMap.clone();
    }

    /** α_x = x̄·u. */
    public double alphaEarly() {
        return alphaEarly;
    }

    /** α_y = ȳ·u. */
    public double alphaLate() {
        return alphaLate;
    }

    /** x̄, the grand-mean early map. */
    public double[] earlyMean() {
        return earlyMean.clone();
    }

    /** ȳ, the grand-mean late map. */
    public double[] lateMean() {
        return lateMean.clone();
    }

    /** d̄ = (1/N) Σ d_i: the part of the late-versus-early change that one map does not explain. */
    public double[] meanResidual() {
        return meanMap(residuals);
    }

    /** d_i of one participant (a copy). */
    public double[] residual(int participant) {
        return residuals[participant].clone();
    }

    /** DISS between the normalised grand-mean early and late maps: the effect size. */
    public double grandMeanDiss() {
        return FieldStatistics.diss(earlyMean, lateMean);
    }

    private double[] meanMap(double[][] maps) {
        double[] m = new double[channels];
        for (double[] map : maps) {
            for (int ch = 0; ch < channels; ch++) {
                m[ch] += map[ch];
            }
        }
        for (int ch = 0; ch < channels; ch++) {
            m[ch] /= maps.length;
        }
        return m;
    }

    static double dot(double[] v, double[] w) {
        double s = 0;
        for (int i = 0; i < v.length; i++) {
            s += v[i] * w[i];
        }
        return s;
    }

    private static double norm(double[] v) {
        return Math.sqrt(dot(v, v));
    }
}
