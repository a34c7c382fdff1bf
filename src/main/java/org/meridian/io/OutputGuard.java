package org.meridian.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.meridian.core.BadInputException;
import org.meridian.core.InputFile;
import org.meridian.core.Study;

/**
 * The one rule every writing command follows: no output ever lands on a file a study was read
 * from ({@link Study#inputFiles()}: manifest, waveform files or long table, montage file), and
 * no output folder swallows one. Paths are compared by their real location (links and
 * {@code ..} resolved; for a path that does not exist yet, its deepest existing folder), so
 * {@code copy/./study.tsv}, a link to it and the manifest's {@code ../b/p01.tsv} are all caught.
 * Errors name the option at fault.
 */
public final class OutputGuard {
    private OutputGuard() {
    }

    /**
     * Refuses an output file that is one of the study's input files. Does nothing when
     * {@code output} is null (the option was not given).
     *
     * @param option the command-line option at fault ({@code -o}), or, for the window, words
     *               naming the output (the message then starts with those words)
     */
    public static void requireNotInput(Study study, String option, Path output) {
        requireNotInput(study, option, output, null, null);
    }

    /**
     * As {@link #requireNotInput(Study, String, Path)}, with one more input that is not part
     * of the study (e.g. a figure spec), described in words for the message.
     */
    public static void requireNotInput(Study study, String option, Path output, Path otherInput,
            String otherDescription) {
        if (output == null) {
            return;
        }
        Path out = located(output);
        if (otherInput != null && (out.equals(located(otherInput)) || sameFile(output, otherInput))) {
            throw new BadInputException(at(option) + output + " is "
                    + otherDescription + " being read; write the output to another file");
        }
        for (InputFile in : study.inputFiles()) {
            if (out.equals(in.path()) || sameFile(output, in.path())) {
                throw new BadInputException(at(option) + output
                        + " is an input file of the study (" + in.role().description() + " "
                        + in.path() + "); write the output to another file");
            }
        }
    }

    /**
     * Refuses an output folder (a study written by {@code csd} or {@code repair}, even with
     * {@code --force}) that holds any input file, or that is or lies inside a folder the input
     * study lives in: the manifest's folder, and any folder holding an input file beside a
     * {@code study.tsv}.
     */
    public static void requireFolderApart(Study study, String option, Path outputFolder) {
        Path out = located(outputFolder);
        for (InputFile in : study.inputFiles()) {
            if (in.path().startsWith(out)) {
                throw new BadInputException(at(option) + outputFolder
                        + " holds an input file of the study (" + in.role().description() + " "
                        + in.path() + "); write the result to another folder");
            }
        }
        for (Path folder : studyFolders(study)) {
            if (out.startsWith(folder)) {
                throw new BadInputException(at(option) + outputFolder
                        + " lies inside the folder of the input study (" + folder
                        + "); write the result to another folder");
            }
        }
    }

    /** The folders of the manifest and of every input file that sits beside a study.tsv. */
    private static List<Path> studyFolders(Study study) {
        Set<Path> folders = new LinkedHashSet<>();
        for (InputFile in : study.inputFiles()) {
            Path folder = in.path().getParent();
            if (folder != null && (in.role() == InputFile.Role.MANIFEST
                    || Files.isRegularFile(folder.resolve(StudyLoader.MANIFEST_NAME)))) {
                folders.add(folder);
            }
        }
        return new ArrayList<>(folders);
    }

    /**
     * Where a path really is: its real path when it exists, else the real path of its deepest
     * existing ancestor with the rest of the names appended.
     */
    static Path located(Path path) {
        Path abs = path.toAbsolutePath().normalize();
        Path existing = abs;
        while (existing != null && !Files.exists(existing, LinkOption.NOFOLLOW_LINKS)) {
            existing = existing.getParent();
        }
        if (existing == null) {
            return abs;
        }
        try {
            Path real = existing.toRealPath();
            return real.resolve(existing.relativize(abs)).normalize();
        } catch (IOException e) {
            return abs;
        }
    }

    /** Two names for one file (a hard link, a case-insensitive file system). */
    private static boolean sameFile(Path a, Path b) {
        try {
            return Files.exists(a) && Files.exists(b) && Files.isSameFile(a, b);
        } catch (IOException e) {
            return false;
        }
    }

    /** The start of an error: {@code option -o: } for an option, the words as given otherwise. */
    private static String at(String option) {
        return option.startsWith("-") ? "option " + option + ": " : option + ": ";
    }
}
