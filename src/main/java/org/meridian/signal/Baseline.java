package org.meridian.signal;

import org.meridian.core.BadInputException;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;

/**
 * Baseline correction: from every channel, subtract that channel's mean over a baseline window,
 * so that the channel averages zero there. The usual window, and our default, is every sample
 * before stimulus onset (time &lt; 0 ms). Linear in the data; never applied unless asked for.
 */
public final class Baseline {
    private Baseline() {
    }

    /** Subtracts each channel's mean over all samples before 0 ms. */
    public static Waveforms preStimulus(Waveforms w) {
        TimeAxis axis = w.axis();
        int count = 0;
        while (count < axis.samples() && axis.timeMs(count) < -1e-9 * axis.stepMs()) {
            count++;
        }
        if (count == 0) {
            throw new BadInputException("no samples before 0 ms for a pre-stimulus baseline (data "
                    + TimeWindow.format(axis.firstMs()) + ".." + TimeWindow.format(axis.lastMs())
                    + " ms); give a baseline window instead");
        }
        return subtractMean(w, 0, count - 1);
    }

    /** Subtracts each channel's mean over the samples of a window (edges snapped as usual). */
    public static Waveforms correct(Waveforms w, TimeWindow window) {
        TimeWindow.SampleRange r = window.resolve(w.axis());
        return subtractMean(w, r.from(), r.to());
    }

    private static Waveforms subtractMean(Waveforms w, int from, int to) {
        int n = w.sampleCount();
        float[] out = w.copyValues();
        for (int c = 0; c < w.channelCount(); c++) {
            int off = c * n;
            double sum = 0;
            for (int s = from; s <= to; s++) {
                sum += out[off + s];
            }
            float mean = (float) (sum / (to - from + 1));
            for (int s = 0; s < n; s++) {
                out[off + s] -= mean;
            }
        }
        return Waveforms.wrap(w.labels(), w.axis(), w.unit(), out);
    }
}
