package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.BadInputException;
import org.meridian.core.ChannelPlacement;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.io.StudyWriter.Options;

class StudyWriterTest {
    @TempDir
    Path dir;

    private static Study random(long seed) {
        return RandomStudies.study(new Random(seed), 3, 3, Unit.MICROVOLT);
    }

    @Test
    void writtenStudyLoadsBackWithinHalfALastDigit() {
        for (long seed = 0; seed < 20; seed++) {
            Study s = random(seed);
            int decimals = (int) (seed % 7);
            Path out = dir.resolve("out" + seed);
            StudyWriter.write(s, out, new Options(seed % 2 == 0, decimals, false));
            Study back = StudyLoader.load(out);
            assertThat(back.participants()).isEqualTo(s.participants());
            assertThat(back.conditions()).isEqualTo(s.conditions());
            assertThat(back.channelLabels()).isEqualTo(s.channelLabels());
            assertThat(back.axis().describeDifference(s.axis())).isNull();
            double half = 0.5 * Math.pow(10, -decimals);
            for (int p = 0; p < s.participants().size(); p++) {
                for (int c = 0; c < s.conditions().size(); c++) {
                    assertThat(back.trials(p, c)).isEqualTo(s.trials(p, c));
                    Waveforms a = back.waveforms(p, c);
                    Waveforms b = s.waveforms(p, c);
                    for (int ch = 0; ch < b.channelCount(); ch++) {
                        for (int t = 0; t < b.sampleCount(); t++) {
                            double tol = half + Math.ulp(a.value(ch, t)) + Math.ulp(b.value(ch, t));
                            assertThat((double) a.value(ch, t)).isCloseTo(b.value(ch, t),
                                    org.assertj.core.data.Offset.offset(tol));
                        }
                    }
                }
            }
        }
    }

    @Test
    void outputIsByteForByteRepeatable() throws IOException {
        Study s = random(11);
        for (boolean gzip : new boolean[] {false, true}) {
            Path a = dir.resolve("a" + gzip);
            Path b = dir.resolve("b" + gzip);
            StudyWriter.write(s, a, new Options(gzip, 4, false));
            StudyWriter.write(StudyLoader.load(a), b, new Options(gzip, 4, false));
            List<Path> files = list(a);
            assertThat(files).isNotEmpty();
            for (Path f : files) {
                assertThat(Files.readAllBytes(b.resolve(a.relativize(f))))
                        .as(f.toString()).isEqualTo(Files.readAllBytes(f));
            }
        }
    }

    @Test
    void layoutHasManifestUnitCommentsAndReadableNames() throws IOException {
        TimeAxis axis = new TimeAxis(-4, 250, 3);
        Waveforms w = Waveforms.wrap(List.of("Cz", "Pz"), axis, Unit.MICROVOLT,
                new float[] {1, 2, 3, -0.00004f, 5.5f, 6});
        Study s = Study.builder("s").add("p01", "rare", w, 40).add("p01", "target/2", w, -1)
                .add("p01", "target_2", w, 12).build();
        Path out = dir.resolve("out");
        StudyWriter.write(s, out, Options.defaults());
        assertThat(Files.readString(out.resolve("study.tsv"))).isEqualTo(
                "participant\tcondition\tfile\ttrials\n"
                        + "p01\trare\tp01_rare.tsv\t40\n"
                        + "p01\ttarget/2\tp01_target_2.tsv\tn/a\n"
                        + "p01\ttarget_2\tp01_target_2_2.tsv\t12\n");
        assertThat(Files.readString(out.resolve("p01_rare.tsv"))).isEqualTo(
                "# participant p01, condition rare\n"
                        + "# unit: uV\n"
                        + "time_ms\tCz\tPz\n"
                        + "-4\t1.0000\t0.0000\n"
                        + "0\t2.0000\t5.5000\n"
                        + "4\t3.0000\t6.0000\n");
        assertThat(out.resolve("montage.tsv")).doesNotExist();
    }

    @Test
    void csdStudiesKeepTheirUnit() throws IOException {
        Waveforms w = Waveforms.wrap(List.of("Cz"), new TimeAxis(0, 100, 2),
                Unit.MICROVOLT_PER_SQUARE_METRE, new float[] {1500, -2500});
        Path out = dir.resolve("csd");
        StudyWriter.write(Study.builder("s").add("p", "c", w).build(), out,
                new Options(true, 1, false));
        assertThat(out.resolve("p_c.tsv.gz")).exists();
        try (InputStream in = Files.newInputStream(out.resolve("p_c.tsv.gz"))) {
            assertThat(in.read()).isEqualTo(0x1f);
        }
        Study back = StudyLoader.load(out);
        assertThat(back.unit()).isEqualTo(Unit.MICROVOLT_PER_SQUARE_METRE);
        assertThat(back.waveforms(0, 0).value(0, 1)).isEqualTo(-2500f);
        assertThat(Files.readString(out.resolve("study.tsv"))).isEqualTo(
                "participant\tcondition\tfile\np\tc\tp_c.tsv.gz\n");
    }

    @Test
    void positionsFromAMontageFileAreWrittenAndFoundAgain() throws IOException {
        Path src = dir.resolve("src");
        Files.createDirectories(src);
        Files.writeString(src.resolve("a.tsv"), "time_ms\tCz\tE1\tE2\tHEOG\n0\t1\t2\t3\t4\n4\t1\t2\t3\t4\n");
        Files.writeString(src.resolve("study.tsv"), "participant\tcondition\tfile\np\tc\ta.tsv\n");
        Files.writeString(src.resolve("montage.tsv"), "label\ttheta\tphi\nE1\t30\t45\nE2\t60\t-120\n");
        Study s = StudyLoader.load(src);
        Path out = dir.resolve("out");
        StudyWriter.write(s, out, Options.defaults());
        assertThat(Files.readString(out.resolve("montage.tsv"))).contains("E1\t", "E2\t")
                .doesNotContain("Cz\t");
        Study back = StudyLoader.load(out);
        assertThat(back.placements()).extracting(ChannelPlacement::how).containsExactly(
                ChannelPlacement.How.STANDARD, ChannelPlacement.How.MONTAGE_FILE,
                ChannelPlacement.How.MONTAGE_FILE, ChannelPlacement.How.UNPOSITIONED);
        for (String l : List.of("Cz", "E1", "E2")) {
            assertThat(back.montage().find(l).orElseThrow().cosineTo(s.montage().find(l).orElseThrow()))
                    .isGreaterThan(1 - 1e-10);
        }
    }

    @Test
    void nonEmptyFolderIsRefusedWithoutForce() throws IOException {
        Path out = dir.resolve("out");
        Files.createDirectories(out);
        Files.writeString(out.resolve("notes.txt"), "mine");
        assertThatThrownBy(() -> StudyWriter.write(random(1), out, Options.defaults()))
                .isInstanceOf(BadInputException.class)
                .hasMessage(out + " already exists and is not empty; choose another folder or"
                        + " allow replacing it (--force)");
        assertThat(Files.readString(out.resolve("notes.txt"))).isEqualTo("mine");
        assertThat(leftovers()).isEmpty();
    }

    @Test
    void forceReplacesAStudyFolderWholly() throws IOException {
        Path out = dir.resolve("out");
        StudyWriter.write(random(1), out, Options.defaults());
        Files.writeString(out.resolve("stale.txt"), "old");
        Study second = random(2);
        StudyWriter.write(second, out, new Options(false, 4, true));
        assertThat(out.resolve("stale.txt")).doesNotExist();
        assertThat(StudyLoader.load(out).participants()).isEqualTo(second.participants());
        assertThat(leftovers()).isEmpty();
    }

    @Test
    void forceNeverReplacesAFolderThatHoldsNoStudy() throws IOException {
        Path out = dir.resolve("home");
        Files.createDirectories(out);
        Files.writeString(out.resolve("thesis.tex"), "years of work");
        assertThatThrownBy(() -> StudyWriter.write(random(1), out, new Options(false, 4, true)))
                .isInstanceOf(BadInputException.class)
                .hasMessage(out + " is not empty and holds no study (study.tsv); it is not"
                        + " replaced, even when forced");
        assertThat(Files.readString(out.resolve("thesis.tex"))).isEqualTo("years of work");
    }

    @Test
    void anEmptyFolderIsFilled() throws IOException {
        Path out = dir.resolve("empty");
        Files.createDirectories(out);
        StudyWriter.write(random(3), out, Options.defaults());
        assertThat(out.resolve("study.tsv")).exists();
        assertThat(leftovers()).isEmpty();
    }

    @Test
    void aFileOrAMissingParentIsRefused() throws IOException {
        Path file = dir.resolve("file");
        Files.writeString(file, "x");
        assertThatThrownBy(() -> StudyWriter.write(random(1), file, Options.defaults()))
                .hasMessage(file + " is a file, not a folder");
        Path orphan = dir.resolve("no/such/out");
        assertThatThrownBy(() -> StudyWriter.write(random(1), orphan, Options.defaults()))
                .hasMessage(orphan + ": the folder it would go in does not exist");
        assertThatThrownBy(() -> StudyWriter.write(random(1), dir.resolve("x"),
                new Options(false, 13, false))).hasMessage("decimals must be between 0 and 12, got 13");
    }

    @Test
    void namesAreMadeSafe() {
        assertThat(StudyWriter.safe("target 2")).isEqualTo("target_2");
        assertThat(StudyWriter.safe("../../etc")).isEqualTo("etc");
        assertThat(StudyWriter.safe(".hidden")).isEqualTo("hidden");
        assertThat(StudyWriter.safe("Früh")).isEqualTo("Früh");
        assertThat(StudyWriter.safe("///")).isEqualTo("x");
    }

    /** Temporary or set-aside folders left beside the outputs (names starting with a dot). */
    private List<Path> leftovers() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> p.getFileName().toString().startsWith(".")).toList();
        }
    }

    private static List<Path> list(Path folder) throws IOException {
        try (Stream<Path> s = Files.walk(folder)) {
            return s.filter(Files::isRegularFile).sorted().toList();
        }
    }
}
