package org.meridian.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.meridian.core.Study;
import org.meridian.spline.SplineParameters;
import org.meridian.spline.SurfaceLaplacian;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code csd STUDY -o DIR}: the CSD (surface Laplacian) of every waveform as a new study. */
@Command(name = "csd", mixinStandardHelpOptions = true,
        description = {"Write the current source density CSD = -(surface Laplacian) of every waveform, "
                + "in uV/m2, as a new study folder (spherical splines, Perrin et al. 1989).",
            "Channels without a position (e.g. EOG) are left out of the output."})
final class CsdCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STUDY", description = "A manifest, its folder, a waveform file or a long table.")
    Path study;

    @Mixin
    StudyOutputOptions target;

    @Mixin
    SplineOptions spline;

    @Override
    public Integer call() {
        SplineParameters parameters = spline.parameters();
        Study in = target.loadInput(study);
        Study csd = SurfaceLaplacian.of(in, parameters);
        target.write(csd);
        PrintWriter out = spec.commandLine().getOut();
        out.println("output: " + target.output);
        out.println("waveforms: " + in.participants().size() * in.conditions().size());
        out.println("channels: " + csd.channelLabels().size());
        out.println("unit: " + csd.unit().symbol());
        out.println("spline: " + parameters.describe());
        if (!in.unpositionedChannels().isEmpty()) {
            out.println("left_out: " + String.join(", ", in.unpositionedChannels()) + " (no position)");
        }
        return Main.EXIT_OK;
    }
}
