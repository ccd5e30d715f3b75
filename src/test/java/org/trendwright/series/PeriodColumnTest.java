package org.trendwright.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The frequency rules for a column of calendar dates (see PeriodColumn). */
class PeriodColumnTest {

    private static Frequency frequencyOf(String... dates) {
        return PeriodColumn.dateFrequency(Arrays.stream(dates).map(LocalDate::parse).toList(), Where.line(2));
    }

    private static IntakeException refusal(String... dates) {
        return assertThrows(IntakeException.class, () -> frequencyOf(dates));
    }

    @Test
    void month_end_and_month_start_dates_give_monthly_quarterly_or_annual() {
        assertEquals(Frequency.MONTHLY, frequencyOf("2023-11-30", "2023-12-31", "2024-01-31"));
        assertEquals(Frequency.MONTHLY, frequencyOf("2023-11-01", "2024-01-01", "2023-12-01"));
        assertEquals(Frequency.QUARTERLY, frequencyOf("2023-12-31", "2024-03-31", "2024-09-30"));
        assertEquals(Frequency.QUARTERLY, frequencyOf("2023-10-01", "2024-01-01"));
        assertEquals(Frequency.ANNUAL, frequencyOf("2022-01-01", "2023-01-01"));
    }

    @Test
    void other_dates_give_daily_or_weekly() {
        // Business days: Friday 1 March 2024, then Monday 4 and Tuesday 5 March.
        assertEquals(Frequency.DAILY, frequencyOf("2024-03-01", "2024-03-04", "2024-03-05"));
        assertEquals(Frequency.WEEKLY, frequencyOf("2024-03-06", "2024-03-13", "2024-03-27"));
    }

    @Test
    void refuses_to_guess() {
        assertTrue(refusal("2024-03-31").getMessage().contains("a single date"));
        assertTrue(refusal("2024-03-31", "2024-03-31").getMessage().contains("a single date"));
        // Month ends three months apart that are not calendar quarter ends (a fiscal quarter?).
        assertTrue(refusal("2024-02-29", "2024-05-31").getMessage().contains("3 months apart"));
        assertTrue(refusal("2024-01-31", "2024-03-31").getMessage().contains("2 months apart"));
        assertTrue(refusal("2024-03-15", "2024-04-15").getMessage().contains("31 days apart"));
        // Seven days apart but on different weekdays.
        assertTrue(refusal("2024-03-04", "2024-03-11", "2024-03-19").getMessage().contains("different weekdays"));
        assertEquals(IntakeException.Reason.AMBIGUOUS, refusal("2023-06-30", "2024-06-30").reason());
    }

    @Test
    void resolves_cells_in_their_order_and_refuses_mixed_forms() {
        List<Period> periods = PeriodColumn.resolve(List.of(new PeriodColumn.Cell("2024-06-30", Where.line(2)),
                new PeriodColumn.Cell("2024-03-31", Where.line(3))));
        assertEquals(List.of(Period.quarter(2024, 2), Period.quarter(2024, 1)), periods);
        IntakeException mixed = assertThrows(IntakeException.class, () -> PeriodColumn.resolve(List.of(
                new PeriodColumn.Cell("2024", Where.cell(2, 1)), new PeriodColumn.Cell("2024-06-30", Where.cell(3, 1)))));
        assertEquals(IntakeException.Reason.INCONSISTENT, mixed.reason());
        assertEquals(3, mixed.where().line());
    }
}
