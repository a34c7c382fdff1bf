package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import java.util.zip.GZIPInputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.Study;
import org.meridian.io.StudyLoader;
import org.meridian.sim.ListeningDemo;

class SimulateCommandTest {
    /** The bundled demo study, relative to the project folder (where Maven runs the tests). */
    private static final Path DEMO = Path.of("samples", ListeningDemo.FOLDER);

    @TempDir
    Path tmp;

    @Test
    void theCommittedDemoStudyEqualsAFreshRunWithTheDocumentedCommand() throws IOException {
        Path fresh = tmp.resolve("demo");
        Result r = run("simulate", "-o", fresh.toString());
        assertThat(r.code).as(r.err).isZero();
        List<String> committed = relativeFiles(DEMO);
        assertThat(relativeFiles(fresh)).containsExactlyElementsOf(committed);
        assertThat(committed).contains("study.tsv", "truth.json");
        for (String f : committed) {
            // gzip bytes may differ between zlib builds, so compare what the files say
            assertThat(content(fresh.resolve(f))).as(f).isEqualTo(content(DEMO.resolve(f)));
        }
    }

    @Test
    void theDemoStudyStaysUnderFiveMegabytes() throws IOException {
        long total;
        try (Stream<Path> files = Files.walk(DEMO)) {
            total = files.filter(Files::isRegularFile).mapToLong(p -> p.toFile().length()).sum();
        }
        assertThat(total).isLessThan(5L * 1024 * 1024);
    }

    @Test
    void theDemoStudyLoadsWithItsLayout() {
        Study s = StudyLoader.load(DEMO);
        assertThat(s.participants()).hasSize(16);
        assertThat(s.conditions()).containsExactly("frequent", "rare");
        assertThat(s.channelLabels()).hasSize(64);
        assertThat(s.axis().samples()).isEqualTo(251);
        assertThat(s.unpositionedChannels()).isEmpty();
        assertThat(s.trials(0, 1)).isPresent();
    }

    @Test
    void printsASummaryAndWritesTheTruthBesideTheData() throws IOException {
        Path out = tmp.resolve("small");
        Result r = run("simulate", "--participants", "3", "--seed", "5", "--noise-scale", "0",
                "--no-gzip", "-o", out.toString());
        assertThat(r.code).as(r.err).isZero();
        assertThat(r.out).contains("participants: 3", "conditions: frequent, rare", "channels: 64",
                "samples: 251", "seed: 5");
        assertThat(Files.readString(out.resolve("truth.json"))).contains("\"seed\": 5");
        assertThat(StudyLoader.load(out).participants()).containsExactly("p01", "p02", "p03");
    }

    @Test
    void badOptionsAreOneLineErrorsWithExitCodeTwo() {
        Result r = run("simulate", "--participants", "0", "-o", tmp.resolve("x").toString());
        assertThat(r.code).isEqualTo(2);
        assertThat(r.err.strip()).isEqualTo("error: option --participants: must lie between 1 and 999, got 0");
        Result n = run("simulate", "--noise-scale", "-1", "-o", tmp.resolve("y").toString());
        assertThat(n.code).isEqualTo(2);
        assertThat(n.err).startsWith("error: option --noise-scale");
        assertThat(run("simulate").code).isEqualTo(2);
    }

    private record Result(int code, String out, String err) {
    }

    private static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Result(code, out.toString(), err.toString());
    }

    private static List<String> relativeFiles(Path root) throws IOException {
        try (Stream<Path> files = Files.walk(root)) {
            return files.filter(Files::isRegularFile).map(p -> root.relativize(p).toString().replace('\\', '/'))
                    .sorted().toList();
        }
    }

    private static String content(Path file) throws IOException {
        try (InputStream in = file.toString().endsWith(".gz")
                ? new GZIPInputStream(Files.newInputStream(file)) : Files.newInputStream(file)) {
            ByteArrayOutputStream buf = new ByteArrayOutputStream();
            in.transferTo(buf);
            return buf.toString(java.nio.charset.StandardCharsets.UTF_8);
        }
    }
}
