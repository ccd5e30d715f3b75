package org.trendwright.core.autoregression;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.Observations;
import org.trendwright.core.RankDeficientDesignException;
import org.trendwright.core.regression.Coefficient;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * Autoregression fitting: refusals, subset lags, order selection on a common sample, the
 * stationarity statement and the residual check. Simulations are seeded; each states its
 * Monte-Carlo tolerance.
 */
class AutoregressionTest {

    @Test
    void refuses_a_series_with_a_gap_and_names_the_first_missing_period() {
        int[] times = IntStream.rangeClosed(1, 40).filter(t -> t != 4 && t != 9).toArray();
        double[] values = new SplittableRandom(1).doubles(times.length).toArray();
        Observations gappy = new Observations(times, values, 4, 1);
        InvalidSpecificationException e = assertThrows(InvalidSpecificationException.class,
                () -> Autoregression.fit(gappy, ArSpec.ofOrder(1)));
        assertTrue(e.getMessage().contains("t = 4"), e.getMessage());
    }

    @Test
    void refuses_a_series_too_short_for_the_largest_candidate_order() {
        Observations eight = Observations.annual(1, 3, 2, 5, 4, 6, 5, 8);
        assertThrows(InsufficientDataException.class, () -> Autoregression.fit(eight, ArSpec.ofOrder(4)));
        assertThrows(InsufficientDataException.class,
                () -> Autoregression.fit(eight, ArSpec.selectedBy(LagSelection.AIC, 4).onDifferences()));
    }

    @Test
    void refuses_a_seasonal_lag_on_annual_data() {
        Observations annual = Observations.annual(new SplittableRandom(2).doubles(40).toArray());
        assertThrows(InvalidSpecificationException.class,
                () -> Autoregression.fit(annual, ArSpec.ofOrder(1).withSeasonalLag()));
    }

    @Test
    void refuses_a_constant_series_whose_lag_duplicates_the_constant() {
        Observations flat = Observations.annual(new double[30]);
        assertThrows(RankDeficientDesignException.class, () -> Autoregression.fit(flat, ArSpec.ofOrder(1)));
    }

    @Test
    void seasonal_lag_makes_a_subset_model_with_lags_one_and_four_for_quarterly_data_and_recovers_them() {
        // Seeded simulation of y_t = 2 + 0.4 y_{t-1} + 0.3 y_{t-4} + e_t, n = 3000: each estimate must lie
        // within 4 of its own standard errors of the truth (a miss has probability 6e-5 under the model).
        double[] y = SimulatedSeries.autoregression(new SplittableRandom(11), 2, new double[] {0.4, 0, 0, 0.3}, 1,
                3000, 200);
        ArFit fit = Autoregression.fit(Observations.consecutive(y, 4, 1), ArSpec.ofOrder(1).withSeasonalLag());
        assertArrayEquals(new int[] {1, 4}, fit.lags());
        assertEquals(List.of("constant", "lag 1", "lag 4"),
                fit.coefficients().stream().map(Coefficient::name).toList());
        assertWithinFourStandardErrors(2, fit.coefficients().get(0));
        assertWithinFourStandardErrors(0.4, fit.coefficients().get(1));
        assertWithinFourStandardErrors(0.3, fit.coefficients().get(2));
        double[] phi = {fit.coefficients().get(1).estimate(), 0, 0, fit.coefficients().get(2).estimate()};
        assertArrayEquals(phi, fit.lagCoefficients(), 0);
        assertEquals(3000 - 4, fit.observationsUsed());
    }

    @Test
    void seasonal_lag_of_monthly_data_is_twelve() {
        double[] y = SimulatedSeries.autoregression(new SplittableRandom(12), 0, new double[] {0.5}, 1, 120, 50);
        ArFit fit = Autoregression.fit(Observations.consecutive(y, 12, 1), ArSpec.ofOrder(1).withSeasonalLag());
        assertArrayEquals(new int[] {1, 12}, fit.lags());
    }

    @Test
    void order_selection_compares_every_candidate_on_the_same_sample_and_refits_the_choice_on_all_it_can_use() {
        double[] y = SimulatedSeries.autoregression(new SplittableRandom(13), 1, new double[] {0.6, -0.2}, 1, 150, 100);
        ArFit fit = Autoregression.fit(Observations.consecutive(y, 4, 1),
                ArSpec.selectedBy(LagSelection.AIC, 6).withSeasonalLag());
        // common practice (Ng & Perron 2005): every candidate on observations 7..150
        assertEquals(7, fit.candidates().size());
        fit.candidates().forEach(c -> assertEquals(150 - 6, c.observations()));
        int chosen = OrderSelection.choose(fit.candidates(), LagSelection.AIC);
        assertEquals(chosen, fit.order());
        assertEquals(150 - Math.max(chosen, 4), fit.observationsUsed());
    }

    @Test
    void criteria_from_the_single_nested_decomposition_equal_those_of_separate_least_squares_fits() {
        double[] y = SimulatedSeries.autoregression(new SplittableRandom(14), 1, new double[] {0.6, -0.2}, 1, 150, 100);
        ArFit fit = Autoregression.fit(Observations.consecutive(y, 4, 1),
                ArSpec.selectedBy(LagSelection.BIC, 6).withSeasonalLag());
        for (CandidateOrder candidate : fit.candidates()) {
            OlsFit separate = separateFit(y, Autoregression.lags(candidate.order(), 4), 6);
            // Same RSS by two QR routes: agreement to ~1e-12 relative in RSS, ~1e-10 absolute in the criteria.
            assertEquals(separate.aic(), candidate.aic(), 1e-8);
            assertEquals(separate.bic(), candidate.bic(), 1e-8);
        }
    }

    @Test
    void bic_picks_the_true_order_of_a_simulated_ar2_in_most_runs() {
        // Seeded: 200 series of y_t = 0.5 y_{t-1} + 0.3 y_{t-2} + e_t, n = 200, orders 0..8 by BIC.
        // BIC is consistent (Schwarz 1978); at n = 200 an extra lag passes its ln(200) = 5.3 penalty with
        // probability ~2% and lag 2 (t about 4.4) is almost never missed, so ~90% is expected. Requiring 80%
        // leaves 4 binomial standard errors (2.1%) of room.
        SplittableRandom random = new SplittableRandom(15);
        int hits = 0;
        int runs = 200;
        for (int run = 0; run < runs; run++) {
            double[] y = SimulatedSeries.autoregression(random, 0, new double[] {0.5, 0.3}, 1, 200, 100);
            if (Autoregression.fit(Observations.annual(y), ArSpec.selectedBy(LagSelection.BIC, 8)).order() == 2) {
                hits++;
            }
        }
        assertTrue(hits >= 0.8 * runs, "BIC chose order 2 in " + hits + " of " + runs + " runs");
    }

    @Test
    void explosive_fit_is_reported_as_not_stationary_without_a_mean_reverting_level() {
        double[] y = SimulatedSeries.autoregression(new SplittableRandom(16), 0, new double[] {1.03}, 1, 200, 0);
        ArFit fit = Autoregression.fit(Observations.annual(y), ArSpec.ofOrder(1));
        assertFalse(fit.stationarity().stationary());
        assertTrue(Double.isNaN(fit.stationarity().meanRevertingLevel()));
        assertTrue(fit.stationarity().largestRootModulus() > 1);
        assertTrue(fit.stationarity().statement().contains("on or inside the unit circle"));
    }

    @Test
    void model_on_differences_reports_the_mean_change_per_period_and_says_it_refers_to_differences() {
        // A random walk with drift 0.5: the differences are white noise with mean 0.5 and SD 1, so over
        // 400 differences the mean-reverting level (the mean change) lies within 4/sqrt(400) = 0.2 of 0.5.
        double[] y = SimulatedSeries.randomWalk(new SplittableRandom(17), 0.5, 401);
        ArFit fit = Autoregression.fit(Observations.annual(y), ArSpec.ofOrder(1).onDifferences());
        assertTrue(fit.differenced());
        assertEquals(0.5, fit.stationarity().meanRevertingLevel(), 0.2);
        assertTrue(fit.stationarity().statement().contains("refers to the differences"));
        assertEquals(400 - 1, fit.observationsUsed());
    }

    @Test
    void residual_autocorrelations_flag_a_lag_an_underfitted_model_misses() {
        // common practice: an AR(1) fitted to y_t = 0.3 y_{t-1} + 0.5 y_{t-2} + e_t leaves residual
        // correlation at lag 2 of about 0.4, some 9 standard errors at T = 499.
        double[] y = SimulatedSeries.autoregression(new SplittableRandom(18), 0, new double[] {0.3, 0.5}, 1, 500, 100);
        ArFit underfitted = Autoregression.fit(Observations.annual(y), ArSpec.ofOrder(1));
        assertTrue(underfitted.flaggedLags().stream().anyMatch(r -> r.lag() <= 2),
                underfitted.flaggedLags().toString());
        ResidualAutocorrelation first = underfitted.residualAutocorrelations().get(0);
        assertEquals(1 / Math.sqrt(499), first.standardError(), 1e-15);
        assertEquals(Autocorrelations.defaultMaxLag(499, 1), underfitted.residualAutocorrelations().size());
        ArFit right = Autoregression.fit(Observations.annual(y), ArSpec.ofOrder(2));
        assertTrue(right.flaggedLags().stream().noneMatch(r -> r.lag() <= 2), right.flaggedLags().toString());
    }

    private static OlsFit separateFit(double[] y, int[] lags, int start) {
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        columns.add(LagDesigns.ones(y.length - start));
        names.add("constant");
        for (int lag : lags) {
            columns.add(LagDesigns.lagged(y, lag, start));
            names.add("lag " + lag);
        }
        return LeastSquares.fit(new Design(columns, names, true), LagDesigns.lagged(y, 0, start));
    }

    private static void assertWithinFourStandardErrors(double truth, Coefficient c) {
        assertEquals(truth, c.estimate(), 4 * c.standardError(), c.name());
    }
}
