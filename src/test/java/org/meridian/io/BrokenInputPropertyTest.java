package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowable;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.regex.Pattern;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.io.VariantWriter.Delimiter;
import org.meridian.io.VariantWriter.Layout;
import org.meridian.io.VariantWriter.Orientation;
import org.meridian.io.VariantWriter.UnitText;
import org.meridian.io.VariantWriter.Variant;

/**
 * Every broken variant of a valid file fails with a one-line {@link BadInputException} that
 * names the file, line and cell at fault, and never with any other exception.
 */
class BrokenInputPropertyTest {

    enum FileBreak {
        DUPLICATE_LABEL, NON_NUMERIC, DECIMAL_COMMA, NAN, INFINITE, RAGGED_SHORT, RAGGED_LONG,
        NON_UNIFORM, EMPTY_FILE, ONLY_COMMENTS, HEADER_ONLY, UNKNOWN_UNIT, ONE_SAMPLE
    }

    enum StudyBreak { MISSING_FILE, DIFFERENT_CHANNELS, DIFFERENT_AXIS, SAME_POSITION }

    enum LongTableBreak { NAN, NON_NUMERIC, RAGGED_SHORT, REPEATED_VALUE, MISSING_VALUE, DIFFERENT_CHANNELS,
        COMMENT_AFTER_HEADER }

    enum MontageBreak { DUPLICATE_LABEL, NON_NUMERIC, RAGGED_SHORT, SAME_POSITION, HEADER_ONLY,
        COMMENT_AFTER_HEADER }

    @Property(tries = 120)
    void everyBrokenLongTableNamesItsFault(@ForAll("longTables") Variant v, @ForAll LongTableBreak kind,
            @ForAll("seeds") long seed) throws Exception {
        Random r = new Random(seed);
        Study study = RandomStudies.study(r, 3, 3, Unit.MICROVOLT);
        List<String> lines = new ArrayList<>(VariantWriter.longTableLines(study, v));
        int h = headerIndex(lines);
        String d = v.delimiter().text;
        List<String> columns = List.of(split(lines.get(h), d));
        int width = columns.size();
        int row = h + 1 + r.nextInt(lines.size() - h - 1);
        int value = columns.indexOf("value");
        int channel = columns.indexOf("channel");
        String expect;
        switch (kind) {
            case NAN -> {
                lines.set(row, replaceCell(lines.get(row), d, value, "NaN"));
                expect = at(row, value + 1) + "\"NaN\" is not a finite number";
            }
            case NON_NUMERIC -> {
                lines.set(row, replaceCell(lines.get(row), d, value, "0x1p3"));
                expect = at(row, value + 1) + "\"0x1p3\" is not a number";
            }
            case RAGGED_SHORT -> {
                String[] cells = split(lines.get(row), d);
                lines.set(row, String.join(d, Arrays.copyOf(cells, cells.length - 1)));
                expect = at(row, width) + "the row has " + (width - 1) + " cells but the header has "
                        + width + " (missing cell)";
            }
            case REPEATED_VALUE -> {
                lines.add(lines.get(row));
                expect = " line " + lines.size() + ": participant ";
            }
            case MISSING_VALUE -> {
                if (study.channelLabels().size() < 2) {
                    return; // with one channel a lost row changes the time axis instead
                }
                String[] cells = split(lines.remove(row), d);
                expect = ": no value for participant ";
                expect += cells[columns.indexOf("participant")] + ", condition "
                        + cells[columns.indexOf("condition")] + ", channel " + cells[channel];
            }
            case DIFFERENT_CHANNELS -> {
                if (study.participants().size() * study.conditions().size() < 2) {
                    return; // one cell cannot differ from another
                }
                String[] cells = split(lines.get(row), d);
                String from = cells[channel];
                String p = cells[columns.indexOf("participant")];
                String c = cells[columns.indexOf("condition")];
                for (int i = h + 1; i < lines.size(); i++) {
                    String[] other = split(lines.get(i), d);
                    if (other[channel].equals(from) && other[columns.indexOf("participant")].equals(p)
                            && other[columns.indexOf("condition")].equals(c)) {
                        lines.set(i, replaceCell(lines.get(i), d, channel, "Renamed"));
                    }
                }
                expect = ": participant ";
            }
            case COMMENT_AFTER_HEADER -> {
                lines.add(row, "# a late note");
                expect = at(row, 1) + "a comment line after the header";
            }
            default -> throw new IllegalStateException();
        }
        Path dir = TempDirs.create();
        try {
            Path file = dir.resolve("long.tsv" + (v.gzip() ? ".gz" : ""));
            VariantWriter.writeLines(file, lines, v);
            Throwable t = catchThrowable(() -> StudyLoader.load(file));
            assertThat(t).isInstanceOf(BadInputException.class);
            assertThat(t.getMessage()).doesNotContain("\n").startsWith(file + expect);
            if (kind == LongTableBreak.REPEATED_VALUE) {
                assertThat(t.getMessage()).contains(" is given twice (also on line ");
            }
            if (kind == LongTableBreak.DIFFERENT_CHANNELS) {
                assertThat(t.getMessage()).contains("(the cells have different channel sets)");
            }
        } finally {
            TempDirs.delete(dir);
        }
    }

    @Property(tries = 120)
    void everyBrokenMontageFileNamesItsFault(@ForAll MontageBreak kind, @ForAll boolean measured,
            @ForAll("seeds") long seed) throws Exception {
        Random r = new Random(seed);
        List<org.meridian.core.Electrode> all = new ArrayList<>(
                org.meridian.montage.StandardSystem.TEN_TWENTY.montage().electrodes());
        java.util.Collections.shuffle(all, r);
        // Cz keeps the points off any one plane, so the sphere fit always has a sphere to find
        all.removeIf(e -> e.label().equals("Cz"));
        List<org.meridian.core.Electrode> chosen = new ArrayList<>(all.subList(0, 5 + r.nextInt(10)));
        chosen.add(r.nextInt(chosen.size()), org.meridian.montage.StandardSystem.TEN_TWENTY.montage()
                .find("Cz").orElseThrow());
        List<String> lines = new ArrayList<>();
        lines.add(measured ? "label\tx\ty\tz" : "label\ttheta\tphi");
        for (org.meridian.core.Electrode e : chosen) {
            lines.add(e.label() + "\t" + coordinates(e, measured));
        }
        int width = measured ? 4 : 3;
        int row = 1 + r.nextInt(chosen.size());
        String expect;
        switch (kind) {
            case DUPLICATE_LABEL -> {
                int other = 1 + (row % chosen.size());
                String twin = chosen.get(row - 1).label().toLowerCase(java.util.Locale.ROOT);
                lines.set(other, replaceCell(lines.get(other), "\t", 0, twin));
                int first = Math.min(row, other);
                int second = Math.max(row, other);
                expect = at(second, 1) + "electrode " + split(lines.get(second), "\t")[0]
                        + " appears twice (also on line " + (first + 1) + ")";
            }
            case NON_NUMERIC -> {
                int cell = 1 + r.nextInt(width - 1);
                lines.set(row, replaceCell(lines.get(row), "\t", cell, "n.a."));
                expect = at(row, cell + 1) + "\"n.a.\" is not a number";
            }
            case RAGGED_SHORT -> {
                String[] cells = split(lines.get(row), "\t");
                lines.set(row, String.join("\t", Arrays.copyOf(cells, cells.length - 1)));
                expect = at(row, width) + "the row has " + (width - 1) + " cells but the header has "
                        + width + " (missing cell)";
            }
            case SAME_POSITION -> {
                // a hair's breadth away: not the same numbers, but the same direction
                org.meridian.core.Electrode e = chosen.get(row - 1);
                org.meridian.core.Electrode near = new org.meridian.core.Electrode("Twin", e.x() + 1e-7,
                        e.y(), e.z());
                lines.add("Twin\t" + coordinates(near, measured));
                expect = " line " + lines.size() + ": electrode Twin is at the same position as "
                        + e.label() + " (line " + (row + 1) + ")";
            }
            case HEADER_ONLY -> {
                lines.subList(1, lines.size()).clear();
                expect = " line 1: a header but no electrodes";
            }
            case COMMENT_AFTER_HEADER -> {
                lines.add(row, "# measured again on Tuesday");
                expect = at(row, 1) + "a comment line after the header";
            }
            default -> throw new IllegalStateException();
        }
        Path dir = TempDirs.create();
        try {
            Path montage = dir.resolve("montage.tsv");
            Files.writeString(montage, String.join("\n", lines) + "\n");
            StringBuilder data = new StringBuilder("time_ms");
            for (org.meridian.core.Electrode e : chosen) {
                data.append('\t').append(e.label());
            }
            data.append("\n0").append("\t1".repeat(chosen.size())).append("\n4")
                    .append("\t2".repeat(chosen.size())).append('\n');
            Path file = Files.writeString(dir.resolve("p01.tsv"), data);
            Throwable t = catchThrowable(() -> StudyLoader.load(file));
            assertThat(t).isInstanceOf(BadInputException.class);
            assertThat(t.getMessage()).doesNotContain("\n").startsWith(montage + expect);
        } finally {
            TempDirs.delete(dir);
        }
    }

    /** theta and phi in degrees, or x y z in mm on a 95 mm head whose centre is off the origin. */
    private static String coordinates(org.meridian.core.Electrode e, boolean measured) {
        if (measured) {
            return (95 * e.x() + 3) + "\t" + (95 * e.y() - 12) + "\t" + (95 * e.z() + 40);
        }
        double theta = Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, e.z()))));
        double phi = Math.toDegrees(Math.atan2(e.y(), e.x()));
        return theta + "\t" + phi;
    }

    @Property(tries = 200)
    void everyBrokenWaveformFileNamesItsFault(@ForAll("singleFiles") Variant v,
            @ForAll FileBreak kind, @ForAll("seeds") long seed) throws Exception {
        Random r = new Random(seed);
        Study study = RandomStudies.study(r, 1, 1, Unit.MICROVOLT);
        Waveforms w = study.waveforms(0, 0);
        List<String> lines = new ArrayList<>(VariantWriter.waveformLines(w, v));
        int h = headerIndex(lines);
        boolean samplesAsRows = v.orientation() != Orientation.CHANNELS;
        String d = v.delimiter().text;
        int dataRows = lines.size() - h - 1;
        int row = h + 1 + r.nextInt(dataRows);
        int width = split(lines.get(h), d).length;
        int cell = 1 + r.nextInt(width - 1);
        String expect;
        switch (kind) {
            case DUPLICATE_LABEL -> {
                String twin = w.label(0).toUpperCase(java.util.Locale.ROOT);
                if (samplesAsRows) {
                    for (int i = h; i < lines.size(); i++) {
                        lines.set(i, lines.get(i) + d + (i == h ? twin : "1"));
                    }
                    expect = at(h, width + 1) + "channel " + twin + " appears twice in the header"
                            + " (also column 2)";
                } else {
                    lines.add(lines.get(h + 1).replaceFirst(Pattern.quote(w.label(0)), twin));
                    expect = at(lines.size() - 1, 1) + "channel " + twin + " appears twice (also"
                            + " on line " + (h + 2) + ")";
                }
            }
            case NON_NUMERIC -> {
                lines.set(row, replaceCell(lines.get(row), d, cell, "1.2.3"));
                expect = at(row, cell + 1) + "\"1.2.3\" is not a number";
            }
            case DECIMAL_COMMA -> {
                Delimiter semi = Delimiter.SEMICOLON;
                lines.replaceAll(l -> l.startsWith("#") ? l : l.replace(d, semi.text));
                lines.set(row, replaceCell(lines.get(row), semi.text, cell, "12,5"));
                expect = at(row, cell + 1) + "\"12,5\" is not a number (the decimal mark must be a"
                        + " point)";
            }
            case NAN, INFINITE -> {
                String bad = kind == FileBreak.NAN ? "NaN" : r.nextBoolean() ? "-Infinity" : "inf";
                lines.set(row, replaceCell(lines.get(row), d, cell, bad));
                expect = at(row, cell + 1) + "\"" + bad + "\" is not a finite number";
            }
            case RAGGED_SHORT -> {
                String[] cells = split(lines.get(row), d);
                lines.set(row, String.join(d, Arrays.copyOf(cells, cells.length - 1)));
                expect = at(row, width) + "the row has " + (width - 1) + " cells but the header has "
                        + width + " (missing cell)";
            }
            case RAGGED_LONG -> {
                lines.set(row, lines.get(row) + d + "0");
                expect = at(row, width + 1) + "the row has " + (width + 1) + " cells but the header"
                        + " has " + width + " (extra cell)";
            }
            case NON_UNIFORM -> {
                int samples = w.sampleCount();
                if (samples < 4) {
                    return; // one odd step among fewer than three cannot be told from the rest
                }
                double late = w.axis().lastMs() + 0.3 * w.axis().stepMs();
                if (samplesAsRows) {
                    int last = lines.size() - 1;
                    String t = v.orientation() == Orientation.SAMPLES_S ? VariantWriter.seconds(late)
                            : VariantWriter.ms(late);
                    lines.set(last, replaceCell(lines.get(last), d, 0, t));
                    expect = at(last, 1) + "sampling is not uniform";
                } else {
                    lines.set(h, replaceCell(lines.get(h), d, samples, VariantWriter.ms(late)));
                    expect = at(h, samples + 1) + "sampling is not uniform";
                }
            }
            case EMPTY_FILE -> {
                lines.clear();
                expect = ": the file is empty";
            }
            case ONLY_COMMENTS -> {
                lines.subList(0, lines.size()).clear();
                lines.add("# nothing but a comment");
                expect = ": has only comment lines, no header";
            }
            case HEADER_ONLY -> {
                lines.subList(h + 1, lines.size()).clear();
                expect = " line " + (h + 1) + ": a header but no data rows";
            }
            case UNKNOWN_UNIT -> {
                lines.add(0, "# unit: furlongs");
                expect = " line 1: unknown unit \"furlongs\"";
            }
            case ONE_SAMPLE -> {
                if (samplesAsRows) {
                    lines.subList(h + 2, lines.size()).clear();
                    expect = at(h + 1, 1) + "only one sample";
                } else {
                    for (int i = h; i < lines.size(); i++) {
                        String[] cells = split(lines.get(i), d);
                        lines.set(i, cells[0] + d + cells[1]);
                    }
                    expect = at(h, 2) + "only one sample";
                }
            }
            default -> throw new IllegalStateException();
        }
        Path dir = TempDirs.create();
        try {
            Path file = dir.resolve("broken.tsv" + (v.gzip() ? ".gz" : ""));
            if (lines.isEmpty()) {
                Files.write(file, new byte[0]);
            } else {
                VariantWriter.writeLines(file, lines, v);
            }
            Throwable t = catchThrowable(() -> StudyLoader.load(file));
            assertThat(t).isInstanceOf(BadInputException.class);
            assertThat(t.getMessage()).doesNotContain("\n").startsWith(file + expect);
        } finally {
            TempDirs.delete(dir);
        }
    }

    @Property(tries = 60)
    void everyBrokenStudyNamesBothPlaces(@ForAll("manifests") Variant v,
            @ForAll StudyBreak kind, @ForAll("seeds") long seed) throws Exception {
        Random r = new Random(seed);
        Study study = RandomStudies.study(r, 3, 3, Unit.MICROVOLT);
        if (study.participants().size() * study.conditions().size() < 2) {
            study = twoCells(study);
        }
        Path dir = TempDirs.create();
        try {
            Path arg = VariantWriter.write(study, dir, v);
            Path manifest = dir.resolve("study.tsv");
            String ext = v.delimiter() == Delimiter.COMMA ? ".csv" : ".tsv";
            String gz = v.gzip() ? ".gz" : "";
            Path second = dir.resolve("data/cell" + (study.conditions().size() > 1 ? "0_1" : "1_0")
                    + ext + gz);
            Path first = dir.resolve("data/cell0_0" + ext + gz);
            List<String> expect = new ArrayList<>();
            switch (kind) {
                case MISSING_FILE -> {
                    Files.delete(second);
                    int line = manifestLineOf(manifest, second.getFileName().toString());
                    expect.add(manifest + " line " + line + " column 3: file " + second
                            + " does not exist");
                }
                case DIFFERENT_CHANNELS -> {
                    Waveforms w = study.waveforms(0, 0);
                    List<String> labels = new ArrayList<>(w.labels());
                    labels.set(0, "Extra");
                    Waveforms other = Waveforms.wrap(labels, w.axis(), w.unit(), w.copyValues());
                    VariantWriter.writeLines(second, VariantWriter.waveformLines(other, v), v);
                    expect.add(arg + ": " + first + " (participant ");
                    expect.add(" and " + second + " (participant ");
                    expect.add(") have different channels:");
                    expect.add("lacks " + w.label(0));
                }
                case DIFFERENT_AXIS -> {
                    Waveforms w = study.waveforms(0, 0);
                    org.meridian.core.TimeAxis a = w.axis();
                    Waveforms other = Waveforms.wrap(w.labels(), new org.meridian.core.TimeAxis(
                            a.firstMs() + a.stepMs(), a.rateHz(), a.samples()), w.unit(),
                            w.copyValues());
                    VariantWriter.writeLines(second, VariantWriter.waveformLines(other, v), v);
                    expect.add(arg + ": " + first + " (participant ");
                    expect.add(" and " + second + " (participant ");
                    expect.add(") have different time axes: first sample");
                }
                case SAME_POSITION -> {
                    Path montage = dir.resolve("montage.tsv");
                    Files.writeString(montage, "label\tx\ty\tz\nA\t0\t0\t1\nB\t1\t0\t0\nC\t0\t0\t1\n");
                    expect.add(montage + " line 4: electrode C is at the same position as A"
                            + " (line 2)");
                }
                default -> throw new IllegalStateException();
            }
            Throwable t = catchThrowable(() -> StudyLoader.load(arg));
            assertThat(t).isInstanceOf(BadInputException.class);
            assertThat(t.getMessage()).doesNotContain("\n");
            for (String part : expect) {
                assertThat(t.getMessage()).contains(part);
            }
        } finally {
            TempDirs.delete(dir);
        }
    }

    private static Study twoCells(Study s) {
        Waveforms w = s.waveforms(0, 0);
        return Study.builder("two").add("p01", "a", w).add("p01", "b", w).build();
    }

    private static int manifestLineOf(Path manifest, String fileName) throws Exception {
        List<String> lines = Files.readAllLines(manifest);
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).contains(fileName)) {
                return i + 1;
            }
        }
        throw new IllegalStateException(fileName);
    }

    /** " line L column C: " for a 0-based line index. */
    private static String at(int lineIndex, int column) {
        return " line " + (lineIndex + 1) + " column " + column + ": ";
    }

    private static int headerIndex(List<String> lines) {
        for (int i = 0; i < lines.size(); i++) {
            if (!lines.get(i).isBlank() && !lines.get(i).startsWith("#")) {
                return i;
            }
        }
        throw new IllegalStateException("no header");
    }

    private static String[] split(String line, String d) {
        return line.split(Pattern.quote(d), -1);
    }

    private static String replaceCell(String line, String d, int cell, String text) {
        String[] cells = split(line, d);
        cells[cell] = text;
        return String.join(d, cells);
    }

    @Provide
    Arbitrary<Long> seeds() {
        return Arbitraries.longs();
    }

    @Provide
    Arbitrary<Variant> singleFiles() {
        return variants(Layout.SINGLE_FILE);
    }

    @Provide
    Arbitrary<Variant> longTables() {
        return Combinators.combine(variants(Layout.LONG_TABLE), Arbitraries.longs())
                .as((v, s) -> new Variant(v.orientation(), v.delimiter(), v.crlf(), v.gzip(), v.unit(),
                        v.layout(), v.comments(), s));
    }

    @Provide
    Arbitrary<Variant> manifests() {
        return variants(Layout.MANIFEST_FOLDER);
    }

    private static Arbitrary<Variant> variants(Layout layout) {
        return Combinators.combine(
                Arbitraries.of(Orientation.class),
                Arbitraries.of(Delimiter.class),
                Arbitraries.of(true, false),
                Arbitraries.of(true, false),
                Arbitraries.of(UnitText.class),
                Arbitraries.of(true, false))
                .as((o, d, crlf, gz, u, comments) -> new Variant(o, d, crlf, gz, u, layout,
                        comments, 1));
    }
}
