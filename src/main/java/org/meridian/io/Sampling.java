package org.meridian.io;

import java.util.Arrays;
import java.util.Locale;
import org.meridian.core.TimeAxis;

/**
 * Turns the sample times read from a file into a {@link TimeAxis}, checking that sampling is
 * uniform: every step between consecutive samples must lie within 0.1 % of the median step
 * (DESIGN §4). The rate is taken from the whole span, 1000·(n − 1)/(t_last − t_first) Hz, which
 * is far less affected by times rounded in the file than any single step; a rate within 1e-6
 * of a whole number of hertz is taken as that number. A first time within 0.1 % of a step of a
 * whole number of steps from 0 ms is taken as exactly that (an epoch sampled in step with its
 * event at 0 ms, written with rounded times), so reading and writing again changes nothing.
 * A rate outside {@value #MIN_RATE_HZ} Hz to {@value #MAX_RATE_HZ} Hz is refused as implausible
 * for averaged ERPs: it almost always means times in seconds under a {@code time_ms} header (or
 * the reverse), or times written with too few decimals.
 */
final class Sampling {
    /** Allowed deviation of any step from the median step. */
    static final double STEP_TOLERANCE = 1e-3;
    private static final double WHOLE_HZ_TOLERANCE = 1e-6;
    private static final double ON_GRID_TOLERANCE = STEP_TOLERANCE;
    /** Times are kept to this many ms, hiding the binary noise of converting seconds. */
    private static final double TIME_GRID_MS = 1e-9;
    /** The lowest sampling rate accepted (a 1 s step). */
    static final double MIN_RATE_HZ = 1;
    /** The highest sampling rate accepted (a 10 µs step; brainstem recordings reach this). */
    static final double MAX_RATE_HZ = 100_000;

    private Sampling() {
    }

    /** Where sample {@code i}'s time was read, so that an error can name its line or cell. */
    @FunctionalInterface
    interface Where {
        ReadException at(int sample, String problem);
    }

    /**
     * @param timesMs the times of the samples in file order, in ms
     * @param n       how many of them are used
     */
    static TimeAxis axis(double[] timesMs, int n, Where where) {
        if (n < 2) {
            throw where.at(0, "only one sample: at least two are needed to know the sampling rate");
        }
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(timesMs[i])) {
                throw where.at(i, "the time is out of range after conversion to ms");
            }
        }
        double[] steps = new double[n - 1];
        for (int i = 0; i < n - 1; i++) {
            steps[i] = timesMs[i + 1] - timesMs[i];
        }
        for (int i = 0; i < n - 1; i++) {
            if (!(steps[i] > 0)) {
                throw where.at(i + 1, "time " + ms(timesMs[i + 1]) + " ms does not come after "
                        + ms(timesMs[i]) + " ms; times must increase");
            }
        }
        double[] sorted = steps.clone();
        Arrays.sort(sorted);
        int m = sorted.length;
        double median = m % 2 == 1 ? sorted[m / 2] : 0.5 * (sorted[m / 2 - 1] + sorted[m / 2]);
        for (int i = 0; i < n - 1; i++) {
            if (Math.abs(steps[i] - median) > STEP_TOLERANCE * median) {
                throw where.at(i + 1, "sampling is not uniform: time " + ms(timesMs[i + 1])
                        + " ms is " + ms(steps[i]) + " ms after the previous sample, but the median"
                        + " step is " + ms(median) + " ms (allowed: within 0.1 %)");
            }
        }
        double rate = 1000.0 * (n - 1) / (timesMs[n - 1] - timesMs[0]);
        if (!(rate >= MIN_RATE_HZ && rate <= MAX_RATE_HZ)) {
            String given = Double.isFinite(rate) ? String.format(Locale.ROOT, "%.4g Hz", rate)
                    : "infinite";
            throw where.at(1, "a step of " + String.format(Locale.ROOT, "%.4g", median)
                    + " ms gives an implausible sampling rate (" + given + "); expected "
                    + (int) MIN_RATE_HZ + " to " + (int) MAX_RATE_HZ + " Hz: are the times in ms"
                    + " under time_ms and in seconds under time_s?");
        }
        double whole = Math.rint(rate);
        if (Math.abs(rate - whole) <= WHOLE_HZ_TOLERANCE * rate) {
            rate = whole;
        }
        double step = 1000.0 / rate;
        double k = Math.rint(timesMs[0] / step);
        double first = Math.abs(timesMs[0] - k * step) <= ON_GRID_TOLERANCE * step
                ? k * 1000.0 / rate : Math.rint(timesMs[0] / TIME_GRID_MS) * TIME_GRID_MS;
        return new TimeAxis(first + 0.0, rate, n);
    }

    /** A time in ms for messages: up to four decimals, no trailing zeros. */
    static String ms(double v) {
        String s = String.format(Locale.ROOT, "%.4f", v);
        s = s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
        return s.equals("-0") ? "0" : s;
    }
}
