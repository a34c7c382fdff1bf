package org.meridian.signal;

import java.util.Set;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;

/**
 * A wave that every participant of a study has: a loaded condition, a contrast of conditions
 * ({@link ConditionExpression}) or a lateralised wave ({@link LateralisedWave}). Derived waves
 * are computed for each participant first and averaged afterwards, so grand averages, intervals
 * and the jackknife all see the same per-participant waves.
 */
public interface ConditionWave {

    /** The name shown in tables and legends, e.g. {@code rare - common}. */
    String name();

    /** This wave for one participant (index into {@link Study#participants()}). */
    Waveforms forParticipant(Study study, int participant);

    /**
     * The weight of a participant in a trial-weighted grand average, or a negative number when
     * the study lacks the trial counts it needs.
     */
    double trialWeight(Study study, int participant);

    /** The grand average of this wave over the participants not excluded. */
    default Waveforms grandAverage(Study study, GrandAverage.Weighting weighting, Set<String> excluded) {
        return GrandAverage.of(study, this, weighting, excluded);
    }

    /** The unweighted grand average over all participants. */
    default Waveforms grandAverage(Study study) {
        return grandAverage(study, GrandAverage.Weighting.UNWEIGHTED, Set.of());
    }
}
