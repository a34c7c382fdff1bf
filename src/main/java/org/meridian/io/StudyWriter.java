package org.meridian.io;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.zip.GZIPOutputStream;
import org.meridian.core.BadInputException;
import org.meridian.core.ChannelPlacement;
import org.meridian.core.InputFile;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;

/**
 * Writes a study as a folder in the §4 layout, which {@link StudyLoader} reads back:
 * <ul>
 * <li>{@code study.tsv}: participant, condition, file, and trials when any cell's count is
 * known ({@code n/a} for the unknown ones);</li>
 * <li>one samples-as-rows waveform file per participant × condition, named after both
 * ({@code p01_rare.tsv}, or {@code .tsv.gz}), with its {@code # unit:} comment, times in ms and
 * every value with the same fixed number of decimals, so the output is byte-for-byte
 * repeatable;</li>
 * <li>{@code montage.tsv} with the positions that came from a montage file, when any did (the
 * others are standard positions, found again on loading).</li>
 * </ul>
 * The folder is written under a temporary name beside the target and renamed into place. An
 * existing non-empty folder is refused unless {@code force}; even then only a folder that holds
 * a study (a {@code study.tsv}) is replaced, and it is replaced by two renames, so a failure
 * leaves either the old or the new study.
 */
public final class StudyWriter {
    /** Times are written with up to this many decimals (trailing zeros dropped). */
    private static final int TIME_DECIMALS = 6;
    private static final int BUFFER = 1 << 16;

    private StudyWriter() {
    }

    /**
     * @param gzip     write the waveform files gzip-compressed ({@code .tsv.gz})
     * @param decimals digits after the decimal point of every value, 0 to 12 (fixed, so output
     *                 is byte-for-byte repeatable)
     * @param force    replace an existing non-empty folder that holds a study
     */
    public record Options(boolean gzip, int decimals, boolean force) {
        public static Options defaults() {
            return new Options(false, 4, false);
        }
    }

    /**
     * Whether a study derived from {@code input} should be written compressed: when every file
     * that held its waveforms was gzip-compressed (false for a study not read from files).
     */
    public static boolean compressedLikeInput(Study input) {
        boolean any = false;
        for (InputFile f : input.inputFiles()) {
            if (f.role().holdsWaveforms()) {
                if (!f.gzip()) {
                    return false;
                }
                any = true;
            }
        }
        return any;
    }

    public static void write(Study study, Path folder, Options options) {
        write(study, folder, options, Map.of());
    }

    /**
     * Writes the study and, into the same temporary folder before it is renamed into place,
     * further text files (name → UTF-8 content), e.g. a simulation's ground truth: the folder
     * appears complete or not at all. Names are plain file names that no study file uses.
     */
    public static void write(Study study, Path folder, Options options, Map<String, String> extraFiles) {
        for (String name : extraFiles.keySet()) {
            if (name.isEmpty() || name.contains("/") || name.contains("\\") || name.startsWith(".")
                    || name.equalsIgnoreCase(StudyLoader.MANIFEST_NAME)
                    || name.equalsIgnoreCase(StudyLoader.MONTAGE_NAME)
                    || fileNames(study, options.gzip()).stream().anyMatch(name::equalsIgnoreCase)) {
                throw new IllegalArgumentException("not a free file name in a study folder: " + name);
            }
        }
        if (options.decimals() < 0 || options.decimals() > FixedDecimals.MAX_DECIMALS) {
            throw new BadInputException("decimals must be between 0 and "
                    + FixedDecimals.MAX_DECIMALS + ", got " + options.decimals());
        }
        Path target = folder.toAbsolutePath().normalize();
        Path parent = target.getParent();
        if (parent == null || !Files.isDirectory(parent)) {
            throw new BadInputException(folder + ": the folder it would go in does not exist");
        }
        boolean replace = checkTarget(folder, target, options.force());
        Path tmp = null;
        try {
            tmp = Files.createTempDirectory(parent, "." + target.getFileName() + ".writing-");
            writeInto(study, tmp, options);
            for (Map.Entry<String, String> extra : extraFiles.entrySet()) {
                Files.writeString(tmp.resolve(extra.getKey()), extra.getValue(), StandardCharsets.UTF_8);
            }
            FolderMoves.moveIntoPlace(tmp, target, replace);
            tmp = null;
        } catch (IOException e) {
            throw new BadInputException("cannot write " + folder + ": " + e.getMessage(), e);
        } finally {
            if (tmp != null) {
                FolderMoves.deleteTreeQuietly(tmp);
            }
        }
    }

    /** Whether an existing folder is to be replaced; refuses what may not be. */
    private static boolean checkTarget(Path folder, Path target, boolean force) {
        if (!Files.exists(target)) {
            return false;
        }
        if (!Files.isDirectory(target)) {
            throw new BadInputException(folder + " is a file, not a folder");
        }
        if (FolderMoves.isEmpty(target)) {
            return true;
        }
        if (!force) {
            throw new BadInputException(folder + " already exists and is not empty; choose another"
                    + " folder or allow replacing it (--force)");
        }
        if (!Files.isRegularFile(target.resolve(StudyLoader.MANIFEST_NAME))) {
            throw new BadInputException(folder + " is not empty and holds no study ("
                    + StudyLoader.MANIFEST_NAME + "); it is not replaced, even when forced");
        }
        return true;
    }

    private static void writeInto(Study study, Path dir, Options options) throws IOException {
        List<String> fileNames = fileNames(study, options.gzip());
        boolean anyTrials = false;
        for (int p = 0; p < study.participants().size(); p++) {
            for (int c = 0; c < study.conditions().size(); c++) {
                anyTrials |= study.trials(p, c).isPresent();
            }
        }
        StringBuilder manifest = new StringBuilder("participant\tcondition\tfile");
        manifest.append(anyTrials ? "\ttrials\n" : "\n");
        int k = 0;
        for (int p = 0; p < study.participants().size(); p++) {
            for (int c = 0; c < study.conditions().size(); c++) {
                String participant = cellText(study.participants().get(p), "participant");
                String condition = cellText(study.conditions().get(c), "condition");
                String file = fileNames.get(k++);
                manifest.append(participant).append('\t').append(condition).append('\t')
                        .append(file);
                if (anyTrials) {
                    manifest.append('\t').append(study.trials(p, c).isPresent()
                            ? Integer.toString(study.trials(p, c).getAsInt()) : "n/a");
                }
                manifest.append('\n');
                writeWaveforms(study.waveforms(p, c), participant, condition, dir.resolve(file),
                        options);
            }
        }
        Files.writeString(dir.resolve(StudyLoader.MANIFEST_NAME), manifest.toString(),
                StandardCharsets.UTF_8);
        List<String> fromFile = new ArrayList<>();
        for (ChannelPlacement pl : study.placements()) {
            if (pl.how() == ChannelPlacement.How.MONTAGE_FILE) {
                fromFile.add(pl.label());
            }
        }
        if (!fromFile.isEmpty()) {
            Files.writeString(dir.resolve(StudyLoader.MONTAGE_NAME),
                    MontageWriter.toTsv(study.montage().select(fromFile)), StandardCharsets.UTF_8);
        }
    }

    /** Safe, readable, distinct file names, one per cell in participant-major order. */
    private static List<String> fileNames(Study study, boolean gzip) {
        List<String> out = new ArrayList<>();
        Set<String> taken = new HashSet<>();
        String ext = gzip ? ".tsv.gz" : ".tsv";
        for (String p : study.participants()) {
            for (String c : study.conditions()) {
                String base = safe(p) + "_" + safe(c);
                String name = base;
                for (int n = 2; !taken.add(name.toLowerCase(Locale.ROOT)); n++) {
                    name = base + "_" + n;
                }
                out.add(name + ext);
            }
        }
        return out;
    }

    /** Letters, digits, '.', '-' and '_' kept; anything else becomes '_'; no leading dot. */
    static String safe(String name) {
        String s = name.replaceAll("[^\\p{L}\\p{N}._-]+", "_").replaceAll("^[._]+", "")
                .replaceAll("_+$", "");
        if (s.length() > 60) {
            s = s.substring(0, 60);
        }
        return s.isEmpty() ? "x" : s;
    }

    private static String cellText(String s, String what) {
        if (s.indexOf('\t') >= 0 || s.indexOf('\n') >= 0 || s.indexOf('\r') >= 0) {
            throw new BadInputException("the " + what + " name " + LineScanner.quote(s)
                    + " holds a tab or line break and cannot be written to a table");
        }
        return s;
    }

    private static void writeWaveforms(Waveforms w, String participant, String condition,
            Path file, Options options) throws IOException {
        try (OutputStream raw = Files.newOutputStream(file);
                OutputStream out = new BufferedOutputStream(options.gzip()
                        ? new GZIPOutputStream(raw, BUFFER) : raw, BUFFER)) {
            StringBuilder head = new StringBuilder();
            head.append("# participant ").append(participant).append(", condition ")
                    .append(condition).append('\n');
            head.append("# unit: ").append(w.unit().fileToken()).append('\n');
            head.append("time_ms");
            for (String l : w.labels()) {
                head.append('\t').append(cellText(l, "channel"));
            }
            head.append('\n');
            out.write(head.toString().getBytes(StandardCharsets.UTF_8));
            int channels = w.channelCount();
            int samples = w.sampleCount();
            float[] v = w.copyValues();
            byte[] row = new byte[32 + channels * (FixedDecimals.MAX_CHARS + 1)];
            TimeAxis axis = w.axis();
            for (int s = 0; s < samples; s++) {
                int pos = appendAscii(time(axis.timeMs(s)), row, 0);
                for (int c = 0; c < channels; c++) {
                    row[pos++] = '\t';
                    pos = FixedDecimals.append(v[c * samples + s], options.decimals(), row, pos);
                }
                row[pos++] = '\n';
                out.write(row, 0, pos);
            }
        }
    }

    /** A time in ms with up to six decimals, trailing zeros dropped: -200, 3.90625, 3.333333. */
    static String time(double ms) {
        String s = BigDecimal.valueOf(ms).setScale(TIME_DECIMALS, RoundingMode.HALF_UP)
                .stripTrailingZeros().toPlainString();
        return s.matches("-0\\.?0*") ? "0" : s;
    }

    private static int appendAscii(String s, byte[] out, int pos) {
        for (int i = 0; i < s.length(); i++) {
            out[pos++] = (byte) s.charAt(i);
        }
        return pos;
    }
}
