package org.meridian.figure;

import java.nio.file.Path;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.SpecFiles;
import org.meridian.io.StudyLoader;

/**
 * The entry points the command line and the window share, so both make the same figure from the
 * same spec: read a spec, find its study, compute its content, draw and export it.
 */
public final class Figures {
    private Figures() {
    }

    /** The study a spec names, resolved against the folder of the spec file. */
    public static Path studyPath(FigureSpec spec, Path specFile) {
        Path study = Path.of(spec.study());
        Path folder = specFile.toAbsolutePath().getParent();
        return study.isAbsolute() || folder == null ? study : folder.resolve(study).normalize();
    }

    /**
     * The study path as a spec saved at {@code specFile} should name it: relative to the spec's
     * folder when both are on one file system root, else absolute. Written with forward slashes
     * so the spec reads the same on every system.
     */
    public static String studyReference(Path study, Path specFile) {
        Path abs = study.toAbsolutePath().normalize();
        Path folder = specFile.toAbsolutePath().normalize().getParent();
        if (folder != null && abs.getRoot() != null && abs.getRoot().equals(folder.getRoot())) {
            String relative = folder.relativize(abs).toString().replace('\\', '/');
            return relative.isEmpty() ? "." : relative;
        }
        return abs.toString();
    }

    /** Computes and lays out a figure of a study already loaded. */
    public static FigureDrawing draw(FigureSpec spec, Study study) {
        return new FigureDrawing(FigureContent.of(spec, study));
    }

    /**
     * Reads a spec file, loads its study and computes the figure. Any problem with the spec is
     * reported with the spec file's name in front.
     */
    public static FigureDrawing load(Path specFile) {
        FigureSpec spec = SpecFiles.read(specFile);
        return draw(specFile, spec, StudyLoader.load(studyPath(spec, specFile)));
    }

    /**
     * Computes the figure of a spec read from {@code specFile} and its study, loaded by the
     * caller (which may check the study's input files first); problems name the spec file.
     */
    public static FigureDrawing draw(Path specFile, FigureSpec spec, Study study) {
        try {
            return draw(spec, study);
        } catch (BadInputException e) {
            throw new BadInputException(specFile + ": " + e.getMessage(), e);
        }
    }

    /** The figure as SVG text: the same bytes for the same spec and data, wherever made. */
    public static String svg(FigureDrawing figure) {
        return SvgExport.document(figure, figure.widthMm(), figure.heightMm());
    }

    /** Writes the figure in the format of the file's extension (dpi for PNG and TIFF). */
    public static void export(FigureDrawing figure, Path file, int dpi) {
        ExportFormat.of(file).write(figure, file, figure.widthMm(), figure.heightMm(), dpi);
    }
}
