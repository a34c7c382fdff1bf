package org.meridian.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;
import org.meridian.figure.ExportFormat;
import org.meridian.figure.spec.FigureWidth;
import org.meridian.io.OutputGuard;
import org.meridian.io.StudyLoader;
import org.meridian.maps.ColourLimits;
import org.meridian.maps.ColourScales;
import org.meridian.maps.MapExtent;
import org.meridian.maps.MapMaker;
import org.meridian.maps.MapMoment;
import org.meridian.maps.MapStrip;
import org.meridian.maps.MapStyle;
import org.meridian.maps.ScalpMap;
import org.meridian.montage.Labels;
import org.meridian.signal.ConditionExpression;
import org.meridian.spline.Quantity;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code maps STUDY --condition EXPR (--times T,… | --windows A:B,…) -o FILE}: a strip of scalp
 * maps of a condition's grand average with one shared colour bar, as SVG, PDF, PNG or TIFF.
 */
@Command(name = "maps", mixinStandardHelpOptions = true,
        description = "Draw a strip of scalp maps (spherical-spline potential, or CSD with --csd) of a "
                + "condition's grand average at given times or as window means, with one colour bar.")
final class MapsCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STUDY", description = "A manifest, its folder, a waveform file or a long table.")
    Path study;

    @Option(names = "--condition", required = true, paramLabel = "EXPR", description = "The condition to map.")
    String condition;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Moments moments;

    static final class Moments {
        @Option(names = "--times", split = ",", paramLabel = "T", description = "Times in ms, e.g. 100,200,300.")
        List<String> times;

        @Option(names = "--windows", split = ",", paramLabel = "A:B",
                description = "Windows in ms, each map the mean over the window, e.g. 300:400,400:500.")
        List<String> windows;
    }

    @Option(names = "--csd", description = "Map the CSD (uV/m2) instead of the potential.")
    boolean csd;

    @Option(names = "--scale", paramLabel = "auto|±X|A:B", defaultValue = "auto",
            description = "Colour limits: auto (symmetric, rounded, shared by all maps), ±X, or fixed "
                    + "A:B such as -2:8 (zero keeps the middle colour).")
    String scale;

    @Option(names = "--colour-scale", paramLabel = "NAME", defaultValue = "diverging",
            description = "diverging (default) or blue-yellow (colour-blind safe).")
    String colourScale;

    @Option(names = "--extent", paramLabel = "head|electrodes[:MARGIN]", defaultValue = "electrodes",
            description = "Colour up to the head outline, or up to the outermost electrodes plus a margin "
                    + "(default; the margin in plane units, 1 = 90 degrees).")
    String extent;

    @Option(names = "--labels", description = "Label every electrode.")
    boolean labels;

    @Option(names = "--highlight", split = ",", paramLabel = "LABEL",
            description = "Electrodes to highlight (positioned channels of the study).")
    List<String> highlight = new ArrayList<>();

    @Option(names = "--no-contours", description = "Leave out the contour lines.")
    boolean noContours;

    @Option(names = "--width-mm", paramLabel = "MM",
            description = "Figure width in mm, 20 to 500 (default 85 for one or two maps, else 175).")
    Double widthMm;

    @Option(names = "--dpi", paramLabel = "DPI", defaultValue = "300", description = "PNG/TIFF resolution (default ${DEFAULT-VALUE}).")
    int dpi;

    @Option(names = "--resolution", paramLabel = "PIXELS", defaultValue = "256",
            description = "Map grid pixels across each map, 16 to 2048 and as memory allows "
                    + "(default ${DEFAULT-VALUE}).")
    int resolution;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "FILE", description = "FILE.svg, FILE.pdf, FILE.png or FILE.tiff.")
    Path output;

    @Mixin
    SplineOptions spline;

    @Mixin
    ProcessingOptions.WithBaseline processing;

    @Override
    public Integer call() {
        ExportFormat format = ExportFormat.of(output);
        if (resolution < 16 || resolution > 2048) {
            throw new BadInputException("option --resolution: must be from 16 to 2048, got " + resolution);
        }
        List<MapMoment> when = parseMoments();
        ColourLimits limits = OptionErrors.about("--scale", () -> ColourLimits.parse(scale));
        MapStyle style = MapStyle.defaults()
                .withScale(OptionErrors.about("--colour-scale", () -> ColourScales.byName(colourScale)))
                .withLabels(labels).withHighlighted(highlight).withContours(!noContours);
        MapExtent mapExtent = OptionErrors.about("--extent", () -> MapExtent.parse(extent));
        double width = widthMm == null ? 0 : OptionErrors.about("--width-mm", () -> FigureWidth.mm(widthMm)).mm();

        Study loaded = StudyLoader.load(study);
        OutputGuard.requireNotInput(loaded, "-o", output);
        Study in = processing.apply(loaded, spec.commandLine().getOut());
        requireAffordable(in.montage().size());
        requireOnMaps(in, highlight);
        Waveforms average = grandAverage(in, condition);
        String momentOption = moments.times != null ? "--times" : "--windows";
        for (MapMoment m : when) {
            OptionErrors.about(momentOption, () -> {
                m.requireWithin(average.axis());
                return m;
            });
        }
        MapMaker maker = MapMaker.of(in.montage(), spline.parameters(), csd ? Quantity.CSD : Quantity.POTENTIAL,
                mapExtent, resolution);
        List<ScalpMap> maps = maker.maps(average, when);
        MapStrip strip = limits == null ? MapStrip.withAutomaticLimits(maps, style) : new MapStrip(maps, limits, style);
        format.write(strip, output, width > 0 ? width : (maps.size() <= 2 ? 85 : 175), dpi);

        PrintWriter out = spec.commandLine().getOut();
        out.println("output: " + output);
        out.println("maps: " + maps.size());
        out.println("condition: " + condition);
        out.println("quantity: " + maps.get(0).unitLabel());
        out.println("limits: " + strip.limits().format(strip.limits().lower()) + " to "
                + strip.limits().format(strip.limits().upper()));
        out.println("channels: " + in.montage().size());
        if (!in.unpositionedChannels().isEmpty()) {
            out.println("left_out: " + String.join(", ", in.unpositionedChannels()) + " (no position)");
        }
        return Main.EXIT_OK;
    }

    /**
     * The map weights (pixels × channels floats) must fit in half the memory this Java may use;
     * otherwise an error naming the largest resolution that fits.
     */
    private void requireAffordable(int channels) {
        long budget = Runtime.getRuntime().maxMemory() / 2;
        if (MapMaker.weightBytes(resolution, channels) > budget) {
            throw new BadInputException(String.format(Locale.ROOT, "option --resolution: %d pixels across for "
                    + "%d channels needs up to %d MB of map weights, more than half the %d MB this Java may use; "
                    + "use --resolution %d or less (or give Java more memory with -Xmx)", resolution, channels,
                    MapMaker.weightBytes(resolution, channels) >> 20, Runtime.getRuntime().maxMemory() >> 20,
                    MapMaker.largestResolution(channels, budget)));
        }
    }

    /** Every highlighted label must be a positioned channel of the study. */
    private static void requireOnMaps(Study study, List<String> labels) {
        for (String label : labels) {
            if (study.montage().contains(label)) {
                continue;
            }
            boolean inData = study.unpositionedChannels().stream().anyMatch(label::equalsIgnoreCase);
            String why = inData ? "channel \"" + label + "\" has no position, so it is not on the maps"
                    : "no channel \"" + label + "\" on the maps" + (Labels.isNonScalp(label) ? ""
                            : Labels.nearest(label, study.montage().labels()).map(n -> "; did you mean " + n + "?")
                                    .orElse(""));
            throw new BadInputException("option --highlight: " + why);
        }
    }

    /** The grand average of the condition or contrast to map ({@code rare - frequent}). */
    static Waveforms grandAverage(Study study, String expression) {
        return OptionErrors.about("--condition", () -> ConditionExpression.parse(expression, study))
                .grandAverage(study);
    }

    private List<MapMoment> parseMoments() {
        List<MapMoment> out = new ArrayList<>();
        if (moments.times != null) {
            for (String t : moments.times) {
                double ms = number(t, "--times");
                out.add(OptionErrors.about("--times", () -> MapMoment.at(ms)));
            }
        } else {
            for (String w : moments.windows) {
                String[] ends = w.split(":", -1);
                if (ends.length != 2) {
                    throw new BadInputException("option --windows: \"" + w + "\" is not START:END in ms");
                }
                double start = number(ends[0], "--windows");
                double end = number(ends[1], "--windows");
                out.add(OptionErrors.about("--windows", () -> MapMoment.window(start, end)));
            }
        }
        return out;
    }

    private static double number(String text, String option) {
        try {
            return Double.parseDouble(text.trim());
        } catch (NumberFormatException e) {
            throw new BadInputException("option " + option + ": \"" + text + "\" is not a number of ms");
        }
    }
}
