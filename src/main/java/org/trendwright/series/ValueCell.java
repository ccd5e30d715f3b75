package org.trendwright.series;

import java.util.regex.Pattern;
import org.trendwright.series.IntakeException.Reason;

/**
 * Reads one value cell: a decimal number with a decimal point and an optional exponent, such as
 * 12, -3.5, .25 or 1.2e3. An empty cell is a missing value (null). Refused, with the reason:
 * decimal commas and thousands separators, NaN, Infinity and numbers too large for a double.
 * Stateless and thread-safe.
 */
public final class ValueCell {

    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");
    private static final Pattern NOT_A_NUMBER = Pattern.compile("[+-]?(nan|inf|infinity)", Pattern.CASE_INSENSITIVE);

    private ValueCell() {
    }

    /** The number in {@code text}, or null when the cell is empty. */
    public static Double parse(String text, Where where) {
        String s = text == null ? "" : text.trim();
        if (s.isEmpty()) {
            return null;
        }
        if (NOT_A_NUMBER.matcher(s).matches()) {
            throw new IntakeException(Reason.INVALID_VALUE, where, "'" + s + "' is not a finite number; NaN and"
                    + " Infinity are not accepted (leave the cell empty and send missing=gap for a gap).");
        }
        if (!NUMBER.matcher(s).matches()) {
            throw new IntakeException(Reason.INVALID_VALUE, where, "'" + s + "' is not a number; write numbers"
                    + " with a decimal point and no thousands separators, e.g. 1234.5.");
        }
        return finite(Double.parseDouble(s), s, where);
    }

    /** Refuses a non-finite number (NaN, or an overflow such as 1e999). */
    public static double finite(double value, String text, Where where) {
        if (!Double.isFinite(value)) {
            throw new IntakeException(Reason.INVALID_VALUE, where, "'" + text + "' is not a finite number; values"
                    + " must lie within about +-1.8e308.");
        }
        return value;
    }
}
