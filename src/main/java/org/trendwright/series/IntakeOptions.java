package org.trendwright.series;

/**
 * How to read one upload. Immutable and thread-safe.
 *
 * @param missing   what to do with empty values and skipped periods
 * @param limits    the configured size limits
 * @param delimiter the CSV delimiter when the request names it, or null to detect it
 * @param name      the series name for a single-series file without a header, or null
 */
public record IntakeOptions(MissingValues missing, IntakeLimits limits, Character delimiter, String name) {

    public static IntakeOptions defaults(IntakeLimits limits) {
        return new IntakeOptions(MissingValues.REFUSE, limits, null, null);
    }
}
