package org.meridian.ui;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.io.StudyLoader;
import org.meridian.signal.ConditionExpression;
import org.meridian.signal.TimeWindow;

/**
 * Opens a study off the event thread: reads it (with progress and Cancel), fits the spline and
 * builds the map weights, works out where the view starts, and computes the first averages, so
 * the window shows a complete picture at once. {@link #run} is the background part;
 * {@link Opened} carries everything the event thread puts in place.
 */
final class StudyOpener {
    /** The default window when the data covers it (the usual late-component window). */
    private static final double DEFAULT_START_MS = 300;
    private static final double DEFAULT_END_MS = 500;
    private static final String[] DEFAULT_CHANNELS = {"Pz", "Cz", "Fz"};

    /** The result of opening, for the event thread. */
    record Opened(StudySession session, List<WaveEntry> entries, Averages averages, ViewDefaults defaults) {
    }

    private StudyOpener() {
    }

    /** Reads a study from a path (null: the demo study) and prepares it; call off the event thread. */
    static Opened run(Path path, ViewOptions options, IntervalKind intervals, Tasks.TaskProgress progress) {
        StudySession session;
        if (path == null) {
            Optional<Path> bundled = DemoStudy.folder();
            if (bundled.isPresent()) {
                Study study = StudyLoader.load(bundled.get(), progress);
                session = StudySession.of(study, bundled.get(), "two-tone listening (demo)");
            } else {
                session = StudySession.of(DemoStudy.simulated(), null, "two-tone listening (demo, simulated)");
            }
        } else {
            Study study = StudyLoader.load(path, progress);
            session = StudySession.of(study, path, titleOf(path));
        }
        return prepare(session, options, intervals, progress);
    }

    /** Prepares a study already in memory: map weights, the view's start, the first averages. */
    static Opened prepare(StudySession session, ViewOptions options, IntervalKind intervals,
            Tasks.TaskProgress progress) {
        progress.checkCancelled();
        // the map weights are built on other threads while this one works out the averages
        java.util.concurrent.CompletableFuture<Void> maps = session.warmUpAsync();
        Study study = session.study();
        List<ConditionExpression> contrasts = new ArrayList<>();
        List<String> shown = new ArrayList<>();
        for (String text : options.waves()) {
            ConditionExpression e = ConditionExpression.parse(text, study);
            if (!e.isSingleCondition()) {
                contrasts.add(e);
            }
            shown.add(e.isSingleCondition() ? e.terms().get(0).condition() : e.name());
        }
        if (options.waves().isEmpty()) {
            shown.addAll(study.conditions().subList(0, Math.min(6, study.conditions().size())));
            if (study.conditions().size() == 2) {
                ConditionExpression difference = ConditionExpression.parse(
                        ConditionExpression.quoteIfNeeded(study.conditions().get(1)) + " - "
                        + ConditionExpression.quoteIfNeeded(study.conditions().get(0)), study);
                contrasts.add(difference);
                shown.add(difference.name());
            }
        }
        List<WaveEntry> entries = ViewModel.entriesFor(session, contrasts);
        String mapWave = options.mapWave().isEmpty() ? (contrasts.isEmpty() ? shown.get(0)
                : contrasts.get(0).name()) : canonicalName(options.mapWave(), entries, study);
        ViewDefaults defaults = defaults(study, options, shown, mapWave);
        List<WaveEntry> computed = new ArrayList<>();
        for (WaveEntry e : entries) {
            if (shown.contains(e.name()) || e.name().equals(mapWave)) {
                computed.add(e);
            }
        }
        Averages averages = Averages.compute(session, computed, java.util.Set.of(), intervals, progress);
        try {
            maps.join();
        } catch (java.util.concurrent.CompletionException e) {
            throw e.getCause() instanceof RuntimeException r ? r : e;
        }
        progress.checkCancelled();
        return new Opened(session, entries, averages, defaults);
    }

    private static String canonicalName(String text, List<WaveEntry> entries, Study study) {
        ConditionExpression e = ConditionExpression.parse(text, study);
        for (WaveEntry w : entries) {
            if (w.wave().equals(e)) {
                return w.name();
            }
        }
        throw new BadInputException("option --map: " + text + " is not among the shown waves");
    }

    static ViewDefaults defaults(Study study, ViewOptions o, List<String> shown, String mapWave) {
        TimeAxis axis = study.axis();
        double start;
        double end;
        if (axis.firstMs() <= DEFAULT_START_MS && axis.lastMs() >= DEFAULT_END_MS) {
            start = DEFAULT_START_MS;
            end = DEFAULT_END_MS;
        } else {
            double from = Math.max(0, axis.firstMs());
            double span = axis.lastMs() - from;
            start = from + span / 3;
            end = from + 2 * span / 3;
        }
        start = o.windowStartMs().orElse(start);
        end = o.windowEndMs().orElse(end);
        for (double t : new double[] {start, end}) {
            if (!axis.covers(t)) {
                throw new BadInputException("option --window: " + TimeWindow.format(t)
                        + " ms lies outside the data (" + TimeWindow.format(axis.firstMs()) + " to "
                        + TimeWindow.format(axis.lastMs()) + " ms)");
            }
        }
        double cursor = o.cursorMs().orElse((start + end) / 2);
        String channel = o.channel();
        if (channel.isEmpty()) {
            channel = study.channelLabels().get(0);
            for (String c : DEFAULT_CHANNELS) {
                int i = study.channelLabels().stream().map(String::toLowerCase).toList().indexOf(c.toLowerCase());
                if (i >= 0) {
                    channel = study.channelLabels().get(i);
                    break;
                }
            }
        } else {
            String wanted = channel;
            channel = study.channelLabels().stream().filter(wanted::equalsIgnoreCase).findFirst()
                    .orElseThrow(() -> new BadInputException("option --channel: the study has no channel "
                            + wanted));
        }
        return new ViewDefaults(cursor, start, end, List.of(channel), shown, mapWave);
    }

    static String titleOf(Path path) {
        Path p = path.toAbsolutePath().normalize();
        Path name = p.getFileName();
        if (name != null && name.toString().equalsIgnoreCase(StudyLoader.MANIFEST_NAME) && p.getParent() != null) {
            name = p.getParent().getFileName();
        }
        return name == null ? p.toString() : name.toString();
    }
}
