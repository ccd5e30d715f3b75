package org.trendwright.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;

/** CSV layouts, quoting and line numbers (RFC 4180). */
class CsvIntakeTest {

    private static final IntakeOptions OPTIONS = IntakeOptions.defaults(IntakeLimits.DEFAULT);

    private static List<SeriesInput> read(String csv) {
        return CsvIntake.read(csv.getBytes(StandardCharsets.UTF_8), OPTIONS);
    }

    private static IntakeException refusal(String csv) {
        return assertThrows(IntakeException.class, () -> read(csv));
    }

    @Test
    void counts_lines_across_quoted_line_breaks() {
        IntakeException e = refusal("series,period,value\n\"Two\nlines\",2024,1\nX,2024,oops\n");
        assertEquals(4, e.where().line());
        assertEquals(3, e.where().column());
        assertEquals("Two\nlines", read("series,period,value\n\"Two\nlines\",2024,1\n").get(0).name());
    }

    @Test
    void reads_quoted_values_and_names_holding_the_delimiter() {
        List<SeriesInput> series = read("period;\"North; East\"\n2024;\"1.5\"\n");
        assertEquals("North; East", series.get(0).name());
        assertEquals(1.5, series.get(0).changes().get(0).value());
    }

    @Test
    void refuses_ragged_rows_single_columns_and_header_only_files() {
        assertEquals(3, refusal("period,value\n2024,1\n2025,1,2\n").where().line());
        assertTrue(refusal("2024\n2025\n").getMessage().contains("found one column"));
        assertTrue(refusal("period,value\n").getMessage().contains("only a header"));
        assertTrue(refusal("").getMessage().contains("no rows"));
        assertTrue(refusal("period,value\n2024,\"1\n").getMessage().contains("not valid CSV"));
    }

    @Test
    void refuses_duplicate_column_names_and_thousands_separators() {
        assertEquals(IntakeException.Reason.INCONSISTENT, refusal("period,a,a\n2024,1,2\n").reason());
        assertTrue(refusal("period,value\n2024,\"1,234\"\n").getMessage().contains("no thousands separators"));
    }
}
