package org.trendwright.series;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.trendwright.core.Observations;

/** The conversion of stored points to the core's Observations. */
class SeriesVersionsTest {

    @Test
    void a_missing_period_keeps_its_place_in_t() {
        List<Point> points = List.of(new Point(Period.quarter(2023, 3), 5), new Point(Period.quarter(2023, 4), 6),
                new Point(Period.quarter(2024, 2), 8));
        Observations series = SeriesVersions.observations(Frequency.QUARTERLY, points);
        assertArrayEquals(new int[] {1, 2, 4}, series.times());
        assertArrayEquals(new double[] {5, 6, 8}, series.values());
        assertEquals(4, series.periodsPerYear());
        assertEquals(3, series.firstSeason());
        assertEquals(2, series.seasonOf(4));
        assertEquals(Period.quarter(2024, 2), SeriesVersions.periodAt(Period.quarter(2023, 3), 4));
    }

    @Test
    void seasons_follow_the_frequency() {
        assertEquals(11, SeriesVersions.observations(Frequency.MONTHLY,
                List.of(new Point(Period.month(2024, 11), 1))).firstSeason());
        assertEquals(1, SeriesVersions.observations(Frequency.ANNUAL, List.of(new Point(Period.year(2024), 1)))
                .periodsPerYear());
        // 2 March 2024 was a Saturday: ISO weekday 6.
        Observations daily = SeriesVersions.observations(Frequency.DAILY,
                List.of(new Point(Period.day(LocalDate.of(2024, 3, 2)), 1)));
        assertEquals(7, daily.periodsPerYear());
        assertEquals(6, daily.firstSeason());
    }
}
