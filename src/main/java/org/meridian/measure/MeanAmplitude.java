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
        double[] x = t.values();
        double sum = 0;
        for (int i = t.from(); i <= t.to(); i++) {
            sum += x[i];
        }
        return Score.of(sum / (t.to() - t.from() + 1));
    }
}
