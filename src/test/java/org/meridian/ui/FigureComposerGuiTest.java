package org.meridian.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.Supplier;
import org.assertj.swing.core.Robot;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.finder.WindowFinder;
import org.assertj.swing.fixture.DialogFixture;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.timing.Timeout;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.figure.ExportFormat;
import org.meridian.figure.Figures;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.Polarity;
import org.meridian.figure.spec.SpecFiles;
import org.meridian.figure.spec.WaveformPanel;

/**
 * The figure composer as a researcher uses it: opened from the toolbar on the demo study, it
 * starts from the view, previews, and exports an SVG with its spec beside it — the same bytes the
 * {@code figure} command makes from that spec. Runs under AssertJ Swing's check that every Swing
 * access happens on the event thread; needs a display (see {@link DisplayRequirement}).
 */
class FigureComposerGuiTest {
    private static DemoWindow demo;
    private static Robot robot;
    private static FrameFixture window;
    private static MainWindow frame;

    @BeforeAll
    static void openTheDemo() {
        demo = DemoWindow.open(new ViewOptions(OptionalDouble.of(280),
                OptionalDouble.of(400), OptionalDouble.of(340), "Pz", List.of(), ""), Timeout.timeout(60_000));
        robot = demo.robot;
        window = demo.window;
        frame = demo.frame;
        waitFor("the averages", () -> !frame.workbench().model().averages().isEmpty()
                && !frame.workbench().tasks().isRunning("averages"));
    }

    @AfterAll
    static void close() {
        DemoWindow.close(demo);
    }

    private static <T> T read(Supplier<T> s) {
        return demo.read(s);
    }

    private static void waitFor(String what, Supplier<Boolean> c) {
        demo.waitFor(what, c);
    }

    @Test
    void composesFromTheViewPreviewsAndExportsAnSvgWithItsSpecBesideIt(@TempDir Path dir) throws Exception {
        GuiActionRunner.execute(() -> {
            ViewState s = frame.workbench().state();
            s.setSelectedChannels(List.of("FCz", "Pz"));
            s.setPolarity(PolarityConvention.NEGATIVE_UP);
            s.setColourRange(ColourRange.locked(4));
        });
        window.button("toolbar.figure").requireEnabled().click();
        DialogFixture composer = WindowFinder.findDialog(FigureComposerDialog.class).withTimeout(10_000).using(robot);
        // starts from the view: its channels and the span view's six map times across 280–400 ms
        composer.textBox("figure.channels").requireText("FCz, Pz");
        composer.textBox("figure.times").requireText("280, 304, 328, 352, 376, 400");
        FigureComposerDialog dialog = (FigureComposerDialog) composer.target();
        waitFor("the preview", () -> dialog.preview().figure() != null
                && !frame.workbench().tasks().isRunning("figure.preview"));
        assertThat(read(() -> dialog.preview().figure().widthMm())).isEqualTo(175);
        assertThat(read(() -> dialog.preview().getPreferredSize().width)).isPositive();
        // the preview is an image drawn in the background at the screen's pixels per point
        int trueSize = read(() -> dialog.preview().image().getWidth());
        double expected = read(() -> 175 * dialog.preview().devicePixelsPerPoint() * ExportFormat.PT_PER_MM);
        assertThat((double) trueSize).isCloseTo(Math.ceil(expected), org.assertj.core.api.Assertions.within(1.0));
        composer.comboBox("figure.zoom").selectItem("200 %");
        waitFor("the preview at 200 %", () -> dialog.preview().image().getWidth() > 1.9 * trueSize
                && !frame.workbench().tasks().isRunning("figure.preview"));
        composer.comboBox("figure.zoom").selectItem("100 % (true size)");

        Path svg = dir.resolve("late peak.svg");
        composer.textBox("figure.file").setText(svg.toString());
        composer.button("figure.export").click();
        Path spec = dir.resolve("late peak.json");
        waitFor("the export", () -> Files.exists(spec) && !frame.workbench().tasks().isRunning("figure.export"));
        composer.label("figure.status").requireText("Saved late peak.svg (SVG) and late peak.json");

        FigureSpec saved = SpecFiles.read(spec);
        // the spec names the study relative to itself, so figure and spec can move together
        assertThat(Figures.studyPath(saved, spec)).isEqualTo(Path.of("samples", "two-tone-listening")
                .toAbsolutePath().normalize());
        assertThat(saved.panels()).filteredOn(p -> p instanceof WaveformPanel).extracting(p -> ((WaveformPanel) p).channels())
                .containsExactly("FCz", "Pz");
        // what you see is what you export: waves, their colours and dashes, polarity, colour limits
        assertThat(saved.conditions()).extracting(c -> c.wave()).containsExactly("frequent", "rare", "rare - frequent");
        List<WaveEntry> shown = read(() -> frame.workbench().model().shownEntries());
        for (int i = 0; i < shown.size(); i++) {
            int rgb = Theme.LIGHT.wave(shown.get(i).colourIndex()).getRGB() & 0xffffff;
            assertThat(saved.conditions().get(i).colour()).isEqualTo(String.format("#%06X", rgb));
            assertThat(saved.conditions().get(i).dashed()).isEqualTo(shown.get(i).contrast());
        }
        assertThat(saved.polarity()).isEqualTo(Polarity.NEGATIVE_UP);
        assertThat(saved.maps().limit()).isEqualTo(4.0);
        // what the window exported is what the figure command makes from the saved spec
        assertThat(Files.readString(svg, StandardCharsets.UTF_8)).isEqualTo(Figures.svg(Figures.load(spec)));
        composer.close();
    }
}
