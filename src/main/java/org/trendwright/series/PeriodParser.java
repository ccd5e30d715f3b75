package org.trendwright.series;

import java.time.DateTimeException;
import java.time.LocalDate;
import java.time.temporal.IsoFields;
import java.util.Optional;

/**
 * Reads one period cell. The accepted forms, case-insensitive and trimmed:
 * <pre>
 *   2024             annual
 *   2024-Q1  2024Q1  Q1 2024  Q1-2024   quarterly
 *   2024-03  03/2024  3/2024           monthly
 *   2024-W05                           weekly (ISO 8601 week)
 *   2024-03-31                         a calendar date: quarterly, monthly, annual, weekly or
 *                                      daily, decided from all dates of the column together
 *                                      by {@link PeriodColumn}
 * </pre>
 * Stateless and thread-safe.
 */
public final class PeriodParser {

    /**
     * A parsed cell: either a period of a fixed frequency or a calendar date whose frequency is
     * still open. Exactly one of the two is non-null.
     */
    public record Parsed(Period period, LocalDate date) {

        /** "annual", "quarterly", "monthly", "weekly" or "date", for messages about mixing. */
        public String kind() {
            return period != null ? period.frequency().jsonName() : "date";
        }
    }

    private PeriodParser() {
    }

    /** The period this text names, or empty when it is no period form Trendwright accepts. */
    public static Optional<Parsed> parse(String text) {
        String s = text.trim();
        try {
            return Optional.ofNullable(parseOrNull(s));
        } catch (DateTimeException e) {
            return Optional.empty();
        }
    }

    /**
     * Recognises the forms of the class comment by their shape, character by character (digits are
     * ASCII 0-9; Q and W in either case): every form has a fixed length or two, so the length
     * decides which shapes to try. A period cell is read for every row of every upload, which is
     * why this is not a chain of regular expressions.
     */
    private static Parsed parseOrNull(String s) {
        return switch (s.length()) {
            case 4 -> digits(s, 0, 4) ? exact(Period.year(year(s, 0))) : null;
            case 6 -> sixCharacters(s);
            case 7 -> sevenCharacters(s);
            case 8 -> digits(s, 0, 4) && s.charAt(4) == '-' && isLetter(s.charAt(5), 'W') && digits(s, 6, 8)
                    ? exact(Period.weekOf(isoWeekMonday(year(s, 0), number(s, 6, 8)))) : null;
            case 10 -> digits(s, 0, 4) && s.charAt(4) == '-' && digits(s, 5, 7) && s.charAt(7) == '-'
                    && digits(s, 8, 10) ? new Parsed(null, LocalDate.of(year(s, 0), number(s, 5, 7), number(s, 8, 10)))
                    : null;
            default -> null;
        };
    }

    /** 2024Q1, Q12024 or 3/2024. */
    private static Parsed sixCharacters(String s) {
        if (digits(s, 0, 4) && isLetter(s.charAt(4), 'Q') && isQuarter(s.charAt(5))) {
            return exact(Period.quarter(year(s, 0), s.charAt(5) - '0'));
        }
        if (isLetter(s.charAt(0), 'Q') && isQuarter(s.charAt(1)) && digits(s, 2, 6)) {
            return exact(Period.quarter(year(s, 2), s.charAt(1) - '0'));
        }
        if (digits(s, 0, 1) && s.charAt(1) == '/' && digits(s, 2, 6)) {
            return exact(Period.month(year(s, 2), month(s, 0, 1)));
        }
        return null;
    }

    /** 2024-Q1, Q1 2024, Q1-2024, 2024-03 or 03/2024. */
    private static Parsed sevenCharacters(String s) {
        if (digits(s, 0, 4) && s.charAt(4) == '-') {
            if (isLetter(s.charAt(5), 'Q') && isQuarter(s.charAt(6))) {
                return exact(Period.quarter(year(s, 0), s.charAt(6) - '0'));
            }
            return digits(s, 5, 7) ? exact(Period.month(year(s, 0), month(s, 5, 7))) : null;
        }
        if (isLetter(s.charAt(0), 'Q') && isQuarter(s.charAt(1)) && (s.charAt(2) == ' ' || s.charAt(2) == '-')
                && digits(s, 3, 7)) {
            return exact(Period.quarter(year(s, 3), s.charAt(1) - '0'));
        }
        if (digits(s, 0, 2) && s.charAt(2) == '/' && digits(s, 3, 7)) {
            return exact(Period.month(year(s, 3), month(s, 0, 2)));
        }
        return null;
    }

    /** Whether s[from, to) are all ASCII digits. */
    private static boolean digits(String s, int from, int to) {
        for (int i = from; i < to; i++) {
            char c = s.charAt(i);
            if (c < '0' || c > '9') {
                return false;
            }
        }
        return true;
    }

    /** The number written by the ASCII digits s[from, to). */
    private static int number(String s, int from, int to) {
        int value = 0;
        for (int i = from; i < to; i++) {
            value = 10 * value + (s.charAt(i) - '0');
        }
        return value;
    }

    /** An upper-case ASCII letter in either case. */
    private static boolean isLetter(char c, char upper) {
        return c == upper || c == Character.toLowerCase(upper);
    }

    private static boolean isQuarter(char c) {
        return c >= '1' && c <= '4';
    }

    private static Parsed exact(Period period) {
        return new Parsed(period, null);
    }

    /** Years 1000..9999 from the four digits at {@code from}, so a plain count such as 12 never reads as a year. */
    private static int year(String s, int from) {
        int year = number(s, from, from + 4);
        if (year < 1000) {
            throw new DateTimeException("year " + year);
        }
        return year;
    }

    private static int month(String s, int from, int to) {
        int month = number(s, from, to);
        if (month < 1 || month > 12) {
            throw new DateTimeException("month " + month);
        }
        return month;
    }

    private static LocalDate isoWeekMonday(int year, int week) {
        LocalDate mid = LocalDate.of(year, 6, 1);
        long weeks = mid.range(IsoFields.WEEK_OF_WEEK_BASED_YEAR).getMaximum();
        if (week < 1 || week > weeks) {
            throw new DateTimeException("week " + week);
        }
        return mid.with(IsoFields.WEEK_OF_WEEK_BASED_YEAR, week).with(java.time.DayOfWeek.MONDAY);
    }
}
