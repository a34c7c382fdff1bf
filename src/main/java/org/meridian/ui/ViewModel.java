package org.meridian.ui;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;
import org.meridian.signal.ConditionExpression;
import org.meridian.signal.ConditionWave;

/**
 * The window's derived data, owned by the event thread: the opened {@link StudySession}, the
 * waves the study panel lists (loaded conditions and the contrasts written so far), and the
 * {@link Averages} of the shown waves. It watches the {@link ViewState}: when the shown waves or
 * the included participants change it recomputes the averages in a background task and, when
 * they arrive, tells its listeners. The processing of the state ({@link ViewState#processing()})
 * is applied to the study in the same background task, before any average. Panels read from here and never compute grand averages
 * themselves.
 */
public final class ViewModel {
    /** What changed in the model. */
    public enum Change {
        /** A new study was opened. */
        SESSION,
        /** A wave was added to or removed from the list. */
        CATALOGUE,
        /** New averages arrived. */
        AVERAGES
    }

    /** Listens to the model. */
    @FunctionalInterface
    public interface Listener {
        void modelChanged(ViewModel model, Set<Change> what);
    }

    private final ViewState state;
    private final Tasks tasks;
    private final Consumer<Throwable> errors;
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private StudySession session;
    private List<WaveEntry> catalogue = List.of();
    private int nextColour;
    private Averages averages = Averages.empty();
    private IntervalKind intervals = IntervalKind.WITHIN;

    public ViewModel(ViewState state, Tasks tasks, Consumer<Throwable> errors) {
        this.state = state;
        this.tasks = tasks;
        this.errors = errors;
        state.addListener((s, what) -> {
            if (session == null) {
                return;
            }
            boolean mapWaveMissing = what.contains(ViewState.Aspect.MAP_WAVE)
                    && averages.wave(s.mapWave()) == null;
            if (what.contains(ViewState.Aspect.WAVES) || what.contains(ViewState.Aspect.PARTICIPANTS)
                    || what.contains(ViewState.Aspect.PROCESSING) || mapWaveMissing) {
                recompute();
            }
        });
    }

    public void addListener(Listener l) {
        listeners.add(l);
    }

    public ViewState state() {
        return state;
    }

    public Tasks tasks() {
        return tasks;
    }

    /** The opened study, or null before the first one is open. */
    public StudySession session() {
        return session;
    }

    /**
     * Puts a newly opened study in place (its averages for the given shown waves and contrasts
     * already computed by the opening task), then resets the view state to the given defaults.
     */
    public void open(StudySession newSession, List<WaveEntry> entries, Averages computed, ViewDefaults d) {
        this.session = newSession;
        this.catalogue = List.copyOf(entries);
        this.nextColour = entries.stream().mapToInt(WaveEntry::colourIndex).max().orElse(-1) + 1;
        this.averages = computed;
        state.reset(newSession.study().axis(), d.cursorMs(), d.windowStartMs(), d.windowEndMs(),
                d.channels(), d.shownWaves(), d.mapWave());
        fire(EnumSet.allOf(Change.class));
    }

    /** The waves of a new session's panel: its conditions and the given contrasts, coloured in order. */
    public static List<WaveEntry> entriesFor(StudySession s, List<ConditionExpression> contrasts) {
        List<WaveEntry> out = new ArrayList<>();
        int colour = 0;
        for (ConditionWave c : s.conditions()) {
            out.add(new WaveEntry(c, false, colour++));
        }
        for (ConditionExpression c : contrasts) {
            out.add(new WaveEntry(c, true, colour++));
        }
        return out;
    }

    /** Every wave the study panel lists, conditions first. */
    public List<WaveEntry> catalogue() {
        return catalogue;
    }

    /** The listed wave of a name, or null. */
    public WaveEntry entry(String name) {
        for (WaveEntry e : catalogue) {
            if (e.name().equals(name)) {
                return e;
            }
        }
        return null;
    }

    /**
     * Adds a contrast to the list and shows it. An expression with the same terms as a listed
     * wave is not added twice; that wave is shown instead. Returns the listed name.
     */
    public String addContrast(ConditionExpression expression) {
        for (WaveEntry e : catalogue) {
            if (e.wave().equals(expression)) {
                show(e.name());
                return e.name();
            }
        }
        List<WaveEntry> next = new ArrayList<>(catalogue);
        next.add(new WaveEntry(expression, true, nextColour++));
        catalogue = List.copyOf(next);
        fire(EnumSet.of(Change.CATALOGUE));
        show(expression.name());
        return expression.name();
    }

    /** Removes a contrast (loaded conditions stay). */
    public void removeContrast(String name) {
        WaveEntry e = entry(name);
        if (e == null || !e.contrast()) {
            return;
        }
        List<WaveEntry> next = new ArrayList<>(catalogue);
        next.remove(e);
        catalogue = List.copyOf(next);
        List<String> shown = new ArrayList<>(state.shownWaves());
        shown.remove(name);
        fire(EnumSet.of(Change.CATALOGUE));
        state.setShownWaves(shown);
        if (state.mapWave().equals(name) && !shown.isEmpty()) {
            state.setMapWave(shown.get(0));
        }
    }

    private void show(String name) {
        List<String> shown = new ArrayList<>(state.shownWaves());
        if (!shown.contains(name)) {
            shown.add(name);
            state.setShownWaves(shown);
        }
    }

    /** The averages of the shown waves as last computed (possibly a moment behind the state). */
    public Averages averages() {
        return averages;
    }

    public IntervalKind intervals() {
        return intervals;
    }

    public void setIntervals(IntervalKind kind) {
        if (kind != intervals) {
            intervals = kind;
            recompute();
        }
    }

    /** The listed waves shown now, in the state's order. */
    public List<WaveEntry> shownEntries() {
        List<WaveEntry> out = new ArrayList<>();
        for (String n : state.shownWaves()) {
            WaveEntry e = entry(n);
            if (e != null) {
                out.add(e);
            }
        }
        WaveEntry map = entry(state.mapWave());
        if (map != null && !out.contains(map)) {
            out.add(map);
        }
        return out;
    }

    /**
     * The study every panel computes from: the opened one with the processing of the current
     * averages applied (the opened study itself when there is none), or null before any.
     */
    public org.meridian.core.Study study() {
        if (session == null) {
            return null;
        }
        return averages.study() != null ? averages.study() : session.study();
    }

    private void recompute() {
        StudySession s = session;
        List<WaveEntry> shown = shownEntries();
        Set<String> excluded = state.excludedParticipants();
        IntervalKind kind = intervals;
        org.meridian.signal.Processing processing = state.processing();
        Averages previous = averages;
        tasks.submit("averages", processing.isNone() ? "Grand averages" : "Processing and grand averages",
                p -> Averages.compute(s, processing, previous, shown, excluded, kind, p),
                result -> {
                    if (s == session) {
                        averages = result;
                        fire(EnumSet.of(Change.AVERAGES));
                    }
                }, errors);
    }

    private void fire(Set<Change> what) {
        for (Listener l : listeners) {
            l.modelChanged(this, what);
        }
    }
}
