package org.meridian.signal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import org.apache.commons.math3.distribution.TDistribution;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;

/**
 * A confidence band around a grand average: at every channel and sample, the mean over N
 * participants and the half-width h of a two-sided interval at the given level (0.95 by
 * default), so the band is mean ± h. Immutable.
 *
 * <p><b>Across participants</b>: h = t(1 − α/2; N − 1) · s / √N, with s the sample standard
 * deviation over participants (Student's t-interval).
 *
 * <p><b>Within participants</b> (for conditions shown together, e.g. the two sides of a
 * contrast): each participant's values are first centred on that participant's mean over the J
 * conditions and the grand mean added back, y_ij = x_ij − x̄_i + x̄ (Cousineau, 2005), which
 * removes the between-participant spread that a within-participant comparison does not see. The
 * variance of y is then multiplied by J / (J − 1) (Morey, 2008), because the centring shrinks it
 * by (J − 1)/J: h = t(1 − α/2; N − 1) · s_y · √(J / (J − 1)) / √N. For J = 2 this is the
 * t-interval of the difference divided by √2.
 *
 * <p>Bands are unweighted: every participant counts once.
 */
public record ConfidenceBand(String name, Waveforms mean, Waveforms halfWidth, double level,
        int participants) {

    public static final double DEFAULT_LEVEL = 0.95;

    public ConfidenceBand {
        String diff = mean.describeLayoutDifference(halfWidth);
        if (diff != null) {
            throw new IllegalArgumentException("mean and half-width have " + diff);
        }
        requireLevel(level);
    }

    /** mean − half-width. */
    public Waveforms lower() {
        return offset(-1);
    }

    /** mean + half-width. */
    public Waveforms upper() {
        return offset(1);
    }

    private Waveforms offset(int sign) {
        float[] m = mean.copyValues();
        float[] h = halfWidth.copyValues();
        for (int i = 0; i < m.length; i++) {
            m[i] += sign * h[i];
        }
        return Waveforms.wrap(mean.labels(), mean.axis(), mean.unit(), m);
    }

    /** The two-sided Student t quantile t(1 − α/2; df) for a confidence level 1 − α. */
    public static double tQuantile(double level, int degreesOfFreedom) {
        requireLevel(level);
        if (degreesOfFreedom < 1) {
            throw new BadInputException("a t-interval needs at least two participants");
        }
        return new TDistribution(null, degreesOfFreedom).inverseCumulativeProbability(0.5 + level / 2);
    }

    /** The t-interval across the participants not excluded. */
    public static ConfidenceBand acrossParticipants(Study study, ConditionWave wave, double level,
            Set<String> excluded) {
        List<Waveforms> waves = included(study, wave, excluded);
        int n = waves.size();
        Waveforms first = waves.get(0);
        int size = first.channelCount() * first.sampleCount();
        double[] sum = new double[size];
        double[] sumSq = new double[size];
        for (Waveforms w : waves) {
            accumulate(w, sum, sumSq, null, 0);
        }
        return band(wave.name(), first, sum, sumSq, n, tQuantile(level, n - 1), level);
    }

    /**
     * Cousineau–Morey within-participant bands for J ≥ 2 waves shown together, one band per wave
     * in the given order.
     */
    public static List<ConfidenceBand> withinParticipants(Study study, List<? extends ConditionWave> waves,
            double level, Set<String> excluded) {
        int j = waves.size();
        if (j < 2) {
            throw new BadInputException("a within-participant interval needs at least two conditions");
        }
        List<List<Waveforms>> byWave = new ArrayList<>();
        for (ConditionWave w : waves) {
            byWave.add(included(study, w, excluded));
        }
        Waveforms first = byWave.get(0).get(0);
        for (List<Waveforms> list : byWave) {
            String diff = first.describeLayoutDifference(list.get(0));
            if (diff != null) {
                throw new BadInputException("cannot show " + waves.get(0).name() + " and "
                        + waves.get(byWave.indexOf(list)).name() + " together: they have " + diff);
            }
        }
        int n = byWave.get(0).size();
        int size = first.channelCount() * first.sampleCount();
        double t = tQuantile(level, n - 1);
        double morey = Math.sqrt(j / (j - 1.0));
        List<double[]> sums = new ArrayList<>();
        List<double[]> sumSqs = new ArrayList<>();
        for (int k = 0; k < j; k++) {
            sums.add(new double[size]);
            sumSqs.add(new double[size]);
        }
        double[] participantMean = new double[size];
        for (int p = 0; p < n; p++) {
            Arrays.fill(participantMean, 0);
            for (int k = 0; k < j; k++) {
                float[] v = byWave.get(k).get(p).copyValues();
                for (int i = 0; i < size; i++) {
                    participantMean[i] += v[i] / (double) j;
                }
            }
            for (int k = 0; k < j; k++) {
                accumulate(byWave.get(k).get(p), sums.get(k), sumSqs.get(k), participantMean, 1);
            }
        }
        List<ConfidenceBand> out = new ArrayList<>();
        for (int k = 0; k < j; k++) {
            // the centred values' mean is the wave's own mean less the grand mean; add it back
            ConfidenceBand centred = band(waves.get(k).name(), first, sums.get(k), sumSqs.get(k), n,
                    t * morey, level);
            out.add(new ConfidenceBand(waves.get(k).name(),
                    waves.get(k).grandAverage(study, GrandAverage.Weighting.UNWEIGHTED, excluded),
                    centred.halfWidth, level, n));
        }
        return out;
    }

    private static List<Waveforms> included(Study study, ConditionWave wave, Set<String> excluded) {
        List<Waveforms> out = new ArrayList<>();
        for (int p = 0; p < study.participants().size(); p++) {
            if (!GrandAverage.isExcluded(study.participants().get(p), excluded)) {
                out.add(wave.forParticipant(study, p));
            }
        }
        if (out.size() < 2) {
            throw new BadInputException("an interval across participants needs at least two "
                    + "participants, and " + out.size() + " " + (out.size() == 1 ? "is" : "are") + " left");
        }
        return out;
    }

    /** Adds w − centre·subtracted (centre may be null) to running sums of values and squares. */
    private static void accumulate(Waveforms w, double[] sum, double[] sumSq, double[] centre,
            double subtracted) {
        int n = w.sampleCount();
        for (int c = 0; c < w.channelCount(); c++) {
            for (int s = 0; s < n; s++) {
                int i = c * n + s;
                double v = w.value(c, s) - (centre == null ? 0 : subtracted * centre[i]);
                sum[i] += v;
                sumSq[i] += v * v;
            }
        }
    }

    private static ConfidenceBand band(String name, Waveforms layout, double[] sum, double[] sumSq,
            int n, double factor, double level) {
        float[] mean = new float[sum.length];
        float[] half = new float[sum.length];
        for (int i = 0; i < sum.length; i++) {
            double m = sum[i] / n;
            double var = Math.max(0, (sumSq[i] - n * m * m) / (n - 1));
            mean[i] = (float) m;
            half[i] = (float) (factor * Math.sqrt(var / n));
        }
        return new ConfidenceBand(name, Waveforms.wrap(layout.labels(), layout.axis(), layout.unit(), mean),
                Waveforms.wrap(layout.labels(), layout.axis(), layout.unit(), half), level, n);
    }

    private static void requireLevel(double level) {
        if (!(level > 0 && level < 1)) {
            throw new BadInputException("confidence level must lie between 0 and 1, got " + level);
        }
    }
}
