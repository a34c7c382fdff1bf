package org.meridian.measure;

import org.meridian.core.Unit;

/**
 * {@code frac-area-latency}: the time at which the running area of the chosen part of the wave
 * (see {@link AreaMeasure}), accumulated from the window start, first reaches the fraction f of
 * its total over the window. Between two samples the time is interpolated linearly in the
 * running area: with A_i &lt; f·A ≤ A_{i+1}, t = t_i + (f·A − A_i) / (A_{i+1} − A_i) · Δt.
 * For the signed wave the running area need not grow steadily; the first time it reaches f·A
 * (in the direction of the total's sign) counts. No area at all leaves the value empty. When
 * rounding leaves every step a hair short of f·A (typically f = 1, the total being summed in
 * another order), the time at which the running area first reached its largest value is
 * reported: for f = 1 the end of the last interval with area, not the window's end.
 */
final class FractionalAreaLatency implements Measure {

    @Override
    public String name() {
        return "frac-area-latency";
    }

    @Override
    public String unit(Unit dataUnit) {
        return "ms";
    }

    @Override
    public String description() {
        return "time at which the running area reaches the fraction f of the window's area";
    }

    @Override
    public Score score(Trace t, MeasureSettings settings) {
        Polarity polarity = settings.polarity();
        double total = t.area(polarity);
        if (total == 0) {
            return Score.empty("no " + (polarity == Polarity.SIGNED ? "net" : polarity == Polarity.POSITIVE
                    ? "positive" : "negative") + " area in the window; value left empty");
        }
        double direction = Math.signum(total);
        double target = settings.fraction() * total * direction;
        if (polarity != Polarity.SIGNED) {
            // the running area of one part never falls, so the search may skip the stretches that
            // end below the target; rounding can leave it short, and then the whole walk decides
            int start = t.areaSearchStart(polarity, direction, target);
            if (start > t.from()) {
                double found = search(t, polarity, direction, target, start,
                        direction * t.areaTo(start, polarity), false);
                if (!Double.isNaN(found)) {
                    return Score.of(found);
                }
            }
        }
        return Score.of(search(t, polarity, direction, target, t.from(), 0, true));
    }

    /**
     * The time at which direction × the running area, {@code running} at sample {@code start},
     * first reaches {@code target}; when it never does, the time at which it first reached its
     * largest value if {@code fallBack}, NaN otherwise.
     */
    private static double search(Trace t, Polarity polarity, double direction, double target,
            int start, double running, boolean fallBack) {
        double[] x = t.values();
        double dt = t.stepMs();
        // where the running area first reached its largest value: the answer when rounding
        // leaves every step a hair short of the target (f near 1, the total summed otherwise)
        double highest = 0;
        double highestAt = t.timeMs(t.to());
        for (int i = start; i < t.to(); i++) {
            double a = x[i];
            double b = x[i + 1];
            double piece = polarity == Polarity.SIGNED ? SegmentArea.signed(a, b, dt)
                    : polarity == Polarity.POSITIVE ? SegmentArea.positive(a, b, dt)
                    : SegmentArea.signed(a, b, dt) - SegmentArea.positive(a, b, dt);
            double next = running + direction * piece;
            if (next >= target) {
                double share = next == running ? 0 : (target - running) / (next - running);
                return t.timeMs(i) + Math.max(0, share) * dt;
            }
            running = next;
            if (running > highest) {
                highest = running;
                highestAt = t.timeMs(i + 1);
            }
        }
        return fallBack ? highestAt : Double.NaN;
    }
}
