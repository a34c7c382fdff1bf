package org.meridian.span;

import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * Segmentation of a window into topographic states by polarity-sensitive k-means clustering of
 * its normalised maps, k chosen by cross-validation (Pascual-Marqui, Michel &amp; Lehmann, 1995,
 * "Segmentation of brain electrical activity into microstates: model estimation and
 * validation", IEEE Transactions on Biomedical Engineering 42:658–665).
 *
 * <p>Each sample t of the window contributes its normalised map v̂_t (mean 0, GFP 1, so
 * |v̂_t|² = C; every sample weighs the same whatever its GFP); flat maps are left out. For a
 * given k the state maps Γ_1..Γ_k (normalised) and the labels L_t minimise
 * Σ_t (1 − r(v̂_t, Γ_{L_t})): each map goes to the state map it correlates with most, and each
 * state map is the normalised mean of its maps. Polarity-sensitive: a map and its inversion are
 * different states, as they are in an ERP (unlike spontaneous-EEG microstates, which ignore
 * polarity). Starts are chosen by k-means++ (Arthur &amp; Vassilvitskii, 2007) from a seeded
 * generator; the best of several restarts is kept.
 *
 * <p>Cross-validation criterion (Pascual-Marqui et al., 1995), with C channels and n maps:
 * σ̂² = Σ_t (|v̂_t|² − C·r_t⁺²) / (n (C − 1)), r_t⁺ = max(r(v̂_t, Γ_{L_t}), 0) (the least-squares
 * fit of v̂_t by its state map at a non-negative strength), and
 * CV(k) = σ̂² · ((C − 1)/(C − 1 − k))²; the k with the smallest CV is chosen among
 * 1..min(K, n, C − 2). States are then numbered in order of first appearance.
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

    /** Segments the window's maps, choosing k by cross-validation. */
    public Segmentation segment(WindowMaps maps) {
        int[] rows = nonFlatSamples(maps);
        if (rows.length == 0) {
            throw new org.meridian.core.BadInputException("every map in the window is flat; "
                    + "there is nothing to segment");
        }
        double[][] x = new double[rows.length][];
        for (int i = 0; i < rows.length; i++) {
            x[i] = maps.normalisedMap(rows[i]);
        }
        int c = maps.channels();
        int kMax = Math.max(1, Math.min(maxStates, Math.min(rows.length, c - 2)));
        double[] cv = new double[maxStates];
        Arrays.fill(cv, Double.NaN);
        Clusters best = null;
        int bestK = 0;
        SplittableRandom rnd = new SplittableRandom(seed);
        for (int k = 1; k <= kMax; k++) {
            Clusters found = bestOfRestarts(x, k, rnd);
            double residual = 0;
            for (int i = 0; i < x.length; i++) {
                double r = Math.max(0, found.correlation[i]);
                residual += c * (1 - r * r);
            }
            double sigma2 = residual / (x.length * (double) Math.max(1, c - 1));
            double penalty = c - 1 - k > 0 ? (c - 1.0) / (c - 1.0 - k) : 1.0;
            cv[k - 1] = sigma2 * penalty * penalty;
            if (best == null || cv[k - 1] < cv[bestK - 1]) {
                best = found;
                bestK = k;
            }
        }
        return relabel(maps, rows, best, cv);
    }

    private Clusters bestOfRestarts(double[][] x, int k, SplittableRandom rnd) {
        Clusters best = null;
        int runs = k == 1 ? 1 : restarts;
        for (int run = 0; run < runs; run++) {
            Clusters c = kMeans(x, k, rnd.split());
            if (best == null || c.loss < best.loss) {
                best = c;
            }
        }
        return best;
    }

    /** One k-means run from a k-means++ start. */
    static Clusters kMeans(double[][] x, int k, SplittableRandom rnd) {
        int n = x.length;
        int c = x[0].length;
        double[][] centres = seeds(x, k, rnd);
        int[] label = new int[n];
        Arrays.fill(label, -1);
        double[] r = new double[n];
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            boolean changed = assign(x, centres, label, r);
            if (!changed && iteration > 0) {
                break;
            }
            double[][] sums = new double[k][c];
            int[] counts = new int[k];
            for (int i = 0; i < n; i++) {
                double[] s = sums[label[i]];
                double[] xi = x[i];
                for (int ch = 0; ch < c; ch++) {
                    s[ch] += xi[ch];
                }
                counts[label[i]]++;
            }
            for (int j = 0; j < k; j++) {
                if (counts[j] == 0 || !(FieldStatistics.normaliseInPlace(sums[j]) > 0)) {
                    // an empty (or self-cancelling) state restarts at the worst-fitted map
                    int worst = 0;
                    for (int i = 1; i < n; i++) {
                        if (r[i] < r[worst]) {
                            worst = i;
                        }
                    }
                    sums[j] = x[worst].clone();
                    r[worst] = 1;
                }
            }
            centres = sums;
        }
        assign(x, centres, label, r);
        double loss = 0;
        for (int i = 0; i < n; i++) {
            loss += 1 - r[i];
        }
        return new Clusters(centres, label, r, loss);
    }

    /** k-means++ starts: each new centre drawn with probability ∝ squared distance to the nearest. */
    private static double[][] seeds(double[][] x, int k, SplittableRandom rnd) {
        int n = x.length;
        double[][] centres = new double[k][];
        centres[0] = x[rnd.nextInt(n)].clone();
        double[] nearest = new double[n];
        Arrays.fill(nearest, Double.POSITIVE_INFINITY);
        for (int j = 1; j < k; j++) {
            double total = 0;
            for (int i = 0; i < n; i++) {
                double d2 = 2.0 * (1.0 - FieldStatistics.correlationOfNormalised(x[i], centres[j - 1]));
                nearest[i] = Math.min(nearest[i], Math.max(0, d2));
                total += nearest[i];
            }
            int pick = rnd.nextInt(n);
            if (total > 0) {
                double target = rnd.nextDouble() * total;
                double acc = 0;
                for (int i = 0; i < n; i++) {
                    acc += nearest[i];
                    if (acc >= target && nearest[i] > 0) {
                        pick = i;
                        break;
                    }
                }
            }
            centres[j] = x[pick].clone();
        }
        return centres;
    }

    /** Labels each map with its best-correlated centre; returns whether any label changed. */
    private static boolean assign(double[][] x, double[][] centres, int[] label, double[] r) {
        boolean changed = false;
        for (int i = 0; i < x.length; i++) {
            int best = 0;
            double bestR = Double.NEGATIVE_INFINITY;
            for (int j = 0; j < centres.length; j++) {
                double rij = FieldStatistics.correlationOfNormalised(x[i], centres[j]);
                if (rij > bestR) {
                    bestR = rij;
                    best = j;
                }
            }
            if (label[i] != best) {
                label[i] = best;
                changed = true;
            }
            r[i] = bestR;
        }
        return changed;
    }

    private static int[] nonFlatSamples(WindowMaps maps) {
        return java.util.stream.IntStream.range(0, maps.size()).filter(t -> !maps.flat(t)).toArray();
    }

    /** Numbers the states 1..k by first appearance and writes each sample's state. */
    private static Segmentation relabel(WindowMaps maps, int[] rows, Clusters found, double[] cv) {
        int k = found.centres.length;
        int[] order = new int[k];
        Arrays.fill(order, -1);
        int next = 0;
        int[] states = new int[maps.size()];
        double sumR = 0;
        for (int i = 0; i < rows.length; i++) {
            int j = found.label[i];
            if (order[j] < 0) {
                order[j] = next++;
            }
            states[rows[i]] = order[j] + 1;
            sumR += found.correlation[i];
        }
        double[][] stateMaps = new double[next][];
        for (int j = 0; j < k; j++) {
            if (order[j] >= 0) {
                stateMaps[order[j]] = found.centres[j];
            }
        }
        SpanWindow w = maps.window();
        return new Segmentation(states, stateMaps, cv, sumR / rows.length,
                t -> w.axis().timeMs(w.first() + t));
    }

    /** One clustering: normalised centres, labels, each map's correlation with its centre, loss. */
    record Clusters(double[][] centres, int[] label, double[] correlation, double loss) {
    }
}
