package org.meridian.span;

/**
 * How one condition's map behaves across a window (DESIGN §7): per sample its GFP, and its
 * spatial correlation r and DISS against a reference map (the map at the GFP maximum of the
 * window unless the researcher names a time), plus the full sample × sample correlation matrix.
 * Descriptive: it shows where the map holds still and where it turns, and says nothing about
 * chance. NaN marks a flat map, whose shape is undefined.
 */
public final class StabilityTrace {
    private final SpanWindow window;
    private final int reference;
    private final double[] gfp;
    private final double[] correlation;
    private final double[] diss;
    private final double[] matrix;

    private StabilityTrace(SpanWindow window, int reference, double[] gfp, double[] correlation,
            double[] diss, double[] matrix) {
        this.window = window;
        this.reference = reference;
        this.gfp = gfp;
        this.correlation = correlation;
        this.diss = diss;
        this.matrix = matrix;
    }

    /**
     * The trace of the window's maps against the map at {@code referenceSample} (a window
     * sample index, 0-based), or at the GFP maximum when it is negative.
     */
    public static StabilityTrace of(WindowMaps maps, int referenceSample) {
        int n = maps.size();
        int ref = referenceSample < 0 ? maps.gfpMaximum() : referenceSample;
        if (ref >= n) {
            throw new IllegalArgumentException("reference sample " + ref + " outside the window of " + n);
        }
        double[] gfp = new double[n];
        double[] r = new double[n];
        double[] d = new double[n];
        double[] matrix = new double[n * n];
        for (int t = 0; t < n; t++) {
            gfp[t] = maps.gfp(t);
            for (int s = t; s < n; s++) {
                double rts = maps.flat(t) || maps.flat(s) ? Double.NaN
                        : FieldStatistics.correlationOfNormalised(maps.normalisedMap(t), maps.normalisedMap(s));
                matrix[t * n + s] = rts;
                matrix[s * n + t] = rts;
            }
        }
        for (int t = 0; t < n; t++) {
            r[t] = matrix[t * n + ref];
            d[t] = FieldStatistics.dissFromCorrelation(r[t]);
        }
        return new StabilityTrace(maps.window(), ref, gfp, r, d, matrix);
    }

    public SpanWindow window() {
        return window;
    }

    public int size() {
        return gfp.length;
    }

    /** The reference map's window sample (0-based). */
    public int referenceSample() {
        return reference;
    }

    public double referenceMs() {
        return timeMs(reference);
    }

    /** Time of window sample {@code t}. */
    public double timeMs(int t) {
        return window.axis().timeMs(window.first() + t);
    }

    public double gfp(int t) {
        return gfp[t];
    }

    /** Spatial correlation with the reference map. */
    public double correlation(int t) {
        return correlation[t];
    }

    /** DISS against the reference map. */
    public double diss(int t) {
        return diss[t];
    }

    /** Spatial correlation of the maps at window samples t and s. */
    public double correlation(int t, int s) {
        return matrix[t * gfp.length + s];
    }

    /** The correlation matrix, row-major n × n (a copy). */
    public double[] correlationMatrix() {
        return matrix.clone();
    }
}
