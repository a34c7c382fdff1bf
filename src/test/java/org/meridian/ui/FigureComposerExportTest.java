package org.meridian.ui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.figure.Figures;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.SpecFiles;
import org.meridian.io.StudyLoader;

/** The composer's export of a study that exists only in memory, as the simulated demo does. */
class FigureComposerExportTest {
    private static Study simulated;

    /** A small figure of the demo: one waveform panel and a two-map strip with its colour bar. */
    private static FigureSpec spec() {
        return SpecFiles.parse("""
                {"study": "(in memory)", "size": {"width_mm": "one-column"},
                 "conditions": [{"wave": "frequent"}, {"wave": "rare"}],
                 "processing": {"low_pass_hz": 30},
                 "maps": {"resolution": 40},
                 "rows": [{"panels": [{"type": "waveforms", "channels": "Pz", "legend": true}]},
                          {"panels": [{"type": "map-strip", "condition": "rare", "times_ms": [300, 400]},
                                      {"type": "colour-bar"}]}]}
                """, "composer");
    }

    @BeforeAll
    static void load() {
        // four participants of the bundled demo, held in memory with no folder (as the simulated demo)
        Study demo = StudyLoader.load(Path.of("samples", "two-tone-listening"));
        Study.Builder b = Study.builder("in memory").montage(demo.montage()).placements(demo.placements());
        for (int p = 0; p < 4; p++) {
            for (int c = 0; c < demo.conditions().size(); c++) {
                b.add(demo.participants().get(p), demo.conditions().get(c), demo.waveforms(p, c),
                        demo.trials(p, c).orElse(-1));
            }
        }
        simulated = b.build();
    }

    @Test
    void theFigureNeverLandsOnAFileTheStudyWasReadFrom(@TempDir Path dir) throws Exception {
        // common practice (and the project's rule): an export never replaces an input file
        Path folder = dir.resolve("copy");
        Files.createDirectories(folder);
        try (var files = Files.list(Path.of("samples", "two-tone-listening"))) {
            for (Path f : (Iterable<Path>) files::iterator) {
                Files.copy(f, folder.resolve(f.getFileName().toString()));
            }
        }
        Study read = StudyLoader.load(folder);
        Path manifest = folder.resolve("study.tsv");
        byte[] before = Files.readAllBytes(manifest);
        assertThatThrownBy(() -> FigureComposerExport.run(spec(), read, folder, manifest, 300, Tasks.TaskProgress.NONE))
                .isInstanceOf(BadInputException.class)
                .hasMessageStartingWith("the figure: ")
                .hasMessageContaining("is an input file of the study");
        assertThat(Files.readAllBytes(manifest)).isEqualTo(before);
    }

    @Test
    void aStudyInMemoryIsSavedBesideTheFigureAndTheSpecRefersToIt(@TempDir Path dir) throws Exception {
        Path svg = dir.resolve("late peak.svg");
        FigureComposerExport.Result r = FigureComposerExport.run(spec(), simulated, null, svg, 300, Tasks.TaskProgress.NONE);
        assertThat(r.writtenStudy()).isEqualTo(dir.resolve("late peak-study"));
        assertThat(r.spec()).isEqualTo(dir.resolve("late peak.json"));
        FigureSpec saved = SpecFiles.read(r.spec());
        // relative to the spec, so figure, spec and study move together
        assertThat(saved.study()).isEqualTo("late peak-study");
        Study back = StudyLoader.load(r.writtenStudy());
        assertThat(back.participants()).isEqualTo(simulated.participants());
        assertThat(back.conditions()).isEqualTo(simulated.conditions());
        // what the window exported is what the figure command makes from the saved spec (issue 8)
        assertThat(Files.readString(svg, StandardCharsets.UTF_8)).isEqualTo(Figures.svg(Figures.load(r.spec())));
        // exporting again replaces the study folder it wrote before
        assertThat(FigureComposerExport.run(spec(), simulated, null, svg, 300, Tasks.TaskProgress.NONE).writtenStudy())
                .isEqualTo(r.writtenStudy());
    }

    @Test
    void aStudyOnDiskIsReferredToAndNotCopied(@TempDir Path dir) {
        Path demo = Path.of("samples", "two-tone-listening").toAbsolutePath();
        Path pdf = dir.resolve("fig.pdf");
        FigureComposerExport.Result r = FigureComposerExport.run(spec(), StudyLoader.load(demo), demo, pdf, 300, Tasks.TaskProgress.NONE);
        assertThat(r.writtenStudy()).isNull();
        assertThat(Files.exists(dir.resolve("fig-study"))).isFalse();
        assertThat(Figures.studyPath(SpecFiles.read(r.spec()), r.spec())).isEqualTo(demo.normalize());
        assertThat(pdf).exists();
    }

    @Test
    void aFolderThatIsNotAStudyIsNeverReplaced(@TempDir Path dir) throws Exception {
        Path mine = Files.createDirectories(dir.resolve("fig-study"));
        Files.writeString(mine.resolve("notes.txt"), "keep me");
        assertThatThrownBy(() -> FigureComposerExport.run(spec(), simulated, null, dir.resolve("fig.svg"), 300, Tasks.TaskProgress.NONE))
                .isInstanceOf(BadInputException.class).hasMessageContaining("holds no study");
        assertThat(Files.readString(mine.resolve("notes.txt"))).isEqualTo("keep me");
    }
}
