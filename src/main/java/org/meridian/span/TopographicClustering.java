package org.meridian.span;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.meridian.core.BadInputException;

/**
 * Segmentation of a window into topographic states by polarity-sensitive k-means clustering of
 * its maps, k chosen by the cross-validation criterion of Pascual-Marqui, Michel &amp; Lehmann
 * (1995, "Segmentation of brain electrical activity into microstates: model estimation and
 * validation", IEEE Transactions on Biomedical Engineering 42:658–665).
 *
 * <p><b>Model.</b> Sample t of the window has the map v_t = GFP_t · v̂_t (v̂_t normalised: mean 0,
 * GFP 1, so |v̂_t|² = C); flat maps are left out. For k states with normalised state maps
 * Γ_1..Γ_k and labels L_t, the residual is
 * Σ_t |v_t|² − (v_t·Γ_{L_t})₊²/C = C Σ_t GFP_t² (1 − r_t₊²), r_t the spatial correlation of v_t
 * with its state map and (·)₊ = max(·, 0) (the state map is fitted at a non-negative strength:
 * polarity-sensitive, so a map and its inversion are different states, as they are in an ERP).
 * k-means minimises it approximately: each map joins the state map it correlates with most;
 * each state map is the normalised GFP-weighted mean of its normalised maps (the normalised mean
 * of its maps). Starts are drawn by k-means++ (Arthur &amp; Vassilvitskii, 2007) from a seeded
 * generator, and the best of several restarts is kept. The iterations work on the Gram matrix
 * v̂_t·v̂_s (C times the correlation matrix), so one iteration costs n² whatever the number of
 * channels.
 *
 * <p><b>Choice of k.</b> CV(k) = σ̂²(k) · ((C − 1)/(C − 1 − k))² with
 * σ̂²(k) = residual / (n (C − 1)), for k = 1..min(K, n, C − 2); the smallest CV wins. Measured on
 * the maps the states were fitted to, σ̂² of a grand average keeps falling with k (its noise is
 * smooth in time, so more states always fit more of it; on the demo study every window chose
 * k = K). {@link #segment(WindowMaps, WindowMaps, WindowMaps)} therefore measures σ̂² on held-out
 * data: states fitted to the grand average of one half of the participants are scored on the
 * other half's maps, and the other way round. The penalty is kept on the held-out σ̂², where
 * it no longer corrects for fitted noise: when the maps change gradually (overlapping
 * generators), each extra state still explains a little more of the other half's signal, and
 * the factor is a mild price per state (about 3 % at 64 channels). On the demo study the
 * held-out σ̂² still fell slowly up to k = 6..8 in every window tried (both conditions,
 * 260..460 to −100..700 ms); with the factor k was 1..4. The final states are fitted to all
 * participants.
 * States are numbered 1, 2, … in order of first appearance.
 */
public final class TopographicClustering {
    private static final int MAX_ITERATIONS = 300;

    private final int maxStates;
    private final int restarts;
    private final long seed;

    /**
     * @param maxStates K, the largest number of states tried (≥ 1)
     * @param restarts  k-means runs from different starts for each k (≥ 1)
     * @param seed      seed of the starts, so a segmentation is repeatable
     */
    public TopographicClustering(int maxStates, int restarts, long seed) {
        if (maxStates < 1) {
            throw new IllegalArgumentException("need at least one state, got " + maxStates);
        }
        if (restarts < 1) {
            throw new IllegalArgumentException("need at least one k-means run, got " + restarts);
        }
        this.maxStates = maxStates;
        this.restarts = restarts;
        this.seed = seed;
    }

    /** Segments the window's maps, σ̂² measured on the same maps (in-sample). */
    public Segmentation segment(WindowMaps maps) {
        return segment(maps, null, null);
    }

    /**
     * Segments {@code all}, choosing k with σ̂² measured on held-out maps: states fitted to
     * {@code halfA} scored on {@code halfB} and the other way round (the grand averages of two
     * disjoint halves of the participants, over the same window and channels). With null halves
     * σ̂² is measured in-sample.
     */
    public Segmentation segment(WindowMaps all, WindowMaps halfA, WindowMaps halfB) {
        Maps full = Maps.of(all);
        Maps a = halfA == null ? null : Maps.of(halfA);
        Maps b = halfB == null ? null : Maps.of(halfB);
        int c = all.channels();
        int kMax = Math.max(1, Math.min(maxStates, Math.min(full.size(), c - 2)));
        double[] cv = new double[maxStates];
        Arrays.fill(cv, Double.NaN);
        Clusters best = null;
        int bestK = 0;
        SplittableRandom rnd = new SplittableRandom(seed);
        for (int k = 1; k <= kMax; k++) {
            Clusters found = bestOfRestarts(full, k, rnd);
            double residual;
            int n;
            if (a != null && b != null && a.size() > 0 && b.size() > 0) {
                residual = bestOfRestarts(a, k, rnd).residualOf(b) + bestOfRestarts(b, k, rnd).residualOf(a);
                n = a.size() + b.size();
            } else {
                residual = found.residualOf(full);
                n = full.size();
            }
            double sigma2 = residual / (n * (double) Math.max(1, c - 1));
            double penalty = c - 1 - k > 0 ? (c - 1.0) / (c - 1.0 - k) : 1.0;
            cv[k - 1] = sigma2 * penalty * penalty;
            if (best == null || cv[k - 1] < cv[bestK - 1]) {
                best = found;
                bestK = k;
            }
        }
        return relabel(all, full, best, cv);
    }

    private Clusters bestOfRestarts(Maps m, int k, SplittableRandom rnd) {
        Clusters best = null;
        int runs = k == 1 ? 1 : restarts;
        for (int run = 0; run < runs; run++) {
            Clusters c = kMeans(m, k, rnd.split());
            if (best == null || c.loss < best.loss) {
                best = c;
            }
        }
        return best;
    }

    /** One k-means run from a k-means++ start, on the Gram matrix of the normalised maps. */
    static Clusters kMeans(Maps m, int k, SplittableRandom rnd) {
        int n = m.size();
        double c = m.channels;
        k = Math.min(k, n);
        double[][] sums = new double[k][n];
        double[] norms = new double[k];
        int[] seeds = seeds(m, k, rnd);
        for (int j = 0; j < k; j++) {
            System.arraycopy(m.gram, seeds[j] * n, sums[j], 0, n);
            norms[j] = c;
        }
        int[] label = new int[n];
        Arrays.fill(label, -1);
        double[] r = new double[n];
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            if (!assign(sums, norms, c, label, r) && iteration > 0) {
                break;
            }
            for (double[] s : sums) {
                Arrays.fill(s, 0);
            }
            for (int t = 0; t < n; t++) {
                double wt = m.weight[t];
                double[] s = sums[label[t]];
                int off = t * n;
                for (int u = 0; u < n; u++) {
                    s[u] += wt * m.gram[off + u];
                }
            }
            for (int j = 0; j < k; j++) {
                double q = 0;
                for (int t = 0; t < n; t++) {
                    if (label[t] == j) {
                        q += m.weight[t] * sums[j][t];
                    }
                }
                norms[j] = q;
                if (!(q > 1e-12 * c)) {
                    // an empty (or self-cancelling) state restarts at the worst-fitted map
                    int worst = 0;
                    for (int t = 1; t < n; t++) {
                        if (r[t] < r[worst]) {
                            worst = t;
                        }
                    }
                    System.arraycopy(m.gram, worst * n, sums[j], 0, n);
                    norms[j] = c;
                    r[worst] = 1;
                }
            }
        }
        assign(sums, norms, c, label, r);
        double loss = 0;
        for (int t = 0; t < n; t++) {
            loss += m.weight[t] * m.weight[t] * (1 - r[t]);
        }
        return new Clusters(m.templates(label, k), label, r, loss);
    }

    /** k-means++: each new start drawn with probability ∝ squared distance to the nearest. */
    private static int[] seeds(Maps m, int k, SplittableRandom rnd) {
        int n = m.size();
        int[] seeds = new int[k];
        seeds[0] = rnd.nextInt(n);
        double[] nearest = new double[n];
        Arrays.fill(nearest, Double.POSITIVE_INFINITY);
        for (int j = 1; j < k; j++) {
            double total = 0;
            int off = seeds[j - 1] * n;
            for (int t = 0; t < n; t++) {
                double d2 = Math.max(0, 2.0 * (m.channels - m.gram[off + t]));
                nearest[t] = Math.min(nearest[t], d2);
                total += nearest[t];
            }
            int pick = rnd.nextInt(n);
            if (total > 0) {
                double target = rnd.nextDouble() * total;
                double acc = 0;
                for (int t = 0; t < n; t++) {
                    acc += nearest[t];
                    if (acc >= target && nearest[t] > 0) {
                        pick = t;
                        break;
                    }
                }
            }
            seeds[j] = pick;
        }
        return seeds;
    }

    /**
     * Labels each map with the state it correlates with most, r = s_j(t)/√(C q_j), s_j the
     * state's weighted sum of Gram rows and q_j its squared norm; returns whether a label changed.
     */
    private static boolean assign(double[][] sums, double[] norms, double c, int[] label, double[] r) {
        boolean changed = false;
        int n = label.length;
        for (int t = 0; t < n; t++) {
            int best = 0;
            double bestR = Double.NEGATIVE_INFINITY;
            for (int j = 0; j < sums.length; j++) {
                double rj = sums[j][t] / Math.sqrt(c * norms[j]);
                if (rj > bestR) {
                    bestR = rj;
                    best = j;
                }
            }
            if (label[t] != best) {
                label[t] = best;
                changed = true;
            }
            r[t] = Math.min(1, bestR);
        }
        return changed;
    }

    /** Numbers the states 1..k by first appearance and writes each sample's state. */
    private static Segmentation relabel(WindowMaps maps, Maps m, Clusters found, double[] cv) {
        int k = found.templates.length;
        int[] order = new int[k];
        Arrays.fill(order, -1);
        int next = 0;
        int[] states = new int[maps.size()];
        double sumR = 0;
        for (int i = 0; i < m.rows.length; i++) {
            int j = found.label[i];
            if (order[j] < 0) {
                order[j] = next++;
            }
            states[m.rows[i]] = order[j] + 1;
            sumR += found.correlation[i];
        }
        double[][] stateMaps = new double[next][];
        for (int j = 0; j < k; j++) {
            if (order[j] >= 0) {
                stateMaps[order[j]] = found.templates[j];
            }
        }
        SpanWindow w = maps.window();
        return new Segmentation(states, stateMaps, cv, sumR / m.rows.length,
                t -> w.axis().timeMs(w.first() + t));
    }

    /** The non-flat maps of a window: normalised maps, GFP weights, their Gram matrix. */
    static final class Maps {
        final int[] rows;
        final double[][] x;
        final double[] weight;
        final double[] gram;
        final int channels;

        private Maps(int[] rows, double[][] x, double[] weight, int channels) {
            this.rows = rows;
            this.x = x;
            this.weight = weight;
            this.channels = channels;
            int n = rows.length;
            gram = new double[n * n];
            for (int t = 0; t < n; t++) {
                for (int s = t; s < n; s++) {
                    double g = SpanResiduals.dot(x[t], x[s]);
                    gram[t * n + s] = g;
                    gram[s * n + t] = g;
                }
            }
        }

        static Maps of(WindowMaps maps) {
            int[] rows = java.util.stream.IntStream.range(0, maps.size()).filter(t -> !maps.flat(t)).toArray();
            if (rows.length == 0) {
                throw new BadInputException("every map in the window is flat; there is nothing to segment");
            }
            double[][] x = new double[rows.length][];
            double[] w = new double[rows.length];
            for (int i = 0; i < rows.length; i++) {
                x[i] = maps.normalisedMap(rows[i]);
                w[i] = maps.gfp(rows[i]);
            }
            return new Maps(rows, x, w, maps.channels());
        }

        int size() {
            return rows.length;
        }

        /** Normalised state maps: the normalised GFP-weighted mean of each state's maps. */
        double[][] templates(int[] label, int k) {
            double[][] t = new double[k][channels];
            for (int i = 0; i < x.length; i++) {
                double[] s = t[label[i]];
                for (int ch = 0; ch < channels; ch++) {
                    s[ch] += weight[i] * x[i][ch];
                }
            }
            for (double[] s : t) {
                FieldStatistics.normaliseInPlace(s);
            }
            return t;
        }
    }

    /**
     * One clustering: normalised state maps (NaN for a state left empty), labels, each map's
     * correlation with its state map, and the loss Σ GFP² (1 − r).
     */
    record Clusters(double[][] templates, int[] label, double[] correlation, double loss) {
        /** C Σ_t GFP_t² (1 − r_t₊²) of other maps against these state maps. */
        double residualOf(Maps other) {
            double sum = 0;
            for (int i = 0; i < other.size(); i++) {
                double best = 0;
                for (double[] t : templates) {
                    double r = FieldStatistics.correlationOfNormalised(other.x[i], t);
                    if (r > best) {
                        best = r;
                    }
                }
                double g = other.weight[i];
                sum += other.channels * g * g * (1 - best * best);
            }
            return sum;
        }
    }
}
