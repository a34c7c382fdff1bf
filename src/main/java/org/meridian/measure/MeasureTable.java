package org.meridian.measure;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import org.meridian.signal.TimeWindow;

/**
 * The tidy measure table of DESIGN §4: one value a row, columns
 * {@code participant condition channel measure window_ms value unit}. Grand-average rows have
 * participant {@code grand}; the jackknife's retrieved scores have a measure cell ending in
 * {@code " (jackknife)"}; a stand-in value carries its qualifier in the measure cell, e.g.
 * {@code local-peak (window maximum)}. A missing value is an empty cell, and every empty or
 * stand-in value has a {@link Warning}. Immutable.
 */
public record MeasureTable(List<Row> rows, List<Warning> warnings) {
    public static final String GRAND = "grand";
    public static final String JACKKNIFE_SUFFIX = " (jackknife)";
    public static final List<String> COLUMNS = List.of("participant", "condition", "channel",
            "measure", "window_ms", "value", "unit");

    public MeasureTable {
        rows = List.copyOf(rows);
        warnings = List.copyOf(warnings);
    }

    /** One row; {@code value} is NaN for an empty cell. */
    public record Row(String participant, String condition, String channel, String measure,
            TimeWindow window, double value, String unit) {

        public boolean isEmpty() {
            return Double.isNaN(value);
        }
    }

    /** Something the researcher should know about one value. */
    public record Warning(String participant, String condition, String channel, String measure,
            TimeWindow window, String message) {

        /** E.g. {@code p03, rare, Pz, frac-peak-latency 300:500 ms: the wave does not …}. */
        public String describe() {
            return participant + ", " + condition + ", " + channel + ", " + measure + " "
                    + window + " ms: " + message;
        }
    }

    /** The table as tab-separated text with a header line, LF line ends. */
    public String toTsv() {
        StringBuilder sb = new StringBuilder(64 * (rows.size() + 1));
        sb.append(String.join("\t", COLUMNS)).append('\n');
        for (Row r : rows) {
            sb.append(cell(r.participant())).append('\t')
                    .append(cell(r.condition())).append('\t')
                    .append(cell(r.channel())).append('\t')
                    .append(cell(r.measure())).append('\t')
                    .append(r.window()).append('\t')
                    .append(formatValue(r.value())).append('\t')
                    .append(r.unit()).append('\n');
        }
        return sb.toString();
    }

    /** A value with 7 significant digits in plain notation; empty for NaN. */
    public static String formatValue(double v) {
        if (Double.isNaN(v)) {
            return "";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "inf" : "-inf";
        }
        if (v == 0) {
            return "0";
        }
        return new BigDecimal(v).round(new MathContext(7)).stripTrailingZeros().toPlainString();
    }

    /** Tabs and line breaks in names would break the table; they become spaces. */
    private static String cell(String s) {
        return s.replace('\t', ' ').replace('\n', ' ').replace('\r', ' ');
    }
}
