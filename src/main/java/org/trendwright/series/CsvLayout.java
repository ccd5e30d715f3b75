package org.trendwright.series;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.trendwright.series.IntakeException.Reason;

/**
 * The layout of a CSV file (wide or long, with or without a header) and the reading of its rows
 * into series. See {@link CsvIntake} for the rules. Immutable and thread-safe; its
 * {@link Columns} are one upload's and not thread-safe.
 *
 * @param longFormat true for the three-column name, period, value layout
 * @param hasHeader  true when the first row names the columns
 */
record CsvLayout(boolean longFormat, boolean hasHeader) {

    /** The layout told by the first row and the second (null when the file has one row). */
    static CsvLayout detect(CsvRow first, CsvRow second) {
        int width = first.width();
        if (isPeriod(first.cell(0))) {
            return new CsvLayout(false, false);
        }
        if (width == 3 && isPeriod(first.cell(1))) {
            return new CsvLayout(true, false);
        }
        if (second == null) {
            throw new IntakeException(Reason.INVALID_VALUE, Where.line(first.line()), "the file holds only a header"
                    + " row; add rows of period and value.");
        }
        boolean longFormat = width == 3 && !isPeriod(second.cell(0)) && isPeriod(second.cell(1));
        return new CsvLayout(longFormat, true);
    }

    private static boolean isPeriod(String cell) {
        return PeriodParser.parse(cell).isPresent();
    }

    /** Empty columns to read the data rows of a file whose first row is {@code first} into. */
    Columns columns(CsvRow first, IntakeOptions options) {
        if (longFormat) {
            return new LongColumns();
        }
        int count = first.width() - 1;
        if (count > options.limits().maxSeriesPerUpload()) {
            throw CsvIntake.tooManySeries(count, options.limits());
        }
        return new WideColumns(first, options);
    }

    /** The data rows of one upload, kept per series in primitive arrays. */
    interface Columns {
        /** Reads one data row, refusing a cell that is no period or no number. */
        void add(CsvRow row);

        /** The series read, in column order (wide) or in order of first appearance (long). */
        List<SeriesInput> finish();
    }

    private List<String> wideNames(CsvRow header, IntakeOptions options) {
        int count = header.width() - 1;
        List<String> names = new ArrayList<>(count);
        Set<String> seen = new HashSet<>();
        for (int column = 1; column <= count; column++) {
            boolean named = options.name() != null && !options.name().isBlank();
            String name = hasHeader && !(named && count == 1) ? header.cell(column) : defaultName(options, column, count);
            if (name.isBlank()) {
                throw new IntakeException(Reason.INVALID_VALUE, header.where(column), "the header gives column "
                        + (column + 1) + " no name; name every series column.");
            }
            if (!seen.add(name)) {
                throw new IntakeException(Reason.INCONSISTENT, header.where(column), "two columns are named '" + name
                        + "'; give every series column its own name.");
            }
            names.add(name);
        }
        return names;
    }

    private static String defaultName(IntakeOptions options, int column, int count) {
        String base = options.name() != null && !options.name().isBlank() ? options.name().trim() : "series";
        return count == 1 ? base : base + " " + column;
    }

    /** A growable column of row lines, period numbers and values. */
    private static final class Column {
        private final PeriodColumn.Reader periods;
        private long[] keys = new long[16];
        private int[] lines = new int[16];
        private double[] values;
        private int size;

        Column(PeriodColumn.Reader periods, boolean withValues) {
            this.periods = periods;
            this.values = withValues ? new double[16] : null;
        }

        int add(CsvRow row, int periodColumn) {
            if (size == keys.length) {
                keys = Arrays.copyOf(keys, size * 2);
                lines = Arrays.copyOf(lines, size * 2);
                values = values == null ? null : Arrays.copyOf(values, size * 2);
            }
            keys[size] = periods.read(row.cell(periodColumn), row.line(), periodColumn + 1);
            lines[size] = row.line();
            return size++;
        }

        Frequency finish() {
            return periods.finish(keys, size);
        }
    }

    /**
     * One period column shared by every series column. The names are checked once the rows are
     * read, so that a bad period is reported before a bad name, as in a file read whole.
     */
    private final class WideColumns implements Columns {
        private final CsvRow header;
        private final IntakeOptions options;
        private final Column periods = new Column(new PeriodColumn.Reader(new HashMap<>()), false);
        private double[][] values;

        WideColumns(CsvRow header, IntakeOptions options) {
            this.header = header;
            this.options = options;
            this.values = new double[header.width() - 1][4];
        }

        @Override
        public void add(CsvRow row) {
            int i = periods.add(row, 0);
            for (int c = 0; c < values.length; c++) {
                if (i == values[c].length) {
                    values[c] = Arrays.copyOf(values[c], Math.max(16, i * 2));
                }
                values[c][i] = ValueCell.parseOrEmpty(row.cell(c + 1), row.line(), c + 2);
            }
        }

        @Override
        public List<SeriesInput> finish() {
            Frequency frequency = periods.finish();
            List<String> names = wideNames(header, options);
            int[] lines = periods.lines;
            List<SeriesInput> series = new ArrayList<>(names.size());
            for (int c = 0; c < names.size(); c++) {
                int column = c + 2;
                Where nameAt = hasHeader ? header.where(c + 1) : Where.NOWHERE;
                series.add(new SeriesInput(names.get(c), nameAt, frequency, periods.keys, values[c], periods.size,
                        i -> Where.cell(lines[i], column)));
            }
            return series;
        }
    }

    /** One column per series name, in order of first appearance. */
    private static final class LongColumns implements Columns {
        private final Map<String, PeriodParser.Parsed> cache = new HashMap<>();
        private final Map<String, Column> byName = new LinkedHashMap<>();
        private final Map<String, Where> nameAt = new HashMap<>();

        @Override
        public void add(CsvRow row) {
            String name = row.cell(0);
            if (name.isBlank()) {
                throw new IntakeException(Reason.INVALID_VALUE, row.where(0), "the series name is empty; every row of"
                        + " a long-format file needs a name, a period and a value.");
            }
            Column column = byName.get(name);
            if (column == null) {
                column = new Column(new PeriodColumn.Reader(cache), true);
                byName.put(name, column);
                nameAt.put(name, row.where(0));
            }
            int i = column.add(row, 1);
            column.values[i] = ValueCell.parseOrEmpty(row.cell(2), row.line(), 3);
        }

        @Override
        public List<SeriesInput> finish() {
            List<SeriesInput> series = new ArrayList<>(byName.size());
            byName.forEach((name, column) -> {
                Frequency frequency = column.finish();
                int[] lines = column.lines;
                series.add(new SeriesInput(name, nameAt.get(name), frequency, column.keys, column.values, column.size,
                        i -> Where.cell(lines[i], 3)));
            });
            return series;
        }
    }
}
