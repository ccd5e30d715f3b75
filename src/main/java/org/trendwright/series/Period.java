package org.trendwright.series;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.temporal.IsoFields;

/**
 * One period of a regular series, stored as a running index so that consecutive periods differ by
 * one and gaps are plain differences:
 * <ul>
 *   <li>annual: the year;</li>
 *   <li>quarterly: year * 4 + (quarter - 1);</li>
 *   <li>monthly: year * 12 + (month - 1);</li>
 *   <li>weekly: the number of weeks from the Monday 1969-12-29 to the Monday of the ISO week;</li>
 *   <li>daily: the epoch day (days since 1970-01-01).</li>
 * </ul>
 * Immutable and thread-safe.
 *
 * @param frequency how often the series is observed
 * @param index     the running index described above
 */
public record Period(Frequency frequency, long index) implements Comparable<Period> {

    /** Epoch day of Monday 1969-12-29, the start of weekly index 0. */
    private static final long FIRST_MONDAY = -3;

    public static Period year(int year) {
        return new Period(Frequency.ANNUAL, year);
    }

    public static Period quarter(int year, int quarter) {
        return new Period(Frequency.QUARTERLY, year * 4L + quarter - 1);
    }

    public static Period month(int year, int month) {
        return new Period(Frequency.MONTHLY, year * 12L + month - 1);
    }

    /** The ISO week that contains this date. */
    public static Period weekOf(LocalDate date) {
        LocalDate monday = date.with(DayOfWeek.MONDAY);
        return new Period(Frequency.WEEKLY, Math.floorDiv(monday.toEpochDay() - FIRST_MONDAY, 7));
    }

    public static Period day(LocalDate date) {
        return new Period(Frequency.DAILY, date.toEpochDay());
    }

    /** The period {@code steps} periods later (earlier when negative). */
    public Period plus(long steps) {
        return new Period(frequency, index + steps);
    }

    /** The season (1..periodsPerYear) the core's Observations expects for this period. */
    public int season() {
        return switch (frequency) {
            case ANNUAL -> 1;
            case QUARTERLY -> (int) Math.floorMod(index, 4L) + 1;
            case MONTHLY -> (int) Math.floorMod(index, 12L) + 1;
            case WEEKLY -> Math.min(monday().get(IsoFields.WEEK_OF_WEEK_BASED_YEAR), 52);
            case DAILY -> LocalDate.ofEpochDay(index).getDayOfWeek().getValue();
        };
    }

    /** The canonical label: 2024, 2024-Q1, 2024-03, 2024-W05 or 2024-03-31. */
    public String label() {
        return switch (frequency) {
            case ANNUAL -> Long.toString(index);
            case QUARTERLY -> Math.floorDiv(index, 4L) + "-Q" + season();
            case MONTHLY -> String.format("%d-%02d", Math.floorDiv(index, 12L), season());
            case WEEKLY -> String.format("%d-W%02d", monday().get(IsoFields.WEEK_BASED_YEAR),
                    monday().get(IsoFields.WEEK_OF_WEEK_BASED_YEAR));
            case DAILY -> LocalDate.ofEpochDay(index).toString();
        };
    }

    private LocalDate monday() {
        return LocalDate.ofEpochDay(FIRST_MONDAY + index * 7);
    }

    @Override
    public int compareTo(Period other) {
        return Long.compare(index, other.index);
    }

    @Override
    public String toString() {
        return label();
    }
}
