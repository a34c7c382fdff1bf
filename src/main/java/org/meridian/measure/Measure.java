package org.meridian.measure;

import org.meridian.core.Unit;

/**
 * A scalar score of a wave in a time window (DESIGN §6.3). Implementations are stateless and
 * registered in {@link Measures}; see DEVELOPERS.md, "How to add a measure".
 */
public interface Measure {

    /** The name on the command line and in the table's {@code measure} column, e.g. {@code peak}. */
    String name();

    /** The unit of the scores, given the unit of the data: µV, ms, µV·ms … */
    String unit(Unit dataUnit);

    /** One sentence for help texts. */
    String description();

    /**
     * Rejects settings the measure cannot use (e.g. a signed peak) before any work is done.
     *
     * @throws org.meridian.core.BadInputException naming the measure and the setting
     */
    default void check(MeasureSettings settings) {
    }

    /**
     * How many samples beyond each end of the window the measure reads (0: only the window).
     * The trace handed to {@link #score} holds at least this many samples on each side where
     * the data has them, and its ends are the data's ends only where the data ends there.
     */
    default int reachSamples(MeasureSettings settings, double rateHz) {
        return 0;
    }

    /** Scores one wave in its window. Must not change the trace's values. */
    Score score(Trace trace, MeasureSettings settings);
}
