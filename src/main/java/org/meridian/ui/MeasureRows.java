package org.meridian.ui;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javax.swing.table.AbstractTableModel;
import org.meridian.measure.Measure;
import org.meridian.measure.MeasureTable;

/**
 * The measure table as the window shows it: one row per participant (or grand average),
 * condition and channel, one column per measure with its unit in the header. The tidy table
 * ({@link MeasureTable}) stays the exported form; this is a view of it. A value that stands in
 * for a missing one (a local peak that is the window maximum) is marked with an asterisk.
 */
final class MeasureRows extends AbstractTableModel {
    static final String[] KEYS = {"Participant", "Condition", "Channel"};
    /** How the grand average's rows are named. */
    static final String GRAND = "grand average";

    /** Readable names of the measures, in the registry's order. */
    private static final Map<String, String> TITLES = Map.of(
            "mean", "Mean",
            "peak", "Peak",
            "peak-latency", "Peak latency",
            "local-peak", "Local peak",
            "local-peak-latency", "Local peak lat.",
            "area", "Area",
            "frac-area-latency", "Frac. area lat.",
            "frac-peak-latency", "Frac. peak lat.");

    /** One row of the view: its keys, a value (or null) per measure column, and its wave. */
    private record ViewRow(String participant, String condition, String channel, Object[] values,
            float[] series) {
    }

    /** The wave behind each row, to read the value at the time cursor. */
    interface Series {
        /** The samples of a participant's ({@code grand}: the grand average's) wave at a channel, or null. */
        float[] of(String participant, String condition, String channel);
    }

    private List<Measure> measures = List.of();
    private List<String> units = List.of();
    private List<ViewRow> rows = List.of();
    private MeasureTable table;
    private int cursorSample = -1;
    private String cursorTitle = "At cursor";
    private String dataUnit = "µV";

    /**
     * Shows a table; grand-average rows only unless {@code participants}. Returns whether the
     * columns stayed the same (then only the data changed, and a row sorter keeps its order).
     */
    boolean show(MeasureTable newTable, List<Measure> newMeasures, List<String> newUnits, boolean participants,
            Series series) {
        boolean sameColumns = newMeasures.equals(measures) && newUnits.equals(units);
        this.table = newTable;
        this.measures = List.copyOf(newMeasures);
        this.units = List.copyOf(newUnits);
        Map<String, ViewRow> byKey = new LinkedHashMap<>();
        for (MeasureTable.Row r : newTable.rows()) {
            if (!participants && !r.participant().equals(MeasureTable.GRAND)) {
                continue;
            }
            String key = r.participant() + "\u0000" + r.condition() + "\u0000" + r.channel();
            ViewRow v = byKey.computeIfAbsent(key, k -> new ViewRow(
                    r.participant().equals(MeasureTable.GRAND) ? GRAND : r.participant(),
                    r.condition(), r.channel(), new Object[measures.size()],
                    series.of(r.participant(), r.condition(), r.channel())));
            int base = r.measure().indexOf(" (");
            String name = base < 0 ? r.measure() : r.measure().substring(0, base);
            int column = indexOf(name);
            if (column >= 0) {
                v.values()[column] = r.isEmpty() ? null : new Value(r.value(), base >= 0, r.unit());
            }
        }
        List<ViewRow> grandLast = new ArrayList<>();
        List<ViewRow> grand = new ArrayList<>();
        for (ViewRow v : byKey.values()) {
            (v.participant().equals(GRAND) ? grand : grandLast).add(v);
        }
        grand.addAll(grandLast);
        this.rows = grand;
        if (sameColumns) {
            fireTableDataChanged();
        } else {
            fireTableStructureChanged();
        }
        return sameColumns;
    }

    /** Empties the table (no wave or no channel to measure). */
    void clear() {
        table = null;
        rows = List.of();
        fireTableDataChanged();
    }

    MeasureTable table() {
        return table;
    }

    /** Moves the "at cursor" column to a sample; its title names the time. */
    void cursor(int sample, String timeText, String unit) {
        this.cursorSample = sample;
        this.cursorTitle = "At " + timeText;
        this.dataUnit = unit;
        if (!rows.isEmpty()) {
            fireTableChanged(new javax.swing.event.TableModelEvent(this, 0, rows.size() - 1, KEYS.length));
        }
    }

    /** The title of the "at cursor" column, e.g. {@code At 352 ms (µV)}. */
    String cursorColumnName() {
        return cursorTitle + " (" + dataUnit + ")";
    }

    private int indexOf(String name) {
        for (int i = 0; i < measures.size(); i++) {
            if (measures.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    /**
     * A measured value; {@code standIn} when it replaces a missing one. Shown rounded (two
     * decimals for amplitudes, one for times and areas); exported in full by the tidy table.
     */
    record Value(double value, boolean standIn, String unit) implements Comparable<Value> {
        @Override
        public int compareTo(Value o) {
            return Double.compare(value, o.value);
        }

        @Override
        public String toString() {
            boolean coarse = unit.equals("ms") || unit.contains("·");
            String s = String.format(java.util.Locale.ROOT, coarse ? "%.1f" : "%.2f", value).replace('-', '−');
            return standIn ? s + " *" : s;
        }
    }

    @Override
    public int getRowCount() {
        return rows.size();
    }

    @Override
    public int getColumnCount() {
        return KEYS.length + 1 + measures.size();
    }

    @Override
    public String getColumnName(int column) {
        if (column < KEYS.length) {
            return KEYS[column];
        }
        if (column == KEYS.length) {
            return "At cursor (" + dataUnit + ")";
        }
        Measure m = measures.get(column - KEYS.length - 1);
        return TITLES.getOrDefault(m.name(), m.name()) + " (" + units.get(column - KEYS.length - 1) + ")";
    }

    @Override
    public Class<?> getColumnClass(int column) {
        return column < KEYS.length ? String.class : Value.class;
    }

    @Override
    public Object getValueAt(int row, int column) {
        ViewRow r = rows.get(row);
        return switch (column) {
            case 0 -> r.participant();
            case 1 -> r.condition();
            case 2 -> r.channel();
            case 3 -> r.series() == null || cursorSample < 0 || cursorSample >= r.series().length ? null
                    : new Value(r.series()[cursorSample], false, dataUnit);
            default -> r.values()[column - KEYS.length - 1];
        };
    }

    /** A measure's description, for the column's tool tip. */
    String description(int column) {
        if (column == KEYS.length) {
            return cursorTitle + ": the wave's value at the time cursor";
        }
        return column < KEYS.length ? null : measures.get(column - KEYS.length - 1).description();
    }
}
