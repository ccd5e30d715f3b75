package org.trendwright.series;

import java.time.DateTimeException;
import java.time.LocalDate;
import java.time.temporal.IsoFields;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

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

    private static final Pattern YEAR = Pattern.compile("(\\d{4})");
    private static final Pattern YEAR_QUARTER = Pattern.compile("(\\d{4})-?Q([1-4])", Pattern.CASE_INSENSITIVE);
    private static final Pattern QUARTER_YEAR = Pattern.compile("Q([1-4])[ -]?(\\d{4})", Pattern.CASE_INSENSITIVE);
    private static final Pattern YEAR_MONTH = Pattern.compile("(\\d{4})-(\\d{2})");
    private static final Pattern MONTH_YEAR = Pattern.compile("(\\d{1,2})/(\\d{4})");
    private static final Pattern ISO_WEEK = Pattern.compile("(\\d{4})-W(\\d{2})", Pattern.CASE_INSENSITIVE);
    private static final Pattern DATE = Pattern.compile("(\\d{4})-(\\d{2})-(\\d{2})");

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

    private static Parsed parseOrNull(String s) {
        Matcher m;
        if ((m = YEAR.matcher(s)).matches()) {
            return exact(Period.year(year(m.group(1))));
        }
        if ((m = YEAR_QUARTER.matcher(s)).matches()) {
            return exact(Period.quarter(year(m.group(1)), Integer.parseInt(m.group(2))));
        }
        if ((m = QUARTER_YEAR.matcher(s)).matches()) {
            return exact(Period.quarter(year(m.group(2)), Integer.parseInt(m.group(1))));
        }
        if ((m = YEAR_MONTH.matcher(s)).matches()) {
            return exact(Period.month(year(m.group(1)), month(m.group(2))));
        }
        if ((m = MONTH_YEAR.matcher(s)).matches()) {
            return exact(Period.month(year(m.group(2)), month(m.group(1))));
        }
        if ((m = ISO_WEEK.matcher(s)).matches()) {
            return exact(Period.weekOf(isoWeekMonday(year(m.group(1)), Integer.parseInt(m.group(2)))));
        }
        if ((m = DATE.matcher(s)).matches()) {
            LocalDate date = LocalDate.of(year(m.group(1)), Integer.parseInt(m.group(2)), Integer.parseInt(m.group(3)));
            return new Parsed(null, date);
        }
        return null;
    }

    private static Parsed exact(Period period) {
        return new Parsed(period, null);
    }

    /** Years 1000..9999: four digits, so a plain count such as 12 never reads as a year. */
    private static int year(String digits) {
        int year = Integer.parseInt(digits);
        if (year < 1000) {
            throw new DateTimeException("year " + year);
        }
        return year;
    }

    private static int month(String digits) {
        int month = Integer.parseInt(digits);
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
