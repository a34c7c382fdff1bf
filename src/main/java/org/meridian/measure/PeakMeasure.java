package org.meridian.measure;

import org.meridian.core.BadInputException;
import org.meridian.core.Unit;

/**
 * {@code peak} and {@code peak-latency}: the most positive (or, for negative polarity, most
 * negative) sample in the window, and its time. On ties the earliest sample wins.
 */
final class PeakMeasure implements Measure {
    private final boolean latency;

    PeakMeasure(boolean latency) {
        this.latency = latency;
    }

    @Override
    public String name() {
        return latency ? "peak-latency" : "peak";
    }

    @Override
    public String unit(Unit dataUnit) {
        return latency ? "ms" : dataUnit.symbol();
    }

    @Override
    public String description() {
        return latency ? "time of the largest sample of the chosen polarity"
                : "largest sample of the chosen polarity (most positive or most negative)";
    }

    @Override
    public void check(MeasureSettings settings) {
        requirePeakPolarity(name(), settings);
    }

    @Override
    public Score score(Trace t, MeasureSettings settings) {
        int i = t.extremeIndex(settings.polarity());
        return Score.of(latency ? t.timeMs(i) : t.values()[i]);
    }

    /** Peaks are positive or negative; a signed peak means nothing. */
    static void requirePeakPolarity(String measure, MeasureSettings settings) {
        if (settings.polarity() == Polarity.SIGNED) {
            throw new BadInputException("measure " + measure + " needs polarity pos or neg;"
                    + " signed applies only to area and frac-area-latency");
        }
    }
}
