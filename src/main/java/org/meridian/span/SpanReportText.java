package org.meridian.span;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The plain-text forms of a {@link SpanReport}, shared by the command line and the window's
 * export: the summary as ordered {@code key: value} lines, and the per-sample table
 * {@code time_ms gfp corr diss state} (tab-separated, one row per sample of the window), both
 * documented in the README. An undefined value (the correlation of a flat map) is an empty cell.
 */
public final class SpanReportText {
    /** The per-sample table's header. */
    public static final String HEADER = "time_ms\tgfp\tcorr\tdiss\tstate";

    private SpanReportText() {
    }

    /** The summary, in reading order; the keys are stable names that scripts may rely on. */
    public static List<Map.Entry<String, String>> summary(SpanReport r) {
        List<Map.Entry<String, String>> out = new ArrayList<>();
        SpanWindow w = r.window();
        SpanTest.Result t = r.test();
        add(out, "condition", r.condition());
        add(out, "window_ms", SpanWindow.fmt(w.startMs()) + ".." + SpanWindow.fmt(w.endMs()));
        add(out, "split_ms", SpanWindow.fmt(w.splitMs()) + (w.middle() ? " (middle)" : " (given)"));
        add(out, "early_ms", w.earlyRangeMs());
        add(out, "late_ms", w.lateRangeMs());
        add(out, "maps", r.settings().csd() ? "CSD (" + r.unit().symbol() + ")"
                : PartMeans.averageReferenced(r.unit()) ? "potential (" + r.unit().symbol()
                        + ", average reference)" : "as loaded (" + r.unit().symbol() + ")");
        add(out, "channels", r.channels().size() + (r.leftOut().isEmpty() ? ""
                : " (left out, no position: " + String.join(", ", r.leftOut()) + ")"));
        add(out, "participants", Integer.toString(r.participants().size()));
        add(out, "reference_ms", SpanWindow.fmt(r.trace().referenceMs()));
        add(out, "reference", r.settings().referenceMs().isPresent() ? "given time" : "GFP maximum");
        Segmentation s = r.segmentation();
        add(out, "segmentation", "descriptive (states chosen by cross-validation among 1.."
                + r.settings().maxStates() + ")");
        add(out, "states", Integer.toString(s.k()));
        add(out, "segments", Integer.toString(s.segments().size()));
        int i = 1;
        for (Segment seg : s.segments()) {
            add(out, "segment_" + i++, "state " + seg.state() + ", " + SpanWindow.fmt(seg.startMs())
                    + ".." + SpanWindow.fmt(seg.endMs()) + " ms");
        }
        add(out, "test", t.whitened() ? "span test, whitened part pairs (--whiten; conservative variant)"
                : "span test");
        add(out, "statistic", number(t.statistic()));
        add(out, "statistic_unit", t.whitened() ? "none" : squared(r.unit().symbol()));
        add(out, "diss", fixed(t.diss(), 4));
        add(out, "p", number(t.p()));
        add(out, "patterns", t.randomisation().exact()
                ? "all " + t.randomisation().patterns() + " sign patterns (exact)"
                : t.randomisation().patterns() + " random sign patterns (seed " + r.settings().seed() + ")");
        add(out, "alpha", number(t.alpha()));
        add(out, "verdict", t.verdict().word());
        if (t.smallestPossibleP() >= t.alpha()) {
            add(out, "note", "with " + r.participants().size() + " participants the smallest possible p is "
                    + number(t.smallestPossibleP()) + ", not below alpha: the test cannot say \"changes\"");
        }
        return out;
    }

    /** The summary as {@code key: value} lines, each prefixed with {@code prefix} ("" or "# "). */
    public static String summaryLines(SpanReport r, String prefix) {
        StringBuilder sb = new StringBuilder();
        for (Map.Entry<String, String> e : summary(r)) {
            sb.append(prefix).append(e.getKey()).append(": ").append(e.getValue()).append('\n');
        }
        return sb.toString();
    }

    /**
     * The per-sample table: the summary as {@code #} comment lines, a {@code # unit:} line, the
     * header, then one row per sample.
     */
    public static String table(SpanReport r) {
        StabilityTrace tr = r.trace();
        Segmentation s = r.segmentation();
        StringBuilder sb = new StringBuilder(64 * (tr.size() + 30));
        sb.append(summaryLines(r, "# "));
        sb.append("# unit: ").append(r.unit().fileToken()).append('\n');
        sb.append(HEADER).append('\n');
        for (int t = 0; t < tr.size(); t++) {
            sb.append(SpanWindow.fmt(tr.timeMs(t))).append('\t')
                    .append(number(tr.gfp(t))).append('\t')
                    .append(cell(tr.correlation(t))).append('\t')
                    .append(cell(tr.diss(t))).append('\t')
                    .append(s.state(t) == 0 ? "" : Integer.toString(s.state(t))).append('\n');
        }
        return sb.toString();
    }

    /** The sample × sample correlation matrix: header {@code time_ms} then the times. */
    public static String correlationMatrix(SpanReport r) {
        StabilityTrace tr = r.trace();
        StringBuilder sb = new StringBuilder();
        sb.append("time_ms");
        for (int t = 0; t < tr.size(); t++) {
            sb.append('\t').append(SpanWindow.fmt(tr.timeMs(t)));
        }
        sb.append('\n');
        for (int t = 0; t < tr.size(); t++) {
            sb.append(SpanWindow.fmt(tr.timeMs(t)));
            for (int u = 0; u < tr.size(); u++) {
                sb.append('\t').append(cell(tr.correlation(t, u)));
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    /** µV → µV², µV/m² → (µV/m²)². */
    static String squared(String unit) {
        return unit.contains("/") ? "(" + unit + ")²" : unit + "²";
    }

    private static void add(List<Map.Entry<String, String>> out, String key, String value) {
        out.add(Map.entry(key, value));
    }

    private static String cell(double v) {
        return Double.isNaN(v) ? "" : fixed(v, 6);
    }

    /** Fixed decimals without trailing zeros: 0.5, 1, -0.123457. */
    static String fixed(double v, int decimals) {
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s.equals("-0") ? "0" : s;
    }

    /** Six significant digits, plain where reasonable: 0.000305176, 3.05176e-05, 12.3457. */
    static String number(double v) {
        if (v == 0 || Double.isNaN(v) || Double.isInfinite(v)) {
            return v == 0 ? "0" : Double.toString(v);
        }
        double a = Math.abs(v);
        if (a >= 1e-4 && a < 1e7) {
            int digits = Math.max(0, 5 - (int) Math.floor(Math.log10(a)));
            return fixed(v, digits);
        }
        String s = String.format(Locale.ROOT, "%.5e", v);
        return s.replaceAll("0+e", "e").replaceAll("\\.e", "e");
    }
}
