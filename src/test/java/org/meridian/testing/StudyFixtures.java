package org.meridian.testing;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;

/** Small invented studies and waves for tests (round trips and closed-form checks only). */
public final class StudyFixtures {
    private StudyFixtures() {
    }

    /** Waveforms whose channel c is f_c(t) for t in ms. */
    public static Waveforms waves(List<String> labels, TimeAxis axis, List<DoubleUnaryOperator> f) {
        int n = axis.samples();
        float[] v = new float[labels.size() * n];
        for (int c = 0; c < labels.size(); c++) {
            for (int s = 0; s < n; s++) {
                v[c * n + s] = (float) f.get(c).applyAsDouble(axis.timeMs(s));
            }
        }
        return Waveforms.wrap(labels, axis, Unit.MICROVOLT, v);
    }

    /** One channel, f(t). */
    public static Waveforms wave(String label, TimeAxis axis, DoubleUnaryOperator f) {
        return waves(List.of(label), axis, List.of(f));
    }

    /**
     * A study of pseudo-random waveforms: participants p01…, the given conditions and channels,
     * values from a fixed linear congruential sequence (seeded), so tests are repeatable.
     */
    public static Study randomStudy(int participants, List<String> conditions, List<String> labels,
            TimeAxis axis, long seed) {
        Study.Builder b = Study.builder("test study");
        java.util.Random random = new java.util.Random(seed);
        int n = axis.samples();
        for (int p = 0; p < participants; p++) {
            for (int c = 0; c < conditions.size(); c++) {
                float[] v = new float[labels.size() * n];
                for (int i = 0; i < v.length; i++) {
                    v[i] = (float) (random.nextGaussian() * 3 + c);
                }
                b.add(participant(p), conditions.get(c),
                        Waveforms.wrap(labels, axis, Unit.MICROVOLT, v), 20 + random.nextInt(60));
            }
        }
        return b.build();
    }

    public static String participant(int p) {
        return String.format("p%02d", p + 1);
    }
}
