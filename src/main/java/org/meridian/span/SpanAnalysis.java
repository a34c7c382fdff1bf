package org.meridian.span;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.IntFunction;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;
import org.meridian.signal.GrandAverage;
import org.meridian.spline.SurfaceLaplacian;
import org.meridian.stats.Progress;
import org.meridian.stats.SignFlipTest;

/**
 * Span stability of one condition (or contrast) of a study over a window (DESIGN §7): the one
 * entry point the command and the window call.
 * <ol>
 * <li>The field's channels: the positioned ones (an EOG channel without a position is no part
 *     of the scalp field); when no channel has a position, all of them.</li>
 * <li>Each participant's waveforms of the condition over those channels, or their CSD
 *     (−∇²V in µV/m² at the positioned channels, from the spherical spline of the settings;
 *     {@link SurfaceLaplacian}).</li>
 * <li>Their unweighted grand average gives the descriptive trace and segmentation; the grand
 *     averages of alternate participants (two halves) cross-validate the number of states.</li>
 * <li>Each participant's early and late mean maps give the span test (DESIGN §7; its whitened
 *     variant only when the settings ask for it).</li>
 * </ol>
 */
public final class SpanAnalysis {
    private SpanAnalysis() {
    }

    /**
     * Runs the analysis.
     *
     * @param study     the study (participants, montage)
     * @param condition the condition's name or contrast expression, for the report
     * @param waveforms participant p's waveforms of the condition, in the study's channel order
     * @param settings  the window and options
     * @param progress  told of the sign-flip patterns done; cancellation checked between blocks
     */
    public static SpanReport run(Study study, String condition, IntFunction<Waveforms> waveforms,
            SpanSettings settings, Progress progress) {
        Fields fields = Fields.of(study, waveforms, settings, progress);
        Description d = describe(study, fields, settings, progress);
        int n = fields.perParticipant.length;
        double[][] early = new double[n][];
        double[][] late = new double[n][];
        for (int p = 0; p < n; p++) {
            double[][] parts = PartMeans.of(fields.perParticipant[p], d.window());
            early[p] = parts[0];
            late[p] = parts[1];
        }
        SignFlipTest flips = SignFlipTest.withRandomPatterns(settings.permutations(), settings.seed());
        SpanTest.Result test = SpanTest.run(early, late, flips, settings.alpha(), progress,
                settings.whiten());
        return new SpanReport(condition, settings, d.window(), d.grand().unit(), fields.channels,
                fields.leftOut, study.participants(), d.trace(), d.segmentation(), test);
    }

    /**
     * The descriptive part alone: the window, the grand average over the field's channels, the
     * stability trace and the segmentation (k cross-validated on alternate halves of the
     * participants), exactly as {@link #run} computes them. The span view shows this live.
     */
    public record Description(SpanWindow window, Waveforms grand, StabilityTrace trace,
            Segmentation segmentation) {
    }

    /** Computes the {@link Description} of a condition over the settings' window. */
    public static Description describe(Study study, IntFunction<Waveforms> waveforms,
            SpanSettings settings, Progress progress) {
        return describe(study, Fields.of(study, waveforms, settings, progress), settings, progress);
    }

    private static Description describe(Study study, Fields fields, SpanSettings settings,
            Progress progress) {
        SpanWindow window = settings.splitMs().isPresent()
                ? SpanWindow.splitAt(study.axis(), settings.window(), settings.splitMs().getAsDouble(),
                        "option --window", "option --split")
                : SpanWindow.middle(study.axis(), settings.window(), "option --window");
        int reference = referenceSample(window, settings);
        Waveforms[] field = fields.perParticipant;
        Waveforms grand = GrandAverage.of(study, p -> field[p], GrandAverage.Weighting.UNWEIGHTED,
                Set.of(), p -> -1);
        WindowMaps maps = new WindowMaps(grand, window);
        StabilityTrace trace = StabilityTrace.of(maps, reference);
        progress.checkCancelled();
        WindowMaps halfA = null;
        WindowMaps halfB = null;
        if (field.length >= 4) {
            halfA = new WindowMaps(half(study, field, 0), window);
            halfB = new WindowMaps(half(study, field, 1), window);
        }
        Segmentation segmentation = new TopographicClustering(settings.maxStates(),
                settings.restarts(), settings.seed()).segment(maps, halfA, halfB);
        return new Description(window, grand, trace, segmentation);
    }

    /** Each participant's waves over the field's channels (potential or CSD). */
    private record Fields(Waveforms[] perParticipant, List<String> channels, List<String> leftOut) {
        static Fields of(Study study, IntFunction<Waveforms> waveforms, SpanSettings settings,
                Progress progress) {
            SurfaceLaplacian laplacian = settings.csd()
                    ? new SurfaceLaplacian(study.montage(), settings.spline()) : null;
            List<String> channels = laplacian != null ? laplacian.spline().labels() : fieldChannels(study);
            List<String> leftOut = new ArrayList<>(study.channelLabels());
            leftOut.removeIf(l -> channels.stream().anyMatch(l::equalsIgnoreCase));
            if (channels.size() < 3) {
                throw new BadInputException(study.name() + ": a scalp map needs at least 3 channels, "
                        + "the study has " + channels.size() + " with a position");
            }
            int n = study.participants().size();
            Waveforms[] field = new Waveforms[n];
            for (int p = 0; p < n; p++) {
                progress.checkCancelled();
                Waveforms w = waveforms.apply(p);
                field[p] = laplacian != null ? laplacian.of(w) : w.select(channels);
            }
            return new Fields(field, channels, leftOut);
        }
    }

    /**
     * The grand average of every other participant (study order), starting at {@code parity}:
     * the halves on which the segmentation's choice of k is cross-validated.
     */
    private static Waveforms half(Study study, Waveforms[] field, int parity) {
        Set<String> others = new java.util.HashSet<>();
        for (int p = 0; p < field.length; p++) {
            if (p % 2 != parity) {
                others.add(study.participants().get(p));
            }
        }
        return GrandAverage.of(study, p -> field[p], GrandAverage.Weighting.UNWEIGHTED, others, p -> -1);
    }

    /** The positioned channels in the study's order, or all channels when none has a position. */
    public static List<String> fieldChannels(Study study) {
        List<String> positioned = new ArrayList<>();
        for (String l : study.channelLabels()) {
            if (study.montage().contains(l)) {
                positioned.add(l);
            }
        }
        return positioned.isEmpty() ? study.channelLabels() : positioned;
    }

    private static int referenceSample(SpanWindow window, SpanSettings settings) {
        if (settings.referenceMs().isEmpty()) {
            return -1;
        }
        double t = settings.referenceMs().getAsDouble();
        if (!window.contains(t)) {
            throw new BadInputException("option --reference-time: " + SpanWindow.fmt(t)
                    + " ms lies outside the window " + SpanWindow.fmt(window.startMs()) + ".."
                    + SpanWindow.fmt(window.endMs()) + " ms");
        }
        return window.axis().nearestIndex(t) - window.first();
    }
}
