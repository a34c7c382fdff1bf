package org.meridian.ui;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;
import org.meridian.signal.ConditionWave;
import org.meridian.signal.ConfidenceBand;
import org.meridian.signal.GrandAverage;
import org.meridian.signal.Processing;
import org.meridian.span.FieldStatistics;

/**
 * The derived data of the shown waves for one set of included participants and one processing
 * of the participants' averages ({@link Processing}: applied to the study first, so that every
 * grand average, band, CSD, GFP, measure and span view agrees), computed once off the event
 * thread and then only read: the processed study, each wave's grand average, its interval band, the CSD of
 * the grand average at the electrodes, the GFP over the scalp field, and the largest absolute
 * value at the field's electrodes over all samples (for the automatic colour range: the map
 * interpolates between electrodes, so its values stay close to theirs, and any value beyond the
 * limits takes the end colour). Immutable.
 */
public final class Averages {
    /** The derived data of one wave. */
    public record WaveAverage(WaveEntry entry, Waveforms grand, ConfidenceBand band, Waveforms csd,
            double[] gfp, double[] csdGfp, double maxAbs, double csdMaxAbs) {
        public String name() {
            return entry.name();
        }

        /** The grand average of the field's channels in a quantity: potential or CSD. */
        public Waveforms field(MapQuantity q) {
            return q == MapQuantity.CSD && csd != null ? csd : grand;
        }

        public double[] gfp(MapQuantity q) {
            return q == MapQuantity.CSD && csdGfp != null ? csdGfp : gfp;
        }

        /** The largest |value| at the field's electrodes over all samples in a quantity. */
        public double maxAbs(MapQuantity q) {
            return q == MapQuantity.CSD ? csdMaxAbs : maxAbs;
        }
    }

    private final StudySession session;
    private final Processing processing;
    private final Study study;
    private final Set<String> excluded;
    private final IntervalKind intervals;
    private final Map<String, WaveAverage> waves;

    private Averages(StudySession session, Processing processing, Study study, Set<String> excluded,
            IntervalKind intervals, Map<String, WaveAverage> waves) {
        this.session = session;
        this.processing = processing;
        this.study = study;
        this.excluded = Set.copyOf(excluded);
        this.intervals = intervals;
        this.waves = Collections.unmodifiableMap(waves);
    }

    /** Nothing computed yet. */
    public static Averages empty() {
        return new Averages(null, Processing.none(), null, Set.of(), IntervalKind.NONE, new LinkedHashMap<>());
    }

    /** As {@link #compute(StudySession, Processing, Averages, List, Set, IntervalKind, Tasks.TaskProgress)} without processing. */
    public static Averages compute(StudySession session, List<WaveEntry> shown, Set<String> excluded,
            IntervalKind intervals, Tasks.TaskProgress progress) {
        return compute(session, Processing.none(), null, shown, excluded, intervals, progress);
    }

    /**
     * Computes the grand averages of the given waves with the participants in {@code excluded}
     * left out, from the study processed as asked (the processed study of {@code previous} is
     * reused when it was made from the same session with the same processing). Within-participant
     * bands are formed over the shown loaded conditions together (when there are at least two);
     * contrasts get their own t-interval.
     */
    public static Averages compute(StudySession session, Processing processing, Averages previous,
            List<WaveEntry> shown, Set<String> excluded, IntervalKind intervals, Tasks.TaskProgress progress) {
        Study study = previous != null && previous.session == session && previous.processing.equals(processing)
                ? previous.study : processing.apply(session.study());
        progress.checkCancelled();
        Set<String> within = new java.util.HashSet<>();
        Map<String, ConfidenceBand> bands = bands(study, shown, excluded, intervals, within);
        Map<String, WaveAverage> out = new LinkedHashMap<>();
        int done = 0;
        for (WaveEntry e : shown) {
            progress.checkCancelled();
            // a within-participant band carries the very grand average (GrandAverage, unweighted)
            ConfidenceBand band = bands.get(e.name());
            Waveforms grand = band != null && within.contains(e.name()) ? band.mean() : GrandAverage.of(study, e.wave(),
                    GrandAverage.Weighting.UNWEIGHTED, excluded);
            Waveforms field = grand.select(session.fieldChannels());
            Waveforms csd = session.hasCsd() ? session.csdOf(grand) : null;
            double potMax = maxAbs(field);
            double csdMax = csd != null ? maxAbs(csd) : Double.NaN;
            out.put(e.name(), new WaveAverage(e, grand, bands.get(e.name()), csd, gfp(field),
                    csd == null ? null : gfp(csd), potMax, csdMax));
            progress.update(++done, shown.size());
        }
        return new Averages(session, processing, study, excluded, intervals, out);
    }

    /** The processing the averages were computed with. */
    public Processing processing() {
        return processing;
    }

    /** The study the averages were computed from (processed), or null before any. */
    public Study study() {
        return study;
    }

    public Set<String> excluded() {
        return excluded;
    }

    public IntervalKind intervals() {
        return intervals;
    }

    /** The wave of a name, or null when it is not computed (not shown). */
    public WaveAverage wave(String name) {
        return waves.get(name);
    }

    /** The computed waves, in legend order. */
    public List<WaveAverage> waves() {
        return new ArrayList<>(waves.values());
    }

    public boolean isEmpty() {
        return waves.isEmpty();
    }

    /** The bands of the shown waves; the names of those formed within participants go to {@code withinNames}. */
    private static Map<String, ConfidenceBand> bands(Study study, List<WaveEntry> shown,
            Set<String> excluded, IntervalKind intervals, Set<String> withinNames) {
        Map<String, ConfidenceBand> out = new LinkedHashMap<>();
        int included = study.participants().size() - excluded.size();
        if (intervals == IntervalKind.NONE || included < 2) {
            return out;
        }
        List<ConditionWave> within = new ArrayList<>();
        for (WaveEntry e : shown) {
            if (!e.contrast()) {
                within.add(e.wave());
            }
        }
        if (intervals == IntervalKind.WITHIN && within.size() >= 2) {
            for (ConfidenceBand b : ConfidenceBand.withinParticipants(study, within,
                    ConfidenceBand.DEFAULT_LEVEL, excluded)) {
                out.put(b.name(), b);
                withinNames.add(b.name());
            }
        }
        for (WaveEntry e : shown) {
            out.computeIfAbsent(e.name(), n -> ConfidenceBand.acrossParticipants(study,
                    e.wave(), ConfidenceBand.DEFAULT_LEVEL, excluded));
        }
        return out;
    }

    /** GFP (Lehmann &amp; Skrandies, 1980) of every sample over the given channels. */
    private static double[] gfp(Waveforms field) {
        int n = field.sampleCount();
        double[] out = new double[n];
        double[] map = new double[field.channelCount()];
        for (int s = 0; s < n; s++) {
            field.sampleInto(s, map);
            out[s] = FieldStatistics.gfp(map);
        }
        return out;
    }

    private static double maxAbs(Waveforms w) {
        double max = 0;
        for (float v : w.copyValues()) {
            max = Math.max(max, Math.abs(v));
        }
        return max;
    }
}
