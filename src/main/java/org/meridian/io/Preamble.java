package org.meridian.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.meridian.core.Unit;

/**
 * What comes before the data of every table: {@code #} comment lines (one of which may be
 * {@code # unit: …}) and blank lines, then the header line. The delimiter is the one of tab,
 * semicolon and comma that occurs most often in the header line (a tie goes to tab, then
 * semicolon). Reading the preamble leaves the scanner on the header line, split into cells.
 *
 * @param headerLine the line number of the header
 * @param columns    the header cells, trimmed, with their original spelling
 * @param unit       the unit of the values and the factor to µV; µV when no comment says
 * @param unitLine   the line of the {@code # unit:} comment, or 0
 */
record Preamble(int headerLine, List<String> columns, Unit.Scaled unit, int unitLine) {
    private static final byte[] DELIMITERS = {'\t', ';', ','};
    private static final Unit.Scaled MICROVOLTS = new Unit.Scaled(Unit.MICROVOLT, 1.0);

    /** Reads up to and including the header line. */
    static Preamble read(LineScanner sc) {
        Unit.Scaled unit = MICROVOLTS;
        int unitLine = 0;
        boolean sawComment = false;
        while (sc.next()) {
            if (sc.isBlank()) {
                continue;
            }
            if (sc.isComment()) {
                sawComment = true;
                String body = sc.lineText().trim().substring(1).trim();
                int colon = body.indexOf(':');
                if (colon > 0 && body.substring(0, colon).trim().equalsIgnoreCase("unit")) {
                    String token = body.substring(colon + 1).trim();
                    unit = Unit.parse(token);
                    if (unit == null) {
                        throw sc.error(0, "unknown unit " + LineScanner.quote(token)
                                + " (expected V, mV, uV or µV, nV, or uV/m2 for CSD)");
                    }
                    unitLine = sc.line();
                }
                continue;
            }
            if (sc.count((byte) 0) > 0) {
                throw sc.error(0, "this is not a text table (it holds binary data)");
            }
            sc.splitAt(detectDelimiter(sc));
            sc.resplit();
            List<String> columns = new ArrayList<>(sc.cellCount());
            for (int i = 0; i < sc.cellCount(); i++) {
                columns.add(sc.text(i));
            }
            return new Preamble(sc.line(), List.copyOf(columns), unit, unitLine);
        }
        if (sawComment) {
            throw new ReadException(sc.file(), 0, 0, "has only comment lines, no header");
        }
        throw new ReadException(sc.file(), 0, 0, "the file is empty");
    }

    private static byte detectDelimiter(LineScanner sc) {
        byte best = DELIMITERS[0];
        int bestCount = -1;
        for (byte d : DELIMITERS) {
            int n = sc.count(d);
            if (n > bestCount) {
                best = d;
                bestCount = n;
            }
        }
        return best;
    }

    /** Refuses a header of one column: the delimiter is then none of ours. */
    void requireColumns(LineScanner sc) {
        if (columns.size() < 2) {
            throw sc.error(0, "the header has a single column; separate the columns by tabs,"
                    + " commas or semicolons");
        }
    }

    /** The first header cell in lower case, which tells the kind of table. */
    String firstColumnKey() {
        return key(columns.get(0));
    }

    /** The index of a column by name (ignoring case), or -1. */
    int indexOf(String name) {
        for (int i = 0; i < columns.size(); i++) {
            if (key(columns.get(i)).equals(name)) {
                return i;
            }
        }
        return -1;
    }

    static String key(String column) {
        return column.trim().toLowerCase(Locale.ROOT);
    }

    /** The delimiter's name for messages. */
    static String delimiterName(byte d) {
        return switch (d) {
            case '\t' -> "tab";
            case ';' -> "semicolon";
            default -> "comma";
        };
    }
}
