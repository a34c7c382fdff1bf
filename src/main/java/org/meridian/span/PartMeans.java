package org.meridian.span;

import org.meridian.core.Unit;
import org.meridian.core.Waveforms;

/**
 * One participant's mean maps over the early and the late part of a window, the x_i and y_i of
 * the span test. Potentials are taken to the average reference of the channels given (the mean
 * map of a part, re-referenced, equals the mean of the re-referenced maps); CSD is reference-free
 * and is left as it is.
 */
public final class PartMeans {
    private PartMeans() {
    }

    /** Whether maps of this unit are re-referenced to the average before the span test. */
    public static boolean averageReferenced(Unit unit) {
        return unit == Unit.MICROVOLT;
    }

    /** {early, late}: the mean maps of the two parts (C values each). */
    public static double[][] of(Waveforms w, SpanWindow window) {
        if (!w.axis().sameAs(window.axis())) {
            throw new IllegalArgumentException("window of another time axis: " + window.axis());
        }
        int c = w.channelCount();
        double[] early = new double[c];
        double[] late = new double[c];
        for (int ch = 0; ch < c; ch++) {
            early[ch] = mean(w, ch, window.first(), window.earlyLast());
            late[ch] = mean(w, ch, window.lateFirst(), window.last());
        }
        if (averageReferenced(w.unit())) {
            FieldStatistics.averageReferenceInPlace(early);
            FieldStatistics.averageReferenceInPlace(late);
        }
        return new double[][] {early, late};
    }

    private static double mean(Waveforms w, int channel, int from, int to) {
        double s = 0;
        for (int t = from; t <= to; t++) {
            s += w.value(channel, t);
        }
        return s / (to - from + 1);
    }
}
