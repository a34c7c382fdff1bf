package org.meridian.cli;

import java.nio.file.Path;
import org.meridian.core.Study;
import org.meridian.io.OutputGuard;
import org.meridian.io.StudyLoader;
import org.meridian.io.StudyWriter;
import picocli.CommandLine.Option;

/**
 * The options of a command that writes a new study folder ({@code csd}, {@code repair}):
 * {@code -o DIR}, {@code --force}, {@code --decimals} and {@code --[no-]gzip}, and the guard
 * that keeps the output away from every file the input was read from.
 */
final class StudyOutputOptions {
    @Option(names = {"-o", "--output"}, required = true, paramLabel = "DIR", description = "The new study folder.")
    Path output;

    @Option(names = "--force", description = "Replace the output folder if it exists and is not empty.")
    boolean force;

    @Option(names = "--decimals", paramLabel = "N", defaultValue = "4",
            description = "Digits after the decimal point of every written value (default ${DEFAULT-VALUE}).")
    int decimals;

    @Option(names = "--gzip", negatable = true,
            description = "Write the waveform files gzip-compressed (.tsv.gz), or not (--no-gzip). "
                    + "Default: like the input, compressed when all its waveform files are.")
    Boolean gzip;

    private Study input;

    /**
     * Loads the input study and refuses an output folder that holds any of its files or lies in
     * its folder, so even {@code --force} never replaces an input.
     */
    Study loadInput(Path studyArgument) {
        input = StudyLoader.load(studyArgument);
        OutputGuard.requireFolderApart(input, "-o", output);
        return input;
    }

    /** Writes the result with the chosen decimals and compression. */
    void write(Study result) {
        boolean compress = gzip != null ? gzip : StudyWriter.compressedLikeInput(input);
        StudyWriter.write(result, output, new StudyWriter.Options(compress, decimals, force));
    }
}
