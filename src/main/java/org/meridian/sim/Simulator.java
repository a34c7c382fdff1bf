package org.meridian.sim;

import java.util.ArrayList;
import java.util.List;
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
 * (trials, participant), (source, participant, source index), (noise, participant, condition).
 * A participant's draws therefore do not depend on how many participants the study has, and the
 * same seed with {@link NoiseModel#NONE} gives the same participants without noise.
 *
 * <p>Work done once: the lead fields of the brain-noise dipoles and the noise mixing matrix, in
 * the constructor; the lead field of each participant's source position, once per simulation
 * and reused for every condition and sample. A {@code Simulator} may be reused for any number of
 * seeds; {@link #simulate} is safe to call from several threads at once.
 */
public final class Simulator {
    private static final long TRIALS_KEY = 1;
    private static final long SOURCE_KEY = 2;
    private static final long NOISE_KEY = 3;
    /** Points of the Fibonacci lattice from which the brain-noise dipoles are taken. */
    private static final int NOISE_LATTICE = 64;
    /** Brain-noise dipoles sit at 70 % of the radius, on the part of the shell above z = −0.3. */
    private static final double NOISE_ECCENTRICITY = 0.7;
    private static final double NOISE_LOWEST_Z = -0.3;
    private static final int POSITION_TRIES = 1000;

    private final Scenario scenario;
    private final int channels;
    private final int samples;
    private final double[] times;
    /** Average-referenced brain-noise mixing, channel-major: channels × noise series. */
    private final double[] brainMixing;
    private final int brainSeries;
    private final double sensorScale;
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
        List<Vector3> noisePositions = brainNoisePositions(scenario.head().radiusM());
        this.brainSeries = 3 * noisePositions.size();
        this.brainMixing = brainMixing(scenario, noisePositions);
        NoiseModel noise = scenario.noise();
        double rms = noise.singleTrialRmsUv();
        this.sensorScale = rms * StrictMath.sqrt(noise.sensorFraction() / (1 - 1.0 / channels));
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
        PowerLawNoise generator = scenario.noise().silent() ? null : new PowerLawNoise(samples,
                scenario.axis().rateHz(), scenario.noise().exponent(), scenario.noise().lowHz());
        double[] brainBuffer = generator == null ? null : new double[brainSeries * samples];
        Study.Builder study = Study.builder(scenario.name()).montage(studyMontage).placements(placements);
        List<GroundTruth.ParticipantTruth> truths = new ArrayList<>();
        String format = "p%0" + Math.max(2, String.valueOf(scenario.participants()).length()) + "d";
        for (int p = 0; p < scenario.participants(); p++) {
            String participant = String.format(format, p + 1);
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
                if (generator != null) {
                    addNoise(v, generator, brainBuffer, SeededStream.derive(seed, NOISE_KEY, p, c),
                            1 / StrictMath.sqrt(trials.get(c)));
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

    private void addNoise(double[] v, PowerLawNoise generator, double[] buffer, SeededStream r,
            double trialScale) {
        generator.reset();
        java.util.Arrays.fill(buffer, 0);
        for (int k = 0; k < brainSeries; k++) {
            generator.addSeries(r, 1, buffer, k * samples);
        }
        for (int ch = 0; ch < channels; ch++) {
            int off = ch * samples;
            int mixOff = ch * brainSeries;
            for (int k = 0; k < brainSeries; k++) {
                double w = brainMixing[mixOff + k] * trialScale;
                int bOff = k * samples;
                for (int t = 0; t < samples; t++) {
                    v[off + t] += w * buffer[bOff + t];
                }
            }
        }
        for (int ch = 0; ch < channels; ch++) {
            generator.addSeries(r, sensorScale * trialScale, v, ch * samples);
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

    /**
     * Average-referenced lead fields of the brain-noise dipoles (x, y, z moments), scaled so
     * that unit-variance series give the brain part of the single-trial RMS.
     */
    private static double[] brainMixing(Scenario scenario, List<Vector3> positions) {
        int channels = scenario.montage().size();
        int series = 3 * positions.size();
        double[] mix = new double[channels * series];
        for (int k = 0; k < positions.size(); k++) {
            LeadField lf = scenario.head().leadField(positions.get(k), scenario.montage(),
                    "a brain-noise dipole");
            for (int ch = 0; ch < channels; ch++) {
                Vector3 g = lf.gain(ch);
                mix[ch * series + 3 * k] = g.x();
                mix[ch * series + 3 * k + 1] = g.y();
                mix[ch * series + 3 * k + 2] = g.z();
            }
        }
        double sumSquares = 0;
        for (int k = 0; k < series; k++) {
            double mean = 0;
            for (int ch = 0; ch < channels; ch++) {
                mean += mix[ch * series + k];
            }
            mean /= channels;
            for (int ch = 0; ch < channels; ch++) {
                mix[ch * series + k] -= mean;
                sumSquares += mix[ch * series + k] * mix[ch * series + k];
            }
        }
        NoiseModel noise = scenario.noise();
        double target = noise.singleTrialRmsUv() * noise.singleTrialRmsUv() * (1 - noise.sensorFraction());
        double scale = sumSquares > 0 ? StrictMath.sqrt(target * channels / sumSquares) : 0;
        for (int i = 0; i < mix.length; i++) {
            mix[i] *= scale;
        }
        return mix;
    }

    /**
     * The brain-noise dipole positions: the points of a 64-point Fibonacci lattice on the unit
     * sphere (González, 2010, "Measurement of areas on a sphere using Fibonacci and latitude–
     * longitude lattices") with z ≥ −0.3, scaled to 70 % of the radius.
     */
    static List<Vector3> brainNoisePositions(double radiusM) {
        List<Vector3> out = new ArrayList<>();
        double golden = (1 + StrictMath.sqrt(5)) / 2;
        for (int i = 0; i < NOISE_LATTICE; i++) {
            double z = 1 - (2 * i + 1.0) / NOISE_LATTICE;
            if (z < NOISE_LOWEST_Z) {
                continue;
            }
            double rho = StrictMath.sqrt(1 - z * z);
            double phi = 2 * StrictMath.PI * i / golden;
            out.add(new Vector3(rho * StrictMath.cos(phi), rho * StrictMath.sin(phi), z)
                    .times(NOISE_ECCENTRICITY * radiusM));
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
