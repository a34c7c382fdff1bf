package org.meridian.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.meridian.core.Waveforms;
import org.openjdk.jmh.annotations.AuxCounters;
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
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Reading speed of one waveform file on one thread: a generated ~100 MB samples-as-rows file
 * with 128 channels, read by {@link WaveformReader} and by a plain reader that splits lines
 * with {@code String.split} and parses with {@code Double.parseDouble} (the baseline, written
 * only here). The {@code megabytes} counter, reported per second, is the reading speed in MB/s
 * (10^6 bytes) of wall time. On a shared machine wall time also counts the time other processes
 * held the core, so the {@code cpu} counters give the same reading against the benchmark
 * thread's own CPU time: speed = cpuMegabytes / cpuSeconds. Goals: at least 150 MB/s, and at
 * least 5× the baseline.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(value = 1, jvmArgsAppend = {"-Xmx2g"})
@Warmup(iterations = 2, time = 5)
@Measurement(iterations = 3, time = 10)
@Threads(1)
public class LoadBench {
    static final int CHANNELS = 128;
    static final long TARGET_BYTES = 100_000_000L;

    Path dir;
    Path file;
    double megabytes;

    /** Counts megabytes read; JMH reports it per second. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.OPERATIONS)
    public static class Read {
        public double megabytes;

        @Setup(Level.Iteration)
        public void reset() {
            megabytes = 0;
        }
    }

    /** Megabytes read and the CPU seconds the reading thread spent on them, per iteration. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.EVENTS)
    public static class Cpu {
        private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();
        public double cpuMegabytes;
        public double cpuSeconds;

        @Setup(Level.Iteration)
        public void reset() {
            cpuMegabytes = 0;
            cpuSeconds = 0;
        }

        long now() {
            return THREADS.getCurrentThreadCpuTime();
        }

        void add(double megabytes, long startNs) {
            cpuMegabytes += megabytes;
            cpuSeconds += (now() - startNs) / 1e9;
        }
    }

    @Setup(Level.Trial)
    public void generate() throws IOException {
        dir = Files.createTempDirectory("meridian-loadbench");
        file = dir.resolve("big.tsv");
        long bytes = BenchFiles.write(file, CHANNELS, 0, TARGET_BYTES, 42);
        megabytes = bytes / 1e6;
        System.out.printf("%n# generated %s: %.1f MB, %d channels%n", file.getFileName(),
                megabytes, CHANNELS);
    }

    @TearDown(Level.Trial)
    public void delete() {
        FolderMoves.deleteTreeQuietly(dir);
    }

    @Benchmark
    public Waveforms meridianReader(Read read, Cpu cpu) {
        long start = cpu.now();
        Waveforms w = WaveformReader.read(file);
        cpu.add(megabytes, start);
        read.megabytes += megabytes;
        return w;
    }

    @Benchmark
    public float[] splitParseDoubleBaseline(Read read, Cpu cpu) throws IOException {
        long start = cpu.now();
        float[] values = splitReader(file);
        cpu.add(megabytes, start);
        read.megabytes += megabytes;
        return values;
    }

    /** The baseline: lines as Strings, String.split, Double.parseDouble, then channel-major. */
    static float[] splitReader(Path file) throws IOException {
        List<float[]> rows = new ArrayList<>();
        int channels = -1;
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String line;
            while ((line = in.readLine()) != null) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                String[] cells = line.split("\t");
                if (channels < 0) {
                    channels = cells.length - 1;
                    continue;
                }
                float[] row = new float[cells.length];
                for (int i = 0; i < cells.length; i++) {
                    row[i] = (float) Double.parseDouble(cells[i]);
                }
                rows.add(row);
            }
        }
        int n = rows.size();
        float[] out = new float[channels * n];
        for (int s = 0; s < n; s++) {
            float[] row = rows.get(s);
            for (int c = 0; c < channels; c++) {
                out[c * n + s] = row[c + 1];
            }
        }
        return out;
    }
}
