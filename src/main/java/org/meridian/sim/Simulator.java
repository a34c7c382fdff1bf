package org.meridian.sim;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.meridian.core.ChannelPlacement;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.core.Study;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.montage.ChannelPositions;

/**
 * Simulates studies from a {@link Scenario}: for every participant and condition, the
 * average-referenced scalp potential
 * <pre>
 *   v_c(t) = Σ_sources  L_c(position_i) · orientation_i · gain(condition) · a_i · m(t − δ_i)
 *            + noise_c(t) / √(trials kept)
 * </pre>
 * where L is the lead field of the participant's source position in the sphere model (voltages
 * from several sources add: the conductor is linear), a_i and δ_i the participant's amplitude
 * factor and latency shift (see {@link Variability}), m the source's time course, and the noise
 * follows {@link NoiseModel}.
 *
 * <p>Everything random comes from {@link SeededStream}s derived from the seed and fixed keys:
 * (trials, participant), (source, participant, hash of the source's name), (noise, participant,
 * condition). A participant's draws therefore do not depend on how many participants the study
 * has, a source's draws not on which other sources the scenario holds, and the same seed with
 * {@link NoiseModel#NONE} gives the same participants without noise — so a validation can compare
 * one source with two on exactly the same participants.
 *
 * <p>Work done once: the background's spatial covariance and its square root
 * ({@link BackgroundNoise}), in the constructor; the lead field of each participant's source
 * position, once per simulation, reused for every condition and sample. A {@code Simulator}
 * may be reused for any number of seeds; {@link #simulate} is safe to call from several
 * threads at once.
 */
public final class Simulator {
    private static final long TRIALS_KEY = 1;
    private static final long SOURCE_KEY = 2;
    private static final long NOISE_KEY = 3;
    private static final int POSITION_TRIES = 1000;

    private final Scenario scenario;
    private final int channels;
    private final int samples;
    private final double[] times;
    private final BackgroundNoise background;
    private final Montage studyMontage;
    private final List<ChannelPlacement> placements;

    public Simulator(Scenario scenario) {
        this.scenario = scenario;
        this.channels = scenario.montage().size();
        this.samples = scenario.axis().samples();
        this.times = new double[samples];
        for (int s = 0; s < samples; s++) {
            times[s] = scenario.axis().timeMs(s);
        }
        this.background = scenario.noise().silent() ? null : new BackgroundNoise(scenario);
        ChannelPositions.Resolution standard = ChannelPositions.resolve(scenario.montage().labels(), null);
        if (sameDirections(standard.montage(), scenario.montage())) {
            this.studyMontage = standard.montage();
            this.placements = standard.placements();
        } else {
            ChannelPositions.Resolution own = ChannelPositions.resolve(scenario.montage().labels(),
                    scenario.montage());
            this.studyMontage = own.montage();
            this.placements = own.placements();
        }
    }

    /** One simulation: {@code new Simulator(scenario).simulate(seed)}. */
    public static Simulation simulate(Scenario scenario, long seed) {
        return new Simulator(scenario).simulate(seed);
    }

    public Scenario scenario() {
        return scenario;
    }

    /** Simulates every participant and condition of the scenario from this seed. */
    public Simulation simulate(long seed) {
        List<ConditionSpec> conditions = scenario.conditions();
        List<Source> sources = scenario.sources();
        BackgroundNoise.Workspace workspace = background == null ? null : background.workspace();
        Study.Builder study = Study.builder(scenario.name()).montage(studyMontage).placements(placements);
        List<GroundTruth.ParticipantTruth> truths = new ArrayList<>();
        String format = "p%0" + Math.max(2, String.valueOf(scenario.participants()).length()) + "d";
        for (int p = 0; p < scenario.participants(); p++) {
            String participant = String.format(Locale.ROOT, format, p + 1);
            List<Integer> trials = drawTrials(seed, p, conditions);
            List<GroundTruth.SourceDraw> draws = new ArrayList<>();
            double[][] maps = new double[sources.size()][];
            for (int j = 0; j < sources.size(); j++) {
                GroundTruth.SourceDraw d = drawSource(seed, p, sources.get(j));
                draws.add(d);
                maps[j] = scenario.head().leadField(d.positionM(), scenario.montage(),
                        "source " + d.source() + " of participant " + participant).map(d.orientation());
            }
            truths.add(new GroundTruth.ParticipantTruth(participant, trials, draws));
            for (int c = 0; c < conditions.size(); c++) {
                double[] v = new double[channels * samples];
                addSources(v, sources, draws, maps, conditions.get(c).name());
                if (background != null) {
                    background.addTo(v, SeededStream.derive(seed, NOISE_KEY, p, c), trials.get(c),
                            workspace);
                }
                study.add(participant, conditions.get(c).name(),
                        Waveforms.wrap(scenario.montage().labels(), scenario.axis(), Unit.MICROVOLT,
                                averageReferenced(v)), trials.get(c));
            }
        }
        return new Simulation(study.build(), new GroundTruth(scenario, seed, truths));
    }

    private List<Integer> drawTrials(long seed, int participant, List<ConditionSpec> conditions) {
        SeededStream r = SeededStream.derive(seed, TRIALS_KEY, participant);
        List<Integer> out = new ArrayList<>();
        for (ConditionSpec c : conditions) {
            out.add(c.trialsPresented() - r.nextInt(c.maxRejected() + 1));
        }
        return out;
    }

    private GroundTruth.SourceDraw drawSource(long seed, int participant, Source s) {
        SeededStream r = SeededStream.derive(seed, SOURCE_KEY, participant, nameKey(s.name()));
        Variability v = s.variability();
        double amplitude = StrictMath.exp(v.amplitudeSdLog() * r.nextGaussian());
        double shift = v.latencySdMs() * r.nextGaussian();
        double tiltScale = StrictMath.toRadians(v.orientationSdDeg());
        Vector3 e1 = perpendicular(s.orientation());
        Vector3 e2 = s.orientation().cross(e1);
        Vector3 orientation = s.orientation().plus(e1.times(tiltScale * r.nextGaussian()))
                .plus(e2.times(tiltScale * r.nextGaussian())).unit();
        double sdM = v.positionSdMm() / 1000;
        Vector3 position = s.positionM();
        for (int attempt = 0; attempt < POSITION_TRIES; attempt++) {
            Vector3 candidate = s.positionM().plus(new Vector3(sdM * r.nextGaussian(),
                    sdM * r.nextGaussian(), sdM * r.nextGaussian()));
            if (scenario.head().accepts(candidate)) {
                position = candidate;
                break;
            }
        }
        return new GroundTruth.SourceDraw(s.name(), position, orientation, amplitude, shift);
    }

    private void addSources(double[] v, List<Source> sources, List<GroundTruth.SourceDraw> draws,
            double[][] maps, String condition) {
        double[] moment = new double[samples];
        for (int j = 0; j < sources.size(); j++) {
            Source s = sources.get(j);
            GroundTruth.SourceDraw d = draws.get(j);
            double gain = s.gain(condition) * d.amplitudeFactor();
            if (gain == 0) {
                continue;
            }
            for (int t = 0; t < samples; t++) {
                moment[t] = gain * s.momentAt(times[t] - d.latencyShiftMs());
            }
            double[] map = maps[j];
            for (int ch = 0; ch < channels; ch++) {
                double w = map[ch];
                int off = ch * samples;
                for (int t = 0; t < samples; t++) {
                    v[off + t] += w * moment[t];
                }
            }
        }
    }

    /** Subtracts the mean over channels at every sample and narrows to float. */
    private float[] averageReferenced(double[] v) {
        float[] out = new float[v.length];
        for (int t = 0; t < samples; t++) {
            double mean = 0;
            for (int ch = 0; ch < channels; ch++) {
                mean += v[ch * samples + t];
            }
            mean /= channels;
            for (int ch = 0; ch < channels; ch++) {
                out[ch * samples + t] = (float) (v[ch * samples + t] - mean);
            }
        }
        return out;
    }

    /** A stable 64-bit key for a name: FNV-1a over its UTF-16 code units (Fowler, Noll & Vo). */
    static long nameKey(String name) {
        long h = 0xcbf29ce484222325L;
        for (int i = 0; i < name.length(); i++) {
            h ^= name.charAt(i);
            h *= 0x100000001b3L;
        }
        return h;
    }

    private static Vector3 perpendicular(Vector3 u) {
        Vector3 axis = Math.abs(u.x()) <= Math.abs(u.y()) && Math.abs(u.x()) <= Math.abs(u.z())
                ? new Vector3(1, 0, 0)
                : Math.abs(u.y()) <= Math.abs(u.z()) ? new Vector3(0, 1, 0) : new Vector3(0, 0, 1);
        return u.cross(axis).unit();
    }

    private static boolean sameDirections(Montage a, Montage b) {
        if (a.size() != b.size()) {
            return false;
        }
        for (int i = 0; i < a.size(); i++) {
            Electrode x = a.electrodes().get(i);
            Electrode y = b.electrodes().get(i);
            if (x.cosineTo(y) < 1 - 1e-12) {
                return false;
            }
        }
        return true;
    }
}
