package org.meridian.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.meridian.core.Study;
import org.meridian.figure.ExportFormat;
import org.meridian.figure.FigureDrawing;
import org.meridian.figure.Figures;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.SpecFiles;
import org.meridian.io.OutputGuard;
import org.meridian.io.StudyLoader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code figure SPEC -o FILE.svg|pdf|png|tiff [--dpi N]}: renders a saved figure spec headless,
 * exactly as the window's figure composer does.
 */
@Command(name = "figure", mixinStandardHelpOptions = true,
        description = "Render a figure from a saved spec (JSON) as SVG, PDF, PNG or TIFF at its size in mm.")
final class FigureCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "SPEC", description = "The figure spec (JSON), e.g. made by the window's figure composer.")
    Path specFile;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "FILE",
            description = "FILE.svg, FILE.pdf, FILE.png or FILE.tiff.")
    Path output;

    @Option(names = "--dpi", paramLabel = "N", defaultValue = "600",
            description = "Resolution of PNG and TIFF output, " + ExportFormat.MIN_DPI + "–" + ExportFormat.MAX_DPI
                    + " (default ${DEFAULT-VALUE}; journals ask for 300 for photographs, 600 for line art).")
    int dpi;

    @Override
    public Integer call() {
        ExportFormat format = ExportFormat.of(output);
        if (format.isRaster()) {
            ExportFormat.requireDpi(dpi, "option --dpi");
        }
        FigureSpec figureSpec = SpecFiles.read(specFile);
        Study study = StudyLoader.load(Figures.studyPath(figureSpec, specFile));
        OutputGuard.requireNotInput(study, "-o", output, specFile, "the figure spec");
        FigureDrawing figure = Figures.draw(specFile, figureSpec, study);
        Figures.export(figure, output, dpi);
        PrintWriter out = spec.commandLine().getOut();
        out.println("output: " + output);
        out.println("format: " + format.extension());
        out.println(String.format(Locale.ROOT, "size_mm: %.1f x %.1f", figure.widthMm(), figure.heightMm()));
        if (format.isRaster()) {
            out.println("dpi: " + dpi);
        }
        out.println("panels: " + figure.content().panels().size());
        return Main.EXIT_OK;
    }
}
