package org.meridian.signal;

import java.util.Set;
import java.util.function.IntFunction;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;

/**
 * The grand average of one condition over participants: the unweighted mean by default, or the
 * mean weighted by each participant's trial count. Participants can be left out by name.
 */
public final class GrandAverage {
    private GrandAverage() {
    }

    public enum Weighting {
        /** Every participant counts once. */
        UNWEIGHTED,
        /** Each participant counts by its trial count (all cells must have one). */
        TRIALS
    }

    /** The unweighted grand average of a loaded condition over all participants. */
    public static Waveforms of(Study study, int condition) {
        return of(study, p -> study.waveforms(p, condition), Weighting.UNWEIGHTED, Set.of(),
                p -> study.trials(p, condition).orElse(-1));
    }

    /**
     * The grand average of per-participant waveforms (a loaded condition or a derived one).
     *
     * @param perParticipant the waveforms of participant {@code p}
     * @param weighting      unweighted or trial-weighted
     * @param excluded       participant names to leave out (ignoring case)
     * @param trials         the trial count behind participant {@code p}'s waveforms, -1 if unknown
     */
    public static Waveforms of(Study study, IntFunction<Waveforms> perParticipant,
            Weighting weighting, Set<String> excluded, IntFunction<Integer> trials) {
        double[] sum = null;
        double totalWeight = 0;
        Waveforms first = null;
        for (int p = 0; p < study.participants().size(); p++) {
            String name = study.participants().get(p);
            if (excluded.stream().anyMatch(name::equalsIgnoreCase)) {
                continue;
            }
            double w = 1;
            if (weighting == Weighting.TRIALS) {
                int t = trials.apply(p);
                if (t < 0) {
                    throw new BadInputException("a trial-weighted grand average needs trial counts, "
                            + "and participant " + name + " has none in " + study.name());
                }
                w = t;
            }
            Waveforms wf = perParticipant.apply(p);
            if (first == null) {
                first = wf;
                sum = new double[wf.channelCount() * wf.sampleCount()];
            }
            int n = wf.sampleCount();
            for (int c = 0; c < wf.channelCount(); c++) {
                for (int s = 0; s < n; s++) {
                    sum[c * n + s] += w * wf.value(c, s);
                }
            }
            totalWeight += w;
        }
        if (first == null) {
            throw new BadInputException("no participants left for the grand average");
        }
        if (!(totalWeight > 0)) {
            throw new BadInputException("the trial counts of " + study.name() + " add up to zero");
        }
        float[] out = new float[sum.length];
        for (int i = 0; i < sum.length; i++) {
            out[i] = (float) (sum[i] / totalWeight);
        }
        return Waveforms.wrap(first.labels(), first.axis(), first.unit(), out);
    }
}
