package org.trendwright.series;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.trendwright.series.IntakeException.Reason;

/**
 * Reads a CSV upload (RFC 4180: quoted fields may hold delimiters, quotes and line breaks) in
 * UTF-8, with or without a byte-order mark, delimited by comma, semicolon or tab.
 *
 * <p>Two layouts, told apart by the first row that is not a header:
 * <ul>
 *   <li>wide: the first column holds periods and every further column is one series, named by
 *       the header (without a header: the request's name, else "series", numbered when there are
 *       several; a request's name also replaces the header of a file with a single series column);</li>
 *   <li>long: exactly three columns, series name, period, value; creates one series per name.</li>
 * </ul>
 * The first row is a header when its period cell is not a period. Numbers use a decimal point.
 * Stateless and thread-safe.
 */
public final class CsvIntake {

    private CsvIntake() {
    }

    /** The series in the file. */
    public static List<SeriesInput> read(byte[] body, IntakeOptions options) {
        String text = decode(body);
        char delimiter = options.delimiter() != null ? options.delimiter() : Delimiters.detect(text);
        List<CsvRow> rows = parse(text, delimiter, options.limits());
        if (rows.isEmpty()) {
            throw new IntakeException(Reason.INVALID_VALUE, Where.NOWHERE, "the file holds no rows; send a header"
                    + " and at least one row of period and value.");
        }
        checkShape(rows, delimiter);
        List<SeriesInput> series = CsvLayout.detect(rows).read(rows, options);
        if (series.size() > options.limits().maxSeriesPerUpload()) {
            throw new IntakeException(Reason.LIMIT_EXCEEDED, Where.NOWHERE, "the file holds " + series.size()
                    + " series; the limit per upload is " + options.limits().maxSeriesPerUpload() + ".");
        }
        return series;
    }

    private static String decode(byte[] body) {
        try {
            String text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(body)).toString();
            return text.startsWith("\uFEFF") ? text.substring(1) : text;
        } catch (CharacterCodingException e) {
            throw new IntakeException(Reason.INVALID_VALUE, Where.NOWHERE, "the file is not valid UTF-8; save it as"
                    + " UTF-8 (with or without a byte-order mark) and upload it again.");
        }
    }

    private static List<CsvRow> parse(String text, char delimiter, IntakeLimits limits) {
        CSVFormat format = CSVFormat.RFC4180.builder().setDelimiter(delimiter).setIgnoreEmptyLines(true)
                .setTrim(true).get();
        LineIndex lines = new LineIndex(text);
        List<CsvRow> rows = new ArrayList<>();
        try (CSVParser parser = CSVParser.builder().setReader(new StringReader(text)).setFormat(format).get()) {
            long cap = Long.MAX_VALUE;
            for (CSVRecord record : parser) {
                rows.add(new CsvRow(record.toList(), lines.lineAt(record.getCharacterPosition())));
                if (rows.size() == 2) {
                    cap = rowCap(rows, limits);
                }
                if (rows.size() > cap) {
                    throw tooManyRows(rows.get(rows.size() - 1), cap, limits);
                }
            }
        } catch (IOException | UncheckedIOException | IllegalStateException e) {
            throw new IntakeException(Reason.INVALID_VALUE, Where.line(lines.lastLine()), "the file is not valid"
                    + " CSV (" + e.getMessage() + "); check for an unbalanced double quote.");
        }
        return rows;
    }

    /**
     * Twice the most rows a file like this one can hold without breaking a limit (a wide file: one
     * row per period of its series plus a header; a long file: one row per observation of every
     * series plus a header). Parsing stops past it, so a body of many tiny rows cannot fill the
     * heap before the limits are checked; a file only just over a limit still reaches the exact
     * message of that limit.
     */
    private static long rowCap(List<CsvRow> firstTwo, IntakeLimits limits) {
        long perSeries = 2 * (limits.maxObservationsPerSeries() + 1L);
        CsvRow first = firstTwo.get(0);
        boolean threeColumns = first.cells().size() == 3 && firstTwo.get(1).cells().size() == 3;
        if (threeColumns && CsvLayout.detect(firstTwo).longFormat()) {
            return perSeries * limits.maxSeriesPerUpload();
        }
        // A wide file's series may cover different spans (gaps elsewhere), so allow a span per column.
        return perSeries * Math.max(1, first.cells().size() - 1);
    }

    private static IntakeException tooManyRows(CsvRow row, long cap, IntakeLimits limits) {
        return new IntakeException(Reason.LIMIT_EXCEEDED, Where.line(row.line()), "the file holds more than " + cap
                + " rows, more than its series can hold with the limit of " + limits.maxObservationsPerSeries()
                + " observations per series; split the upload.");
    }

    private static void checkShape(List<CsvRow> rows, char delimiter) {
        int width = rows.get(0).cells().size();
        if (width < 2) {
            throw new IntakeException(Reason.INVALID_VALUE, Where.line(rows.get(0).line()), "found one column with"
                    + " delimiter '" + Delimiters.name(delimiter) + "'; a series needs a period column and a value"
                    + " column.");
        }
        for (CsvRow row : rows) {
            if (row.cells().size() != width) {
                throw new IntakeException(Reason.INVALID_VALUE, Where.line(row.line()), "the row has "
                        + row.cells().size() + " cells but the first row has " + width + "; every row needs the"
                        + " same number of cells.");
            }
        }
    }

    /** Line numbers (1-based) of character offsets. */
    private static final class LineIndex {
        private final int[] starts;

        LineIndex(String text) {
            int[] found = new int[16];
            int count = 1;
            for (int i = 0; i < text.length(); i++) {
                if (text.charAt(i) == '\n') {
                    if (count == found.length) {
                        found = Arrays.copyOf(found, count * 2);
                    }
                    found[count++] = i + 1;
                }
            }
            starts = Arrays.copyOf(found, count);
        }

        int lineAt(long offset) {
            int i = Arrays.binarySearch(starts, (int) offset);
            return i >= 0 ? i + 1 : -i - 1;
        }

        int lastLine() {
            return starts.length;
        }
    }
}
