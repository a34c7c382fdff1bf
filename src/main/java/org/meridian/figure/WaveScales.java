package org.meridian.figure;

import java.util.List;
import org.meridian.figure.spec.Polarity;

/**
 * The axes all waveform panels of a figure share: time range and tick step (ms), amplitude range
 * and tick step, the axis labels as printed (the amplitude label with its unit), the polarity,
 * and the time spans of the maps to mark ({@code [from, to]} in ms).
 */
public record WaveScales(double timeFromMs, double timeToMs, double timeStepMs, double amplitudeFrom,
        double amplitudeTo, double amplitudeStep, String timeLabel, String amplitudeLabel, Polarity polarity,
        List<double[]> marksMs) {

    public WaveScales {
        marksMs = List.copyOf(marksMs);
    }
}
