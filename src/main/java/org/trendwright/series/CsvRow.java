package org.trendwright.series;

/**
 * One CSV record with the physical line it starts on. Immutable and thread-safe (the cells are
 * never handed out).
 */
final class CsvRow {

    private final String[] cells;
    private final int line;

    /**
     * @param cells the trimmed cells (owned from now on)
     * @param line  the 1-based line the record starts on
     */
    CsvRow(String[] cells, int line) {
        this.cells = cells;
        this.line = line;
    }

    int width() {
        return cells.length;
    }

    int line() {
        return line;
    }

    String cell(int column) {
        return cells[column];
    }

    /** Where cell {@code column} (0-based) sits, reported 1-based. */
    Where where(int column) {
        return Where.cell(line, column + 1);
    }
}
