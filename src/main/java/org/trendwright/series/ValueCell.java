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

    private static final Pattern NOT_A_NUMBER = Pattern.compile("[+-]?(nan|inf|infinity)", Pattern.CASE_INSENSITIVE);

    private ValueCell() {
    }

    /** The number in {@code text}, or null when the cell is empty. */
    public static Double parse(String text, Where where) {
        String s = text == null ? "" : text.trim();
        if (s.isEmpty()) {
            return null;
        }
        if (isDecimal(s)) {
            return finite(Double.parseDouble(s), s, where);
        }
        if (NOT_A_NUMBER.matcher(s).matches()) {
            throw new IntakeException(Reason.INVALID_VALUE, where, "'" + s + "' is not a finite number; NaN and"
                    + " Infinity are not accepted (leave the cell empty and send missing=gap for a gap).");
        }
        throw new IntakeException(Reason.INVALID_VALUE, where, "'" + s + "' is not a number; write numbers"
                + " with a decimal point and no thousands separators, e.g. 1234.5.");
    }

    /**
     * The number in a CSV cell at {@code line} and {@code column} (1-based), or NaN when the cell
     * is empty (NaN itself is refused as input, so it can stand for the empty cell). Builds the
     * {@link Where} only for a refusal, since this runs once per value cell of an upload.
     */
    static double parseOrEmpty(String text, int line, int column) {
        String s = text.trim();
        if (s.isEmpty()) {
            return Double.NaN;
        }
        if (isDecimal(s)) {
            double value = Double.parseDouble(s);
            if (Double.isFinite(value)) {
                return value;
            }
        }
        return parse(s, Where.cell(line, column));
    }

    /**
     * True when {@code s} matches {@code [+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?}, checked by hand
     * because this runs once per value cell of an upload (a regular expression costs several times more).
     */
    static boolean isDecimal(String s) {
        int i = s.isEmpty() || s.charAt(0) != '+' && s.charAt(0) != '-' ? 0 : 1;
        int intDigits = digits(s, i);
        i += intDigits;
        int fracDigits = 0;
        if (i < s.length() && s.charAt(i) == '.') {
            fracDigits = digits(s, i + 1);
            i += 1 + fracDigits;
        }
        if (intDigits == 0 && fracDigits == 0) {
            return false;
        }
        if (i < s.length() && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            i++;
            i += i < s.length() && (s.charAt(i) == '+' || s.charAt(i) == '-') ? 1 : 0;
            int expDigits = digits(s, i);
            if (expDigits == 0) {
                return false;
            }
            i += expDigits;
        }
        return i == s.length();
    }

    private static int digits(String s, int from) {
        int i = from;
        while (i < s.length() && s.charAt(i) >= '0' && s.charAt(i) <= '9') {
            i++;
        }
        return i - from;
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
