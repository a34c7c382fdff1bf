package org.meridian.measure;

import java.util.Objects;
import org.meridian.core.BadInputException;

/**
 * The parameters shared by the measures of one request.
 *
 * @param polarity        positive or negative deflections, or the signed wave (areas only)
 * @param fraction        f of the fractional area and fractional peak latencies, 0 &lt; f ≤ 1
 * @param neighbourhoodMs the span on each side of a candidate that a local peak must exceed on
 *                        average (DESIGN §6.3: k samples equivalent to 20 ms by default)
 */
public record MeasureSettings(Polarity polarity, double fraction, double neighbourhoodMs) {
    public static final double DEFAULT_FRACTION = 0.5;
    public static final double DEFAULT_NEIGHBOURHOOD_MS = 20;

    public MeasureSettings {
        Objects.requireNonNull(polarity);
        if (!(fraction > 0 && fraction <= 1)) {
            throw new BadInputException("fraction must lie in (0, 1], got " + fraction);
        }
        if (!(neighbourhoodMs >= 0) || !Double.isFinite(neighbourhoodMs)) {
            throw new BadInputException("local-peak neighbourhood must be 0 ms or more, got "
                    + neighbourhoodMs);
        }
    }

    /** Positive polarity, f = 0.5, 20 ms neighbourhood. */
    public static MeasureSettings defaults() {
        return new MeasureSettings(Polarity.POSITIVE, DEFAULT_FRACTION, DEFAULT_NEIGHBOURHOOD_MS);
    }

    public MeasureSettings withPolarity(Polarity p) {
        return new MeasureSettings(p, fraction, neighbourhoodMs);
    }

    public MeasureSettings withFraction(double f) {
        return new MeasureSettings(polarity, f, neighbourhoodMs);
    }

    public MeasureSettings withNeighbourhoodMs(double ms) {
        return new MeasureSettings(polarity, fraction, ms);
    }

    /** The neighbourhood in samples at a sampling rate: round(ms · rate / 1000), at least 1. */
    public int neighbourhoodSamples(double rateHz) {
        return (int) Math.max(1, Math.round(neighbourhoodMs * rateHz / 1000));
    }
}
