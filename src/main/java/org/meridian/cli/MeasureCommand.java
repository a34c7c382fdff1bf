package org.meridian.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.io.AtomicFiles;
import org.meridian.io.OutputGuard;
import org.meridian.io.StudyLoader;
import org.meridian.measure.MeasureRequest;
import org.meridian.measure.MeasureSettings;
import org.meridian.measure.MeasureTable;
import org.meridian.measure.Measurement;
import org.meridian.measure.Measures;
import org.meridian.measure.Polarity;
import org.meridian.measure.Region;
import org.meridian.signal.Baseline;
import org.meridian.signal.ConditionExpression;
import org.meridian.signal.ConditionWave;
import org.meridian.signal.GrandAverage;
import org.meridian.signal.LateralisedWave;
import org.meridian.signal.TimeWindow;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code measure STUDY --window A:B --measure M …}: window and peak measures (DESIGN §6.3) as the
 * tidy table of §4, on standard output or into a file. Warnings (empty values, a window maximum
 * standing in for a local peak) go to standard error.
 */
@Command(name = "measure", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Measure windows and peaks of conditions, contrasts and lateralised waves.",
            "Writes one value a row: participant condition channel measure window_ms value unit."})
final class MeasureCommand implements Callable<Integer> {
    /** At most this many warnings are printed one by one; the rest are counted. */
    static final int WARNINGS_SHOWN = 20;

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STUDY",
            description = "A study manifest, its folder, a waveform file or a long table.")
    Path study;

    @Option(names = "--window", required = true, split = ",", paramLabel = "A:B",
            description = "Window(s) in ms, ends included, e.g. 300:500 (comma-separated or repeated).")
    List<String> windows;

    @Option(names = "--measure", required = true, split = ",", paramLabel = "M",
            description = "Measure(s): mean, peak, peak-latency, local-peak, local-peak-latency, "
                    + "area, frac-area-latency, frac-peak-latency.")
    List<String> measures;

    @Option(names = "--polarity", defaultValue = "pos", paramLabel = "pos|neg|signed",
            description = "Positive or negative peaks and areas, or the signed area (default: ${DEFAULT-VALUE}).")
    String polarity;

    @Option(names = "--fraction", defaultValue = "0.5", paramLabel = "F",
            description = "Fraction for frac-area-latency and frac-peak-latency, 0 < F <= 1 (default: ${DEFAULT-VALUE}).")
    double fraction;

    @Option(names = "--neighbourhood-ms", defaultValue = "20", paramLabel = "MS",
            description = "Span on each side that a local peak must exceed on average (default: ${DEFAULT-VALUE} ms).")
    double neighbourhoodMs;

    @Option(names = "--channels", split = ",", paramLabel = "L",
            description = "Channels, or regions joined by + (P3+Pz+P4, measured as their mean); default: every channel.")
    List<String> channels = new ArrayList<>();

    @Option(names = "--conditions", paramLabel = "EXPR,...",
            description = "Conditions or contrasts, e.g. \"rare, rare - common\"; quote names with "
                    + "spaces or operators in single quotes; default: every condition.")
    List<String> conditions = new ArrayList<>();

    @Option(names = "--lateralised", paramLabel = "LEFT,RIGHT",
            description = "A contra - ipsi wave from the conditions with left- and right-hemifield "
                    + "stimuli (each may be a contrast), under the right-hemisphere labels. Repeatable.")
    List<String> lateralised = new ArrayList<>();

    @Option(names = "--grand", description = "Add a row per measure for the grand average (participant 'grand').")
    boolean grand;

    @Option(names = "--jackknife",
            description = "Add the jackknife's retrieved scores (Smulders, 2010); their measure ends in ' (jackknife)'.")
    boolean jackknife;

    @Option(names = "--trial-weighted", description = "Weight the grand average by trial counts.")
    boolean trialWeighted;

    @Option(names = "--exclude", split = ",", paramLabel = "P",
            description = "Participants to leave out of every row and average.")
    List<String> exclude = new ArrayList<>();

    @Option(names = "--baseline", paramLabel = "A:B|pre",
            description = "Subtract each channel's mean over this window, after any filter ('pre': every sample before 0 ms); default: none.")
    String baseline;

    @Mixin
    ProcessingOptions processing;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Write here instead of to standard output.")
    Path output;

    @Override
    public Integer call() {
        Polarity chosen = OptionErrors.about("--polarity", () -> Polarity.parse(polarity));
        MeasureSettings withFraction = OptionErrors.about("--fraction",
                () -> MeasureSettings.defaults().withPolarity(chosen).withFraction(fraction));
        MeasureSettings settings = OptionErrors.about("--neighbourhood-ms",
                () -> withFraction.withNeighbourhoodMs(neighbourhoodMs));
        MeasureRequest.Builder request = MeasureRequest.builder().settings(settings).grand(grand)
                .jackknife(jackknife).excluded(new LinkedHashSet<>(exclude))
                .weighting(trialWeighted ? GrandAverage.Weighting.TRIALS : GrandAverage.Weighting.UNWEIGHTED);
        List<TimeWindow> parsedWindows = new ArrayList<>();
        for (String w : windows) {
            parsedWindows.add(OptionErrors.about("--window", () -> TimeWindow.parse(w)));
        }
        parsedWindows.forEach(request::window);
        for (String m : measures) {
            request.measure(OptionErrors.about("--measure", () -> Measures.byName(m)));
        }
        channels.forEach(request::channel);

        Study read = StudyLoader.load(study);
        OutputGuard.requireNotInput(read, "-o", output);
        Study loaded = processing.apply(read, null);
        // every option that refers to the study is checked against it here, so that an error
        // names the option at fault (DESIGN §9)
        for (TimeWindow w : parsedWindows) {
            OptionErrors.about("--window", () -> w.resolve(loaded.axis()));
        }
        Set<String> excluded = new LinkedHashSet<>(exclude);
        OptionErrors.about("--exclude", () -> GrandAverage.weights(loaded,
                GrandAverage.Weighting.UNWEIGHTED, excluded, p -> 1));
        Study data = baseline == null ? loaded : OptionErrors.about("--baseline", () -> withBaseline(loaded));
        List<ConditionWave> waves = conditionWaves(data);
        checkChannels(data, waves, excluded);
        waves.forEach(request::condition);
        MeasureTable table = Measurement.run(data, OptionErrors.about("--measure", request::build));

        if (output == null) {
            spec.commandLine().getOut().print(processing.commentLine(baseline) + table.toTsv());
        } else {
            AtomicFiles.writeString(output, processing.commentLine(baseline) + table.toTsv());
        }
        printWarnings(table, spec.commandLine().getErr());
        return Main.EXIT_OK;
    }

    private List<ConditionWave> conditionWaves(Study data) {
        List<ConditionWave> out = new ArrayList<>();
        for (String list : conditions) {
            out.addAll(OptionErrors.about("--conditions", () -> ConditionExpression.parseList(list, data.conditions())));
        }
        for (String pair : lateralised) {
            List<String> sides = ConditionExpression.splitList(pair);
            if (sides.size() != 2) {
                throw new BadInputException("option --lateralised: \"" + pair
                        + "\" is not LEFT,RIGHT (the conditions with left- and right-hemifield stimuli)");
            }
            out.add(OptionErrors.about("--lateralised", () -> LateralisedWave.of(
                    ConditionExpression.parse(sides.get(0), data.conditions()),
                    ConditionExpression.parse(sides.get(1), data.conditions()))));
        }
        if (out.isEmpty()) {
            for (String c : data.conditions()) {
                out.add(ConditionExpression.condition(c));
            }
        }
        return out;
    }

    private Study withBaseline(Study loaded) {
        if (baseline.trim().equalsIgnoreCase("pre")) {
            return loaded.mapWaveforms(loaded.name(), (p, c) -> Baseline.preStimulus(loaded.waveforms(p, c)));
        }
        TimeWindow w = TimeWindow.parse(baseline);
        w.resolve(loaded.axis());
        return loaded.mapWaveforms(loaded.name(), (p, c) -> Baseline.correct(loaded.waveforms(p, c), w));
    }

    /**
     * Reads every {@code --channels} entry against the channels of each wave (a lateralised
     * wave has only the right-hemisphere labels of its pairs), taken from the first included
     * participant.
     */
    private void checkChannels(Study data, List<ConditionWave> waves, Set<String> excluded) {
        if (channels.isEmpty()) {
            return;
        }
        int first = 0;
        while (GrandAverage.isExcluded(data.participants().get(first), excluded)) {
            first++;
        }
        for (ConditionWave wave : waves) {
            List<String> labels = wave.forParticipant(data, first).labels();
            String where = labels.equals(data.channelLabels()) ? "" : wave.name() + ": ";
            for (String spec : channels) {
                OptionErrors.about("--channels", () -> {
                    try {
                        return Region.parse(spec, labels);
                    } catch (BadInputException e) {
                        throw new BadInputException(where + e.getMessage(), e);
                    }
                });
            }
        }
    }

    /** Warnings one per line, at most {@link #WARNINGS_SHOWN}, then how many more there were. */
    static void printWarnings(MeasureTable table, PrintWriter err) {
        List<MeasureTable.Warning> warnings = table.warnings();
        for (int i = 0; i < Math.min(WARNINGS_SHOWN, warnings.size()); i++) {
            err.println("warning: " + warnings.get(i).describe());
        }
        if (warnings.size() > WARNINGS_SHOWN) {
            err.println("warning: " + (warnings.size() - WARNINGS_SHOWN) + " more warnings like these;"
                    + " their values are empty cells or marked in the measure column");
        }
    }
}
