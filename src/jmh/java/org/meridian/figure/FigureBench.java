package org.meridian.figure;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.meridian.core.Study;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.SpecFiles;
import org.meridian.io.StudyLoader;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Speed of the showcase figure (docs/showcase.json: three waveform panels with intervals, five
 * 256 × 256 maps, the colour bar) once the study is loaded — what the composer's preview and
 * export cost:
 * <ul>
 *   <li>{@code content}: grand averages, contrasts and interval bands at three channels, spline
 *       maps (fit and weights included);</li>
 *   <li>{@code svg}, {@code pdf}: drawing the computed figure to SVG text and PDF bytes;</li>
 *   <li>{@code png300}: drawing it into a 300-dpi image (2067 × 984 pixels), not encoded.</li>
 * </ul>
 * Run from the project folder: {@code mvn -q -Pbench test-compile exec:exec -Dbench=FigureBench
 * -Djmh.args="-f 1 -wi 2 -i 3"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3)
@Measurement(iterations = 5)
public class FigureBench {
    private FigureSpec spec;
    private Study study;
    private FigureDrawing figure;

    @Setup
    public void load() {
        Path specFile = Path.of("docs", "showcase.json");
        spec = SpecFiles.read(specFile);
        study = StudyLoader.load(Figures.studyPath(spec, specFile));
        figure = Figures.draw(spec, study);
    }

    @Benchmark
    public FigureContent content() {
        return FigureContent.of(spec, study);
    }

    @Benchmark
    public String svg() {
        return Figures.svg(figure);
    }

    @Benchmark
    public byte[] pdf() {
        return PdfExport.bytes(figure, figure.widthMm(), figure.heightMm(), "bench");
    }

    @Benchmark
    public BufferedImage png300() {
        return RasterExport.render(figure, figure.widthMm(), figure.heightMm(), 300);
    }
}
