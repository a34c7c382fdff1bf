package org.meridian.ui;

import java.nio.file.Path;
import org.meridian.core.Study;
import org.meridian.figure.FigureDrawing;
import org.meridian.figure.Figures;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.SpecFiles;
import org.meridian.io.OutputGuard;
import org.meridian.io.StudyLoader;
import org.meridian.io.StudyWriter;

/**
 * The composer's export, apart from Swing so it can run as a task and be tested: the figure, and
 * beside it its spec ({@code name.json}) naming the study relative to itself, so the
 * {@code figure} command makes the same file again. A study that exists only in memory (the
 * simulated demo, a study handed to the window without a file) is first written beside the
 * figure as a study folder ({@code name-study}, through {@link StudyWriter}: gzip-compressed,
 * 6 decimals), read back, and the figure drawn from what was read — so figure and command agree
 * to the byte. A folder of that name from an earlier export is replaced; any other is refused.
 */
final class FigureComposerExport {
    /** Digits after the decimal point of a written study: float precision for µV-sized values. */
    static final int STUDY_DECIMALS = 6;

    private FigureComposerExport() {
    }

    /**
     * What was written.
     *
     * @param writtenStudy the study folder written beside the figure, or null when the study was
     *                     already on disk
     */
    record Result(Path figure, Path spec, Path writtenStudy) {
    }

    /** The spec's file beside a figure: the same name with {@code .json}. */
    static Path specBeside(Path figure) {
        return figure.resolveSibling(baseName(figure) + ".json");
    }

    /** The folder a study in memory is written to beside a figure: {@code name-study}. */
    static Path studyBeside(Path figure) {
        return figure.resolveSibling(baseName(figure) + "-study");
    }

    /**
     * @param studyOnDisk the file or folder the study was read from, or null when it has none
     */
    static Result run(FigureSpec spec, Study data, Path studyOnDisk, Path figure, int dpi,
            Tasks.TaskProgress progress) {
        Path target = figure.toAbsolutePath();
        Path specFile = specBeside(target);
        OutputGuard.requireNotInput(data, "the figure", target);
        OutputGuard.requireNotInput(data, "the figure's spec", specFile);
        Path studyPath = studyOnDisk;
        Study drawn = data;
        Path written = null;
        progress.update(0, 4);
        if (studyPath == null) {
            written = studyBeside(target);
            StudyWriter.write(data, written, new StudyWriter.Options(true, STUDY_DECIMALS, true));
            drawn = StudyLoader.load(written);
            studyPath = written;
        }
        progress.checkCancelled();
        progress.update(1, 4);
        FigureSpec saved = spec.withStudy(Figures.studyReference(studyPath, specFile));
        FigureDrawing drawing = Figures.draw(saved, drawn);
        progress.checkCancelled();
        progress.update(2, 4);
        Figures.export(drawing, target, dpi);
        progress.update(3, 4);
        SpecFiles.write(saved, specFile);
        progress.update(4, 4);
        return new Result(target, specFile, written);
    }

    private static String baseName(Path figure) {
        String name = figure.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }
}
