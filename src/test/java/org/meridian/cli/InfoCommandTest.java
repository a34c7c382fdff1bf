package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class InfoCommandTest {
    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    private void write(String name, String text) throws IOException {
        Files.writeString(dir.resolve(name), text);
    }

    @Test
    void summarisesAManifestStudy() throws IOException {
        String rows = "0\t1\t1\t1\t1\t1\t1\n4\t1\t1\t1\t1\t1\t1\n8\t1\t1\t1\t1\t1\t1\n";
        write("p01_rare.tsv", "# unit: mV\ntime_ms\tFz\tCz\tPz\tT3\tHEOG\tFcz\n" + rows);
        write("p01_common.tsv", "# unit: mV\ntime_ms\tFz\tCz\tPz\tT3\tHEOG\tFcz\n" + rows);
        write("p02_rare.tsv", "# unit: mV\ntime_ms\tFz\tCz\tPz\tT3\tHEOG\tFcz\n" + rows);
        write("p02_common.tsv", "# unit: mV\ntime_ms\tFz\tCz\tPz\tT3\tHEOG\tFcz\n" + rows);
        write("study.tsv", "participant\tcondition\tfile\ttrials\n"
                + "p01\trare\tp01_rare.tsv\t38\np01\tcommon\tp01_common.tsv\t150\n"
                + "p02\trare\tp02_rare.tsv\t41\np02\tcommon\tp02_common.tsv\tn/a\n");
        Run r = run("info", dir.toString());
        assertThat(r.err()).isEmpty();
        assertThat(r.code()).isZero();
        assertThat(r.out()).isEqualTo(String.join(System.lineSeparator(),
                "study: " + dir,
                "format: study manifest",
                "participants: 2",
                "participant_names: p01, p02",
                "conditions: rare, common",
                "channels: 6",
                "positioned_channels: 5",
                "samples: 3",
                "time_ms: 0..8",
                "sampling_hz: 250",
                "unit: µV",
                "montage: standard 10-5 positions",
                "labels_montage_file: 0",
                "labels_standard: 4",
                "labels_alias: 1 (T3 → T7)",
                "labels_unpositioned: 1 (HEOG)",
                "trials: 38..150 (known for 3 of 4 cells)",
                "warning: channel HEOG has no position (not in a montage file, not a standard 10-5"
                        + " label or alias): it is shown and measured but left out of maps, CSD and"
                        + " channel repair",
                "warning: CSD is coarse below 32 channels (this study has 5 positioned)",
                ""));
    }

    @Test
    void warnsOfLikelyTyposAndImpossibleMaps() throws IOException {
        write("one.csv", "time_s,Cz,Pzz,EOG\n-0.1,1,2,3\n-0.098,1,2,3\n");
        Run r = run("info", dir.resolve("one.csv").toString());
        assertThat(r.code()).isZero();
        assertThat(r.out()).contains("format: waveform file", "participant_names: one",
                "conditions: one", "time_ms: -100..-98", "sampling_hz: 500",
                "labels_unpositioned: 2 (Pzz, EOG)",
                "warning: channel Pzz has no position (not in a montage file, not a standard 10-5"
                        + " label or alias): it is shown and measured but left out of maps, CSD and"
                        + " channel repair; is it a misspelling of Pz?",
                "warning: only 1 positioned channel: maps, CSD and channel repair are impossible"
                        + " (they need at least 4)")
                .doesNotContain("trials:", "CSD is coarse");
    }

    @Test
    void namesTheMontageFileAndTheCsdUnit() throws IOException {
        write("a.tsv", "# unit: uV/m2\ntime_ms\tE1\tE2\tE3\tE4\n0\t1\t1\t1\t1\n2\t1\t1\t1\t1\n");
        write("study.tsv", "participant\tcondition\tfile\np\tc\ta.tsv\n");
        write("montage.tsv", "label\tx\ty\tz\nE1\t0\t0\t9\nE2\t9\t0\t0\nE3\t0\t9\t0\nE4\t-9\t0\t0\n");
        Run r = run("info", dir.resolve("study.tsv").toString());
        assertThat(r.code()).isZero();
        assertThat(r.out()).contains("unit: µV/m²", "montage: " + dir.resolve("montage.tsv"),
                "labels_montage_file: 4", "labels_standard: 0", "sampling_hz: 500");
    }

    @Test
    void invalidInputExitsTwoWithOneErrorLine() throws IOException {
        write("bad.tsv", "time_ms\tCz\n0\t1\n4\tx\n");
        Run r = run("info", dir.resolve("bad.tsv").toString());
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.out()).isEmpty();
        assertThat(r.err()).isEqualTo("error: " + dir.resolve("bad.tsv")
                + " line 3 column 2: \"x\" is not a number" + System.lineSeparator());
    }

    @Test
    void missingStudyExitsTwo() {
        Run r = run("info", dir.resolve("nope").toString());
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).startsWith("error: " + dir.resolve("nope") + ": file or folder does not"
                + " exist");
    }
}
