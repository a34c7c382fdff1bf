package org.meridian.ui;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.meridian.figure.spec.ColourBarPanel;
import org.meridian.figure.spec.FigureSize;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.FigureWidth;
import org.meridian.figure.spec.IntervalSpec;
import org.meridian.figure.spec.MapQuantity;
import org.meridian.figure.spec.MapSettings;
import org.meridian.figure.spec.MapStripPanel;
import org.meridian.figure.spec.PanelRow;
import org.meridian.figure.spec.PanelSpec;
import org.meridian.figure.spec.Polarity;
import org.meridian.figure.spec.ShownCondition;
import org.meridian.figure.spec.SpanTracePanel;
import org.meridian.figure.spec.WaveformPanel;
import org.meridian.maps.ColourLimits;
import org.meridian.signal.ConditionExpression;

/**
 * Builds a figure spec from what the window shows — what you see is what you export: the shown
 * waves in their colours (the light theme's, as a figure is printed on white) with contrasts
 * dashed, the interval kind, the polarity, the excluded participants, a waveform panel per
 * selected channel, the span view's map strip of the map wave (its times, quantity, colour scale
 * and colour limits) with the selected channels ringed, and the colour bar. The composer's own
 * choices (width, channels, map times, a GFP trace, letters) come in {@link Choices}.
 */
final class FigureFromView {
    private FigureFromView() {
    }

    /**
     * What the composer lets the researcher change before export. The maps are at times or over
     * windows ({@code [from, to]} ms): one of the two lists is empty.
     */
    record Choices(FigureWidth width, List<String> channels, List<Double> mapTimesMs,
            List<List<Double>> mapWindowsMs, boolean spanTrace, boolean letters) {
        Choices {
            channels = List.copyOf(channels);
            mapTimesMs = List.copyOf(mapTimesMs);
            mapWindowsMs = List.copyOf(mapWindowsMs);
        }
    }

    /**
     * The choices the view suggests, following its modes: its channels (one panel each, also
     * when they are overlaid — a spec's conditions own the colours, so channels get panels of
     * their own); the span view's strip times, or, when the scalp map shows window means, as
     * many equal windows across the view's window; a GFP trace when the waveforms show all
     * channels with the GFP; two columns for wide figures.
     *
     * @param mode the waveform view's mode, or null when there is none
     */
    static Choices suggested(ViewState state, int mapCount, WaveformMode mode) {
        List<String> channels = state.selectedChannels().isEmpty() ? List.of() : state.selectedChannels();
        List<Double> times = List.of();
        List<List<Double>> windows = List.of();
        if (state.moment() == MapMomentMode.WINDOW_MEAN) {
            windows = equalWindows(state.windowStartMs(), state.windowEndMs(), Math.max(1, mapCount));
        } else {
            times = SpanData.stripTimes(state.axis(), state.windowStartMs(), state.windowEndMs(), mapCount);
        }
        int maps = Math.max(times.size(), windows.size());
        FigureWidth width = channels.size() >= 2 || maps >= 4 ? FigureWidth.TWO_COLUMN : FigureWidth.ONE_COLUMN;
        return new Choices(width, channels, times, windows, mode == WaveformMode.BUTTERFLY, true);
    }

    /** [from, to] cut into n equal, touching windows, their edges rounded to 0.1 ms. */
    static List<List<Double>> equalWindows(double from, double to, int n) {
        List<List<Double>> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double a = Math.round((from + (to - from) * i / n) * 10) / 10.0;
            double b = Math.round((from + (to - from) * (i + 1) / n) * 10) / 10.0;
            out.add(List.of(a, b));
        }
        return out;
    }

    static FigureSpec build(ViewState state, ViewModel model, Choices choices, String studyReference) {
        List<ShownCondition> conditions = new ArrayList<>();
        for (WaveEntry e : model.shownEntries()) {
            conditions.add(new ShownCondition(waveText(e), e.name(), hex(Theme.LIGHT.wave(e.colourIndex())),
                    e.contrast()));
        }
        List<PanelRow> rows = new ArrayList<>();
        if (!choices.channels().isEmpty() && !conditions.isEmpty()) {
            List<PanelSpec> waves = new ArrayList<>();
            for (int i = 0; i < choices.channels().size(); i++) {
                WaveformPanel p = WaveformPanel.at(choices.channels().get(i));
                waves.add(i == choices.channels().size() - 1 ? p.withLegend(true) : p);
            }
            rows.add(new PanelRow(null, waves));
        }
        if (choices.spanTrace() && !conditions.isEmpty()) {
            rows.add(PanelRow.of(SpanTracePanel.gfp(rows.isEmpty())));
        }
        WaveEntry mapWave = model.entry(state.mapWave());
        boolean mappable = model.session() != null && model.session().hasMaps();
        boolean anyMaps = !choices.mapTimesMs().isEmpty() || !choices.mapWindowsMs().isEmpty();
        if (mappable && mapWave != null && anyMaps) {
            List<String> positioned = model.session().study().montage().labels();
            // ring the waveform channels that have a place on the head (regions and EOG channels have none)
            List<String> ringed = choices.channels().stream()
                    .filter(c -> positioned.stream().anyMatch(c::equalsIgnoreCase)).toList();
            MapStripPanel strip = choices.mapWindowsMs().isEmpty()
                    ? MapStripPanel.atTimes(waveText(mapWave), choices.mapTimesMs())
                    : new MapStripPanel(waveText(mapWave), null, choices.mapWindowsMs(), null, null, null);
            rows.add(PanelRow.of(strip.withHighlight(ringed), ColourBarPanel.standard()));
        }
        // as the span view: CSD where the study allows it, else the potential
        boolean csd = state.quantity() == org.meridian.ui.MapQuantity.CSD && model.session() != null
                && model.session().hasCsd();
        MapQuantity quantity = csd ? MapQuantity.CSD : MapQuantity.POTENTIAL;
        MapSettings maps = new MapSettings(quantity, state.colourScale().name(),
                colourLimit(state, model, csd ? org.meridian.ui.MapQuantity.CSD : org.meridian.ui.MapQuantity.POTENTIAL), null,
                null, null, null);
        return new FigureSpec(null, studyReference, new FigureSize(choices.width(), null), null, null,
                state.polarity() == PolarityConvention.NEGATIVE_UP ? Polarity.NEGATIVE_UP : Polarity.POSITIVE_UP,
                choices.letters(), conditions, List.copyOf(state.excludedParticipants()),
                org.meridian.figure.spec.ProcessingSpec.of(state.processing()),
                new IntervalSpec(intervals(model.intervals()), null, null), null, maps, rows);
    }

    /** The limit the window's maps use: locked, or the map wave's largest value (auto); null = the strip's own. */
    private static Double colourLimit(ViewState state, ViewModel model, org.meridian.ui.MapQuantity shown) {
        ColourRange range = state.colourRange();
        switch (range.mode()) {
            case LOCKED:
                return range.limit();
            case AUTO:
                Averages.WaveAverage w = model.averages().wave(state.mapWave());
                double max = w == null ? Double.NaN : w.maxAbs(shown);
                return Double.isFinite(max) && max > 0 ? ColourLimits.automatic(max).upper() : null;
            default:
                return null;
        }
    }

    private static org.meridian.figure.spec.IntervalKind intervals(IntervalKind kind) {
        return switch (kind) {
            case NONE -> org.meridian.figure.spec.IntervalKind.NONE;
            case ACROSS -> org.meridian.figure.spec.IntervalKind.ACROSS_PARTICIPANTS;
            case WITHIN -> org.meridian.figure.spec.IntervalKind.WITHIN_PARTICIPANTS;
        };
    }

    /** A wave as a spec writes it: a contrast as written, a condition quoted when it must be. */
    private static String waveText(WaveEntry e) {
        return e.contrast() ? e.name() : ConditionExpression.quoteIfNeeded(e.name());
    }

    private static String hex(Color c) {
        return String.format(Locale.ROOT, "#%06X", c.getRGB() & 0xffffff);
    }
}
