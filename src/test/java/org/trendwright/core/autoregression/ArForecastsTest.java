package org.trendwright.core.autoregression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.Observations;
import org.trendwright.core.forecast.Forecast;
import org.trendwright.core.forecast.ForecastPoint;
import org.trendwright.core.forecast.PredictionInterval;

/**
 * AR forecasts against the closed forms of Box & Jenkins (1970, Time Series Analysis: Forecasting
 * and Control, chapter 5) and, for the intervals, seeded coverage simulations.
 */
class ArForecastsTest {

    @Test
    void ar1_forecasts_follow_the_closed_form_and_converge_to_the_mean_reverting_level() {
        ArFit fit = Autoregression.fit(ar1Series(31), ArSpec.ofOrder(1));
        double phi = fit.lagCoefficients()[0];
        double mu = fit.stationarity().meanRevertingLevel();
        double last = fit.series().valueAt(fit.series().size() - 1);
        double[] forecasts = ArForecasts.forecast(fit, 300).values();
        for (int h = 1; h <= 300; h++) {
            // Box & Jenkins (1970), AR(1): y_hat(h) = mu + phi^h (y_n - mu); rounding of the recursion only
            assertEquals(mu + Math.pow(phi, h) * (last - mu), forecasts[h - 1], 1e-12 * (1 + Math.abs(mu)));
        }
        // common practice: the forecasts approach the mean-reverting level monotonically for 0 < phi < 1
        for (int h = 1; h < 300; h++) {
            assertTrue(Math.abs(forecasts[h] - mu) <= Math.abs(forecasts[h - 1] - mu));
        }
        assertEquals(mu, forecasts[299], 1e-10 * (1 + Math.abs(mu)));
    }

    @Test
    void ar1_forecast_error_grows_to_the_stationary_standard_deviation() {
        ArFit fit = Autoregression.fit(ar1Series(32), ArSpec.ofOrder(1));
        double phi = fit.lagCoefficients()[0];
        double sigma = fit.standardErrorOfEstimate();
        List<ForecastPoint> points = ArForecasts.forecast(fit, 200).points();
        for (ForecastPoint point : points) {
            int h = point.horizon();
            // Box & Jenkins (1970): Var = sigma^2 (1 - phi^(2h)) / (1 - phi^2) for an AR(1)
            double expected = sigma * Math.sqrt((1 - Math.pow(phi, 2 * h)) / (1 - phi * phi));
            assertEquals(expected, point.standardError(), 1e-12 * expected);
        }
        assertEquals(sigma / Math.sqrt(1 - phi * phi), points.get(199).standardError(), 1e-12);
    }

    @Test
    void time_indices_continue_from_the_last_observation_and_intervals_use_the_normal_quantile() {
        ArFit fit = Autoregression.fit(ar1Series(33), ArSpec.ofOrder(1));
        Forecast forecast = ArForecasts.forecast(fit, 12, 0.5, 0.95);
        assertEquals(201, forecast.points().get(0).time());
        assertEquals(1, forecast.points().get(0).horizon());
        assertEquals(212, forecast.points().get(11).time());
        for (ForecastPoint point : forecast.points()) {
            PredictionInterval wide = point.interval(0.95);
            PredictionInterval half = point.interval(0.5);
            // standard normal quantiles 0.975 -> 1.959963985, 0.75 -> 0.6744897502 (common practice)
            double se = point.standardError();
            assertEquals(1.959963985 * se, wide.upper() - point.value(), 1e-8 * se);
            assertEquals(0.6744897502 * se, point.value() - half.lower(), 1e-8 * se);
        }
        assertEquals(List.of(0.8, 0.95), ArForecasts.forecast(fit, 1).points().get(0).intervals().stream()
                .map(PredictionInterval::level).toList());
    }

    @Test
    void random_walk_with_drift_on_differences_forecasts_a_straight_line_with_error_growing_as_root_h() {
        double[] y = SimulatedSeries.randomWalk(new SplittableRandom(34), 0.3, 150);
        ArFit fit = Autoregression.fit(Observations.annual(y), ArSpec.ofOrder(0).onDifferences());
        Forecast forecast = ArForecasts.forecast(fit, 10);
        double drift = fit.constant();
        double sigma = fit.standardErrorOfEstimate();
        for (ForecastPoint point : forecast.points()) {
            int h = point.horizon();
            // common practice: y_hat(h) = y_n + h * drift, se = sigma * sqrt(h)
            assertEquals(y[149] + h * drift, point.value(), 1e-12 * Math.abs(y[149]) + 1e-12);
            assertEquals(sigma * Math.sqrt(h), point.standardError(), 1e-12 * sigma);
        }
        assertTrue(forecast.model().contains("integrated to levels"), forecast.model());
    }

    @Test
    void ar1_on_differences_uses_the_psi_weights_of_the_integrated_process() {
        double[] y = SimulatedSeries.autoregression(new SplittableRandom(35), 0.2, new double[] {1.4, -0.4}, 1, 200, 0);
        ArFit fit = Autoregression.fit(Observations.annual(y), ArSpec.ofOrder(1).onDifferences());
        double phi = fit.lagCoefficients()[0];
        double sigma = fit.standardErrorOfEstimate();
        List<ForecastPoint> points = ArForecasts.forecast(fit, 8).points();
        double sum = 0;
        for (int j = 0; j < 8; j++) {
            // Box & Jenkins (1970), ARIMA(1,1,0): psi*_j = (1 - phi^(j+1)) / (1 - phi)
            double psiStar = (1 - Math.pow(phi, j + 1)) / (1 - phi);
            sum += psiStar * psiStar;
            assertEquals(sigma * Math.sqrt(sum), points.get(j).standardError(), 1e-12 * sigma * Math.sqrt(sum));
        }
    }

    @Test
    void ninety_five_percent_intervals_cover_about_95_percent_of_simulated_future_values() {
        // Seeded: 2000 AR(2) series (0.5, 0.3), n = 200, fitted as AR(2); the next 6 values come from the
        // same process. The binomial standard error of a 95% coverage at 2000 runs is 0.49 points. The
        // intervals ignore parameter uncertainty, which lowers coverage, more so further ahead (about half
        // a point at h = 1 and one point at h = 6 for this model and n). Band: 93%..96.5%, i.e. 3 standard
        // errors above 95% and 4 below. Wrong psi-weights or quantiles would miss it by far (a 90% quantile
        // covers 90%).
        double[] coverage = coverage(new SplittableRandom(36), new double[] {0.5, 0.3}, ArSpec.ofOrder(2), 2000, 6);
        assertCoverageNearNinetyFive(coverage[0], "h = 1");
        assertCoverageNearNinetyFive(coverage[5], "h = 6");
    }

    @Test
    void ninety_five_percent_intervals_of_a_differenced_model_cover_about_95_percent_of_future_levels() {
        // Seeded: 2000 series whose differences are AR(1) with phi = 0.4 (so the levels are ARIMA(1,1,0)),
        // n = 200, fitted as AR(1) on differences; coverage of the level 1 and 4 steps ahead. Band as above.
        double[] coverage = coverage(new SplittableRandom(37), new double[] {1.4, -0.4},
                ArSpec.ofOrder(1).onDifferences(), 2000, 4);
        assertCoverageNearNinetyFive(coverage[0], "h = 1");
        assertCoverageNearNinetyFive(coverage[3], "h = 4");
    }

    @Test
    void a_fit_that_is_not_stationary_is_forecast_and_says_so() {
        // Differences that explode (phi = 1.05): stated, not refused.
        double[] y = SimulatedSeries.autoregression(new SplittableRandom(38), 0, new double[] {2.05, -1.05}, 1, 120, 0);
        ArFit fit = Autoregression.fit(Observations.annual(y), ArSpec.ofOrder(1).onDifferences());
        Forecast forecast = ArForecasts.forecast(fit, 12);
        assertTrue(forecast.model().contains("not stationary"), forecast.model());
        assertTrue(Arrays.stream(forecast.values()).allMatch(Double::isFinite));
        assertTrue(forecast.points().get(11).standardError() > forecast.points().get(10).standardError());
    }

    @Test
    void refuses_a_horizon_below_one_and_levels_outside_zero_one() {
        ArFit fit = Autoregression.fit(ar1Series(39), ArSpec.ofOrder(1));
        assertThrows(InvalidSpecificationException.class, () -> ArForecasts.forecast(fit, 0));
        assertThrows(InvalidSpecificationException.class, () -> ArForecasts.forecast(fit, 4, 0.95, 1.0));
        assertThrows(InvalidSpecificationException.class, () -> ArForecasts.forecast(fit, 4, 0.0));
    }

    private static void assertCoverageNearNinetyFive(double coverage, String horizon) {
        assertTrue(coverage >= 0.93 && coverage <= 0.965, horizon + " coverage " + coverage);
    }

    private static Observations ar1Series(long seed) {
        return Observations.annual(SimulatedSeries.autoregression(new SplittableRandom(seed), 5, new double[] {0.7}, 2,
                200, 100));
    }

    /** Share of runs whose 95% interval at each horizon 1..horizon holds the simulated future value. */
    private static double[] coverage(SplittableRandom random, double[] phi, ArSpec spec, int runs, int horizon) {
        int n = 200;
        double[] covered = new double[horizon];
        for (int run = 0; run < runs; run++) {
            double[] all = SimulatedSeries.autoregression(random, 0.1, phi, 1, n + horizon, 100);
            ArFit fit = Autoregression.fit(Observations.annual(Arrays.copyOf(all, n)), spec);
            List<ForecastPoint> points = ArForecasts.forecast(fit, horizon).points();
            for (int h = 1; h <= horizon; h++) {
                PredictionInterval interval = points.get(h - 1).interval(0.95);
                double future = all[n + h - 1];
                covered[h - 1] += interval.lower() <= future && future <= interval.upper() ? 1 : 0;
            }
        }
        for (int h = 0; h < horizon; h++) {
            covered[h] /= runs;
        }
        return covered;
    }
}
