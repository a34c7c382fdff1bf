package org.meridian.signal;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;
import org.meridian.montage.Labels;

/**
 * A lateralised wave: contralateral minus ipsilateral activity over each homologous pair of
 * channels (F3/F4, PO7/PO8, …; {@link Labels#homologue}), the kind of wave behind the N2pc and
 * the lateralised readiness potential. The result has one channel per pair, under the pair's
 * right-hemisphere label (the even number); midline channels and channels whose homologue is not
 * in the data are left out.
 *
 * <p>For a pair (L, R), with A the condition whose stimulus (or response) was in the left
 * hemifield and B the one in the right hemifield:
 * <ul>
 * <li>one condition in the left hemifield: A(R) − A(L);</li>
 * <li>one condition in the right hemifield: B(L) − B(R);</li>
 * <li>the pair: ½ · [(A(R) − A(L)) + (B(L) − B(R))], the mean of both sides, which cancels any
 *     hemispheric asymmetry common to both conditions (Coles, 1989, for the readiness
 *     potential; Luck &amp; Hillyard, 1994, for the N2pc).</li>
 * </ul>
 * Either side may itself be a contrast. Computed for each participant, then averaged.
 */
public final class LateralisedWave implements ConditionWave {

    /** The side of the visual field (or the responding hand) of a condition. */
    public enum Hemifield {
        LEFT, RIGHT
    }

    private final ConditionWave leftHemifield;
    private final ConditionWave rightHemifield;

    private LateralisedWave(ConditionWave leftHemifield, ConditionWave rightHemifield) {
        if (leftHemifield == null && rightHemifield == null) {
            throw new IllegalArgumentException("a lateralised wave needs at least one condition");
        }
        this.leftHemifield = leftHemifield;
        this.rightHemifield = rightHemifield;
    }

    /** Both sides: the condition with left-hemifield stimuli and the one with right. */
    public static LateralisedWave of(ConditionWave leftHemifield, ConditionWave rightHemifield) {
        return new LateralisedWave(Objects.requireNonNull(leftHemifield),
                Objects.requireNonNull(rightHemifield));
    }

    /** One condition whose stimuli were in the given hemifield. */
    public static LateralisedWave single(ConditionWave wave, Hemifield hemifield) {
        Objects.requireNonNull(wave);
        return hemifield == Hemifield.LEFT ? new LateralisedWave(wave, null)
                : new LateralisedWave(null, wave);
    }

    public Optional<ConditionWave> leftHemifield() {
        return Optional.ofNullable(leftHemifield);
    }

    public Optional<ConditionWave> rightHemifield() {
        return Optional.ofNullable(rightHemifield);
    }

    /** E.g. {@code contra-ipsi(left: targetL, right: targetR)}. */
    @Override
    public String name() {
        List<String> parts = new ArrayList<>();
        if (leftHemifield != null) {
            parts.add("left: " + leftHemifield.name());
        }
        if (rightHemifield != null) {
            parts.add("right: " + rightHemifield.name());
        }
        return "contra-ipsi(" + String.join(", ", parts) + ")";
    }

    /** The homologous pairs in a channel list: {left label, right label}, in data order. */
    public static List<String[]> pairs(List<String> labels) {
        List<String[]> out = new ArrayList<>();
        for (String right : labels) {
            if (Labels.side(right) <= 0 || Labels.isMidline(right)) {
                continue;
            }
            Optional<String> left = Labels.homologue(right);
            if (left.isEmpty()) {
                continue;
            }
            for (String l : labels) {
                if (l.equalsIgnoreCase(left.get())) {
                    out.add(new String[] {l, right});
                }
            }
        }
        return out;
    }

    /** The lateralised wave of given waveforms of each side (either may be null, not both). */
    public Waveforms compute(Waveforms left, Waveforms right) {
        Waveforms any = left != null ? left : right;
        if (left != null && right != null) {
            String diff = left.describeLayoutDifference(right);
            if (diff != null) {
                throw new BadInputException("the two sides of " + name() + " have " + diff);
            }
        }
        List<String[]> pairs = pairs(any.labels());
        if (pairs.isEmpty()) {
            throw new BadInputException("no left/right homologous channel pairs (such as P7 and "
                    + "P8) in the data, so there is no lateralised wave");
        }
        int n = any.sampleCount();
        List<String> labels = new ArrayList<>();
        float[] out = new float[pairs.size() * n];
        double scale = left != null && right != null ? 0.5 : 1;
        for (int p = 0; p < pairs.size(); p++) {
            int l = any.requireIndex(pairs.get(p)[0]);
            int r = any.requireIndex(pairs.get(p)[1]);
            labels.add(pairs.get(p)[1]);
            for (int s = 0; s < n; s++) {
                double v = 0;
                if (left != null) {
                    v += left.value(r, s) - left.value(l, s);
                }
                if (right != null) {
                    v += right.value(l, s) - right.value(r, s);
                }
                out[p * n + s] = (float) (scale * v);
            }
        }
        return Waveforms.wrap(labels, any.axis(), any.unit(), out);
    }

    @Override
    public Waveforms forParticipant(Study study, int participant) {
        return compute(leftHemifield == null ? null : leftHemifield.forParticipant(study, participant),
                rightHemifield == null ? null : rightHemifield.forParticipant(study, participant));
    }

    /**
     * Inverse noise variance of the lateralised wave, from the sides' own weights: each side is a
     * difference of two channels with the side's noise, so the weight is 1 / Σ (s² · 2 / w_side),
     * with s = ½ for the pair and 1 for one side; relative weights are what matter.
     */
    @Override
    public double trialWeight(Study study, int participant) {
        double scale = leftHemifield != null && rightHemifield != null ? 0.5 : 1;
        double variance = 0;
        for (ConditionWave side : new ConditionWave[] {leftHemifield, rightHemifield}) {
            if (side == null) {
                continue;
            }
            double w = side.trialWeight(study, participant);
            if (w < 0) {
                return -1;
            }
            if (w == 0) {
                return 0;
            }
            variance += scale * scale * 2 / w;
        }
        return 1 / variance;
    }

    @Override
    public String toString() {
        return name();
    }
}
