package org.meridian.maps;

import java.util.Locale;
import org.meridian.core.BadInputException;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;

/**
 * The moment a map shows: one time (the nearest sample) or a time window (the mean over the
 * window's samples, inclusive, edges snapped to the nearest sample with ties going toward the
 * inside of the window, as for the window measures of DESIGN §6.3).
 */
public sealed interface MapMoment permits MapMoment.At, MapMoment.Window {

    /** The title of the map, e.g. {@code 350 ms} or {@code 300–400 ms}. */
    String label();

    /** One value per spline channel: {@code rows[i]} is channel i's row in the waveforms. */
    double[] valuesOf(Waveforms waveforms, int[] rows);

    /** Checks that data on this time axis can be mapped at this moment (a bad-input error if not). */
    void requireWithin(TimeAxis axis);

    static MapMoment at(double timeMs) {
        return new At(timeMs);
    }

    static MapMoment window(double startMs, double endMs) {
        return new Window(startMs, endMs);
    }

    /** A single time. */
    record At(double timeMs) implements MapMoment {
        public At {
            if (!Double.isFinite(timeMs)) {
                throw new BadInputException("a map time must be a number of ms, got " + timeMs);
            }
        }

        @Override
        public String label() {
            return ms(timeMs) + " ms";
        }

        @Override
        public void requireWithin(TimeAxis axis) {
            if (!axis.covers(timeMs)) {
                throw new BadInputException("time " + ms(timeMs) + " ms is outside the data ("
                        + span(axis) + ")");
            }
        }

        @Override
        public double[] valuesOf(Waveforms waveforms, int[] rows) {
            TimeAxis axis = waveforms.axis();
            requireWithin(axis);
            int s = axis.nearestIndex(timeMs);
            double[] out = new double[rows.length];
            for (int i = 0; i < rows.length; i++) {
                out[i] = waveforms.value(rows[i], s);
            }
            return out;
        }
    }

    /** The mean over a window [start, end] ms. */
    record Window(double startMs, double endMs) implements MapMoment {
        private static final double TIE = 1e-9;

        public Window {
            if (!Double.isFinite(startMs) || !Double.isFinite(endMs) || !(startMs < endMs)) {
                throw new BadInputException("a map window must run from an earlier to a later time, got "
                        + ms(startMs) + ":" + ms(endMs) + " ms");
            }
        }

        @Override
        public String label() {
            return ms(startMs) + "–" + ms(endMs) + " ms";
        }

        /** The first sample of the window (nearest, a tie going to the later sample). */
        public int firstSample(TimeAxis axis) {
            return (int) Math.floor(axis.fractionalIndex(startMs) + 0.5 + TIE);
        }

        /** The last sample of the window (nearest, a tie going to the earlier sample). */
        public int lastSample(TimeAxis axis) {
            return (int) Math.ceil(axis.fractionalIndex(endMs) - 0.5 - TIE);
        }

        @Override
        public void requireWithin(TimeAxis axis) {
            if (!axis.covers(startMs) || !axis.covers(endMs)) {
                throw new BadInputException("window " + ms(startMs) + ":" + ms(endMs)
                        + " ms reaches beyond the data (" + span(axis) + ")");
            }
            if (Math.min(axis.samples() - 1, lastSample(axis)) < Math.max(0, firstSample(axis))) {
                throw new BadInputException("window " + ms(startMs) + ":" + ms(endMs)
                        + " ms holds no sample (one sample every " + ms(axis.stepMs()) + " ms)");
            }
        }

        @Override
        public double[] valuesOf(Waveforms waveforms, int[] rows) {
            TimeAxis axis = waveforms.axis();
            requireWithin(axis);
            int a = Math.max(0, firstSample(axis));
            int b = Math.min(axis.samples() - 1, lastSample(axis));
            double[] out = new double[rows.length];
            for (int i = 0; i < rows.length; i++) {
                double sum = 0;
                for (int s = a; s <= b; s++) {
                    sum += waveforms.value(rows[i], s);
                }
                out[i] = sum / (b - a + 1);
            }
            return out;
        }
    }

    private static String span(TimeAxis axis) {
        return ms(axis.firstMs()) + " to " + ms(axis.lastMs()) + " ms";
    }

    /** A time in the shortest plain form: 350, 352.5, -100. */
    static String ms(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e9) {
            return Long.toString((long) v);
        }
        String s = String.format(Locale.ROOT, "%.3f", v);
        return s.replaceAll("0+$", "").replaceAll("\\.$", "");
    }
}
