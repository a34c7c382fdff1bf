package org.meridian.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.meridian.core.BadInputException;
import org.meridian.io.AtomicFiles;
import org.meridian.io.MontageWriter;
import org.meridian.montage.StandardSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code montage --system 10-20|10-10|10-5 [-o FILE]}: the standard positions as a montage TSV. */
@Command(name = "montage", mixinStandardHelpOptions = true,
        description = "Write the standard positions of the 10-20, 10-10 or 10-5 system "
                + "(label x y z on the unit sphere; +x right ear, +y nose, +z up).")
final class MontageCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--system", required = true, paramLabel = "10-20|10-10|10-5",
            description = "The electrode system.")
    String system;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "Write here instead of to standard output.")
    Path output;

    @Override
    public Integer call() throws IOException {
        StandardSystem sys = StandardSystem.parse(system);
        if (sys == null) {
            throw new BadInputException("option --system: \"" + system
                    + "\" is not one of 10-20, 10-10, 10-5");
        }
        String text = MontageWriter.toTsv(sys.montage());
        if (output == null) {
            spec.commandLine().getOut().print(text);
        } else {
            AtomicFiles.writeString(output, text);
        }
        return Main.EXIT_OK;
    }
}
