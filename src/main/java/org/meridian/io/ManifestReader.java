package org.meridian.io;

import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads a study manifest (DESIGN §4): the columns {@code participant}, {@code condition},
 * {@code file} and optionally {@code trials}, in any order, other columns ignored. Paths are
 * relative to the manifest's folder (absolute paths are taken as they are). A trial count is a
 * whole number ≥ 0; an empty cell or {@code n/a} means unknown.
 */
final class ManifestReader {
    private ManifestReader() {
    }

    /**
     * One row: a participant × condition cell and where its waveforms are.
     *
     * @param trials the trial count, or -1 when unknown
     * @param line   the manifest line, for messages
     */
    record Row(String participant, String condition, Path file, int trials, int line) {
    }

    /** Whether a header is a manifest's. */
    static boolean isManifestHeader(Preamble pre) {
        return pre.indexOf("participant") >= 0 && pre.indexOf("condition") >= 0
                && pre.indexOf("file") >= 0;
    }

    static List<Row> read(Path manifest) {
        String name = manifest.toString();
        Path folder = manifest.toAbsolutePath().getParent();
        Path shownFolder = manifest.getParent();
        try (LineScanner sc = new LineScanner(name, TextInput.open(manifest), () -> false)) {
            Preamble pre = Preamble.read(sc);
            int ip = required(sc, pre, "participant");
            int ic = required(sc, pre, "condition");
            int iff = required(sc, pre, "file");
            int it = pre.indexOf("trials");
            int width = pre.columns().size();
            List<Row> rows = new ArrayList<>();
            Map<String, Integer> cellLines = new HashMap<>();
            while (sc.next()) {
                if (sc.cellCount() == 1 && sc.isBlank()) {
                    continue;
                }
                if (sc.cellCount() != width) {
                    throw WaveformReader.ragged(sc, width);
                }
                String participant = nonEmpty(sc, ip, "participant");
                String condition = nonEmpty(sc, ic, "condition");
                String fileCell = nonEmpty(sc, iff, "file");
                Integer previous = cellLines.put(participant.toLowerCase(java.util.Locale.ROOT)
                        + "\u0000" + condition.toLowerCase(java.util.Locale.ROOT), sc.line());
                if (previous != null) {
                    throw sc.error(0, "participant " + participant + ", condition " + condition
                            + " is listed twice (also on line " + previous + ")");
                }
                Path file = resolve(sc, iff, fileCell, folder, shownFolder);
                int trials = it < 0 ? -1 : trials(sc, it);
                rows.add(new Row(participant, condition, file, trials, sc.line()));
            }
            if (rows.isEmpty()) {
                throw new ReadException(name, pre.headerLine(), 0, "a header but no rows: the"
                        + " manifest lists no waveform files");
            }
            return rows;
        }
    }

    private static int required(LineScanner sc, Preamble pre, String column) {
        int i = pre.indexOf(column);
        if (i < 0) {
            throw sc.error(0, "a study manifest needs the columns participant, condition and file"
                    + " (and optionally trials); this header has " + String.join(", ",
                    pre.columns()));
        }
        return i;
    }

    private static String nonEmpty(LineScanner sc, int cell, String what) {
        String s = sc.text(cell);
        if (s.isEmpty()) {
            throw sc.error(cell + 1, "empty " + what);
        }
        return s;
    }

    /** The listed file, shown to the user relative to the manifest as they named it. */
    private static Path resolve(LineScanner sc, int cell, String fileCell, Path folder,
            Path shownFolder) {
        Path rel;
        try {
            rel = Path.of(fileCell);
        } catch (InvalidPathException e) {
            throw sc.error(cell + 1, LineScanner.quote(fileCell) + " is not a valid file name");
        }
        Path shown = rel.isAbsolute() || shownFolder == null ? rel : shownFolder.resolve(rel);
        Path actual = rel.isAbsolute() ? rel : folder.resolve(rel);
        if (!Files.exists(actual)) {
            throw sc.error(cell + 1, "file " + shown + " does not exist");
        }
        if (Files.isDirectory(actual)) {
            throw sc.error(cell + 1, shown + " is a folder, not a waveform file");
        }
        return shown;
    }

    private static int trials(LineScanner sc, int cell) {
        String s = sc.text(cell);
        if (s.isEmpty() || s.equalsIgnoreCase("n/a")) {
            return -1;
        }
        try {
            int t = Integer.parseInt(s);
            if (t >= 0) {
                return t;
            }
        } catch (NumberFormatException ignored) {
            // described below
        }
        throw sc.error(cell + 1, "trials must be a whole number of at least 0, not "
                + LineScanner.quote(s));
    }
}
