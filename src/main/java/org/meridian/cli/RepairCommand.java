package org.meridian.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.meridian.core.Study;
import org.meridian.spline.ChannelRepair;
import org.meridian.spline.SplineParameters;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code repair STUDY --channels L,… -o DIR}: named channels interpolated from all others. */
@Command(name = "repair", mixinStandardHelpOptions = true,
        description = "Replace the named channels by the spherical-spline interpolation of all other "
                + "positioned channels, in every waveform, and write the result as a new study folder.")
final class RepairCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STUDY", description = "A manifest, its folder, a waveform file or a long table.")
    Path study;

    @Option(names = "--channels", required = true, split = ",", paramLabel = "LABEL",
            description = "The channels to repair, comma-separated (e.g. T7,P8).")
    List<String> channels;

    @Mixin
    StudyOutputOptions target;

    @Mixin
    SplineOptions spline;

    @Override
    public Integer call() {
        SplineParameters parameters = spline.parameters();
        Study in = target.loadInput(study);
        ChannelRepair repair = ChannelRepair.forStudy(in, channels, parameters);
        Study repaired = repair.of(in);
        target.write(repaired);
        PrintWriter out = spec.commandLine().getOut();
        out.println("output: " + target.output);
        out.println("repaired: " + String.join(", ", repair.repairedChannels()));
        out.println("from: " + repair.sourceChannelCount() + " positioned channels");
        out.println("waveforms: " + in.participants().size() * in.conditions().size());
        out.println("spline: " + parameters.describe());
        return Main.EXIT_OK;
    }
}
