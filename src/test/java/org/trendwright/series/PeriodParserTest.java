package org.trendwright.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;

import java.time.DateTimeException;
import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.temporal.IsoFields;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** Period forms, canonical labels and seasons. Calendar facts are from the ISO 8601 calendar. */
class PeriodParserTest {

    private static Period parse(String text) {
        return PeriodParser.parse(text).orElseThrow().period();
    }

    @Test
    void every_quarter_form_names_the_same_period() {
        for (String form : List.of("2024-Q3", "2024Q3", "2024-q3", "Q3 2024", "Q3-2024", "q32024", " 2024-Q3 ")) {
            assertEquals(Period.quarter(2024, 3), parse(form), form);
        }
        assertEquals("2024-Q3", Period.quarter(2024, 3).label());
        assertEquals(3, Period.quarter(2024, 3).season());
    }

    @Test
    void month_forms_and_labels_agree() {
        assertEquals(Period.month(2024, 3), parse("2024-03"));
        assertEquals(Period.month(2024, 3), parse("03/2024"));
        assertEquals(Period.month(2024, 3), parse("3/2024"));
        assertEquals("2024-03", Period.month(2024, 3).label());
    }

    @Test
    void iso_weeks_follow_the_iso_calendar() {
        // ISO 8601: 2020 has 53 weeks; week 53 of 2020 runs from Monday 28 December 2020, and
        // 2021-W01 begins Monday 4 January 2021.
        assertEquals(Period.weekOf(LocalDate.of(2020, 12, 28)), parse("2020-W53"));
        assertEquals(parse("2020-W53").plus(1), parse("2021-W01"));
        assertEquals(Period.weekOf(LocalDate.of(2021, 1, 4)), parse("2021-W01"));
        assertEquals("2021-W01", Period.weekOf(LocalDate.of(2021, 1, 10)).label());
        // Week 53 shares season 52 (see Frequency).
        assertEquals(52, parse("2020-W53").season());
        assertEquals(1, parse("2021-W01").season());
    }

    @Test
    void refuses_what_is_no_period() {
        for (String text : List.of("", "24", "0999", "2024-Q5", "Q0 2024", "2024-13", "13/2024", "2024-00",
                "2021-W53", "2024-W00", "2024-02-30", "2023-02-29", "2024/03", "March 2024", "2024-3", "1e3")) {
            assertTrue(PeriodParser.parse(text).isEmpty(), text);
        }
    }

    @Test
    void a_full_date_stays_open_until_the_column_decides() {
        PeriodParser.Parsed parsed = PeriodParser.parse("2024-02-29").orElseThrow();
        assertEquals(LocalDate.of(2024, 2, 29), parsed.date());
        assertEquals("date", parsed.kind());
    }

    @Test
    void every_label_parses_back_to_its_period() {
        qt().forAll(integers().between(1000 * 4, 9999 * 4 + 3))
                .checkAssert(i -> assertEquals(new Period(Frequency.QUARTERLY, i), parse(new Period(Frequency.QUARTERLY, i).label())));
        qt().forAll(integers().between(1000 * 12, 9999 * 12 + 11))
                .checkAssert(i -> assertEquals(new Period(Frequency.MONTHLY, i), parse(new Period(Frequency.MONTHLY, i).label())));
        qt().forAll(integers().between(1000, 9999))
                .checkAssert(y -> assertEquals(Period.year(y), parse(Period.year(y).label())));
        // Weeks from 1001 to 9998, so the ISO week-based year of every label has four digits.
        long firstWeek = Period.weekOf(LocalDate.of(1001, 1, 10)).index();
        long lastWeek = Period.weekOf(LocalDate.of(9998, 12, 20)).index();
        qt().forAll(integers().between((int) firstWeek, (int) lastWeek))
                .checkAssert(i -> assertEquals(new Period(Frequency.WEEKLY, i), parse(new Period(Frequency.WEEKLY, i).label())));
    }

    @Test
    void weekly_seasons_are_the_iso_week_number_capped_at_52() {
        qt().forAll(integers().between(0, 3000)).checkAssert(i -> {
            Period week = new Period(Frequency.WEEKLY, i);
            LocalDate monday = LocalDate.parse(week.label() + "-1", java.time.format.DateTimeFormatter.ISO_WEEK_DATE);
            assertEquals(Math.min(52, monday.get(IsoFields.WEEK_OF_WEEK_BASED_YEAR)), week.season());
            assertEquals(week, Period.weekOf(monday.plusDays(6)));
        });
    }

    @Test
    void reads_exactly_the_forms_of_its_grammar_written_as_regular_expressions() {
        // common practice: the class comment's grammar as regular expressions (ASCII digits, Q and W
        // in either case), with years from 1000 and the ISO 8601 calendar (java.time) deciding months,
        // weeks and dates. Seeded shapes of every form, half of them with one character changed,
        // added or removed, so that near misses are read too.
        String[] shapes = {"dddd", "dddd-Qd", "ddddQd", "Qd dddd", "Qd-dddd", "Qddddd", "dddd-dd", "dd/dddd",
            "d/dddd", "dddd-Wdd", "dddd-dd-dd"};
        String noise = "0123456789QqWw-/ x\u0663\uff11";
        SplittableRandom random = new SplittableRandom(2026_12_02L);
        for (int example = 0; example < 200_000; example++) {
            StringBuilder text = new StringBuilder();
            for (char c : shapes[random.nextInt(shapes.length)].toCharArray()) {
                text.append(switch (c) {
                    case 'd' -> (char) ('0' + random.nextInt(10));
                    case 'Q', 'W' -> random.nextBoolean() ? c : Character.toLowerCase(c);
                    default -> c;
                });
            }
            if (random.nextBoolean() && text.length() > 0) {
                int at = random.nextInt(text.length());
                switch (random.nextInt(3)) {
                    case 0 -> text.setCharAt(at, noise.charAt(random.nextInt(noise.length())));
                    case 1 -> text.insert(at, noise.charAt(random.nextInt(noise.length())));
                    default -> text.deleteCharAt(at);
                }
            }
            String cell = text.toString();
            assertEquals(RegularGrammar.parse(cell), PeriodParser.parse(cell), cell);
        }
    }

    /** The accepted forms as regular expressions, the way the class comment lists them. */
    private static final class RegularGrammar {
        private static final Pattern YEAR = Pattern.compile("(\\d{4})");
        private static final Pattern YEAR_QUARTER = Pattern.compile("(\\d{4})-?Q([1-4])",
                Pattern.CASE_INSENSITIVE);
        private static final Pattern QUARTER_YEAR = Pattern.compile("Q([1-4])[ -]?(\\d{4})",
                Pattern.CASE_INSENSITIVE);
        private static final Pattern YEAR_MONTH = Pattern.compile("(\\d{4})-(\\d{2})");
        private static final Pattern MONTH_YEAR = Pattern.compile("(\\d{1,2})/(\\d{4})");
        private static final Pattern ISO_WEEK = Pattern.compile("(\\d{4})-W(\\d{2})", Pattern.CASE_INSENSITIVE);
        private static final Pattern DATE = Pattern.compile("(\\d{4})-(\\d{2})-(\\d{2})");

        static Optional<PeriodParser.Parsed> parse(String text) {
            String s = text.trim();
            try {
                return Optional.ofNullable(parsed(s));
            } catch (DateTimeException e) {
                return Optional.empty();
            }
        }

        private static PeriodParser.Parsed parsed(String s) {
            Matcher m;
            if ((m = YEAR.matcher(s)).matches()) {
                return period(Period.year(year(m.group(1))));
            }
            if ((m = YEAR_QUARTER.matcher(s)).matches()) {
                return period(Period.quarter(year(m.group(1)), Integer.parseInt(m.group(2))));
            }
            if ((m = QUARTER_YEAR.matcher(s)).matches()) {
                return period(Period.quarter(year(m.group(2)), Integer.parseInt(m.group(1))));
            }
            if ((m = YEAR_MONTH.matcher(s)).matches()) {
                return period(Period.month(year(m.group(1)), month(m.group(2))));
            }
            if ((m = MONTH_YEAR.matcher(s)).matches()) {
                return period(Period.month(year(m.group(2)), month(m.group(1))));
            }
            if ((m = ISO_WEEK.matcher(s)).matches()) {
                int week = Integer.parseInt(m.group(2));
                LocalDate mid = LocalDate.of(year(m.group(1)), 6, 1);
                if (week < 1 || week > mid.range(IsoFields.WEEK_OF_WEEK_BASED_YEAR).getMaximum()) {
                    throw new DateTimeException("week " + week);
                }
                LocalDate monday = mid.with(IsoFields.WEEK_OF_WEEK_BASED_YEAR, week).with(DayOfWeek.MONDAY);
                return period(Period.weekOf(monday));
            }
            if ((m = DATE.matcher(s)).matches()) {
                return new PeriodParser.Parsed(null, LocalDate.of(year(m.group(1)), Integer.parseInt(m.group(2)),
                        Integer.parseInt(m.group(3))));
            }
            return null;
        }

        private static PeriodParser.Parsed period(Period period) {
            return new PeriodParser.Parsed(period, null);
        }

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
    }
}
