package org.trendwright.series;

import java.util.List;

/**
 * One series as read from an upload, before it is checked as a whole. Immutable and thread-safe.
 *
 * @param name    the series name
 * @param where   where the name was given (for messages)
 * @param changes the rows, in upload order
 */
public record SeriesInput(String name, Where where, List<Change> changes) {

    public SeriesInput {
        changes = List.copyOf(changes);
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
