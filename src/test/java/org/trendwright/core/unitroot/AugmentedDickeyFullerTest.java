package org.trendwright.core.unitroot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.Observations;
import org.trendwright.core.autoregression.LagSelection;
import org.trendwright.core.autoregression.SimulatedSeries;
import org.trendwright.testing.ReferenceData;

/**
 * The augmented Dickey-Fuller test: its statistic, a real series with a well-known outcome, its
 * size and power in seeded simulations, and its refusals.
 */
class AugmentedDickeyFullerTest {

    private static final String GDP = "open-series/us_real_gdp_quarterly_1950q1_2019q4.csv";

    @Test
    void tau_without_lagged_differences_equals_the_frisch_waugh_formula_the_tables_were_simulated_with() {
        // Two computations of the same statistic: pivoted QR here, partialled-out sums in the generator.
        double[] walk = SimulatedSeries.randomWalk(new SplittableRandom(50), 0, 120);
        for (DeterministicTerms terms : DeterministicTerms.values()) {
            AdfResult result = AugmentedDickeyFuller.test(Observations.annual(walk),
                    AdfSpec.of(terms).withFixedLags(0));
            assertEquals(DickeyFullerTableGenerator.tau(walk, terms), result.tau(), 1e-10, terms.toString());
            assertEquals(119, result.observations());
        }
    }

    @Test
    void tau_is_unchanged_by_a_shift_and_with_a_trend_term_by_an_added_trend() {
        // common practice: the deterministic regressors absorb a level shift (and a linear trend) exactly.
        double[] y = SimulatedSeries.autoregression(new SplittableRandom(51), 0, new double[] {0.9}, 1, 150, 50);
        double[] shifted = IntStream.range(0, y.length).mapToDouble(t -> y[t] + 100).toArray();
        double[] trended = IntStream.range(0, y.length).mapToDouble(t -> y[t] + 3 + 0.7 * t).toArray();
        AdfSpec constant = AdfSpec.of(DeterministicTerms.CONSTANT).withFixedLags(2);
        AdfSpec trend = AdfSpec.of(DeterministicTerms.CONSTANT_AND_TREND).withFixedLags(2);
        double base = AugmentedDickeyFuller.test(Observations.annual(y), constant).tau();
        assertEquals(base, AugmentedDickeyFuller.test(Observations.annual(shifted), constant).tau(), 1e-9);
        double baseTrend = AugmentedDickeyFuller.test(Observations.annual(y), trend).tau();
        assertEquals(baseTrend, AugmentedDickeyFuller.test(Observations.annual(trended), trend).tau(), 1e-9);
    }

    @Test
    void does_not_reject_a_unit_root_in_log_us_real_gdp_with_constant_and_trend() {
        // Nelson & Plosser (1982, J. Monetary Economics 10): US real output does not reject a unit root
        // against trend stationarity; a well-known result that later samples of quarterly GDP repeat.
        for (LagSelection criterion : new LagSelection[] {LagSelection.AIC, LagSelection.BIC}) {
            AdfResult result = AugmentedDickeyFuller.test(logGdp(), AdfSpec.of(DeterministicTerms.CONSTANT_AND_TREND)
                    .withLagsSelectedBy(criterion, AdfSpec.SCHWERT_MAXIMUM));
            assertFalse(result.rejected(), result.test().toString());
            assertTrue(result.tau() > result.criticalValues().fivePercent());
            assertTrue(result.test().reading().contains("Granger & Newbold"), result.test().reading());
            assertTrue(result.test().reading().contains("differences"), result.test().reading());
        }
    }

    @Test
    void rejects_a_unit_root_in_the_growth_of_us_real_gdp() {
        // Nelson & Plosser (1982): the first differences of log real output are stationary.
        double[] logs = logGdp().values();
        double[] growth = IntStream.range(1, logs.length).mapToDouble(t -> logs[t] - logs[t - 1]).toArray();
        AdfResult result = AugmentedDickeyFuller.test(Observations.consecutive(growth, 4, 2),
                AdfSpec.of(DeterministicTerms.CONSTANT).atLevel(0.01));
        assertTrue(result.rejected(), result.test().toString());
        assertTrue(result.tau() < result.criticalValues().onePercent());
        assertTrue(result.test().reading().contains("stationary around its mean"), result.test().reading());
    }

    @Test
    void rejects_a_random_walk_in_about_five_percent_of_runs() {
        // Seeded: 1000 Gaussian random walks, n = 200, constant case, lags by AIC up to Schwert's 14. Under the
        // null the rejection rate is 5%; its binomial standard error at 1000 runs is 0.69 points, so 3.5%..6.5%
        // is a 2.2-SE band (lag selection and the p-value's dependence on p shift the true size a little).
        SplittableRandom random = new SplittableRandom(52);
        int rejections = 0;
        int runs = 1000;
        for (int run = 0; run < runs; run++) {
            Observations walk = Observations.annual(SimulatedSeries.randomWalk(random, 0, 200));
            rejections += AugmentedDickeyFuller.test(walk, AdfSpec.of(DeterministicTerms.CONSTANT)).rejected() ? 1 : 0;
        }
        double rate = rejections / (double) runs;
        assertTrue(rate >= 0.035 && rate <= 0.065, "rejection rate " + rate);
    }

    @Test
    void rejects_a_stationary_ar1_with_phi_one_half_in_more_than_ninety_percent_of_runs() {
        // Seeded: 300 series y_t = 0.5 y_{t-1} + e_t, n = 200. Power is close to 1 here (tau is about -7 on
        // average); requiring 90% leaves a wide margin for the 300-run binomial error (under 1.7 points).
        SplittableRandom random = new SplittableRandom(53);
        int rejections = 0;
        int runs = 300;
        for (int run = 0; run < runs; run++) {
            double[] y = SimulatedSeries.autoregression(random, 0, new double[] {0.5}, 1, 200, 100);
            rejections += AugmentedDickeyFuller.test(Observations.annual(y), AdfSpec.of(DeterministicTerms.CONSTANT))
                    .rejected() ? 1 : 0;
        }
        assertTrue(rejections > 0.9 * runs, rejections + " of " + runs);
    }

    @Test
    void rejection_around_a_trend_reads_as_trend_stationary() {
        double[] noise = SimulatedSeries.autoregression(new SplittableRandom(54), 0, new double[] {0.3}, 1, 150, 50);
        double[] trended = IntStream.range(0, noise.length).mapToDouble(t -> 10 + 0.2 * t + noise[t]).toArray();
        AdfResult result = AugmentedDickeyFuller.test(Observations.annual(trended),
                AdfSpec.of(DeterministicTerms.CONSTANT_AND_TREND));
        assertTrue(result.rejected());
        assertTrue(result.test().reading().contains("stationary around its linear trend"), result.test().reading());
    }

    @Test
    void lag_selection_uses_a_common_sample_up_to_schwerts_maximum() {
        double[] y = SimulatedSeries.autoregression(new SplittableRandom(55), 0, new double[] {0.8, 0.1}, 1, 280, 50);
        AdfResult result = AugmentedDickeyFuller.test(Observations.annual(y),
                AdfSpec.of(DeterministicTerms.CONSTANT).withLagsSelectedBy(LagSelection.BIC, AdfSpec.SCHWERT_MAXIMUM));
        // Schwert (1989): floor(12 (280/100)^(1/4)) = floor(15.52) = 15
        assertEquals(15, result.maximumLags());
        assertEquals(16, result.candidates().size());
        result.candidates().forEach(c -> assertEquals(280 - 1 - 15, c.observations()));
        assertEquals(280 - 1 - result.lags(), result.observations());
        assertEquals(DickeyFullerDistribution.criticalValues(DeterministicTerms.CONSTANT, result.observations()),
                result.criticalValues());
    }

    @Test
    void schwert_maximum_follows_the_rule_and_keeps_the_tables_smallest_sample() {
        // Schwert (1989): floor(12 (n/100)^(1/4)); 100 -> 12, 500 -> floor(17.94) = 17, 30 -> floor(8.88) = 8
        assertEquals(12, AugmentedDickeyFuller.schwertMaximum(100));
        assertEquals(17, AugmentedDickeyFuller.schwertMaximum(500));
        assertEquals(8, AugmentedDickeyFuller.schwertMaximum(30));
        // n = 25 allows 8 by the rule but only 25 - 1 - 20 = 4 if T is to stay at 20 or more
        assertEquals(4, AugmentedDickeyFuller.schwertMaximum(25));
    }

    @Test
    void refuses_a_series_with_a_gap_and_names_the_first_missing_period() {
        int[] times = IntStream.rangeClosed(1, 80).filter(t -> t != 17).toArray();
        Observations gappy = new Observations(times, new SplittableRandom(56).doubles(times.length).toArray(), 4, 1);
        InvalidSpecificationException e = assertThrows(InvalidSpecificationException.class,
                () -> AugmentedDickeyFuller.test(gappy, AdfSpec.of(DeterministicTerms.CONSTANT)));
        assertTrue(e.getMessage().contains("t = 17"), e.getMessage());
    }

    @Test
    void refuses_series_too_short_for_the_tables_or_the_lags_asked_for() {
        Observations twenty = Observations.annual(SimulatedSeries.randomWalk(new SplittableRandom(57), 0, 20));
        assertThrows(InsufficientDataException.class,
                () -> AugmentedDickeyFuller.test(twenty, AdfSpec.of(DeterministicTerms.CONSTANT)));
        Observations forty = Observations.annual(SimulatedSeries.randomWalk(new SplittableRandom(58), 0, 40));
        assertThrows(InsufficientDataException.class,
                () -> AugmentedDickeyFuller.test(forty, AdfSpec.of(DeterministicTerms.CONSTANT).withFixedLags(20)));
    }

    @Test
    void refuses_a_level_outside_zero_one_and_a_negative_fixed_lag_count() {
        assertThrows(InvalidSpecificationException.class, () -> AdfSpec.of(DeterministicTerms.CONSTANT).atLevel(1.5));
        assertThrows(InvalidSpecificationException.class,
                () -> AdfSpec.of(DeterministicTerms.CONSTANT).withFixedLags(AdfSpec.SCHWERT_MAXIMUM));
    }

    private static Observations logGdp() {
        double[] gdp = ReferenceData.rows(GDP).stream().mapToDouble(r -> Math.log(Double.parseDouble(r[1]))).toArray();
        return Observations.consecutive(gdp, 4, 1);
    }
}
