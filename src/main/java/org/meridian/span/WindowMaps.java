package org.meridian.span;

import org.meridian.core.Waveforms;

/**
 * The maps of one set of waveforms over the samples of a window, as doubles, with their GFP
 * and their normalised maps (mean 0, GFP 1; NaN for a flat map), computed once for the
 * stability trace, the correlation matrix and the segmentation. Every channel of the waveforms
 * counts: choose the field's channels first (see {@link SpanAnalysis#fieldChannels}).
 */
public final class WindowMaps {
    private final SpanWindow window;
    private final double[][] maps;
    private final double[][] normalised;
    private final double[] gfp;

    public WindowMaps(Waveforms waveforms, SpanWindow window) {
        if (!waveforms.axis().sameAs(window.axis())) {
            throw new IllegalArgumentException("window of another time axis: " + window.axis());
        }
        this.window = window;
        int n = window.size();
        int channels = waveforms.channelCount();
        maps = new double[n][channels];
        normalised = new double[n][];
        gfp = new double[n];
        for (int t = 0; t < n; t++) {
            waveforms.sampleInto(window.first() + t, maps[t]);
            normalised[t] = maps[t].clone();
            gfp[t] = FieldStatistics.normaliseInPlace(normalised[t]);
        }
    }

    public SpanWindow window() {
        return window;
    }

    /** Samples in the window. */
    public int size() {
        return maps.length;
    }

    public int channels() {
        return maps[0].length;
    }

    /** GFP at window sample {@code t} (0 = the window's first sample). */
    public double gfp(int t) {
        return gfp[t];
    }

    /** The map at window sample {@code t} (the array itself: do not modify). */
    double[] map(int t) {
        return maps[t];
    }

    /** The normalised map at window sample {@code t} (the array itself: do not modify). */
    double[] normalisedMap(int t) {
        return normalised[t];
    }

    /** Whether the map at window sample {@code t} is flat (GFP 0) and so has no shape. */
    public boolean flat(int t) {
        return !(gfp[t] > 0);
    }

    /** The window sample of the largest GFP (the first one when several tie). */
    public int gfpMaximum() {
        int best = 0;
        for (int t = 1; t < gfp.length; t++) {
            if (gfp[t] > gfp[best]) {
                best = t;
            }
        }
        return best;
    }
}
