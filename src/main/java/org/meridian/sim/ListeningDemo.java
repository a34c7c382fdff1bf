package org.meridian.sim;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.core.TimeAxis;
import org.meridian.montage.StandardSystem;

/**
 * The bundled demo study, a scenario of our own: participants listen to a stream of tones in
 * which a frequent tone is now and then replaced by a rare one.
 *
 * <ul>
 *   <li>Auditory cortex, left and right: tangential dipoles in the supratemporal plane giving
 *       the early P1–N1–P2 sequence to every tone (a little larger to rare ones).</li>
 *   <li>Mismatch, left and right: slightly more anterior dipoles, active for rare tones only,
 *       giving a fronto-central negativity around 170 ms that reverses polarity at the
 *       mastoids.</li>
 *   <li>The late positive peak is two sources 90 ms apart: a fronto-central one peaking at
 *       300 ms (rare tones only) and a parietal one peaking at 390 ms (rare tones, and weaker
 *       for frequent ones). In the rare condition the peak's scalp distribution therefore moves
 *       from fronto-central to parietal across its span; in the frequent condition the late
 *       peak is the parietal source alone.</li>
 * </ul>
 * 16 participants, 64 channels of the 10-10 system, −200 … 800 ms at 250 Hz, average
 * reference, homogeneous sphere of 9 cm. Moments are chosen for plausible scalp amplitudes in
 * a sphere without a skull, not taken from source-imaging results.
 */
public final class ListeningDemo {
    /** The seed of the bundled study. */
    public static final long SEED = 20_251_107L;
    public static final int PARTICIPANTS = 16;
    /** The folder name of the bundled study under {@code samples/}. */
    public static final String FOLDER = "two-tone-listening";
    public static final String FREQUENT = "frequent";
    public static final String RARE = "rare";

    /** The 64 channels, a subset of the 10-10 positions. */
    static final Set<String> CHANNELS = Set.of(
            "Fp1", "Fpz", "Fp2", "AF7", "AF3", "AFz", "AF4", "AF8",
            "F7", "F5", "F3", "F1", "Fz", "F2", "F4", "F6", "F8",
            "FT7", "FC5", "FC3", "FC1", "FCz", "FC2", "FC4", "FC6", "FT8",
            "T7", "C5", "C3", "C1", "Cz", "C2", "C4", "C6", "T8",
            "TP9", "TP7", "CP5", "CP3", "CP1", "CPz", "CP2", "CP4", "CP6", "TP8", "TP10",
            "P7", "P5", "P3", "P1", "Pz", "P2", "P4", "P6", "P8",
            "PO7", "PO3", "POz", "PO4", "PO8", "O1", "Oz", "O2", "Iz");

    private static final Variability SPREAD = new Variability(0.25, 12, 5, 10);

    private ListeningDemo() {
    }

    /** The demo scenario with its 16 participants. */
    public static Scenario scenario() {
        return scenario(PARTICIPANTS);
    }

    public static Scenario scenario(int participants) {
        return new Scenario("two-tone listening (simulated)", montage(),
                new TimeAxis(-200, 250, 251), SphereHeadModel.standard(),
                List.of(new ConditionSpec(FREQUENT, 320, 0.8), new ConditionSpec(RARE, 80, 0.75)),
                sources(), participants, new NoiseModel(18, 1, 1, 0.2));
    }

    /** The 64 demo channels in the order of the 10-10 system (front to back, left to right). */
    public static Montage montage() {
        List<Electrode> chosen = new ArrayList<>();
        for (Electrode e : StandardSystem.TEN_TEN.montage().electrodes()) {
            if (CHANNELS.contains(e.label())) {
                chosen.add(e);
            }
        }
        return new Montage(chosen, "standard 10-10 (64 channels)");
    }

    static List<Source> sources() {
        List<TimeCourse> auditory = List.of(
                new SourceComponent(30, 55, 50, 8),
                new SourceComponent(60, 100, 110, -30),
                new SourceComponent(130, 185, 140, 22));
        Map<String, Double> everyTone = Map.of(FREQUENT, 1.0, RARE, 1.15);
        List<TimeCourse> mismatch = List.of(new SourceComponent(100, 165, 150, -20));
        return List.of(
                new Source("auditory-left", new Vector3(-0.047, -0.008, 0.02),
                        new Vector3(0.1, 0.25, 1), auditory, everyTone, SPREAD),
                new Source("auditory-right", new Vector3(0.047, -0.008, 0.02),
                        new Vector3(-0.1, 0.25, 1), auditory, everyTone, SPREAD),
                new Source("mismatch-left", new Vector3(-0.045, 0.004, 0.024),
                        new Vector3(0.1, 0.35, 1), mismatch, Map.of(RARE, 1.0), SPREAD),
                new Source("mismatch-right", new Vector3(0.045, 0.004, 0.024),
                        new Vector3(-0.1, 0.35, 1), mismatch, Map.of(RARE, 1.0), SPREAD),
                new Source("late-frontocentral", new Vector3(0, 0.018, 0.052),
                        new Vector3(0, 0.3, 1), List.of(new SourceComponent(220, 300, 190, 14)),
                        Map.of(RARE, 1.0), SPREAD),
                new Source("late-parietal", new Vector3(0, -0.038, 0.046),
                        new Vector3(0, -0.45, 1), List.of(new SourceComponent(270, 390, 300, 16)),
                        Map.of(FREQUENT, 0.35, RARE, 1.0), SPREAD));
    }
}
