package org.meridian.measure;

import org.meridian.core.Unit;

/**
 * {@code area}: the integral over the window, sample interval by sample interval, in µV·ms, of
 * the positive part of the wave ({@code pos}), its negative part min(x, 0) ({@code neg},
 * reported as a negative number) or the signed wave ({@code signed}); see {@link SegmentArea}.
 * A window of one sample has area 0.
 */
final class AreaMeasure implements Measure {

    @Override
    public String name() {
        return "area";
    }

    @Override
    public String unit(Unit dataUnit) {
        return dataUnit.symbol() + "·ms";
    }

    @Override
    public String description() {
        return "integral of the positive, negative or signed wave over the window (trapezoid rule)";
    }

    @Override
    public Score score(Trace t, MeasureSettings settings) {
        return Score.of(t.area(settings.polarity()));
    }
}
