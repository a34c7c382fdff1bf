package org.meridian.measure;

import org.meridian.core.Unit;

/**
 * {@code frac-peak-latency}: starting at the peak sample (see {@link PeakMeasure}) and searching
 * backwards inside the window, the first time the wave crosses f × peak amplitude, interpolated
 * linearly between the two samples on either side of the crossing. The value is left empty,
 * with a warning, when the wave does not come down to f × peak inside the window, or when the
 * peak has the wrong sign (a "positive" peak at or below zero has no fraction to fall to).
 */
final class FractionalPeakLatency implements Measure {

    @Override
    public String name() {
        return "frac-peak-latency";
    }

    @Override
    public String unit(Unit dataUnit) {
        return "ms";
    }

    @Override
    public String description() {
        return "time before the peak at which the wave crosses the fraction f of the peak amplitude";
    }

    @Override
    public void check(MeasureSettings settings) {
        PeakMeasure.requirePeakPolarity(name(), settings);
    }

    @Override
    public Score score(Trace t, MeasureSettings settings) {
        int sign = settings.polarity().sign();
        double[] x = t.values();
        int p = t.extremeIndex(settings.polarity());
        double peak = sign * x[p];
        if (!(peak > 0)) {
            return Score.empty("the " + (sign > 0 ? "most positive sample is not above"
                    : "most negative sample is not below") + " zero; value left empty");
        }
        double target = settings.fraction() * peak;
        for (int i = p - 1; i >= t.from(); i--) {
            double v = sign * x[i];
            if (v <= target) {
                double w = sign * x[i + 1];
                return Score.of(t.timeMs(i) + (target - v) / (w - v) * t.stepMs());
            }
        }
        if (settings.fraction() == 1) {
            return Score.of(t.timeMs(p));
        }
        return Score.empty("the wave does not cross " + percent(settings.fraction())
                + " of the peak before the peak inside the window; value left empty");
    }

    private static String percent(double f) {
        return org.meridian.signal.TimeWindow.format(100 * f) + " %";
    }
}
