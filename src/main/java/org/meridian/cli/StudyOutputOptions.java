package org.meridian.cli;

import java.nio.file.Path;
import org.meridian.core.Study;
import org.meridian.io.StudyLoader;
import org.meridian.io.StudyWriter;
import picocli.CommandLine.Option;

/**
 * The options of a command that writes a new study folder ({@code csd}, {@code repair}):
 * {@code -o DIR}, {@code --force} and {@code --decimals}, and the guard that keeps the output
 * away from the input.
 */
final class StudyOutputOptions {
    @Option(names = {"-o", "--output"}, required = true, paramLabel = "DIR", description = "The new study folder.")
    Path output;

    @Option(names = "--force", description = "Replace the output folder if it exists and is not empty.")
    boolean force;

    @Option(names = "--decimals", paramLabel = "N", defaultValue = "4",
            description = "Digits after the decimal point of every written value (default ${DEFAULT-VALUE}).")
    int decimals;

    /** Loads the input study after checking that the output folder cannot replace it. */
    Study loadInput(Path studyArgument) {
        StudyWriter.requireApartFromInput(studyArgument, output);
        return StudyLoader.load(studyArgument);
    }

    /** Writes the result, uncompressed, with the chosen decimals. */
    void write(Study result) {
        StudyWriter.write(result, output, new StudyWriter.Options(false, decimals, force));
    }
}
