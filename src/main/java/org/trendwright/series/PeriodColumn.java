package org.trendwright.series;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.trendwright.series.IntakeException.Reason;

/**
 * Reads a whole period column and decides its frequency. All cells must use forms of one
 * frequency. A column of calendar dates (2024-03-31) is read by these rules, in order, and refused
 * as ambiguous when none applies:
 * <ol>
 *   <li>every date is the last day of its month, or every date is the first day: the closest two
 *       months decide: 1 month apart is monthly; 3 months apart is quarterly when every date sits
 *       at a calendar quarter's end (or start); 12 months apart is annual when every date is a
 *       31 December (or a 1 January);</li>
 *   <li>otherwise the closest two days decide: 1 day apart is daily; 7 days apart with every date
 *       on the same weekday is weekly (the ISO week that contains the date).</li>
 * </ol>
 * A single date is always ambiguous. Stateless and thread-safe.
 */
public final class PeriodColumn {

    private static final String FORMS = "write periods as 2024, 2024-Q1, Q1 2024, 2024-03, 03/2024, 2024-W05 or"
            + " 2024-03-31";

    /** One period cell with where it came from. */
    public record Cell(String text, Where where) {
    }

    private PeriodColumn() {
    }

    /** The periods of the cells, in cell order, all of one frequency. */
    public static List<Period> resolve(List<Cell> cells) {
        List<PeriodParser.Parsed> parsed = new ArrayList<>(cells.size());
        for (Cell cell : cells) {
            parsed.add(parseCell(cell));
        }
        checkOneKind(cells, parsed);
        if (parsed.isEmpty() || parsed.get(0).period() != null) {
            return parsed.stream().map(PeriodParser.Parsed::period).toList();
        }
        List<LocalDate> dates = parsed.stream().map(PeriodParser.Parsed::date).toList();
        Frequency frequency = dateFrequency(dates, cells.get(0).where());
        return dates.stream().map(d -> periodOf(d, frequency)).toList();
    }

    /**
     * Reads a period column one cell at a time, for uploads too large to hold as cells: each cell
     * becomes a number (the period's running index, or the epoch day of a calendar date whose
     * frequency is decided by {@link #finish}), checked against the first cell's form as it
     * arrives. Parsed texts are remembered in a cache shared by the columns of one upload, since a
     * large upload repeats a few period texts many times. Not thread-safe: one upload's reader.
     */
    static final class Reader {

        /** Most distinct period texts remembered per upload. */
        private static final int CACHE_LIMIT = 4096;

        private final Map<String, PeriodParser.Parsed> cache;
        private String firstText;
        private String firstKind;
        private Where firstWhere;

        /** @param cache the upload's cache of parsed period texts */
        Reader(Map<String, PeriodParser.Parsed> cache) {
            this.cache = cache;
        }

        /** The number standing for the period in {@code text} at a CSV line and column (1-based). */
        long read(String text, int line, int column) {
            PeriodParser.Parsed parsed = cache.get(text);
            if (parsed == null) {
                parsed = parseCell(new Cell(text, Where.cell(line, column)));
                if (cache.size() < CACHE_LIMIT) {
                    cache.put(text, parsed);
                }
            }
            if (firstKind == null) {
                firstText = text;
                firstKind = parsed.kind();
                firstWhere = Where.cell(line, column);
            } else if (!parsed.kind().equals(firstKind)) {
                throw mixed(text, parsed.kind(), firstText, firstKind, Where.cell(line, column));
            }
            return parsed.period() != null ? parsed.period().index() : parsed.date().toEpochDay();
        }

        /**
         * The column's frequency, after turning the epoch days of a date column into period
         * indexes in place ({@code keys[0..count)} are the numbers {@link #read} returned).
         */
        Frequency finish(long[] keys, int count) {
            if (firstKind == null || !firstKind.equals("date")) {
                return firstKind == null ? null : Frequency.fromJsonName(firstKind).orElseThrow();
            }
            List<LocalDate> dates = new ArrayList<>(count);
            for (int i = 0; i < count; i++) {
                dates.add(LocalDate.ofEpochDay(keys[i]));
            }
            Frequency frequency = dateFrequency(dates, firstWhere);
            for (int i = 0; i < count; i++) {
                keys[i] = periodOf(dates.get(i), frequency).index();
            }
            return frequency;
        }
    }

    private static PeriodParser.Parsed parseCell(Cell cell) {
        if (cell.text() == null || cell.text().isBlank()) {
            throw new IntakeException(Reason.INVALID_VALUE, cell.where(), "the period is empty; every row needs one.");
        }
        return PeriodParser.parse(cell.text()).orElseThrow(() -> new IntakeException(Reason.INVALID_VALUE,
                cell.where(), "'" + cell.text().trim() + "' is not a period; " + FORMS + "."));
    }

    private static void checkOneKind(List<Cell> cells, List<PeriodParser.Parsed> parsed) {
        for (int i = 1; i < parsed.size(); i++) {
            if (!parsed.get(i).kind().equals(parsed.get(0).kind())) {
                throw mixed(cells.get(i).text(), parsed.get(i).kind(), cells.get(0).text(), parsed.get(0).kind(),
                        cells.get(i).where());
            }
        }
    }

    private static IntakeException mixed(String text, String kind, String firstText, String firstKind, Where where) {
        return new IntakeException(Reason.INCONSISTENT, where, "'" + text.trim() + "' is " + article(kind)
                + " period but the first period '" + firstText.trim() + "' is " + article(firstKind)
                + "; a series has one frequency, so write every period in the same form.");
    }

    private static String article(String kind) {
        return kind.equals("annual") ? "an annual" : "date".equals(kind) ? "a calendar-date" : "a " + kind;
    }

    static Frequency dateFrequency(List<LocalDate> dates, Where first) {
        TreeSet<LocalDate> distinct = new TreeSet<>(dates);
        if (distinct.size() < 2) {
            throw ambiguous(first, "a single date cannot show whether the series is daily, weekly, monthly,"
                    + " quarterly or annual");
        }
        boolean monthEnds = distinct.stream().allMatch(d -> d.getDayOfMonth() == d.lengthOfMonth());
        boolean monthStarts = distinct.stream().allMatch(d -> d.getDayOfMonth() == 1);
        if (monthEnds || monthStarts) {
            return monthlyOrCoarser(distinct, monthEnds, first);
        }
        long days = closest(distinct, ChronoUnit.DAYS);
        if (days == 1) {
            return Frequency.DAILY;
        }
        boolean oneWeekday = distinct.stream().map(LocalDate::getDayOfWeek).distinct().count() == 1;
        if (days == 7 && oneWeekday) {
            return Frequency.WEEKLY;
        }
        throw ambiguous(first, days == 7 ? "the dates are a week apart but fall on different weekdays"
                : "the closest two dates are " + days + " days apart, which fits no daily or weekly series");
    }

    private static Frequency monthlyOrCoarser(TreeSet<LocalDate> dates, boolean ends, Where first) {
        long months = closest(dates, ChronoUnit.MONTHS);
        if (months == 1) {
            return Frequency.MONTHLY;
        }
        int position = ends ? 0 : 1;
        if (months == 3 && dates.stream().allMatch(d -> d.getMonthValue() % 3 == position)) {
            return Frequency.QUARTERLY;
        }
        int month = ends ? 12 : 1;
        if (months == 12 && dates.stream().allMatch(d -> d.getMonthValue() == month)) {
            return Frequency.ANNUAL;
        }
        throw ambiguous(first, "the closest two dates are " + months + " months apart and do not sit at calendar"
                + " quarter or year " + (ends ? "ends" : "starts"));
    }

    private static long closest(TreeSet<LocalDate> dates, ChronoUnit unit) {
        long closest = Long.MAX_VALUE;
        LocalDate previous = null;
        for (LocalDate date : dates) {
            if (previous != null) {
                long gap = unit == ChronoUnit.MONTHS
                        ? (date.getYear() * 12L + date.getMonthValue()) - (previous.getYear() * 12L + previous.getMonthValue())
                        : unit.between(previous, date);
                closest = Math.min(closest, gap);
            }
            previous = date;
        }
        return closest;
    }

    private static IntakeException ambiguous(Where where, String why) {
        return new IntakeException(Reason.AMBIGUOUS, where, "cannot tell the frequency of the date column: " + why
                + "; " + FORMS.replace("write periods as", "write the periods as") + " with the intended frequency.");
    }

    private static Period periodOf(LocalDate date, Frequency frequency) {
        return switch (frequency) {
            case ANNUAL -> Period.year(date.getYear());
            case QUARTERLY -> Period.quarter(date.getYear(), (date.getMonthValue() + 2) / 3);
            case MONTHLY -> Period.month(date.getYear(), date.getMonthValue());
            case WEEKLY -> Period.weekOf(date);
            case DAILY -> Period.day(date);
        };
    }
}
