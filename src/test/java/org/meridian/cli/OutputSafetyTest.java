package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.io.StudyLoader;
import org.meridian.io.StudyWriter;
import org.meridian.spline.TestFields;

/**
 * No writing command ever replaces a file the study was read from (DESIGN §2: "nothing ever
 * writes into a loaded input file"), whichever way the output names it: the manifest, a
 * waveform file, the montage file, a file the manifest reaches through {@code ../}, the figure
 * spec; and no output folder swallows or sits inside the input study. Every refusal is one
 * {@code error: option …} line, exit 2, and leaves every input byte as it was.
 */
class OutputSafetyTest {
    @TempDir
    Path dir;

    private Path study;
    private Map<Path, byte[]> before;

    @BeforeEach
    void writeStudy() throws Exception {
        study = SplineCommandFixture.write(TestFields.dipolar(1, 0, 0, 1), dir.resolve("in"));
        // a montage file beside the manifest, so it is one of the inputs too
        Files.writeString(study.resolve(StudyLoader.MONTAGE_NAME), "label\ttheta\tphi\nCz\t0\t0\n");
        before = snapshot(dir);
    }

    private static Map<Path, byte[]> snapshot(Path folder) throws Exception {
        Map<Path, byte[]> out = new HashMap<>();
        try (Stream<Path> files = Files.walk(folder)) {
            for (Path p : files.filter(Files::isRegularFile).toList()) {
                out.put(folder.relativize(p), Files.readAllBytes(p));
            }
        }
        return out;
    }

    private void assertRefused(CliRun r, String option, String why) throws Exception {
        assertThat(r.exitCode()).as(r.err()).isEqualTo(Main.EXIT_BAD_INPUT);
        assertThat(r.err().strip()).doesNotContain("\n").startsWith("error: option " + option + ": ")
                .contains(why);
        Map<Path, byte[]> after = snapshot(dir);
        assertThat(after.keySet()).containsExactlyInAnyOrderElementsOf(before.keySet());
        before.forEach((p, bytes) -> assertThat(after.get(p)).as(p.toString()).isEqualTo(bytes));
    }

    private List<Path> inputs() {
        return List.of(study.resolve("study.tsv"), study.resolve("p01_rare.tsv"),
                study.resolve(StudyLoader.MONTAGE_NAME), study.resolve("sub/../p02_common.tsv"));
    }

    @Test
    void measureNeverWritesOverAnInputFile() throws Exception {
        for (Path target : inputs()) {
            assertRefused(CliRun.of("measure", study.toString(), "--window", "0:40", "--measure", "mean",
                    "--channels", "Cz", "-o", target.toString()), "-o", "is an input file of the study");
        }
        // the manifest named as STUDY and as -o
        Path manifest = study.resolve("study.tsv");
        assertRefused(CliRun.of("measure", manifest.toString(), "--window", "0:40", "--measure", "mean",
                "-o", manifest.toString()), "-o", "(the study manifest ");
    }

    @Test
    void spanNeverWritesOverAnInputFileWithItsTableOrMatrix() throws Exception {
        for (Path target : inputs()) {
            assertRefused(CliRun.of("span", study.toString(), "--condition", "rare", "--window", "0:40",
                    "-o", target.toString()), "-o", "is an input file of the study");
            assertRefused(CliRun.of("span", study.toString(), "--condition", "rare", "--window", "0:40",
                    "--matrix", target.toString()), "--matrix", "is an input file of the study");
        }
    }

    @Test
    void mapsNeverWritesOverAnInputFile() throws Exception {
        // a waveform file renamed .png is still an input
        Path png = study.resolve("p01_rare.png");
        Files.copy(study.resolve("p01_rare.tsv"), png);
        Files.writeString(study.resolve("study.tsv"), Files.readString(study.resolve("study.tsv"))
                .replace("p01_rare.tsv", "p01_rare.png"));
        before = snapshot(dir);
        assertRefused(CliRun.of("maps", study.toString(), "--condition", "rare", "--times", "0",
                "--resolution", "16", "-o", png.toString()), "-o", "(a waveform file ");
    }

    @Test
    void figureNeverWritesOverItsSpecOrItsStudy() throws Exception {
        // a spec with an image extension, and a study whose data file is an .svg
        Path svg = study.resolve("p01_rare.svg");
        Files.copy(study.resolve("p01_rare.tsv"), svg);
        Files.writeString(study.resolve("study.tsv"), Files.readString(study.resolve("study.tsv"))
                .replace("p01_rare.tsv", "p01_rare.svg"));
        Path spec = dir.resolve("fig.svg");
        Files.writeString(spec, """
                {"study": "in", "size": {"width_mm": "one-column"},
                 "conditions": [{"wave": "rare"}],
                 "rows": [{"panels": [{"type": "waveforms", "channels": "Cz"}]}]}
                """);
        before = snapshot(dir);
        assertRefused(CliRun.of("figure", spec.toString(), "-o", spec.toString()), "-o", "is the figure spec");
        assertRefused(CliRun.of("figure", spec.toString(), "-o", svg.toString()), "-o",
                "is an input file of the study (a waveform file ");
    }

    @Test
    void csdAndRepairNeverPutTheirFolderOverOrInsideTheInput() throws Exception {
        for (Path target : List.of(study, dir, study.resolve("inner"), study.resolve("inner/deeper"))) {
            assertRefused(CliRun.of("csd", study.toString(), "-o", target.toString(), "--force"), "-o",
                    "write the result to another folder");
            assertRefused(CliRun.of("repair", study.resolve("study.tsv").toString(), "--channels", "C3",
                    "-o", target.toString(), "--force"), "-o", "write the result to another folder");
        }
        // a single waveform file of the study folder, given on its own, is still inside it
        assertRefused(CliRun.of("repair", study.resolve("p01_rare.tsv").toString(), "--channels", "C3",
                "-o", study.resolve("inner").toString()), "-o", "lies inside the folder of the input study");
    }

    @Test
    void aManifestReachingIntoAnotherStudyFolderProtectsThatFolderToo() throws Exception {
        // audit case: a/study.tsv lists ../b/…; b is itself a study; csd a -o b --force must not replace b
        Path a = Files.createDirectory(dir.resolve("a"));
        StringBuilder manifest = new StringBuilder("participant\tcondition\tfile\n");
        for (String p : List.of("p01", "p02")) {
            for (String c : List.of("rare", "common")) {
                manifest.append(p).append('\t').append(c).append("\t../in/").append(p).append('_').append(c)
                        .append(".tsv\n");
            }
        }
        Files.writeString(a.resolve("study.tsv"), manifest);
        before = snapshot(dir);
        assertRefused(CliRun.of("csd", a.toString(), "-o", study.toString(), "--force"), "-o",
                "holds an input file of the study (a waveform file ");
        assertRefused(CliRun.of("measure", a.toString(), "--window", "0:40", "--measure", "mean",
                "-o", study.resolve("p02_rare.tsv").toString()), "-o", "(a waveform file ");
        // a folder beside both is fine
        CliRun ok = CliRun.of("csd", a.toString(), "-o", dir.resolve("c").toString());
        assertThat(ok.exitCode()).as(ok.err()).isZero();
    }

    @Test
    void aLinkToAnInputIsAnInputToo() throws Exception {
        Path link = dir.resolve("link.tsv");
        try {
            Files.createSymbolicLink(link, study.resolve("p01_rare.tsv"));
        } catch (UnsupportedOperationException | java.io.IOException e) {
            return; // no symbolic links on this file system: nothing to check
        }
        before = snapshot(dir);
        assertRefused(CliRun.of("measure", study.toString(), "--window", "0:40", "--measure", "mean",
                "-o", link.toString()), "-o", "is an input file of the study");
    }

    @Test
    void csdAndRepairFollowTheInputsCompressionUnlessTold() throws Exception {
        Path zipped = dir.resolve("zipped");
        StudyWriter.write(StudyLoader.load(study), zipped, new StudyWriter.Options(true, 6, false));
        assertThat(CliRun.of("csd", zipped.toString(), "-o", dir.resolve("c1").toString()).exitCode()).isZero();
        assertThat(dir.resolve("c1/p01_rare.tsv.gz")).exists();
        assertThat(CliRun.of("csd", zipped.toString(), "-o", dir.resolve("c2").toString(), "--no-gzip")
                .exitCode()).isZero();
        assertThat(dir.resolve("c2/p01_rare.tsv")).exists();
        assertThat(CliRun.of("repair", study.toString(), "--channels", "C3", "-o", dir.resolve("r1").toString())
                .exitCode()).isZero();
        assertThat(dir.resolve("r1/p01_rare.tsv")).exists();
        assertThat(CliRun.of("repair", study.toString(), "--channels", "C3", "-o", dir.resolve("r2").toString(),
                "--gzip").exitCode()).isZero();
        assertThat(dir.resolve("r2/p01_rare.tsv.gz")).exists();
        // gzip is told by the bytes, as on reading
        assertThat(Files.readAllBytes(dir.resolve("r2/p01_rare.tsv.gz"))).startsWith((byte) 0x1f, (byte) 0x8b);
    }
}
