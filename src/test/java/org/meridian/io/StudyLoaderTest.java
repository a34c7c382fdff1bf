package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.ChannelPlacement;
import org.meridian.core.ChannelPlacement.How;
import org.meridian.core.Study;
import org.meridian.core.Unit;

class StudyLoaderTest {
    @TempDir
    Path dir;

    private Path file(String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.createDirectories(f.getParent());
        Files.writeString(f, text);
        return f;
    }

    /** A manifest of {@code n} participants, one condition, each file "time_ms Cz Pz". */
    private Path manifestOf(int n) throws IOException {
        StringBuilder m = new StringBuilder("participant\tcondition\tfile\ttrials\n");
        for (int p = 0; p < n; p++) {
            file("data/p" + p + ".tsv", "time_ms\tCz\tPz\n0\t" + p + "\t1\n4\t" + p + "\t2\n");
            m.append("p").append(p).append("\trare\tdata/p").append(p).append(".tsv\t").append(p)
                    .append('\n');
        }
        return file("study.tsv", m.toString());
    }

    @Test
    void detectsEveryKindOfStudyArgument() throws IOException {
        Path m = manifestOf(1);
        assertThat(StudyLoader.detect(dir)).isEqualTo(StudyLoader.Kind.MANIFEST);
        assertThat(StudyLoader.detect(m)).isEqualTo(StudyLoader.Kind.MANIFEST);
        assertThat(StudyLoader.detect(dir.resolve("data/p0.tsv")))
                .isEqualTo(StudyLoader.Kind.WAVEFORM_FILE);
        Path channels = file("c.csv", "channel,0,4\nCz,1,2\n");
        assertThat(StudyLoader.detect(channels)).isEqualTo(StudyLoader.Kind.WAVEFORM_FILE);
        Path seconds = file("s.csv", "time_s,Cz\n0,1\n0.004,2\n");
        assertThat(StudyLoader.detect(seconds)).isEqualTo(StudyLoader.Kind.WAVEFORM_FILE);
        Path longTable = file("l.tsv", "# unit: V\nvalue\ttime_ms\tchannel\tcondition\tparticipant\n"
                + "1e-6\t0\tCz\trare\tp1\n2e-6\t4\tCz\trare\tp1\n");
        assertThat(StudyLoader.detect(longTable)).isEqualTo(StudyLoader.Kind.LONG_TABLE);
        Study s = StudyLoader.load(longTable);
        assertThat(s.waveforms(0, 0).value(0, 1)).isEqualTo(2f);
    }

    @Test
    void aSingleFileIsOneParticipantAndOneConditionNamedAfterIt() throws IOException {
        Path f = file("p07_rare.tsv", "time_ms\tCz\n0\t1\n4\t2\n");
        VariantWriter.writeLines(dir.resolve("p07_rare.tsv.gz"), Files.readAllLines(f),
                new VariantWriter.Variant(null, null, false, true, null, null, false, 0));
        for (Path p : List.of(f, dir.resolve("p07_rare.tsv.gz"))) {
            Study s = StudyLoader.load(p);
            assertThat(s.participants()).containsExactly("p07_rare");
            assertThat(s.conditions()).containsExactly("p07_rare");
            assertThat(s.name()).isEqualTo(p.toString());
        }
    }

    @Test
    void progressCountsEveryFileOnTheCallingThread() throws IOException {
        Path m = manifestOf(7);
        List<int[]> seen = new ArrayList<>();
        Thread caller = Thread.currentThread();
        Study s = StudyLoader.load(m, (done, total) -> {
            assertThat(Thread.currentThread()).isSameAs(caller);
            seen.add(new int[] {done, total});
        });
        assertThat(seen).hasSize(8);
        for (int i = 0; i < seen.size(); i++) {
            assertThat(seen.get(i)).containsExactly(i, 7);
        }
        // files read in parallel still land in manifest order
        for (int p = 0; p < 7; p++) {
            assertThat(s.participants().get(p)).isEqualTo("p" + p);
            assertThat(s.waveforms(p, 0).value(0, 0)).isEqualTo((float) p);
            assertThat(s.trials(p, 0).getAsInt()).isEqualTo(p);
        }
    }

    @Test
    void cancellingStopsLoading() throws IOException {
        Path m = manifestOf(5);
        assertThatThrownBy(() -> StudyLoader.load(m, new StudyLoader.Progress() {
            private int calls;

            @Override
            public void update(int done, int total) {
                calls++;
            }

            @Override
            public boolean cancelled() {
                return calls >= 1;
            }
        })).isInstanceOf(CancellationException.class);
    }

    @Test
    void channelsInAnotherOrderAreMatchedByLabel() throws IOException {
        file("a.tsv", "time_ms\tCz\tPz\n0\t1\t2\n4\t1\t2\n");
        file("b.tsv", "channel\t0\t4\nPZ\t20\t20\ncz\t10\t10\n");
        file("study.tsv", "participant\tcondition\tfile\np1\trare\ta.tsv\np2\trare\tb.tsv\n");
        Study s = StudyLoader.load(dir);
        assertThat(s.waveforms(1, 0).labels()).containsExactly("Cz", "Pz");
        assertThat(s.waveforms(1, 0).value(0, 0)).isEqualTo(10f);
        assertThat(s.waveforms(1, 0).value(1, 1)).isEqualTo(20f);
    }

    @Test
    void aMontageBesideTheManifestPlacesItsLabelsFirst() throws IOException {
        file("a.tsv", "time_ms\tCz\tT3\tE17\tHEOG\tFpzz\n0\t1\t1\t1\t1\t1\n4\t1\t1\t1\t1\t1\n");
        file("study.tsv", "participant\tcondition\tfile\np1\trare\ta.tsv\n");
        file("montage.tsv", "label\ttheta\tphi\nE17\t40\t10\n");
        Study s = StudyLoader.load(dir);
        assertThat(s.placements()).containsExactly(
                new ChannelPlacement("Cz", How.STANDARD, ""),
                new ChannelPlacement("T3", How.ALIAS, "T7"),
                new ChannelPlacement("E17", How.MONTAGE_FILE, ""),
                new ChannelPlacement("HEOG", How.UNPOSITIONED, ""),
                new ChannelPlacement("Fpzz", How.UNPOSITIONED, "Fpz"));
        assertThat(s.montage().labels()).containsExactly("Cz", "T3", "E17");
        assertThat(s.montage().source()).isEqualTo(dir.resolve("montage.tsv")
                + " and standard 10-5 positions");
        assertThat(s.unpositionedChannels()).containsExactly("HEOG", "Fpzz");
    }

    @Test
    void fewerThanFourPositionedChannelsLoad() throws IOException {
        Study s = StudyLoader.load(file("a.csv", "time_ms,Cz,EOG\n0,1,1\n4,1,1\n"));
        assertThat(s.montage().size()).isEqualTo(1);
    }

    @Test
    void unitsAreConvertedToMicrovoltsAndCsdIsKept() throws IOException {
        assertThat(StudyLoader.load(file("v.tsv", "# unit: V\ntime_ms\tCz\n0\t1.5e-6\n4\t0\n"))
                .waveforms(0, 0).value(0, 0)).isEqualTo(1.5f);
        assertThat(StudyLoader.load(file("n.tsv", "#unit:nV\ntime_ms\tCz\n0\t2500\n4\t0\n"))
                .waveforms(0, 0).value(0, 0)).isEqualTo(2.5f);
        Study csd = StudyLoader.load(file("c.tsv", "# unit: µV/m²\ntime_ms\tCz\n0\t2500\n4\t0\n"));
        assertThat(csd.unit()).isEqualTo(Unit.MICROVOLT_PER_SQUARE_METRE);
        assertThat(csd.waveforms(0, 0).value(0, 0)).isEqualTo(2500f);
    }

    @Test
    void inputFilesAreNeverChanged() throws IOException {
        manifestOf(3);
        file("montage.tsv", "label\ttheta\tphi\nCz\t0\t0\n");
        Map<Path, byte[]> bytes = new HashMap<>();
        Map<Path, FileTime> times = new HashMap<>();
        List<Path> files;
        try (Stream<Path> s = Files.walk(dir)) {
            files = s.filter(Files::isRegularFile).toList();
        }
        for (Path f : files) {
            Files.setLastModifiedTime(f, FileTime.fromMillis(1_000_000_000_000L));
            bytes.put(f, Files.readAllBytes(f));
            times.put(f, Files.getLastModifiedTime(f));
        }
        StudyLoader.load(dir);
        for (Path f : files) {
            assertThat(Files.readAllBytes(f)).isEqualTo(bytes.get(f));
            assertThat(Files.getLastModifiedTime(f)).isEqualTo(times.get(f));
        }
        try (Stream<Path> s = Files.walk(dir)) {
            assertThat(s.filter(Files::isRegularFile).count()).isEqualTo(files.size());
        }
    }
}
