package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.InputFile;
import org.meridian.core.Study;
import org.meridian.core.Unit;

/** The loader names every file it read; the writer takes extra files into its temporary folder. */
class InputFilesTest {
    @TempDir
    Path dir;

    @Test
    void aManifestStudyListsItsManifestEveryWaveformFileAndItsMontage() throws Exception {
        Study s = RandomStudies.study(new Random(3), 2, 2, Unit.MICROVOLT);
        Path out = dir.resolve("s");
        StudyWriter.write(s, out, new StudyWriter.Options(true, 3, false));
        Files.writeString(out.resolve(StudyLoader.MONTAGE_NAME), "label\ttheta\tphi\n"
                + s.channelLabels().get(0) + "\t10\t20\n");
        Study back = StudyLoader.load(dir.resolve("s/../s"));
        assertThat(back.inputFiles()).extracting(InputFile::role).containsExactly(InputFile.Role.MANIFEST,
                InputFile.Role.WAVEFORMS, InputFile.Role.WAVEFORMS, InputFile.Role.WAVEFORMS,
                InputFile.Role.WAVEFORMS, InputFile.Role.MONTAGE);
        // canonical paths (no "..") that exist, gzip told by the bytes
        for (InputFile f : back.inputFiles()) {
            assertThat(f.path()).isAbsolute().exists().isEqualTo(f.path().toRealPath());
            assertThat(f.gzip()).isEqualTo(f.role() == InputFile.Role.WAVEFORMS);
        }
        assertThat(StudyWriter.compressedLikeInput(back)).isTrue();
        // a derived study keeps its origin, so its outputs are checked against the same files
        assertThat(back.mapWaveforms("copy", back::waveforms).inputFiles()).isEqualTo(back.inputFiles());
    }

    @Test
    void aSingleFileAndALongTableAreTheirOwnInput() throws Exception {
        Path one = Files.writeString(dir.resolve("one.tsv"), "time_ms\tCz\n0\t1\n4\t2\n");
        Study s = StudyLoader.load(one);
        assertThat(s.inputFiles()).containsExactly(new InputFile(one.toRealPath(), InputFile.Role.WAVEFORMS, false));
        assertThat(StudyWriter.compressedLikeInput(s)).isFalse();
        Path table = Files.writeString(dir.resolve("long.tsv"),
                "participant\tcondition\tchannel\ttime_ms\tvalue\np1\ta\tCz\t0\t1\np1\ta\tCz\t4\t2\n");
        assertThat(StudyLoader.load(table).inputFiles()).extracting(InputFile::role)
                .containsExactly(InputFile.Role.LONG_TABLE);
    }

    @Test
    void extraFilesArriveWithTheStudyAndMayNotReplaceOne() throws Exception {
        Study s = RandomStudies.study(new Random(4), 1, 1, Unit.MICROVOLT);
        Path out = dir.resolve("with-truth");
        StudyWriter.write(s, out, StudyWriter.Options.defaults(), Map.of("truth.json", "{}\n"));
        assertThat(Files.readString(out.resolve("truth.json"))).isEqualTo("{}\n");
        assertThat(StudyLoader.load(out).participants()).isEqualTo(s.participants());
        for (String bad : new String[] {"study.tsv", "MONTAGE.tsv", "../x", ".hidden", ""}) {
            assertThatThrownBy(() -> StudyWriter.write(s, dir.resolve("x"), StudyWriter.Options.defaults(),
                    Map.of(bad, "")))
                    .isInstanceOf(IllegalArgumentException.class);
        }
        assertThat(dir.resolve("x")).doesNotExist();
    }

    @Test
    void infoWarnsWhenChannelsMissingFromTheMontageFileTookTemplatePositions() throws Exception {
        Path data = Files.writeString(dir.resolve("d.tsv"), "time_ms\tFz\tCz\tPz\tT3\tEOG\n0\t1\t1\t1\t1\t1\n"
                + "4\t2\t2\t2\t2\t2\n");
        Files.writeString(dir.resolve(StudyLoader.MONTAGE_NAME), "label\ttheta\tphi\nFz\t45\t90\nCz\t0\t0\n");
        List<String> lines = StudySummary.lines(StudyLoader.load(data), StudyLoader.Kind.WAVEFORM_FILE);
        assertThat(lines).contains("warning: 2 channels are not in the montage file and took standard 10-5"
                + " (template) positions, mixed with the measured ones: Pz, T3");
        // without a montage file the standard positions are the expected source: no such warning
        Files.delete(dir.resolve(StudyLoader.MONTAGE_NAME));
        assertThat(StudySummary.lines(StudyLoader.load(data), StudyLoader.Kind.WAVEFORM_FILE))
                .noneMatch(l -> l.contains("template"));
    }
}
