package org.meridian.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.io.StudyWriter;
import org.meridian.montage.ChannelPositions;
import org.meridian.montage.StandardSystem;
import org.meridian.spline.TestFields.Field;

/**
 * A small study folder for the spline commands: two participants, conditions {@code rare} and
 * {@code common}, the 10-10 channels plus an unpositioned VEOG, 40 samples at 250 Hz from
 * −100 ms. Every positioned channel holds field(electrode) × amplitude × course(t), with the
 * course rising linearly from 0 at −100 ms to 1 at 56 ms; rare has amplitude 2, common 1.
 */
final class SplineCommandFixture {
    static final TimeAxis AXIS = new TimeAxis(-100, 250, 40);
    static final Montage TEN_TEN = StandardSystem.TEN_TEN.montage();

    private SplineCommandFixture() {
    }

    static double course(int sample) {
        return sample / 39.0;
    }

    static Study study(Field field) {
        List<String> labels = new ArrayList<>(TEN_TEN.labels());
        labels.add("VEOG");
        ChannelPositions.Resolution where = ChannelPositions.resolve(labels, null);
        Study.Builder b = Study.builder("fixture").montage(where.montage()).placements(where.placements());
        for (String p : List.of("p01", "p02")) {
            for (String c : List.of("rare", "common")) {
                double amplitude = c.equals("rare") ? 2 : 1;
                float[] v = new float[labels.size() * AXIS.samples()];
                for (int ch = 0; ch < labels.size(); ch++) {
                    for (int s = 0; s < AXIS.samples(); s++) {
                        double spatial = ch < TEN_TEN.size() ? field.at(TEN_TEN.electrodes().get(ch)) : 40;
                        v[ch * AXIS.samples() + s] = (float) (spatial * amplitude * course(s));
                    }
                }
                b.add(p, c, new Waveforms(labels, AXIS, Unit.MICROVOLT, v), 30);
            }
        }
        return b.build();
    }

    static Path write(Field field, Path folder) {
        StudyWriter.write(study(field), folder, new StudyWriter.Options(false, 6, false));
        return folder;
    }

    static Electrode electrode(String label) {
        return TEN_TEN.find(label).orElseThrow();
    }
}
