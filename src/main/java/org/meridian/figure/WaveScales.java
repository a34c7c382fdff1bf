package org.meridian.figure;

import java.util.List;
import org.meridian.figure.spec.Polarity;

/**
 * The axes all waveform panels of a figure share: time range and tick step (ms), amplitude range
 * and tick step, the axis labels as printed (the amplitude label with its unit), the polarity,
 * the time spans of the maps to mark ({@code [from, to]} in ms), and the lowest and highest value
 * shown (so the range can be rounded again to a coarser step when the panels are small).
 */
public record WaveScales(double timeFromMs, double timeToMs, double timeStepMs, double amplitudeFrom,
        double amplitudeTo, double amplitudeStep, String timeLabel, String amplitudeLabel, Polarity polarity,
        List<double[]> marksMs, double dataMin, double dataMax) {

    public WaveScales {
        marksMs = List.copyOf(marksMs);
    }

    /** The same axes with another time step. */
    public WaveScales withTimeStep(double step) {
        return new WaveScales(timeFromMs, timeToMs, step, amplitudeFrom, amplitudeTo, amplitudeStep, timeLabel,
                amplitudeLabel, polarity, marksMs, dataMin, dataMax);
    }

    /** The same axes with another amplitude range and step. */
    public WaveScales withAmplitude(double from, double to, double step) {
        return new WaveScales(timeFromMs, timeToMs, timeStepMs, from, to, step, timeLabel, amplitudeLabel,
                polarity, marksMs, dataMin, dataMax);
    }

    /** The same axes with another amplitude label. */
    public WaveScales withAmplitudeLabel(String label) {
        return new WaveScales(timeFromMs, timeToMs, timeStepMs, amplitudeFrom, amplitudeTo, amplitudeStep, timeLabel,
                label, polarity, marksMs, dataMin, dataMax);
    }
}
