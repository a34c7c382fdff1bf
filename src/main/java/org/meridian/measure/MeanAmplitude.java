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
        // two running sums halve the chain of dependent additions
        double even = 0;
        double odd = 0;
        int i = t.from();
        for (; i + 1 <= t.to(); i += 2) {
            even += x[i];
            odd += x[i + 1];
        }
        if (i == t.to()) {
            even += x[i];
        }
        return Score.of((even + odd) / (t.to() - t.from() + 1));
    }
}
