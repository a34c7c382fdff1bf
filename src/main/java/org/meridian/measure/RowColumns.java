package org.meridian.measure;

import java.util.AbstractList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.RandomAccess;
import org.meridian.signal.TimeWindow;

/**
 * The rows of a {@link MeasureTable} kept column by column: for each row the index of its
 * participant name and of its measure cell in a table of texts, the index of its group (the
 * condition, channel, window and unit that all rows of one measure share), and the value.
 * {@link #get} builds the {@link MeasureTable.Row} when it is asked for.
 *
 * <p>Why: a whole study scored in one call gives hundreds of thousands of rows whose text cells
 * repeat; as objects they cost more to build (and to keep past the young generation) than the
 * scoring itself. Immutable once built; the list refuses every change.
 */
final class RowColumns extends AbstractList<MeasureTable.Row> implements RandomAccess {
    private final List<String> texts;
    private final List<Group> groups;
    private final int[] participant;
    private final int[] group;
    private final int[] measure;
    private final double[] value;

    /** What every row of one condition, channel, window and measure shares. */
    private record Group(String condition, String channel, TimeWindow window, String unit) {
    }

    private RowColumns(Builder b) {
        this.texts = List.copyOf(b.texts);
        this.groups = List.copyOf(b.groups);
        // the builder is spent after build(), so arrays of the exact length are taken over
        this.participant = b.participant.length == b.size ? b.participant : Arrays.copyOf(b.participant, b.size);
        this.group = b.group.length == b.size ? b.group : Arrays.copyOf(b.group, b.size);
        this.measure = b.measure.length == b.size ? b.measure : Arrays.copyOf(b.measure, b.size);
        this.value = b.value.length == b.size ? b.value : Arrays.copyOf(b.value, b.size);
    }

    @Override
    public MeasureTable.Row get(int i) {
        Objects.checkIndex(i, value.length);
        Group g = groups.get(group[i]);
        return new MeasureTable.Row(texts.get(participant[i]), g.condition(), g.channel(),
                texts.get(measure[i]), g.window(), value[i], g.unit());
    }

    @Override
    public int size() {
        return value.length;
    }

    /** Collects rows in order; texts repeated across rows are stored once. */
    static final class Builder {
        private final List<String> texts = new ArrayList<>();
        private final Map<String, Integer> textIndex = new HashMap<>();
        private final List<Group> groups = new ArrayList<>();
        private int[] participant;
        private int[] group;
        private int[] measure;
        private double[] value;
        private int size;

        /** @param expectedRows the number of rows expected (the arrays grow past it if needed) */
        Builder(int expectedRows) {
            int n = Math.max(16, expectedRows);
            participant = new int[n];
            group = new int[n];
            measure = new int[n];
            value = new double[n];
        }

        /** The index of a participant name or measure cell text, added on first use. */
        int text(String s) {
            Integer i = textIndex.get(s);
            if (i == null) {
                i = texts.size();
                texts.add(s);
                textIndex.put(s, i);
            }
            return i;
        }

        /** A new group for the rows of one condition, channel, window and measure. */
        int group(String condition, String channel, TimeWindow window, String unit) {
            groups.add(new Group(condition, channel, window, unit));
            return groups.size() - 1;
        }

        /** Adds a row; {@code participant} and {@code measure} are {@link #text} indices. */
        void add(int participantText, int groupIndex, int measureText, double v) {
            if (size == value.length) {
                int n = 2 * size;
                participant = Arrays.copyOf(participant, n);
                group = Arrays.copyOf(group, n);
                measure = Arrays.copyOf(measure, n);
                value = Arrays.copyOf(value, n);
            }
            participant[size] = participantText;
            group[size] = groupIndex;
            measure[size] = measureText;
            value[size] = v;
            size++;
        }

        /** The rows so far; the builder cannot be used afterwards. */
        RowColumns build() {
            RowColumns rows = new RowColumns(this);
            participant = null;
            group = null;
            measure = null;
            value = null;
            return rows;
        }
    }
}
