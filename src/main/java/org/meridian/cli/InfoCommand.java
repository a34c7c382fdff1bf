package org.meridian.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.meridian.core.Study;
import org.meridian.io.StudyLoader;
import org.meridian.io.StudySummary;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code info STUDY}: loads a study, checks it and prints its summary as key: value lines. */
@Command(name = "info", mixinStandardHelpOptions = true,
        description = "Load and check a study; print participants, conditions, channels, time"
                + " axis, unit, montage and how each label was placed, then any warnings.")
final class InfoCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "STUDY", description = "A study manifest (study.tsv), its folder,"
            + " a single waveform file or a long table.")
    Path study;

    @Override
    public Integer call() {
        StudyLoader.Kind kind = StudyLoader.detect(study);
        Study loaded = StudyLoader.load(study);
        PrintWriter out = spec.commandLine().getOut();
        for (String line : StudySummary.lines(loaded, kind)) {
            out.println(line);
        }
        return Main.EXIT_OK;
    }
}
