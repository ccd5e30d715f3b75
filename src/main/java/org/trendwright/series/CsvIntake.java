package org.trendwright.series;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.Iterator;
import java.util.List;
import java.util.function.LongConsumer;
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
 *
 * <p>The body is read as a stream: the delimiter is detected on its first lines, then records are
 * parsed one at a time and their periods and values kept in primitive arrays per series (see
 * {@link SeriesInput}), so an upload costs about 20 bytes per row however large the file is.
 * Refusals name the line and column of the first problem met in file order. Stateless and
 * thread-safe.
 */
public final class CsvIntake {

    /** Rows between two reports to the progress listener. */
    static final int PROGRESS_EVERY = 10_000;
    /** Longest start of the file held for delimiter detection, in characters. */
    private static final int PREFIX_CHARS = 1 << 20;

    private CsvIntake() {
    }

    /** The series in the file. */
    public static List<SeriesInput> read(byte[] body, IntakeOptions options) {
        return read(new ByteArrayInputStream(body), options, rows -> { });
    }

    /**
     * The series in the file read from {@code body}, telling {@code rowsRead} the count of data rows
     * read (the header left out) every {@value #PROGRESS_EVERY} records and at the end. Does not
     * close the stream.
     */
    public static List<SeriesInput> read(InputStream body, IntakeOptions options, LongConsumer rowsRead) {
        Reader chars = new InputStreamReader(body, StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT));
        String prefix = prefix(chars);
        char delimiter = options.delimiter() != null ? options.delimiter() : Delimiters.detect(prefix);
        LineTrackingReader lines = new LineTrackingReader(new PrefixedReader(prefix, chars));
        CSVFormat format = CSVFormat.RFC4180.builder().setDelimiter(delimiter).setIgnoreEmptyLines(true)
                .setTrim(true).get();
        try (CSVParser parser = CSVParser.builder().setReader(lines).setFormat(format).get()) {
            return new Rows(parser.iterator(), lines, delimiter, options, rowsRead).read();
        } catch (IOException | UncheckedIOException | IllegalStateException e) {
            throw unreadable(e, lines.lastLine());
        }
    }

    /** The start of the file, at least {@link Delimiters#SAMPLE_LINES} times 4 lines when it has them, without a BOM. */
    private static String prefix(Reader chars) {
        StringBuilder prefix = new StringBuilder();
        char[] buffer = new char[8192];
        int newlines = 0;
        try {
            int n;
            while (newlines < Delimiters.SAMPLE_LINES * 4 && prefix.length() < PREFIX_CHARS
                    && (n = chars.read(buffer)) > 0) {
                prefix.append(buffer, 0, n);
                for (int i = 0; i < n; i++) {
                    newlines += buffer[i] == '\n' ? 1 : 0;
                }
            }
        } catch (IOException | UncheckedIOException e) {
            throw unreadable(e, 1);
        }
        return prefix.length() > 0 && prefix.charAt(0) == '\uFEFF' ? prefix.substring(1) : prefix.toString();
    }

    private static IntakeException unreadable(Exception e, int line) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof CharacterCodingException) {
                return new IntakeException(Reason.INVALID_VALUE, Where.NOWHERE, "the file is not valid UTF-8; save it"
                        + " as UTF-8 (with or without a byte-order mark) and upload it again.");
            }
        }
        return new IntakeException(Reason.INVALID_VALUE, Where.line(line), "the file is not valid CSV ("
                + e.getMessage() + "); check for an unbalanced double quote.");
    }

    /** The records of one upload, read one at a time into the layout's columns. */
    private static final class Rows {
        private final Iterator<CSVRecord> records;
        private final LineTrackingReader lines;
        private final char delimiter;
        private final IntakeOptions options;
        private final LongConsumer rowsRead;
        private int width;

        Rows(Iterator<CSVRecord> records, LineTrackingReader lines, char delimiter, IntakeOptions options,
             LongConsumer rowsRead) {
            this.records = records;
            this.lines = lines;
            this.delimiter = delimiter;
            this.options = options;
            this.rowsRead = rowsRead;
        }

        List<SeriesInput> read() {
            CsvRow first = next();
            if (first == null) {
                throw new IntakeException(Reason.INVALID_VALUE, Where.NOWHERE, "the file holds no rows; send a header"
                        + " and at least one row of period and value.");
            }
            width = first.width();
            if (width < 2) {
                throw new IntakeException(Reason.INVALID_VALUE, Where.line(first.line()), "found one column with"
                        + " delimiter '" + Delimiters.name(delimiter) + "'; a series needs a period column and a"
                        + " value column.");
            }
            CsvRow second = checkedNext();
            CsvLayout layout = CsvLayout.detect(first, second);
            CsvLayout.Columns columns = layout.columns(first, options);
            long cap = second == null ? Long.MAX_VALUE : rowCap(layout, first, options.limits());
            if (!layout.hasHeader()) {
                columns.add(first);
            }
            long count = 1;
            long header = layout.hasHeader() ? 1 : 0;
            for (CsvRow row = second; row != null; row = checkedNext()) {
                if (++count > cap) {
                    throw tooManyRows(row, cap, options.limits());
                }
                columns.add(row);
                if (count % PROGRESS_EVERY == 0) {
                    rowsRead.accept(count - header);
                }
            }
            rowsRead.accept(count - header);
            List<SeriesInput> series = columns.finish();
            if (series.size() > options.limits().maxSeriesPerUpload()) {
                throw tooManySeries(series.size(), options.limits());
            }
            return series;
        }

        private CsvRow next() {
            if (!records.hasNext()) {
                return null;
            }
            CSVRecord record = records.next();
            return new CsvRow(record.values(), lines.lineAt(record.getCharacterPosition()));
        }

        private CsvRow checkedNext() {
            CsvRow row = next();
            if (row != null && row.width() != width) {
                throw new IntakeException(Reason.INVALID_VALUE, Where.line(row.line()), "the row has " + row.width()
                        + " cells but the first row has " + width + "; every row needs the same number of cells.");
            }
            return row;
        }
    }

    static IntakeException tooManySeries(int count, IntakeLimits limits) {
        return new IntakeException(Reason.LIMIT_EXCEEDED, Where.NOWHERE, "the file holds " + count
                + " series; the limit per upload is " + limits.maxSeriesPerUpload() + ".");
    }

    /**
     * Twice the most rows a file like this one can hold without breaking a limit (a wide file: one
     * row per period of its series plus a header; a long file: one row per observation of every
     * series plus a header). Reading stops past it, so a body of many tiny rows is refused early;
     * a file only just over a limit still reaches the exact message of that limit.
     */
    private static long rowCap(CsvLayout layout, CsvRow first, IntakeLimits limits) {
        long perSeries = 2 * (limits.maxObservationsPerSeries() + 1L);
        if (layout.longFormat()) {
            return perSeries * limits.maxSeriesPerUpload();
        }
        // A wide file's series may cover different spans (gaps elsewhere), so allow a span per column.
        return perSeries * Math.max(1, first.width() - 1);
    }

    private static IntakeException tooManyRows(CsvRow row, long cap, IntakeLimits limits) {
        return new IntakeException(Reason.LIMIT_EXCEEDED, Where.line(row.line()), "the file holds more than " + cap
                + " rows, more than its series can hold with the limit of " + limits.maxObservationsPerSeries()
                + " observations per series; split the upload.");
    }

    /** The held start of the file, then the rest of the stream. */
    private static final class PrefixedReader extends Reader {
        private final StringReader prefix;
        private final Reader rest;
        private boolean prefixDone;

        PrefixedReader(String prefix, Reader rest) {
            this.prefix = new StringReader(prefix);
            this.rest = rest;
        }

        @Override
        public int read(char[] buffer, int from, int length) throws IOException {
            if (!prefixDone) {
                int n = prefix.read(buffer, from, length);
                if (n > 0) {
                    return n;
                }
                prefixDone = true;
            }
            return rest.read(buffer, from, length);
        }

        @Override
        public void close() {
            prefix.close();
        }
    }
}
