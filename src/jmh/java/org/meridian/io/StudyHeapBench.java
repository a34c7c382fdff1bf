package org.meridian.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.meridian.core.Study;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Loads a generated study of 100 participants × 4 conditions × 128 channels × 1000 samples
 * (400 files, about 460 MB of text) through {@link StudyLoader} in a JVM limited to 450 MB of
 * heap: the benchmark completing shows the study fits. After each load the heap still in use
 * is printed; the values alone take 100·4·128·1000·4 B = 204.8 MB (195.3 MiB). The time per load is the
 * whole study read on all cores.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(value = 1, jvmArgsAppend = {"-Xmx450m"})
@Warmup(iterations = 1)
@Measurement(iterations = 3)
public class StudyHeapBench {
    static final int PARTICIPANTS = 100;
    static final String[] CONDITIONS = {"rare", "common", "target", "novel"};
    static final int CHANNELS = 128;
    static final int SAMPLES = 1000;

    Path dir;
    Study loaded;

    @Setup(Level.Trial)
    public void generate() throws IOException {
        dir = Files.createTempDirectory("meridian-heapbench");
        StringBuilder manifest = new StringBuilder("participant\tcondition\tfile\n");
        long bytes = 0;
        for (int p = 1; p <= PARTICIPANTS; p++) {
            for (String c : CONDITIONS) {
                String name = String.format("p%03d_%s.tsv", p, c);
                bytes += BenchFiles.write(dir.resolve(name), CHANNELS, SAMPLES, 0, p * 31L + c.length());
                manifest.append(String.format("p%03d\t%s\t%s%n", p, c, name));
            }
        }
        Files.writeString(dir.resolve("study.tsv"), manifest.toString());
        System.out.printf("%n# generated %d files, %.1f MB%n", PARTICIPANTS * CONDITIONS.length,
                bytes / 1e6);
    }

    @TearDown(Level.Trial)
    public void delete() {
        FolderMoves.deleteTreeQuietly(dir);
    }

    @Benchmark
    public Study loadStudy() {
        loaded = StudyLoader.load(dir);
        return loaded;
    }

    @TearDown(Level.Iteration)
    public void reportHeap() {
        Runtime rt = Runtime.getRuntime();
        System.gc();
        long used = rt.totalMemory() - rt.freeMemory();
        System.out.printf("%n# heap in use with the study loaded: %.1f MiB of at most %.1f MiB"
                + " (%d cells)%n", used / 1048576.0, rt.maxMemory() / 1048576.0,
                loaded.participants().size() * loaded.conditions().size());
        loaded = null;
    }
}
