package org.trendwright.series;

/**
 * Where in an upload a problem sits: a CSV line and column (both 1-based) or a JSON field path
 * such as {@code observations[3].value}. Unknown parts are null. Immutable and thread-safe.
 *
 * @param line   the physical line of a CSV file, or null
 * @param column the 1-based column of a CSV file, or null
 * @param field  the JSON path of the field, or null
 */
public record Where(Integer line, Integer column, String field) {

    public static final Where NOWHERE = new Where(null, null, null);

    public static Where cell(int line, int column) {
        return new Where(line, column, null);
    }

    public static Where line(int line) {
        return new Where(line, null, null);
    }

    public static Where field(String path) {
        return new Where(null, null, path);
    }

    /** "line 5, column 2", "line 5", "observations[3].value" or "" when unknown. */
    public String describe() {
        if (field != null) {
            return field;
        }
        if (line == null) {
            return "";
        }
        return column == null ? "line " + line : "line " + line + ", column " + column;
    }
}
