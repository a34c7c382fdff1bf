package org.meridian.figure;

import java.awt.Color;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;
import org.meridian.figure.spec.ColourBarPanel;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.IntervalKind;
import org.meridian.figure.spec.MapSettings;
import org.meridian.figure.spec.MapStripPanel;
import org.meridian.figure.spec.PanelSpec;
import org.meridian.figure.spec.ShownCondition;
import org.meridian.figure.spec.SpanTracePanel;
import org.meridian.figure.spec.WaveformAxes;
import org.meridian.figure.spec.WaveformPanel;
import org.meridian.maps.MapExtent;
import org.meridian.maps.MapMaker;
import org.meridian.maps.MapMoment;
import org.meridian.maps.ScalpMap;
import org.meridian.measure.Region;
import org.meridian.signal.ConditionExpression;
import org.meridian.signal.ConditionWave;
import org.meridian.signal.ConfidenceBand;
import org.meridian.signal.GrandAverage;
import org.meridian.signal.TimeWindow;
import org.meridian.span.FieldStatistics;
import org.meridian.span.SpanAnalysis;
import org.meridian.spline.SplineParameters;

/**
 * Everything a figure shows, computed from a spec and a study by calling the packages that own
 * each computation: waves and contrasts ({@code signal.ConditionExpression}, per participant, then
 * averaged), interval bands ({@code signal.ConfidenceBand}), regions ({@code measure.Region}), maps
 * ({@code maps.MapMaker}, spline defaults of DESIGN §5). It also settles the shared scales: the
 * time and amplitude ranges of all waveform panels and the colour limits of all maps. A spec that
 * names a channel, condition or electrode the study lacks fails here, naming it and where in the
 * spec it is. Immutable.
 */
public final class FigureContent {
    private final FigureSpec spec;
    private final List<PanelContent> panels;
    private final WaveScales waveScales;
    private final WaveScales gfpScales;
    private final WaveScales dissScales;
    private final MapScales mapScales;

    private FigureContent(FigureSpec spec, List<PanelContent> panels, WaveScales waveScales, WaveScales gfpScales,
            WaveScales dissScales, MapScales mapScales) {
        this.spec = spec;
        this.panels = List.copyOf(panels);
        this.waveScales = waveScales;
        this.gfpScales = gfpScales;
        this.dissScales = dissScales;
        this.mapScales = mapScales;
    }

    public FigureSpec spec() {
        return spec;
    }

    /** One content per panel, in the order of {@link FigureSpec#panels()}. */
    public List<PanelContent> panels() {
        return panels;
    }

    /** The waveform axes, or null when the figure has no waveform panel. */
    public WaveScales waveScales() {
        return waveScales;
    }

    /** The axes of the span-trace panels (GFP from 0), or null when there is none. */
    public WaveScales gfpScales() {
        return gfpScales;
    }

    /** The axes of the DISS traces (0 to 2), or null when there is none. */
    public WaveScales dissScales() {
        return dissScales;
    }

    /** The map scales, or null when the figure has no map strip. */
    public MapScales mapScales() {
        return mapScales;
    }

    /**
     * Computes the figure's content: the spec's processing first, on every participant ×
     * condition average, then every wave, band and map from the processed study.
     */
    public static FigureContent of(FigureSpec spec, Study loaded) {
        Study study;
        try {
            study = spec.processingValue().apply(loaded);
        } catch (BadInputException e) {
            throw new BadInputException("processing: " + e.getMessage(), e);
        }
        for (String name : spec.excludedParticipants()) {
            if (study.participantIndex(name) < 0) {
                throw new BadInputException("excluded_participants: " + study.name() + " has no participant " + name
                        + " (participants: " + String.join(", ", study.participants()) + ")");
            }
        }
        Map<String, ConditionExpression> waves = new HashMap<>();
        for (int i = 0; i < spec.conditions().size(); i++) {
            String text = spec.conditions().get(i).wave();
            waves.put(text, expression(text, study, "conditions[" + i + "].wave"));
        }
        TimeAxis axis = study.axis();
        WaveformAxes axes = spec.waveforms();
        double t0 = axes.timeMs() != null ? axes.timeMs().get(0) : axis.firstMs();
        double t1 = axes.timeMs() != null ? axes.timeMs().get(1) : axis.lastMs();
        if (t0 < axis.firstMs() - axis.stepMs() / 2 || t1 > axis.lastMs() + axis.stepMs() / 2) {
            throw new BadInputException("waveforms.time_ms [" + t0 + ", " + t1 + "] reaches beyond the data ("
                    + axis.firstMs() + " to " + axis.lastMs() + " ms)");
        }
        List<PanelContent> out = new ArrayList<>();
        List<ScalpMap> allMaps = new ArrayList<>();
        List<double[]> marks = new ArrayList<>();
        Map<Object, MapMaker> makers = new HashMap<>();
        List<PanelSpec> panels = spec.panels();
        boolean anyStrip = panels.stream().anyMatch(p -> p instanceof MapStripPanel);
        for (int i = 0; i < panels.size(); i++) {
            String where = where(spec, i);
            PanelSpec p = panels.get(i);
            if (p instanceof WaveformPanel w) {
                out.add(waveforms(spec, study, w, waves, t0, t1, where));
            } else if (p instanceof MapStripPanel m) {
                PanelContent.MapStrip strip = mapStrip(spec, study, m, makers, where);
                allMaps.addAll(strip.maps());
                marks.addAll(marks(m));
                out.add(strip);
            } else if (p instanceof SpanTracePanel t) {
                out.add(spanTrace(spec, study, t, waves, t0, t1, where));
            } else if (p instanceof ColourBarPanel) {
                if (!anyStrip) {
                    throw new BadInputException(where + ": a colour bar needs a map strip in the figure");
                }
                out.add(new PanelContent.ColourBar());
            }
        }
        WaveScales waveScales = out.stream().anyMatch(c -> c instanceof PanelContent.Waveforms)
                ? FigureScales.waves(spec, study, out, t0, t1, axes.markMaps() ? marks : List.of()) : null;
        List<double[]> marked = axes.markMaps() ? marks : List.of();
        WaveScales gfpScales = out.stream().anyMatch(c -> c instanceof PanelContent.SpanTrace t && !t.diss())
                ? FigureScales.gfp(spec, study, out, t0, t1, marked) : null;
        WaveScales dissScales = out.stream().anyMatch(c -> c instanceof PanelContent.SpanTrace t && t.diss())
                ? FigureScales.diss(spec, study, t0, t1, marked) : null;
        MapScales mapScales = allMaps.isEmpty() ? null : FigureScales.maps(spec.maps(), allMaps);
        return new FigureContent(spec, out, waveScales, gfpScales, dissScales, mapScales);
    }

    private static Set<String> excluded(FigureSpec spec) {
        return Set.copyOf(spec.excludedParticipants());
    }

    private static String where(FigureSpec spec, int panelIndex) {
        int k = panelIndex;
        for (int r = 0; r < spec.rows().size(); r++) {
            int n = spec.rows().get(r).panels().size();
            if (k < n) {
                return "rows[" + r + "].panels[" + k + "]";
            }
            k -= n;
        }
        throw new IndexOutOfBoundsException(panelIndex);
    }

    private static ConditionExpression expression(String text, Study study, String where) {
        try {
            return ConditionExpression.parse(text, study);
        } catch (BadInputException e) {
            throw new BadInputException(where + ": " + e.getMessage(), e);
        }
    }

    private static PanelContent.Waveforms waveforms(FigureSpec spec, Study study, WaveformPanel panel,
            Map<String, ConditionExpression> waves, double t0, double t1, String where) {
        Region region;
        try {
            region = Region.parse(panel.channels(), study.channelLabels());
        } catch (BadInputException e) {
            throw new BadInputException(where + ".channels: " + e.getMessage(), e);
        }
        List<ShownCondition> shown = picked(spec, panel.conditions());
        List<ConfidenceBand> bands = bands(spec, study, shown, waves, region);
        TimeAxis axis = study.axis();
        int a = firstSample(axis, t0);
        int b = lastSample(axis, t1);
        double[] times = times(axis, a, b);
        List<WaveTrace> traces = new ArrayList<>();
        for (int k = 0; k < shown.size(); k++) {
            ShownCondition c = shown.get(k);
            ConfidenceBand band = bands.get(k);
            double[] mean = slice(band.mean(), a, b);
            double[] lower = null;
            double[] upper = null;
            if (spec.intervals().kind() != IntervalKind.NONE) {
                double[] h = slice(band.halfWidth(), a, b);
                lower = new double[h.length];
                upper = new double[h.length];
                for (int s = 0; s < h.length; s++) {
                    lower[s] = mean[s] - h[s];
                    upper[s] = mean[s] + h[s];
                }
            }
            traces.add(new WaveTrace(c.label(), Color.decode(c.colour()), c.dashed(), times, mean, lower, upper));
        }
        String title = panel.title() != null ? panel.title() : region.label();
        return new PanelContent.Waveforms(title, traces, panel.legend());
    }

    private static int firstSample(TimeAxis axis, double t0) {
        return Math.max(0, (int) Math.ceil(axis.fractionalIndex(t0) - 1e-9));
    }

    private static int lastSample(TimeAxis axis, double t1) {
        return Math.min(axis.samples() - 1, (int) Math.floor(axis.fractionalIndex(t1) + 1e-9));
    }

    private static double[] times(TimeAxis axis, int a, int b) {
        double[] times = new double[b - a + 1];
        for (int s = a; s <= b; s++) {
            times[s - a] = axis.timeMs(s);
        }
        return times;
    }

    private static List<ShownCondition> picked(FigureSpec spec, List<String> wanted) {
        List<ShownCondition> shown = new ArrayList<>();
        for (ShownCondition c : spec.conditions()) {
            if (wanted == null || wanted.contains(c.wave())) {
                shown.add(c);
            }
        }
        return shown;
    }

    /**
     * GFP of each shown wave's grand average over the field channels (those with positions,
     * as the span analysis uses): {@code span.FieldStatistics.gfp} sample by sample; or its DISS
     * to the reference map ({@code span.FieldStatistics.diss}), the map at the panel's reference
     * time or at the wave's GFP maximum inside the panel's window.
     */
    private static PanelContent.SpanTrace spanTrace(FigureSpec spec, Study study, SpanTracePanel panel,
            Map<String, ConditionExpression> waves, double t0, double t1, String where) {
        TimeAxis axis = study.axis();
        int a = firstSample(axis, t0);
        int b = lastSample(axis, t1);
        double[] times = times(axis, a, b);
        List<String> field = SpanAnalysis.fieldChannels(study);
        List<WaveTrace> traces = new ArrayList<>();
        for (ShownCondition c : picked(spec, panel.conditions())) {
            Waveforms average = GrandAverage.of(study, waves.get(c.wave()), GrandAverage.Weighting.UNWEIGHTED, excluded(spec))
                    .select(field);
            double[] map = new double[average.channelCount()];
            double[] values = new double[times.length];
            double[] reference = panel.isDiss() ? referenceMap(average, panel, where) : null;
            for (int s = a; s <= b; s++) {
                average.sampleInto(s, map);
                values[s - a] = reference == null ? FieldStatistics.gfp(map) : FieldStatistics.diss(map, reference);
            }
            traces.add(new WaveTrace(c.label(), Color.decode(c.colour()), c.dashed(), times, values, null, null));
        }
        return new PanelContent.SpanTrace(panel.title(), traces, panel.legend(), panel.isDiss());
    }

    /** A DISS trace's reference: the map at reference_ms, or at the GFP maximum inside window_ms. */
    private static double[] referenceMap(Waveforms average, SpanTracePanel panel, String where) {
        TimeAxis axis = average.axis();
        int at;
        if (panel.referenceMs() != null) {
            double t = panel.referenceMs();
            if (t < axis.firstMs() - axis.stepMs() / 2 || t > axis.lastMs() + axis.stepMs() / 2) {
                throw new BadInputException(where + ".reference_ms: " + TimeWindow.format(t) + " ms lies outside the data ("
                        + TimeWindow.format(axis.firstMs()) + ".." + TimeWindow.format(axis.lastMs()) + " ms)");
            }
            at = axis.nearestIndex(t);
        } else {
            int from = 0;
            int to = axis.samples() - 1;
            if (panel.windowMs() != null) {
                try {
                    TimeWindow.SampleRange r = new TimeWindow(panel.windowMs().get(0), panel.windowMs().get(1)).resolve(axis);
                    from = r.from();
                    to = r.to();
                } catch (BadInputException e) {
                    throw new BadInputException(where + ".window_ms: " + e.getMessage(), e);
                }
            }
            double[] map = new double[average.channelCount()];
            at = from;
            double best = -1;
            for (int s = from; s <= to; s++) {
                average.sampleInto(s, map);
                double g = FieldStatistics.gfp(map);
                if (g > best) {
                    best = g;
                    at = s;
                }
            }
        }
        double[] reference = new double[average.channelCount()];
        average.sampleInto(at, reference);
        return reference;
    }

    /**
     * One band per shown wave, in order. Within-participant intervals go to the loaded
     * conditions shown together (two or more); contrasts and lone conditions get the t-interval
     * across participants (see {@link IntervalKind}). With no intervals, the band's half-width is
     * computed but not drawn.
     */
    private static List<ConfidenceBand> bands(FigureSpec spec, Study study, List<ShownCondition> shown,
            Map<String, ConditionExpression> waves, Region region) {
        double level = spec.intervals().level();
        List<ConditionWave> atRegion = new ArrayList<>();
        List<Integer> plain = new ArrayList<>();
        for (int k = 0; k < shown.size(); k++) {
            ConditionExpression e = waves.get(shown.get(k).wave());
            atRegion.add(new RegionWave(e, region));
            if (e.isSingleCondition()) {
                plain.add(k);
            }
        }
        ConfidenceBand[] out = new ConfidenceBand[shown.size()];
        if (spec.intervals().kind() == IntervalKind.WITHIN_PARTICIPANTS && plain.size() >= 2) {
            List<ConditionWave> together = plain.stream().map(atRegion::get).toList();
            List<ConfidenceBand> within = ConfidenceBand.withinParticipants(study, together, level, excluded(spec));
            for (int j = 0; j < plain.size(); j++) {
                out[plain.get(j)] = within.get(j);
            }
        }
        for (int k = 0; k < out.length; k++) {
            if (out[k] == null) {
                out[k] = ConfidenceBand.acrossParticipants(study, atRegion.get(k), level, excluded(spec));
            }
        }
        return List.of(out);
    }

    private static double[] slice(Waveforms oneChannel, int a, int b) {
        double[] out = new double[b - a + 1];
        for (int s = a; s <= b; s++) {
            out[s - a] = oneChannel.value(0, s);
        }
        return out;
    }

    private static PanelContent.MapStrip mapStrip(FigureSpec spec, Study study, MapStripPanel panel,
            Map<Object, MapMaker> makers, String where) {
        MapSettings settings = spec.maps();
        ConditionExpression wave = expression(panel.condition(), study, where + ".condition");
        List<MapMoment> moments = new ArrayList<>();
        if (panel.timesMs() != null) {
            panel.timesMs().forEach(t -> moments.add(MapMoment.at(t)));
        } else {
            panel.windowsMs().forEach(w -> moments.add(MapMoment.window(w.get(0), w.get(1))));
        }
        List<String> labels = study.montage().labels();
        List<String> highlight = new ArrayList<>();
        for (String h : panel.highlight()) {
            try {
                highlight.addAll(Region.parse(h, labels).channels());
            } catch (BadInputException e) {
                throw new BadInputException(where + ".highlight: " + e.getMessage(), e);
            }
        }
        MapMaker maker = makers.computeIfAbsent(List.of(settings.quantity(), settings.extent(), settings.resolution()),
                k -> MapMaker.of(study.montage(), SplineParameters.defaults(), settings.quantity().quantity(),
                        MapExtent.parse(settings.extent()), settings.resolution()));
        Waveforms average = GrandAverage.of(study, wave, GrandAverage.Weighting.UNWEIGHTED, excluded(spec));
        List<ScalpMap> maps;
        try {
            maps = maker.maps(average, moments);
        } catch (BadInputException e) {
            throw new BadInputException(where + ": " + e.getMessage(), e);
        }
        // a wave that is also one of the figure's conditions is named as in the legend
        String title = panel.title() != null ? panel.title() : spec.conditions().stream()
                .filter(c -> c.wave().equals(panel.condition())).map(ShownCondition::label).findFirst()
                .orElse(wave.name());
        return new PanelContent.MapStrip(title, maps, Set.copyOf(highlight));
    }

    private static List<double[]> marks(MapStripPanel m) {
        List<double[]> out = new ArrayList<>();
        if (m.timesMs() != null) {
            double lo = m.timesMs().stream().mapToDouble(Double::doubleValue).min().orElseThrow();
            double hi = m.timesMs().stream().mapToDouble(Double::doubleValue).max().orElseThrow();
            out.add(lo == hi ? new double[] {lo - 2, hi + 2} : new double[] {lo, hi});
        } else {
            m.windowsMs().forEach(w -> out.add(new double[] {w.get(0), w.get(1)}));
        }
        return out;
    }

}
