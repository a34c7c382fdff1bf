package org.meridian.signal;

import java.util.Set;
import java.util.function.IntFunction;
import java.util.function.IntToDoubleFunction;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;

/**
 * The grand average of one condition over participants: the unweighted mean by default, or the
 * mean weighted by each participant's trial count. Participants can be left out by name.
 * Derived waves ({@link ConditionWave}) are computed per participant, then averaged.
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
     * The grand average of a loaded or derived wave; its trial weights come from
     * {@link ConditionWave#trialWeight}.
     */
    public static Waveforms of(Study study, ConditionWave wave, Weighting weighting, Set<String> excluded) {
        return average(study, p -> wave.forParticipant(study, p), weighting, excluded,
                p -> wave.trialWeight(study, p));
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
        return average(study, perParticipant, weighting, excluded, p -> trials.apply(p));
    }

    /** Whether a participant is among the excluded names (ignoring case). */
    public static boolean isExcluded(String participant, Set<String> excluded) {
        return excluded.stream().anyMatch(participant::equalsIgnoreCase);
    }

    /**
     * The weight of each participant (0 for excluded ones), checked: every included participant
     * needs a trial count under {@link Weighting#TRIALS}, and the weights must not add up to 0.
     */
    public static double[] weights(Study study, Weighting weighting, Set<String> excluded,
            IntToDoubleFunction trials) {
        for (String name : excluded) {
            if (study.participantIndex(name) < 0) {
                throw new BadInputException("cannot exclude participant " + name + ": "
                        + study.name() + " has no such participant");
            }
        }
        double[] w = new double[study.participants().size()];
        double total = 0;
        int included = 0;
        for (int p = 0; p < w.length; p++) {
            String name = study.participants().get(p);
            if (isExcluded(name, excluded)) {
                continue;
            }
            included++;
            w[p] = 1;
            if (weighting == Weighting.TRIALS) {
                double t = trials.applyAsDouble(p);
                if (t < 0) {
                    throw new BadInputException("a trial-weighted grand average needs trial counts, "
                            + "and participant " + name + " has none in " + study.name());
                }
                w[p] = t;
            }
            total += w[p];
        }
        if (included == 0) {
            throw new BadInputException("no participants left for the grand average");
        }
        if (!(total > 0)) {
            throw new BadInputException("the trial counts of " + study.name() + " add up to zero");
        }
        return w;
    }

    private static Waveforms average(Study study, IntFunction<Waveforms> perParticipant,
            Weighting weighting, Set<String> excluded, IntToDoubleFunction trials) {
        double[] weight = weights(study, weighting, excluded, trials);
        double[] sum = null;
        double totalWeight = 0;
        Waveforms first = null;
        for (int p = 0; p < weight.length; p++) {
            if (GrandAverage.isExcluded(study.participants().get(p), excluded)) {
                continue;
            }
            double w = weight[p];
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
        float[] out = new float[sum.length];
        for (int i = 0; i < sum.length; i++) {
            out[i] = (float) (sum[i] / totalWeight);
        }
        return Waveforms.wrap(first.labels(), first.axis(), first.unit(), out);
    }
}
