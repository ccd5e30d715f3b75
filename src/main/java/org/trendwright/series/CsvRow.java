package org.trendwright.series;

import java.util.List;

/**
 * One CSV record with the physical line it starts on. Immutable and thread-safe.
 *
 * @param cells the trimmed cells
 * @param line  the 1-based line the record starts on
 */
record CsvRow(List<String> cells, int line) {

    CsvRow {
        cells = List.copyOf(cells);
    }

    String cell(int column) {
        return cells.get(column);
    }

    /** Where cell {@code column} (0-based) sits, reported 1-based. */
    Where where(int column) {
        return Where.cell(line, column + 1);
    }
}
