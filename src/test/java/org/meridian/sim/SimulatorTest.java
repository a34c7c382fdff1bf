package org.meridian.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.meridian.core.ChannelPlacement;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.montage.StandardSystem;

class SimulatorTest {
    private static final Montage MONTAGE = StandardSystem.TEN_TWENTY.montage();
    private static final TimeAxis AXIS = new TimeAxis(-100, 250, 150);
    private static final SphereHeadModel HEAD = SphereHeadModel.standard();
    private static final List<ConditionSpec> ONE_CONDITION = List.of(new ConditionSpec("a", 40, 1));

    private static final Source RADIAL = new Source("radial", new Vector3(0, -0.02, 0.055),
            new Vector3(0, -0.02, 0.055), List.of(new SourceComponent(100, 200, 250, 20)),
            Map.of("a", 1.0), Variability.NONE);
    private static final Source TANGENTIAL = new Source("tangential", new Vector3(0.04, 0.01, 0.03),
            new Vector3(0, 1, 0.2), List.of(new SourceComponent(50, 120, 150, -15)),
            Map.of("a", 1.0), Variability.NONE);

    private static Scenario scenario(List<Source> sources, NoiseModel noise, int participants) {
        return new Scenario("test", MONTAGE, AXIS, HEAD, ONE_CONDITION, sources, participants, noise);
    }

    @Test
    void aSingleFixedSourceGivesItsClosedFormMapTimesItsWaveform() {
        Study study = Simulator.simulate(scenario(List.of(TANGENTIAL), NoiseModel.NONE, 2), 1).study();
        Waveforms w = study.waveforms(1, 0);
        assertThat(w.unit()).isEqualTo(Unit.MICROVOLT);
        double[] map = new double[MONTAGE.size()];
        for (int c = 0; c < map.length; c++) {
            Electrode e = MONTAGE.electrodes().get(c);
            // closed form for the homogeneous sphere (Frank 1952; Brody, Terry & Ideker 1973), from memory
            map[c] = HomogeneousSphereClosedForm.potential(HEAD.radiusM(), HEAD.conductivitySPerM(),
                    TANGENTIAL.positionM(), TANGENTIAL.orientation(), new Vector3(e.x(), e.y(), e.z()));
        }
        double mean = java.util.Arrays.stream(map).average().orElseThrow();
        for (int s = 0; s < AXIS.samples(); s++) {
            double m = TANGENTIAL.momentAt(AXIS.timeMs(s));
            for (int c = 0; c < map.length; c++) {
                // average reference: subtract the mean over channels (definition)
                assertThat((double) w.value(c, s)).isCloseTo((map[c] - mean) * m, within(1e-5 + 1e-6 * Math.abs(m * map[c])));
            }
        }
    }

    @Test
    void twoSourcesGiveTheSumOfTheirMaps() {
        Variability spread = new Variability(0.3, 15, 6, 12);
        Source a = RADIAL.withVariability(spread);
        Source b = TANGENTIAL.withVariability(spread);
        Study both = Simulator.simulate(scenario(List.of(a, b), NoiseModel.NONE, 3), 8).study();
        Study onlyA = Simulator.simulate(scenario(List.of(a), NoiseModel.NONE, 3), 8).study();
        Study onlyB = Simulator.simulate(scenario(List.of(b), NoiseModel.NONE, 3), 8).study();
        for (int p = 0; p < 3; p++) {
            Waveforms w = both.waveforms(p, 0);
            for (int c = 0; c < w.channelCount(); c++) {
                for (int s = 0; s < w.sampleCount(); s++) {
                    // superposition: potentials of sources in a linear conductor add (textbook fact)
                    assertThat((double) w.value(c, s)).isCloseTo(
                            onlyA.waveforms(p, 0).value(c, s) + onlyB.waveforms(p, 0).value(c, s), within(1e-4));
                }
            }
        }
    }

    @Test
    void theSameSeedGivesTheSameStudyAndAnotherSeedAnother() {
        Scenario sc = scenario(List.of(RADIAL.withVariability(new Variability(0.2, 10, 4, 8))),
                new NoiseModel(15, 1, 1, 0.2), 3);
        Study x = Simulator.simulate(sc, 77).study();
        Study y = new Simulator(sc).simulate(77).study();
        Study z = Simulator.simulate(sc, 78).study();
        for (int p = 0; p < 3; p++) {
            assertThat(x.waveforms(p, 0).copyValues()).isEqualTo(y.waveforms(p, 0).copyValues());
            assertThat(x.waveforms(p, 0).copyValues()).isNotEqualTo(z.waveforms(p, 0).copyValues());
        }
    }

    @Test
    void aParticipantDoesNotDependOnHowManyOthersThereAre() {
        Scenario sc = scenario(List.of(RADIAL.withVariability(new Variability(0.2, 10, 4, 8))),
                new NoiseModel(15, 1, 1, 0.2), 3);
        Simulation small = Simulator.simulate(sc, 5);
        Simulation large = Simulator.simulate(sc.withParticipants(7), 5);
        for (int p = 0; p < 3; p++) {
            assertThat(large.study().waveforms(p, 0).copyValues()).isEqualTo(small.study().waveforms(p, 0).copyValues());
            assertThat(large.truth().participants().get(p)).isEqualTo(small.truth().participants().get(p));
        }
        assertThat(large.study().participants()).containsExactly("p01", "p02", "p03", "p04", "p05", "p06", "p07");
    }

    @Test
    void withoutNoiseTheSameSeedGivesTheSameParticipants() {
        Scenario sc = scenario(List.of(RADIAL.withVariability(new Variability(0.2, 10, 4, 8))),
                new NoiseModel(15, 1, 1, 0.2), 4);
        assertThat(Simulator.simulate(sc.withNoise(NoiseModel.NONE), 3).truth().participants())
                .isEqualTo(Simulator.simulate(sc, 3).truth().participants());
    }

    @Test
    void noiseShrinksWithTheSquareRootOfTheTrialCount() {
        List<ConditionSpec> counts = List.of(new ConditionSpec("few", 16, 1), new ConditionSpec("many", 64, 1));
        Scenario sc = new Scenario("noise", StandardSystem.TEN_TEN.montage(), new TimeAxis(0, 250, 250),
                HEAD, counts, List.of(), 20, new NoiseModel(12, 1, 1, 0.3));
        Study study = Simulator.simulate(sc, 21).study();
        // averaging n independent trials divides the noise RMS by √n (textbook fact): 12/4 and 12/8 µV
        assertThat(rms(study, 0)).isCloseTo(3.0, within(0.15));
        assertThat(rms(study, 1)).isCloseTo(1.5, within(0.075));
        assertThat(study.trials(0, 0)).hasValue(16);
        assertThat(study.trials(0, 1)).hasValue(64);
    }

    @Test
    void brainNoiseIsSpatiallySmoothAndSensorNoiseIsNot() {
        Montage m = StandardSystem.TEN_TEN.montage();
        Scenario brain = new Scenario("noise", m, new TimeAxis(0, 250, 250), HEAD, ONE_CONDITION,
                List.of(), 20, new NoiseModel(10, 1, 1, 0));
        Scenario sensor = brain.withNoise(new NoiseModel(10, 1, 1, 1));
        // neighbouring electrodes share most of the background from brain sources (volume
        // conduction; textbook fact), independent sensor noise only the average reference's −1/(C−1)
        assertThat(correlation(Simulator.simulate(brain, 2).study(), "C1", "C3")).isGreaterThan(0.6);
        assertThat(Math.abs(correlation(Simulator.simulate(sensor, 2).study(), "C1", "C3"))).isLessThan(0.1);
    }

    @Test
    void dataAreAverageReferenced() {
        Study s = Simulator.simulate(scenario(List.of(RADIAL, TANGENTIAL), new NoiseModel(15, 1, 1, 0.2), 2), 4).study();
        Waveforms w = s.waveforms(0, 0);
        for (int t = 0; t < w.sampleCount(); t++) {
            double sum = 0;
            for (int c = 0; c < w.channelCount(); c++) {
                sum += w.value(c, t);
            }
            assertThat(sum / w.channelCount()).isCloseTo(0, within(1e-5));
        }
    }

    @Test
    void latencyShiftsMoveTheWaveformInTime() {
        Source jittered = RADIAL.withVariability(new Variability(0, 30, 0, 0));
        Simulation sim = Simulator.simulate(scenario(List.of(jittered), NoiseModel.NONE, 6), 12);
        Study study = sim.study();
        int pz = study.waveforms(0, 0).requireIndex("Pz");
        for (int p = 0; p < 6; p++) {
            double shift = sim.truth().participants().get(p).sources().get(0).latencyShiftMs();
            float[] pzWave = study.waveforms(p, 0).channel(pz);
            int best = 0;
            for (int s = 1; s < pzWave.length; s++) {
                if (pzWave[s] > pzWave[best]) {
                    best = s;
                }
            }
            assertThat(AXIS.timeMs(best)).isCloseTo(200 + shift, within(AXIS.stepMs()));
        }
    }

    @Test
    void trialCountsStayWithinTheRejectionLimit() {
        List<ConditionSpec> conds = List.of(new ConditionSpec("a", 100, 0.8));
        Scenario sc = new Scenario("t", MONTAGE, AXIS, HEAD, conds, List.of(), 200, NoiseModel.NONE);
        List<Integer> seen = new ArrayList<>();
        for (GroundTruth.ParticipantTruth p : Simulator.simulate(sc, 1).truth().participants()) {
            seen.add(p.trials().get(0));
        }
        assertThat(seen).allSatisfy(n -> assertThat(n).isBetween(80, 100));
        assertThat(seen).contains(80, 100);
    }

    @Test
    void jitteredPositionsStayInsideTheSphere() {
        Source nearSurface = new Source("edge", new Vector3(0, 0, 0.085), new Vector3(0, 0, 1),
                List.of(new SourceComponent(0, 50, 100, 1)), Map.of("a", 1.0), new Variability(0, 0, 10, 0));
        for (GroundTruth.ParticipantTruth p : Simulator.simulate(scenario(List.of(nearSurface),
                NoiseModel.NONE, 50), 3).truth().participants()) {
            assertThat(HEAD.accepts(p.sources().get(0).positionM())).isTrue();
        }
    }

    @Test
    void standardPositionsAreMarkedAsStandard() {
        Study s = Simulator.simulate(scenario(List.of(RADIAL), NoiseModel.NONE, 1), 1).study();
        assertThat(s.placements()).extracting(ChannelPlacement::how).containsOnly(ChannelPlacement.How.STANDARD);
        assertThat(s.montage().size()).isEqualTo(MONTAGE.size());
    }

    private static double rms(Study study, int condition) {
        double ss = 0;
        long n = 0;
        for (int p = 0; p < study.participants().size(); p++) {
            float[] v = study.waveforms(p, condition).copyValues();
            for (float x : v) {
                ss += x * x;
                n++;
            }
        }
        return Math.sqrt(ss / n);
    }

    private static double correlation(Study study, String a, String b) {
        double sab = 0;
        double saa = 0;
        double sbb = 0;
        for (int p = 0; p < study.participants().size(); p++) {
            Waveforms w = study.waveforms(p, 0);
            float[] x = w.channel(w.requireIndex(a));
            float[] y = w.channel(w.requireIndex(b));
            for (int i = 0; i < x.length; i++) {
                sab += x[i] * y[i];
                saa += x[i] * x[i];
                sbb += y[i] * y[i];
            }
        }
        return sab / Math.sqrt(saa * sbb);
    }
}
