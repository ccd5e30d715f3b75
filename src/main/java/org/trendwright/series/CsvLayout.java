package org.trendwright.series;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.trendwright.series.IntakeException.Reason;

/**
 * The layout of a CSV file (wide or long, with or without a header) and the reading of its rows
 * into series. See {@link CsvIntake} for the rules. Immutable and thread-safe.
 *
 * @param longFormat true for the three-column name, period, value layout
 * @param hasHeader  true when the first row names the columns
 */
record CsvLayout(boolean longFormat, boolean hasHeader) {

    static CsvLayout detect(List<CsvRow> rows) {
        int width = rows.get(0).cells().size();
        CsvRow first = rows.get(0);
        if (isPeriod(first.cell(0))) {
            return new CsvLayout(false, false);
        }
        if (width == 3 && isPeriod(first.cell(1))) {
            return new CsvLayout(true, false);
        }
        if (rows.size() < 2) {
            throw new IntakeException(Reason.INVALID_VALUE, Where.line(first.line()), "the file holds only a header"
                    + " row; add rows of period and value.");
        }
        CsvRow second = rows.get(1);
        boolean longFormat = width == 3 && !isPeriod(second.cell(0)) && isPeriod(second.cell(1));
        return new CsvLayout(longFormat, true);
    }

    private static boolean isPeriod(String cell) {
        return PeriodParser.parse(cell).isPresent();
    }

    List<SeriesInput> read(List<CsvRow> rows, IntakeOptions options) {
        List<CsvRow> data = hasHeader ? rows.subList(1, rows.size()) : rows;
        return longFormat ? readLong(data) : readWide(rows.get(0), data, options);
    }

    private List<SeriesInput> readWide(CsvRow header, List<CsvRow> data, IntakeOptions options) {
        List<Period> periods = PeriodColumn.resolve(data.stream()
                .map(r -> new PeriodColumn.Cell(r.cell(0), r.where(0))).toList());
        List<String> names = wideNames(header, options);
        List<SeriesInput> series = new ArrayList<>();
        for (int column = 1; column < header.cells().size(); column++) {
            List<SeriesInput.Change> changes = new ArrayList<>(data.size());
            for (int i = 0; i < data.size(); i++) {
                CsvRow row = data.get(i);
                changes.add(new SeriesInput.Change(periods.get(i), ValueCell.parse(row.cell(column),
                        row.where(column)), row.where(column)));
            }
            Where nameAt = hasHeader ? header.where(column) : Where.NOWHERE;
            series.add(new SeriesInput(names.get(column - 1), nameAt, changes));
        }
        return series;
    }

    private List<String> wideNames(CsvRow header, IntakeOptions options) {
        int count = header.cells().size() - 1;
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

    private static List<SeriesInput> readLong(List<CsvRow> data) {
        Map<String, List<CsvRow>> byName = new LinkedHashMap<>();
        for (CsvRow row : data) {
            if (row.cell(0).isBlank()) {
                throw new IntakeException(Reason.INVALID_VALUE, row.where(0), "the series name is empty; every row of"
                        + " a long-format file needs a name, a period and a value.");
            }
            byName.computeIfAbsent(row.cell(0), k -> new ArrayList<>()).add(row);
        }
        List<SeriesInput> series = new ArrayList<>(byName.size());
        byName.forEach((name, rows) -> {
            List<Period> periods = PeriodColumn.resolve(rows.stream()
                    .map(r -> new PeriodColumn.Cell(r.cell(1), r.where(1))).toList());
            List<SeriesInput.Change> changes = new ArrayList<>(rows.size());
            for (int i = 0; i < rows.size(); i++) {
                CsvRow row = rows.get(i);
                changes.add(new SeriesInput.Change(periods.get(i), ValueCell.parse(row.cell(2), row.where(2)),
                        row.where(2)));
            }
            series.add(new SeriesInput(name, rows.get(0).where(0), changes));
        });
        return series;
    }
}
