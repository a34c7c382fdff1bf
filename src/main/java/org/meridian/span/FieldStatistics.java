package org.meridian.span;

/**
 * Statistics of one scalp map, or of two, over its C channels (Lehmann &amp; Skrandies, 1980,
 * "Reference-free identification of components of checkerboard-evoked multichannel potential
 * fields", Electroencephalography and Clinical Neurophysiology 48:609–621). With the channel
 * mean v̄ = (1/C) Σ_c v_c:
 * <ul>
 * <li>global field power GFP(v) = sqrt((1/C) Σ_c (v_c − v̄)²), the population standard
 *     deviation of the map across channels, the same under any choice of reference;</li>
 * <li>the normalised map v̂ = (v − v̄) / GFP(v), mean 0 and GFP 1;</li>
 * <li>the global map dissimilarity DISS(v, w) = sqrt((1/C) Σ_c (v̂_c − ŵ_c)²), which equals
 *     sqrt(2 (1 − r)) with r the spatial (Pearson) correlation of v and w: 0 for maps of the
 *     same shape (any positive scale), 2 for inverted maps.</li>
 * </ul>
 * A flat map (GFP 0) has no shape: its normalised map, correlation and DISS are NaN.
 * Maps are plain {@code double[]} arrays, one value per channel; nothing is modified in place
 * unless the method says so.
 */
public final class FieldStatistics {
    private FieldStatistics() {
    }

    /** The channel mean v̄. */
    public static double mean(double[] map) {
        requireChannels(map);
        double sum = 0;
        for (double v : map) {
            sum += v;
        }
        return sum / map.length;
    }

    /** GFP(v) = sqrt(mean((v_c − v̄)²)). */
    public static double gfp(double[] map) {
        double m = mean(map);
        double ss = 0;
        for (double v : map) {
            double d = v - m;
            ss += d * d;
        }
        return Math.sqrt(ss / map.length);
    }

    /** Subtracts the channel mean in place (re-reference to the average of these channels). */
    public static void averageReferenceInPlace(double[] map) {
        double m = mean(map);
        for (int c = 0; c < map.length; c++) {
            map[c] -= m;
        }
    }

    /** The normalised map v̂ = (v − v̄)/GFP(v), a new array; all NaN when the map is flat. */
    public static double[] normalised(double[] map) {
        double[] out = map.clone();
        normaliseInPlace(out);
        return out;
    }

    /**
     * Replaces a map by its normalised map and returns the GFP it had. A flat map becomes all
     * NaN (it has no shape to compare).
     */
    public static double normaliseInPlace(double[] map) {
        averageReferenceInPlace(map);
        double ss = 0;
        for (double v : map) {
            ss += v * v;
        }
        double g = Math.sqrt(ss / map.length);
        double scale = g > 0 ? 1.0 / g : Double.NaN;
        for (int c = 0; c < map.length; c++) {
            map[c] *= scale;
        }
        return g;
    }

    /** The spatial correlation r of two maps (Pearson, across channels); NaN if either is flat. */
    public static double correlation(double[] v, double[] w) {
        requireSameLength(v, w);
        double mv = mean(v);
        double mw = mean(w);
        double svw = 0;
        double svv = 0;
        double sww = 0;
        for (int c = 0; c < v.length; c++) {
            double a = v[c] - mv;
            double b = w[c] - mw;
            svw += a * b;
            svv += a * a;
            sww += b * b;
        }
        if (!(svv > 0) || !(sww > 0)) {
            return Double.NaN;
        }
        return clamp(svw / Math.sqrt(svv * sww));
    }

    /** DISS(v, w) = sqrt(2 (1 − r)); NaN if either map is flat. */
    public static double diss(double[] v, double[] w) {
        return dissFromCorrelation(correlation(v, w));
    }

    /** DISS from a spatial correlation: sqrt(2 (1 − r)). */
    public static double dissFromCorrelation(double r) {
        return Math.sqrt(2.0 * (1.0 - clamp(r)));
    }

    /**
     * The correlation of two maps that are already normalised (mean 0, GFP 1): their dot product
     * divided by C. The fast path for the correlation matrix and for clustering.
     */
    public static double correlationOfNormalised(double[] vHat, double[] wHat) {
        requireSameLength(vHat, wHat);
        double s = 0;
        for (int c = 0; c < vHat.length; c++) {
            s += vHat[c] * wHat[c];
        }
        return clamp(s / vHat.length);
    }

    /** Rounding can carry |r| a hair past 1; NaN stays NaN. */
    private static double clamp(double r) {
        return r > 1 ? 1 : (r < -1 ? -1 : r);
    }

    private static void requireChannels(double[] map) {
        if (map.length == 0) {
            throw new IllegalArgumentException("a map needs at least one channel");
        }
    }

    private static void requireSameLength(double[] v, double[] w) {
        if (v.length != w.length) {
            throw new IllegalArgumentException("maps of " + v.length + " and " + w.length
                    + " channels cannot be compared");
        }
        requireChannels(v);
    }
}
