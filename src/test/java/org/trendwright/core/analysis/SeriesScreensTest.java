package org.trendwright.core.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.trendwright.core.Observations;
import org.trendwright.testing.ReferenceData;

class SeriesScreensTest {

    /**
     * US real GDP 1950-2019 (BEA): on the log scale a unit root is not rejected against a trend
     * stationary alternative (Nelson & Plosser 1982, J. Monetary Economics 10, found the same for
     * US output).
     */
    @Test
    void does_not_reject_a_unit_root_in_log_us_real_gdp() {
        double[] gdp = ReferenceData.column("open-series/us_real_gdp_quarterly_1950q1_2019q4.csv", 1);
        SeriesScreening screening = SeriesScreens.screen(Observations.consecutive(gdp, 4, 1), true, 0.05);
        assertFalse(screening.unitRoot().orElseThrow().rejected());
        assertTrue(screening.unitRoot().orElseThrow().test().reading().toLowerCase().contains("spurious"));
    }

    /**
     * Seeded: a linear trend whose level jumps by 8 error SDs at t = 61 of 100. The most likely
     * break must be found within two periods of it (a shift this large is located almost surely;
     * common practice), and the row index must be reported as the period where the new regime
     * starts.
     */
    @Test
    void locates_a_level_break_and_names_the_period_where_the_new_regime_starts() {
        Random random = new Random(5);
        double[] y = new double[100];
        for (int t = 1; t <= 100; t++) {
            y[t - 1] = 10 + 0.5 * t + (t >= 61 ? 8 : 0) + random.nextGaussian();
        }
        SeriesScreening screening = SeriesScreens.screen(Observations.annual(y), false, 0.05);
        assertTrue(screening.trendBreak().orElseThrow().test().rejected());
        assertEquals(61, screening.breakTime().getAsInt(), 2);
    }

    @Test
    void notes_each_check_it_cannot_run_instead_of_failing() {
        Observations tiny = Observations.annual(3, 4, 2, 5, 6, 5, 7, 8);
        SeriesScreening screening = SeriesScreens.screen(tiny, false, 0.05);
        assertTrue(screening.unitRoot().isEmpty());
        assertTrue(screening.notes().stream().anyMatch(n -> n.startsWith("The unit-root test was skipped")),
                screening.notes().toString());
        SeriesScreening negative = SeriesScreens.screen(Observations.annual(3, -4, 2, 5), true, 0.05);
        assertTrue(negative.notes().get(0).contains("t = 2"), negative.notes().toString());
    }
}
