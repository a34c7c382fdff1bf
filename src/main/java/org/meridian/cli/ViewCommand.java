package org.meridian.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import org.meridian.core.BadInputException;
import org.meridian.signal.ConditionExpression;
import org.meridian.signal.TimeWindow;
import org.meridian.ui.Launcher;
import org.meridian.ui.Theme;
import org.meridian.ui.ViewOptions;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code view [STUDY]}: opens the window on a study, or on the demo study; returns when it is closed. */
@Command(name = "view", mixinStandardHelpOptions = true,
        description = "Open the window on a study (without STUDY: the bundled demo study).")
final class ViewCommand implements Callable<Integer> {
    @Parameters(paramLabel = "STUDY", arity = "0..1", description = "A study manifest (study.tsv), its"
            + " folder, a single waveform file or a long table; none: the demo study.")
    Path study;

    @Option(names = "--window", paramLabel = "A:B", description = "The time window in ms, e.g. 300:500.")
    String window;

    @Option(names = "--cursor", paramLabel = "MS", description = "The time cursor in ms.")
    Double cursor;

    @Option(names = "--channel", paramLabel = "LABEL", description = "The current channel, e.g. Pz.")
    String channel;

    @Option(names = "--conditions", paramLabel = "EXPR,…", description = "Conditions and contrasts to"
            + " show, e.g. 'rare, frequent, rare - frequent'.")
    String conditions;

    @Option(names = "--map", paramLabel = "EXPR", description = "The wave of the scalp map and span view.")
    String map;

    @Option(names = "--theme", paramLabel = "light|dark", description = "The theme (remembered).")
    String theme;

    @Override
    public Integer call() throws InterruptedException {
        OptionalDouble start = OptionalDouble.empty();
        OptionalDouble end = OptionalDouble.empty();
        if (window != null) {
            TimeWindow w = TimeWindow.parse(window);
            start = OptionalDouble.of(w.startMs());
            end = OptionalDouble.of(w.endMs());
        }
        List<String> waves = conditions == null ? List.of() : new ArrayList<>(ConditionExpression.splitList(conditions));
        Theme t = null;
        if (theme != null) {
            if (!theme.equalsIgnoreCase("light") && !theme.equalsIgnoreCase("dark")) {
                throw new BadInputException("option --theme: expected light or dark, got " + theme);
            }
            t = Theme.parse(theme);
        }
        ViewOptions options = new ViewOptions(start, end,
                cursor == null ? OptionalDouble.empty() : OptionalDouble.of(cursor),
                channel, waves, map);
        Launcher.showAndWait(study, options, t);
        return Main.EXIT_OK;
    }
}
