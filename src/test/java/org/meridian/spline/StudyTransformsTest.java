package org.meridian.spline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.Electrode;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.montage.ChannelPositions;
import org.meridian.montage.StandardSystem;
import org.meridian.spline.TestFields.Field;

/** CSD and channel repair of whole studies. */
class StudyTransformsTest {
    private static final TimeAxis AXIS = new TimeAxis(-100, 250, 50);
    private static final double R = 0.1;

    /**
     * A study on the 10-10 positions plus one unpositioned channel (VEOG): two participants, two
     * conditions, each channel the field {@code f} times a time course that differs per cell.
     */
    private static Study study(Field f) {
        List<String> labels = new ArrayList<>(StandardSystem.TEN_TEN.montage().labels());
        labels.add("VEOG");
        ChannelPositions.Resolution where = ChannelPositions.resolve(labels, null);
        Study.Builder b = Study.builder("test study").montage(where.montage()).placements(where.placements());
        int cell = 0;
        for (String p : List.of("p01", "p02")) {
            for (String c : List.of("rare", "common")) {
                cell++;
                float[] v = new float[labels.size() * AXIS.samples()];
                for (int ch = 0; ch < labels.size(); ch++) {
                    double spatial = ch < labels.size() - 1
                            ? f.at(where.montage().electrodes().get(ch)) : 123.0;
                    for (int s = 0; s < AXIS.samples(); s++) {
                        v[ch * AXIS.samples() + s] = (float) (spatial * Math.sin(0.1 * s * cell));
                    }
                }
                b.add(p, c, new Waveforms(labels, AXIS, Unit.MICROVOLT, v), 40 + cell);
            }
        }
        return b.build();
    }

    @Test
    void csdOfAStudyHasThePositionedChannelsInMicrovoltsPerSquareMetre() {
        Field y = (x, yy, z) -> 8 * (x * yy);
        Study csd = SurfaceLaplacian.of(study(y), SplineParameters.defaults().withLambda(0));
        assertThat(csd.unit()).isEqualTo(Unit.MICROVOLT_PER_SQUARE_METRE);
        assertThat(csd.channelLabels()).doesNotContain("VEOG").hasSize(StandardSystem.TEN_TEN.montage().size());
        assertThat(csd.unpositionedChannels()).isEmpty();
        assertThat(csd.placements()).allMatch(p -> p.positioned());
        assertThat(csd.participants()).containsExactly("p01", "p02");
        assertThat(csd.trials(1, 1).getAsInt()).isEqualTo(44);
        Waveforms w = csd.waveforms(1, 0);
        int cz = w.requireIndex("C3");
        Electrode c3 = StandardSystem.TEN_TEN.montage().find("C3").orElseThrow();
        int sample = 7;
        double course = Math.sin(0.1 * sample * 3);
        // xy is a degree-2 harmonic: CSD = +2·3·Y/R² (Laplace–Beltrami eigenvalue identity)
        double expected = 6 * 8 * c3.x() * c3.y() * course / (R * R);
        assertThat((double) w.value(cz, sample)).isCloseTo(expected, within(0.01 * 6 * 8 / (R * R)));
    }

    @Test
    void csdOfCsdIsRefused() {
        Study csd = SurfaceLaplacian.of(study((x, y, z) -> z), SplineParameters.defaults());
        assertThatThrownBy(() -> SurfaceLaplacian.of(csd, SplineParameters.defaults()))
                .isInstanceOf(BadInputException.class).hasMessageContaining("already CSD");
    }

    /** Worst error reached over the repaired channels: 0.12 % of the field's range at λ = 1e-5. */
    @Test
    void repairOfChannelsInADegreeTwoHarmonicFieldRecoversTheField() {
        Field quadrupole = (x, y, z) -> 10 * (3 * z * z - 1) / 2 + 6 * x * y;
        Study original = study(quadrupole);
        List<String> bad = List.of("C3", "pz", "FC6");
        // a broken recording: the bad channels hold rubbish
        Study broken = original.mapWaveforms("broken", (p, c) -> {
            Waveforms w = original.waveforms(p, c);
            float[] v = w.copyValues();
            for (String l : bad) {
                int row = w.requireIndex(l);
                java.util.Arrays.fill(v, row * w.sampleCount(), (row + 1) * w.sampleCount(), 999f);
            }
            return w.withValues(w.unit(), v);
        });
        Study repaired = ChannelRepair.of(broken, bad, SplineParameters.defaults());
        double range = 10 + 6;
        double worst = 0;
        for (int p = 0; p < 2; p++) {
            for (int c = 0; c < 2; c++) {
                Waveforms got = repaired.waveforms(p, c);
                Waveforms want = original.waveforms(p, c);
                for (int ch = 0; ch < want.channelCount(); ch++) {
                    boolean isBad = bad.stream().anyMatch(want.label(ch)::equalsIgnoreCase);
                    for (int s = 0; s < want.sampleCount(); s++) {
                        if (isBad) {
                            worst = Math.max(worst, Math.abs(got.value(ch, s) - want.value(ch, s)));
                        } else {
                            assertThat(got.value(ch, s)).isEqualTo(want.value(ch, s));
                        }
                    }
                }
            }
        }
        // spherical spline interpolation of a smooth field (Perrin et al., 1989): within 0.15 %
        // of the field's range (the λ = 1e-5 smoothing and the 10-10 spacing set the error)
        assertThat(worst / range).isLessThan(1.5e-3);
    }

    @Test
    void repairRefusesUnknownUnpositionedAndTooManyChannels() {
        Study s = study((x, y, z) -> z);
        assertThatThrownBy(() -> ChannelRepair.of(s, List.of("Xx9"), SplineParameters.defaults()))
                .isInstanceOf(BadInputException.class).hasMessage("test study has no channel Xx9 to repair");
        assertThatThrownBy(() -> ChannelRepair.of(s, List.of("VEOG"), SplineParameters.defaults()))
                .isInstanceOf(BadInputException.class).hasMessage("channel VEOG has no position, so it cannot be repaired");
        List<String> almostAll = new ArrayList<>(s.montage().labels());
        almostAll.remove(0);
        almostAll.remove(0);
        assertThatThrownBy(() -> ChannelRepair.of(s, almostAll, SplineParameters.defaults()))
                .isInstanceOf(BadInputException.class).hasMessageContaining("leaves 2 to interpolate from");
    }
}
