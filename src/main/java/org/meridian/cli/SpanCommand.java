package org.meridian.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.meridian.core.Study;
import org.meridian.io.AtomicFiles;
import org.meridian.io.OutputGuard;
import org.meridian.io.StudyLoader;
import org.meridian.signal.ConditionExpression;
import org.meridian.signal.TimeWindow;
import org.meridian.span.SpanAnalysis;
import org.meridian.span.SpanReport;
import org.meridian.span.SpanReportText;
import org.meridian.span.SpanSettings;
import org.meridian.stats.Progress;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code span STUDY --condition EXPR --window A:B [...]}: span stability of one condition or
 * contrast over a window (DESIGN §7, §9). With {@code -o FILE} the per-sample table goes to the
 * file and the summary to standard output as {@code key: value} lines; without it, standard
 * output carries the table with the summary as {@code # key: value} comment lines above its
 * header, so it is one valid table either way.
 */
@Command(name = "span", mixinStandardHelpOptions = true, sortOptions = false,
        description = {
            "Span stability of a condition's scalp map over a window: per-sample GFP, spatial "
                    + "correlation and DISS against a reference map, a descriptive segmentation "
                    + "into topographic states, and the span test (does one map, at any strength "
                    + "and polarity, account for the whole window?).",
            "Output columns: time_ms gfp corr diss state. Summary keys include reference_ms, "
                    + "segments, diss, p and verdict (stable or changes)."})
final class SpanCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STUDY",
            description = "A study manifest, its folder, a waveform file or a long table.")
    Path study;

    @Option(names = "--condition", required = true, paramLabel = "EXPR",
            description = "A condition or a contrast, e.g. rare or 'rare - common'.")
    String condition;

    @Option(names = "--window", required = true, paramLabel = "A:B",
            description = "The window in ms, e.g. 300:500.")
    String window;

    @Option(names = "--split", paramLabel = "T",
            description = "Where the late part starts (ms); default: the middle of the window. "
                    + "Fix it before looking at the data.")
    Double split;

    @Option(names = "--reference-time", paramLabel = "T",
            description = "Time of the reference map (ms); default: the GFP maximum in the window.")
    Double referenceTime;

    @Option(names = "--csd", description = "Analyse the CSD (surface Laplacian, µV/m²) of the "
            + "positioned channels instead of the potential; --m, --lambda, --terms and --radius-m "
            + "set its spline.")
    boolean csd;

    @Mixin
    SplineOptions spline;

    @Mixin
    ProcessingOptions.WithBaseline processing;

    @Option(names = "--permutations", paramLabel = "N", defaultValue = "5000",
            description = "Random sign patterns when there are more than 16 participants "
                    + "(default: ${DEFAULT-VALUE}); up to 16 every pattern is used.")
    int permutations;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1",
            description = "Seed of the random patterns and of the segmentation (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--alpha", paramLabel = "A", defaultValue = "0.05",
            description = "Level of the verdict (default: ${DEFAULT-VALUE}).")
    double alpha;

    @Option(names = "--whiten", description = "Run the more conservative variant of the span "
            + "test that first whitens each participant's pair of part maps (fewer false alarms "
            + "and less power at high noise; its statistic has no unit). Default: the test as "
            + "defined, on the maps as measured.")
    boolean whiten;

    @Option(names = "--max-states", paramLabel = "K", defaultValue = "8",
            description = "Largest number of topographic states tried (default: ${DEFAULT-VALUE}).")
    int maxStates;

    @Option(names = "--restarts", paramLabel = "R", defaultValue = "20",
            description = "Clustering runs per number of states (default: ${DEFAULT-VALUE}).")
    int restarts;

    @Option(names = "--matrix", paramLabel = "FILE",
            description = "Also write the sample × sample correlation matrix here.")
    Path matrix;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "Write the per-sample table here; the summary goes to standard output.")
    Path output;

    @Override
    public Integer call() {
        TimeWindow w = OptionErrors.about("--window", () -> TimeWindow.parse(window));
        SpanSettings settings = OptionErrors.about("--window", () -> SpanSettings.window(w))
                .withCsd(csd).withSpline(spline.parameters())
                .withSegmentation(maxStates, restarts).withPermutations(permutations, seed)
                .withAlpha(alpha).withWhitening(whiten);
        if (split != null) {
            settings = settings.withSplitMs(split);
        }
        if (referenceTime != null) {
            settings = settings.withReferenceMs(referenceTime);
        }
        Study read = StudyLoader.load(study);
        OutputGuard.requireNotInput(read, "-o", output);
        OutputGuard.requireNotInput(read, "--matrix", matrix);
        Study s = processing.apply(read, spec.commandLine().getErr());
        ConditionExpression expression = OptionErrors.about("--condition", () -> ConditionExpression.parse(condition, s));
        SpanReport report = SpanAnalysis.run(s, expression.name(),
                p -> expression.forParticipant(s, p), settings, Progress.NONE);
        if (matrix != null) {
            AtomicFiles.writeString(matrix, SpanReportText.correlationMatrix(report));
        }
        if (output == null) {
            spec.commandLine().getOut().print(SpanReportText.table(report));
        } else {
            AtomicFiles.writeString(output, SpanReportText.table(report));
            spec.commandLine().getOut().print(SpanReportText.summaryLines(report, ""));
        }
        return Main.EXIT_OK;
    }
}
