package org.meridian.io;

import java.io.IOException;
import java.io.OutputStream;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.zip.GZIPOutputStream;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;

/**
 * Writes a study in one of the format variants of DESIGN §4, independently of the production
 * writer: both orientations (times in ms or s), three delimiters, LF or CRLF, gzip, every unit
 * spelling, comment lines, manifest (as file or folder), long table, single file.
 */
final class VariantWriter {
    enum Orientation { SAMPLES_MS, SAMPLES_S, CHANNELS }

    enum Delimiter {
        TAB("\t"), COMMA(","), SEMICOLON(";");

        final String text;

        Delimiter(String text) {
            this.text = text;
        }
    }

    /** A unit comment and the factor from µV to the file's unit. */
    enum UnitText {
        NONE(null, 1), UV("uV", 1), MICRO("µV", 1), MV("mV", 1e-3), V("V", 1e-6), NV("nV", 1e3);

        final String token;
        final double fromMicrovolts;

        UnitText(String token, double fromMicrovolts) {
            this.token = token;
            this.fromMicrovolts = fromMicrovolts;
        }
    }

    enum Layout { MANIFEST_FOLDER, MANIFEST_FILE, LONG_TABLE, SINGLE_FILE }

    record Variant(Orientation orientation, Delimiter delimiter, boolean crlf, boolean gzip,
            UnitText unit, Layout layout, boolean comments, long seed) {
    }

    private VariantWriter() {
    }

    /** Writes the study into {@code dir}; returns the STUDY argument to load. */
    static Path write(Study s, Path dir, Variant v) throws IOException {
        String ext = v.delimiter() == Delimiter.COMMA ? ".csv" : ".tsv";
        switch (v.layout()) {
            case SINGLE_FILE -> {
                Path f = dir.resolve("single" + ext + (v.gzip() ? ".gz" : ""));
                writeLines(f, waveformLines(s.waveforms(0, 0), v), v);
                return f;
            }
            case LONG_TABLE -> {
                Path f = dir.resolve("long" + ext + (v.gzip() ? ".gz" : ""));
                writeLines(f, longTableLines(s, v), v);
                return f;
            }
            default -> {
                Files.createDirectories(dir.resolve("data"));
                List<String> manifest = new ArrayList<>();
                boolean trials = hasTrials(s);
                manifest.add(join(v, "participant", "condition", "file")
                        + (trials ? v.delimiter().text + "trials" : ""));
                for (int p = 0; p < s.participants().size(); p++) {
                    for (int c = 0; c < s.conditions().size(); c++) {
                        String name = "data/cell" + p + "_" + c + ext + (v.gzip() ? ".gz" : "");
                        writeLines(dir.resolve(name), waveformLines(s.waveforms(p, c), v), v);
                        String row = join(v, s.participants().get(p), s.conditions().get(c), name);
                        if (trials) {
                            row += v.delimiter().text + (s.trials(p, c).isPresent()
                                    ? s.trials(p, c).getAsInt() : "n/a");
                        }
                        manifest.add(row);
                    }
                }
                Path m = dir.resolve("study.tsv");
                writeLines(m, manifest, new Variant(v.orientation(), v.delimiter(), v.crlf(),
                        false, v.unit(), v.layout(), v.comments(), v.seed()));
                return v.layout() == Layout.MANIFEST_FOLDER ? dir : m;
            }
        }
    }

    static boolean hasTrials(Study s) {
        for (int p = 0; p < s.participants().size(); p++) {
            for (int c = 0; c < s.conditions().size(); c++) {
                if (s.trials(p, c).isPresent()) {
                    return true;
                }
            }
        }
        return false;
    }

    /** The lines of one waveform file (without line ends). */
    static List<String> waveformLines(Waveforms w, Variant v) {
        List<String> lines = new ArrayList<>(preamble(w.unit(), v));
        TimeAxis axis = w.axis();
        String d = v.delimiter().text;
        if (v.orientation() == Orientation.CHANNELS) {
            StringBuilder h = new StringBuilder("channel");
            for (int s = 0; s < axis.samples(); s++) {
                h.append(d).append(ms(axis.timeMs(s)));
            }
            lines.add(h.toString());
            for (int c = 0; c < w.channelCount(); c++) {
                StringBuilder row = new StringBuilder(w.label(c));
                for (int s = 0; s < axis.samples(); s++) {
                    row.append(d).append(value(w.value(c, s), v));
                }
                lines.add(row.toString());
            }
            return lines;
        }
        boolean seconds = v.orientation() == Orientation.SAMPLES_S;
        lines.add((seconds ? "time_s" : "time_ms") + d + String.join(d, w.labels()));
        for (int s = 0; s < axis.samples(); s++) {
            StringBuilder row = new StringBuilder(seconds ? seconds(axis.timeMs(s))
                    : ms(axis.timeMs(s)));
            for (int c = 0; c < w.channelCount(); c++) {
                row.append(d).append(value(w.value(c, s), v));
            }
            lines.add(row.toString());
        }
        return lines;
    }

    /** The lines of a long table, columns and rows in an order drawn from the variant's seed. */
    static List<String> longTableLines(Study s, Variant v) {
        Random r = new Random(v.seed());
        List<String> columns = new ArrayList<>(List.of("participant", "condition", "channel",
                v.orientation() == Orientation.SAMPLES_S ? "time_s" : "time_ms", "value", "note"));
        Collections.shuffle(columns, r);
        List<String> rows = new ArrayList<>();
        for (int p = 0; p < s.participants().size(); p++) {
            for (int c = 0; c < s.conditions().size(); c++) {
                Waveforms w = s.waveforms(p, c);
                for (int ch = 0; ch < w.channelCount(); ch++) {
                    for (int t = 0; t < w.sampleCount(); t++) {
                        List<String> cells = new ArrayList<>();
                        for (String col : columns) {
                            cells.add(switch (col) {
                                case "participant" -> s.participants().get(p);
                                case "condition" -> s.conditions().get(c);
                                case "channel" -> w.label(ch);
                                case "time_s" -> seconds(w.axis().timeMs(t));
                                case "time_ms" -> ms(w.axis().timeMs(t));
                                case "value" -> value(w.value(ch, t), v);
                                default -> "x";
                            });
                        }
                        rows.add(String.join(v.delimiter().text, cells));
                    }
                }
            }
        }
        if (v.seed() % 2 == 0) {
            Collections.shuffle(rows, r);
        }
        List<String> lines = new ArrayList<>(preamble(s.unit(), v));
        lines.add(String.join(v.delimiter().text, columns));
        lines.addAll(rows);
        return lines;
    }

    private static List<String> preamble(Unit unit, Variant v) {
        List<String> out = new ArrayList<>();
        if (v.comments()) {
            out.add("# written for a round-trip test; a comment: with a colon");
            out.add("");
        }
        if (unit == Unit.MICROVOLT_PER_SQUARE_METRE) {
            out.add("# unit: uV/m2");
        } else if (v.unit().token != null) {
            out.add("#unit:" + (v.comments() ? "  " : " ") + v.unit().token);
        }
        return out;
    }

    static String value(float microvolts, Variant v) {
        double f = v.unit().fromMicrovolts;
        return f == 1 ? Float.toString(microvolts) : Double.toString(microvolts * f);
    }

    static String ms(double t) {
        return BigDecimal.valueOf(t).toPlainString();
    }

    static String seconds(double t) {
        return BigDecimal.valueOf(t).movePointLeft(3).toPlainString();
    }

    private static String join(Variant v, String... cells) {
        return String.join(v.delimiter().text, cells);
    }

    static void writeLines(Path file, List<String> lines, Variant v) throws IOException {
        String eol = v.crlf() ? "\r\n" : "\n";
        byte[] bytes = (String.join(eol, lines) + eol).getBytes(StandardCharsets.UTF_8);
        try (OutputStream out = v.gzip() ? new GZIPOutputStream(Files.newOutputStream(file))
                : Files.newOutputStream(file)) {
            out.write(bytes);
        }
    }
}
