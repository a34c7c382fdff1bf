package org.meridian.figure;

import java.awt.Color;

/**
 * One wave in a waveform panel, ready to draw: its legend name, colour and dash, and per sample
 * the time, the grand-average value and the interval's lower and upper ends ({@code lower} and
 * {@code upper} null when no band is drawn). The arrays are shared, not copied: a trace is made
 * once by {@link FigureContent} and only read afterwards.
 */
public record WaveTrace(String label, Color colour, boolean dashed, double[] timesMs, double[] mean,
        double[] lower, double[] upper) {

    public WaveTrace {
        if (timesMs.length != mean.length || (lower != null && (lower.length != mean.length
                || upper == null || upper.length != mean.length))) {
            throw new IllegalArgumentException("a trace needs one time, mean and band value per sample");
        }
    }

    public boolean hasBand() {
        return lower != null;
    }
}
