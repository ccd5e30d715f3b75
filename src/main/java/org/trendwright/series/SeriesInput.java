package org.trendwright.series;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntFunction;

/**
 * One series as read from an upload, before it is checked as a whole: its name and its rows in
 * upload order, kept in two primitive arrays (period index and value, NaN for an empty cell) so
 * that a large upload costs 16 bytes per row rather than a few objects per row. Where each row
 * sits (a CSV line and column, or a JSON path) is worked out only when a message needs it.
 * Immutable and thread-safe (the arrays are never handed out).
 */
public final class SeriesInput {

    private final String name;
    private final Where where;
    private final Frequency frequency;
    private final long[] periods;
    private final double[] values;
    private final int size;
    private final IntFunction<Where> rowWhere;

    /**
     * A series from its rows (the JSON intake and callers that build rows by hand).
     *
     * @param name    the series name
     * @param where   where the name was given (for messages)
     * @param changes the rows, in upload order, all of one frequency
     */
    public SeriesInput(String name, Where where, List<Change> changes) {
        this(name, where, changes.isEmpty() ? null : changes.get(0).period().frequency(),
                changes.stream().mapToLong(c -> c.period().index()).toArray(),
                changes.stream().mapToDouble(c -> c.value() == null ? Double.NaN : c.value()).toArray(),
                changes.size(), List.copyOf(changes).stream().map(Change::where).toList()::get);
    }

    /** Takes ownership of the arrays: the caller must not change them afterwards. */
    SeriesInput(String name, Where where, Frequency frequency, long[] periods, double[] values, int size,
                IntFunction<Where> rowWhere) {
        this.name = name;
        this.where = where;
        this.frequency = frequency;
        this.periods = periods;
        this.values = values;
        this.size = size;
        this.rowWhere = rowWhere;
    }

    public String name() {
        return name;
    }

    /** Where the name was given. */
    public Where where() {
        return where;
    }

    /** The frequency of every period, or null when there are no rows. */
    public Frequency frequency() {
        return frequency;
    }

    /** The number of rows. */
    public int size() {
        return size;
    }

    /** The running index ({@link Period#index()}) of row {@code i}'s period. */
    public long periodIndex(int i) {
        return periods[checked(i)];
    }

    /** Row {@code i}'s value, or NaN for an empty cell. */
    public double valueOrNaN(int i) {
        return values[checked(i)];
    }

    /** Where row {@code i}'s value sits, for messages. */
    public Where where(int i) {
        return rowWhere.apply(checked(i));
    }

    /** This series under another name. */
    public SeriesInput named(String newName) {
        return new SeriesInput(newName, where, frequency, periods, values, size, rowWhere);
    }

    /** The rows as records (a copy; costs a few objects per row). */
    public List<Change> changes() {
        List<Change> changes = new ArrayList<>(size);
        for (int i = 0; i < size; i++) {
            changes.add(new Change(new Period(frequency, periods[i]), Double.isNaN(values[i]) ? null : values[i],
                    where(i)));
        }
        return changes;
    }

    private int checked(int i) {
        if (i < 0 || i >= size) {
            throw new IndexOutOfBoundsException("row " + i + " of " + size);
        }
        return i;
    }

    /**
     * One row: a period and its value, null when the cell was empty.
     *
     * @param period the period
     * @param value  the finite value, or null for an empty cell
     * @param where  where the row sits, for messages
     */
    public record Change(Period period, Double value, Where where) {
    }
}
