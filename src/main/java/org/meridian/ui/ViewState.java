package org.meridian.ui;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.CopyOnWriteArrayList;
import javax.swing.SwingUtilities;
import org.meridian.core.TimeAxis;
import org.meridian.maps.ColourScale;
import org.meridian.maps.ColourScales;
import org.meridian.signal.Processing;

/**
 * The one model of the window's state (DESIGN §10): what the researcher looks at, not what is
 * computed from it. Every panel observes it and draws; a panel that wants a change asks for it
 * here, and every panel (itself included) redraws from the event that follows.
 *
 * <ul>
 * <li>the time cursor (ms, always on a sample) and the time window [start, end] (ms, on samples);
 * <li>the selected channels, the first one the <em>current</em> channel;
 * <li>the shown waves: loaded conditions and contrasts by name, in legend order, and the one the
 *     scalp map and span view show (the <em>map wave</em>);
 * <li>the participants left out of every grand average;
 * <li>potential or CSD for maps and the span view; the map moment (cursor or window mean);
 * <li>the colour range (automatic, symmetric about zero over the whole study, or locked), the
 *     colour scale, and the polarity convention of every waveform plot;
 * <li>the processing of every participant's averages before anything is computed from them
 *     (restored reference, re-reference, filter, baseline: {@link Processing}).
 * </ul>
 *
 * Changes happen on the event thread only; listeners learn which {@link Aspect}s changed. A
 * setter that changes nothing fires nothing.
 */
public final class ViewState {
    /** What part of the state changed. */
    public enum Aspect {
        CURSOR, WINDOW, CHANNELS, WAVES, MAP_WAVE, PARTICIPANTS, QUANTITY, MOMENT, COLOUR_RANGE, POLARITY,
        PROCESSING
    }

    /** Listens to the state. */
    @FunctionalInterface
    public interface Listener {
        void changed(ViewState state, Set<Aspect> what);
    }

    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private TimeAxis axis;
    private double cursorMs;
    private double windowStartMs;
    private double windowEndMs;
    private List<String> selectedChannels = List.of();
    private List<String> shownWaves = List.of();
    private String mapWave = "";
    private Set<String> excluded = Set.of();
    private MapQuantity quantity = MapQuantity.POTENTIAL;
    private MapMomentMode moment = MapMomentMode.CURSOR;
    private ColourRange colourRange = ColourRange.automatic();
    private PolarityConvention polarity = PolarityConvention.POSITIVE_UP;
    private ColourScale colourScale = ColourScales.DIVERGING;
    private Processing processing = Processing.none();

    /** Starts with a one-sample axis; {@link #reset} puts a study's axis in place. */
    public ViewState() {
        this.axis = new TimeAxis(0, 1000, 1);
    }

    public void addListener(Listener l) {
        listeners.add(l);
    }

    public void removeListener(Listener l) {
        listeners.remove(l);
    }

    /**
     * Puts a newly opened study's axis and defaults in place: cursor and window as given (snapped),
     * channels, waves and participants as given, no processing (its channels may not exist in the
     * new study). Fires every aspect.
     */
    public void reset(TimeAxis newAxis, double cursor, double start, double end, List<String> channels,
            List<String> waves, String newMapWave) {
        requireEventThread();
        this.axis = newAxis;
        this.windowStartMs = snap(Math.min(start, end));
        this.windowEndMs = snap(Math.max(start, end));
        this.cursorMs = snap(cursor);
        this.selectedChannels = List.copyOf(channels);
        this.shownWaves = List.copyOf(waves);
        this.mapWave = newMapWave;
        this.excluded = Set.of();
        this.processing = Processing.none();
        fire(EnumSet.allOf(Aspect.class));
    }

    public TimeAxis axis() {
        return axis;
    }

    public double cursorMs() {
        return cursorMs;
    }

    /** The sample index of the cursor. */
    public int cursorSample() {
        return axis.nearestIndex(cursorMs);
    }

    /** Moves the cursor to the sample nearest to a time, within the data. */
    public void setCursorMs(double ms) {
        requireEventThread();
        double t = snap(ms);
        if (t != cursorMs) {
            cursorMs = t;
            fire(EnumSet.of(Aspect.CURSOR));
        }
    }

    /** Moves the cursor by a number of samples (negative: earlier). */
    public void stepCursor(int samples) {
        setCursorMs(axis.timeMs(Math.max(0, Math.min(axis.samples() - 1, cursorSample() + samples))));
    }

    public double windowStartMs() {
        return windowStartMs;
    }

    public double windowEndMs() {
        return windowEndMs;
    }

    /**
     * Sets the time window; edges snap to samples and are put in order. A window needs at least
     * two samples: a narrower request keeps the previous window.
     */
    public void setWindow(double startMs, double endMs) {
        requireEventThread();
        double a = snap(Math.min(startMs, endMs));
        double b = snap(Math.max(startMs, endMs));
        if (axis.nearestIndex(b) - axis.nearestIndex(a) < 1) {
            return;
        }
        if (a != windowStartMs || b != windowEndMs) {
            windowStartMs = a;
            windowEndMs = b;
            fire(EnumSet.of(Aspect.WINDOW));
        }
    }

    /** The selected channels; the first is the current channel. */
    public List<String> selectedChannels() {
        return selectedChannels;
    }

    /** The current channel, or an empty string when none is selected. */
    public String currentChannel() {
        return selectedChannels.isEmpty() ? "" : selectedChannels.get(0);
    }

    /** Selects channels; the first becomes the current channel. Duplicates are dropped. */
    public void setSelectedChannels(List<String> channels) {
        requireEventThread();
        List<String> unique = new ArrayList<>(new LinkedHashSet<>(channels));
        if (!unique.equals(selectedChannels)) {
            selectedChannels = List.copyOf(unique);
            fire(EnumSet.of(Aspect.CHANNELS));
        }
    }

    /** Selects one channel alone (a plain click on it). */
    public void selectChannel(String channel) {
        setSelectedChannels(List.of(channel));
    }

    /** Adds a channel to the selection, or removes it when it is there and not the only one. */
    public void toggleChannel(String channel) {
        List<String> next = new ArrayList<>(selectedChannels);
        if (!next.removeIf(channel::equalsIgnoreCase)) {
            next.add(channel);
        }
        if (!next.isEmpty()) {
            setSelectedChannels(next);
        }
    }

    /** The shown waves (conditions and contrasts) by name, in legend order. */
    public List<String> shownWaves() {
        return shownWaves;
    }

    public void setShownWaves(List<String> waves) {
        requireEventThread();
        List<String> unique = List.copyOf(new LinkedHashSet<>(waves));
        if (!unique.equals(shownWaves)) {
            shownWaves = unique;
            fire(EnumSet.of(Aspect.WAVES));
        }
    }

    /** The wave the scalp map and the span view show. */
    public String mapWave() {
        return mapWave;
    }

    public void setMapWave(String wave) {
        requireEventThread();
        if (!wave.equals(mapWave)) {
            mapWave = wave;
            fire(EnumSet.of(Aspect.MAP_WAVE));
        }
    }

    /** The participants left out of every grand average (names as in the study). */
    public Set<String> excludedParticipants() {
        return excluded;
    }

    public void setExcludedParticipants(Set<String> names) {
        requireEventThread();
        Set<String> sorted = new TreeSet<>(names);
        if (!sorted.equals(excluded)) {
            excluded = Set.copyOf(sorted);
            fire(EnumSet.of(Aspect.PARTICIPANTS));
        }
    }

    public MapQuantity quantity() {
        return quantity;
    }

    public void setQuantity(MapQuantity q) {
        requireEventThread();
        if (q != quantity) {
            quantity = q;
            fire(EnumSet.of(Aspect.QUANTITY));
        }
    }

    public MapMomentMode moment() {
        return moment;
    }

    public void setMoment(MapMomentMode m) {
        requireEventThread();
        if (m != moment) {
            moment = m;
            fire(EnumSet.of(Aspect.MOMENT));
        }
    }

    public ColourRange colourRange() {
        return colourRange;
    }

    public void setColourRange(ColourRange r) {
        requireEventThread();
        if (!r.equals(colourRange)) {
            colourRange = r;
            fire(EnumSet.of(Aspect.COLOUR_RANGE));
        }
    }

    /** The colour scale of every map (the diverging scale by default); changes fire COLOUR_RANGE. */
    public ColourScale colourScale() {
        return colourScale;
    }

    public void setColourScale(ColourScale scale) {
        requireEventThread();
        if (scale != colourScale) {
            colourScale = scale;
            fire(EnumSet.of(Aspect.COLOUR_RANGE));
        }
    }

    public PolarityConvention polarity() {
        return polarity;
    }

    public void setPolarity(PolarityConvention p) {
        requireEventThread();
        if (p != polarity) {
            polarity = p;
            fire(EnumSet.of(Aspect.POLARITY));
        }
    }

    /** What is done to every participant's averages first ({@link Processing#none()}: nothing). */
    public Processing processing() {
        return processing;
    }

    public void setProcessing(Processing p) {
        requireEventThread();
        if (!p.equals(processing)) {
            processing = p;
            fire(EnumSet.of(Aspect.PROCESSING));
        }
    }

    /** A time clamped to the data and moved to the nearest sample. */
    public double snap(double ms) {
        return axis.timeMs(axis.nearestIndex(ms));
    }

    private void fire(Set<Aspect> what) {
        Set<Aspect> copy = Set.copyOf(what);
        for (Listener l : listeners) {
            l.changed(this, copy);
        }
    }

    private static void requireEventThread() {
        if (!SwingUtilities.isEventDispatchThread()) {
            throw new IllegalStateException("the view state changes on the event thread only");
        }
    }
}
