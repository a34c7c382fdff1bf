package org.meridian.measure;

import org.meridian.core.Unit;

/** {@code mean}: the mean of the samples in the window, ends included. Polarity plays no part. */
final class MeanAmplitude implements Measure {

    @Override
    public String name() {
        return "mean";
    }

    @Override
    public String unit(Unit dataUnit) {
        return dataUnit.symbol();
    }

    @Override
    public String description() {
        return "mean amplitude over the window";
    }

    @Override
    public Score score(Trace t, MeasureSettings settings) {
        // the sum comes from the window's one pass shared with the area and the peaks
        return Score.of(t.windowMean());
    }
}
