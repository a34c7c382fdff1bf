package org.meridian.io;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;

/** Invented studies for round-trip tests: random names, labels, axes and values. */
final class RandomStudies {
    /** Standard labels, an old alias and labels with no position (no two share a position). */
    static final List<String> LABELS = List.of("Fp1", "Fz", "Cz", "Pz", "Oz", "T3", "C3", "C4",
            "P3", "P4", "O1", "O2", "HEOG", "VEOG", "Mastoid_L", "fcz");
    static final List<String> CONDITIONS = List.of("rare", "common", "target 2", "go-nogo",
            "Früh", "A");
    static final double[] RATES = {100, 200, 250, 256, 300, 500, 512, 1000, 1024};

    private RandomStudies() {
    }

    static Study study(Random r, int maxParticipants, int maxConditions, Unit unit) {
        int np = 1 + r.nextInt(maxParticipants);
        int nc = 1 + r.nextInt(maxConditions);
        List<String> labels = new ArrayList<>(LABELS);
        Collections.shuffle(labels, r);
        labels = labels.subList(0, 1 + r.nextInt(6));
        List<String> conditions = new ArrayList<>(CONDITIONS);
        Collections.shuffle(conditions, r);
        TimeAxis axis = axis(r);
        double scale = Math.pow(10, r.nextInt(5) - 2);
        Study.Builder b = Study.builder("random");
        for (int p = 0; p < np; p++) {
            for (int c = 0; c < nc; c++) {
                float[] v = new float[labels.size() * axis.samples()];
                for (int i = 0; i < v.length; i++) {
                    v[i] = (float) (r.nextGaussian() * 20 * scale);
                }
                int trials = r.nextInt(4) == 0 ? -1 : r.nextInt(80);
                b.add(String.format("p%02d", p + 1), conditions.get(c),
                        Waveforms.wrap(labels, axis, unit, v), trials);
            }
        }
        return b.build();
    }

    static TimeAxis axis(Random r) {
        double rate = RATES[r.nextInt(RATES.length)];
        int samples = 2 + r.nextInt(14);
        double first = (r.nextInt(61) - 50) * 1000.0 / rate;
        return new TimeAxis(first, rate, samples);
    }
}
