package org.meridian.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletionService;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.BooleanSupplier;
import org.meridian.core.BadInputException;
import org.meridian.core.InputFile;
import org.meridian.core.Montage;
import org.meridian.core.SamePositionException;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;
import org.meridian.montage.ChannelPositions;

/**
 * Loads a study from a STUDY argument (DESIGN §4), telling its kind from the header of the file:
 * <ul>
 * <li>a study manifest (columns participant, condition, file), or a folder holding
 * {@code study.tsv}: the listed waveform files are read in parallel;</li>
 * <li>a single waveform file (first column time_ms, time_s or channel): one participant and one
 * condition, both named after the file name without its extensions;</li>
 * <li>a long table (columns participant, condition, channel, time_ms or time_s, value).</li>
 * </ul>
 * A {@code montage.tsv} in the same folder as the manifest (or the file) gives the positions;
 * labels not found there are looked up among the standard 10-5 positions; a label found in
 * neither loads as an unpositioned channel. Cells whose channels differ only in order are put in
 * the order of the first cell; any other difference in channels, time axis or unit is an error
 * naming both files.
 */
public final class StudyLoader {
    /** The file of a folder argument. */
    public static final String MANIFEST_NAME = "study.tsv";
    /** The montage file looked for beside a manifest. */
    public static final String MONTAGE_NAME = "montage.tsv";
    private static final long POLL_MS = 50;

    private StudyLoader() {
    }

    /** Reports loading progress; asked often, so loading can be cancelled at any time. */
    public interface Progress {
        void update(int filesDone, int filesTotal);

        default boolean cancelled() {
            return false;
        }
    }

    /** What a STUDY argument turned out to be. */
    public enum Kind {
        MANIFEST("study manifest"),
        WAVEFORM_FILE("waveform file"),
        LONG_TABLE("long table");

        private final String description;

        Kind(String description) {
            this.description = description;
        }

        public String description() {
            return description;
        }
    }

    public static Study load(Path path) {
        return load(path, (done, total) -> { });
    }

    /**
     * Loads a study. {@code progress} is told the files done (from the calling thread, counts
     * increasing); when it says cancelled, loading stops with a {@link CancellationException}.
     */
    public static Study load(Path path, Progress progress) {
        Path file = studyFile(path);
        Kind kind = detect(file);
        List<InputFile> inputs = new ArrayList<>();
        List<Cell> cells = switch (kind) {
            case MANIFEST -> manifestCells(file, progress, inputs);
            case WAVEFORM_FILE -> singleFileCells(file, progress, inputs);
            case LONG_TABLE -> longTableCells(file, progress, inputs);
        };
        Path montage = montageBeside(file);
        if (montage != null) {
            inputs.add(inputFile(montage, InputFile.Role.MONTAGE));
        }
        return assemble(path.toString(), cells, montage, inputs);
    }

    /** A file read, by its real path (links resolved), so outputs can be checked against it. */
    private static InputFile inputFile(Path file, InputFile.Role role) {
        Path real;
        try {
            real = file.toRealPath();
        } catch (IOException e) {
            real = file.toAbsolutePath().normalize();
        }
        return new InputFile(real, role, TextInput.isGzip(file));
    }

    /** The kind of a STUDY argument (a folder counts as its manifest). */
    public static Kind detect(Path path) {
        Path file = studyFile(path);
        try (LineScanner sc = new LineScanner(file.toString(), TextInput.open(file), () -> false)) {
            Preamble pre = Preamble.read(sc);
            pre.requireColumns(sc);
            if (ManifestReader.isManifestHeader(pre)) {
                return Kind.MANIFEST;
            }
            if (LongTableReader.isLongTableHeader(pre)) {
                return Kind.LONG_TABLE;
            }
            String first = pre.firstColumnKey();
            if (first.equals("time_ms") || first.equals("time_s") || first.equals("channel")) {
                return Kind.WAVEFORM_FILE;
            }
            if (MontageReader.isMontageHeader(pre)) {
                throw sc.error(0, "this is a montage file, not a study (a montage is used when it"
                        + " lies beside the manifest as " + MONTAGE_NAME + ")");
            }
            throw sc.error(1, "cannot tell what this file is: the header starts with "
                    + LineScanner.quote(pre.columns().get(0)) + "; expected time_ms, time_s or"
                    + " channel (a waveform file), or the columns participant, condition and file"
                    + " (a study manifest) or participant, condition, channel, time_ms and value"
                    + " (a long table)");
        }
    }

    /** The file behind a STUDY argument: itself, or a folder's manifest. */
    private static Path studyFile(Path path) {
        if (Files.isDirectory(path)) {
            Path manifest = path.resolve(MANIFEST_NAME);
            if (!Files.isRegularFile(manifest)) {
                throw new ReadException(path.toString(), 0, 0, "the folder has no " + MANIFEST_NAME);
            }
            return manifest;
        }
        if (!Files.exists(path)) {
            throw new ReadException(path.toString(), 0, 0, "file or folder does not exist");
        }
        return path;
    }

    private static Path montageBeside(Path file) {
        Path folder = file.getParent();
        Path m = folder == null ? Path.of(MONTAGE_NAME) : folder.resolve(MONTAGE_NAME);
        return Files.isRegularFile(m) && !m.toAbsolutePath().normalize()
                .equals(file.toAbsolutePath().normalize()) ? m : null;
    }

    /** One loaded participant × condition and the file it came from (for messages). */
    private record Cell(String participant, String condition, Waveforms waveforms, int trials,
            String source, Path file) {
    }

    private static List<Cell> manifestCells(Path manifest, Progress progress,
            List<InputFile> inputs) {
        List<ManifestReader.Row> rows = ManifestReader.read(manifest);
        inputs.add(inputFile(manifest, InputFile.Role.MANIFEST));
        List<Path> files = new ArrayList<>(rows.size());
        for (ManifestReader.Row r : rows) {
            files.add(r.file());
        }
        Waveforms[] loaded = readInParallel(files, progress);
        List<Cell> cells = new ArrayList<>(rows.size());
        for (int i = 0; i < rows.size(); i++) {
            ManifestReader.Row r = rows.get(i);
            cells.add(new Cell(r.participant(), r.condition(), loaded[i], r.trials(),
                    r.file() + " (participant " + r.participant() + ", condition "
                            + r.condition() + ")", r.file()));
            inputs.add(inputFile(r.file(), InputFile.Role.WAVEFORMS));
        }
        return cells;
    }

    private static List<Cell> singleFileCells(Path file, Progress progress,
            List<InputFile> inputs) {
        progress.update(0, 1);
        Waveforms w = WaveformReader.read(file, progress::cancelled);
        progress.update(1, 1);
        inputs.add(inputFile(file, InputFile.Role.WAVEFORMS));
        String stem = stem(file);
        return List.of(new Cell(stem, stem, w, -1, file.toString(), file));
    }

    private static List<Cell> longTableCells(Path file, Progress progress,
            List<InputFile> inputs) {
        progress.update(0, 1);
        List<LongTableReader.Cell> read = LongTableReader.read(file, progress::cancelled);
        progress.update(1, 1);
        inputs.add(inputFile(file, InputFile.Role.LONG_TABLE));
        List<Cell> cells = new ArrayList<>(read.size());
        for (LongTableReader.Cell c : read) {
            cells.add(new Cell(c.participant(), c.condition(), c.waveforms(), -1, file.toString()
                    + " (participant " + c.participant() + ", condition " + c.condition() + ")",
                    file));
        }
        return cells;
    }

    /** The file name without {@code .gz} and without its last extension: p01_rare.tsv.gz → p01_rare. */
    static String stem(Path file) {
        String name = file.getFileName().toString();
        if (name.toLowerCase(java.util.Locale.ROOT).endsWith(".gz")) {
            name = name.substring(0, name.length() - 3);
        }
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }

    /** Reads waveform files on a small pool (one thread per core), reporting each file done. */
    private static Waveforms[] readInParallel(List<Path> files, Progress progress) {
        int total = files.size();
        Waveforms[] out = new Waveforms[total];
        progress.update(0, total);
        int threads = Math.min(total, Math.max(1, Runtime.getRuntime().availableProcessors()));
        AtomicBoolean stop = new AtomicBoolean();
        BooleanSupplier stopped = stop::get;
        ExecutorService pool = Executors.newFixedThreadPool(threads, daemonThreads());
        try {
            CompletionService<Integer> done = new ExecutorCompletionService<>(pool);
            for (int i = 0; i < total; i++) {
                int k = i;
                done.submit(() -> {
                    out[k] = WaveformReader.read(files.get(k), stopped);
                    return k;
                });
            }
            int finished = 0;
            while (finished < total) {
                if (progress.cancelled()) {
                    stop.set(true);
                    throw new CancellationException("loading cancelled");
                }
                Future<Integer> f = done.poll(POLL_MS, TimeUnit.MILLISECONDS);
                if (f == null) {
                    continue;
                }
                try {
                    f.get();
                } catch (ExecutionException e) {
                    stop.set(true);
                    throw rethrow(e.getCause());
                }
                finished++;
                progress.update(finished, total);
            }
            return out;
        } catch (InterruptedException e) {
            stop.set(true);
            Thread.currentThread().interrupt();
            throw new CancellationException("loading interrupted");
        } finally {
            pool.shutdownNow();
        }
    }

    private static RuntimeException rethrow(Throwable t) {
        if (t instanceof RuntimeException r) {
            return r;
        }
        if (t instanceof Error e) {
            throw e;
        }
        return new IllegalStateException(t);
    }

    private static ThreadFactory daemonThreads() {
        AtomicInteger n = new AtomicInteger();
        return r -> {
            Thread t = new Thread(r, "meridian-load-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        };
    }

    /** Checks the cells agree, orders their channels alike, and finds the positions. */
    private static Study assemble(String name, List<Cell> cells, Path montageFile,
            List<InputFile> inputs) {
        Cell first = cells.get(0);
        Waveforms reference = first.waveforms();
        Study.Builder builder = Study.builder(name).inputFiles(inputs);
        List<Cell> ordered = new ArrayList<>(cells.size());
        for (Cell c : cells) {
            Waveforms w = c.waveforms();
            if (sameSetAxisUnit(reference, w)) {
                ordered.add(new Cell(c.participant(), c.condition(), w.labels().equals(
                        reference.labels()) ? w : w.reorderedLike(reference), c.trials(),
                        c.source(), c.file()));
            } else {
                throw new BadInputException(name + ": " + first.source() + " and " + c.source()
                        + " have " + reference.describeLayoutDifference(w));
            }
        }
        Montage fromFile = montageFile == null ? null : MontageReader.read(montageFile);
        ChannelPositions.Resolution res;
        try {
            res = ChannelPositions.resolve(reference.labels(), fromFile);
        } catch (SamePositionException e) {
            throw samePlace(first, e);
        } catch (BadInputException e) {
            throw new BadInputException(first.source() + ": the channels cannot all be placed: "
                    + e.getMessage(), e);
        }
        builder.montage(res.montage()).placements(res.placements());
        for (Cell c : ordered) {
            builder.add(c.participant(), c.condition(), c.waveforms(), c.trials());
        }
        return builder.build();
    }

    /**
     * Two data labels that resolve to one position (T3 and T7, say), named where the first file
     * gives them: the header columns, or the rows of a channels-as-rows file.
     */
    private static BadInputException samePlace(Cell first, SamePositionException e) {
        int[] a = WaveformReader.labelPlace(first.file(), e.first());
        int[] b = WaveformReader.labelPlace(first.file(), e.second());
        String problem = "channels " + e.first() + " and " + e.second() + " take the same"
                + " position (from " + e.source() + "); keep one of them or give positions in a "
                + MONTAGE_NAME + " beside the data";
        if (a == null || b == null) {
            return new BadInputException(first.source() + ": " + problem, e);
        }
        String where = a[0] == b[0] ? "line " + a[0] + " columns " + a[1] + " and " + b[1]
                : "lines " + a[0] + " and " + b[0] + " column " + a[1];
        return new BadInputException(first.file() + " " + where + ": " + problem, e);
    }

    private static boolean sameSetAxisUnit(Waveforms a, Waveforms b) {
        if (a.channelCount() != b.channelCount() || a.unit() != b.unit()
                || !a.axis().sameAs(b.axis())) {
            return false;
        }
        for (String l : a.labels()) {
            if (b.indexOf(l) < 0) {
                return false;
            }
        }
        return true;
    }
}
