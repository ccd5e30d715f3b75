package org.trendwright.core.trend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.NonPositiveValueException;
import org.trendwright.core.Observations;
import org.trendwright.core.forecast.ForecastPoint;
import org.trendwright.core.regression.Coefficient;
import org.trendwright.testing.ReferenceData;

class TrendsTest {

    private static final List<Double> LEVELS = List.of(0.80, 0.95);

    /**
     * NIST/SEMATECH e-Handbook, section 1.4.2.3 (random walk case study), companion output: the
     * linear trend y = b0 + b1 t fitted to the 500-point series. Printed digits: b0 1.8335107
     * (se 0.1721148), b1 0.0055216 (se 0.0005953), t values 10.653 and 9.275. Tolerances are half
     * a unit in the last printed digit.
     */
    @Test
    void reproduces_the_published_linear_trend_of_the_nist_random_walk_case_study() {
        double[] y = ReferenceData.column("nist-ehandbook/randwalk.csv", 1);
        TrendFit fit = Trends.fit(Observations.annual(y), TrendSpec.linear());
        Coefficient b0 = fit.ols().coefficient("constant");
        Coefficient b1 = fit.ols().coefficient("t");
        assertEquals(1.8335107, b0.estimate(), 0.5e-7);
        assertEquals(0.1721148, b0.standardError(), 0.5e-7);
        assertEquals(0.0055216, b1.estimate(), 0.5e-7);
        assertEquals(0.0005953, b1.standardError(), 0.5e-7);
        assertEquals(10.653, b0.tStatistic(), 0.5e-3);
        assertEquals(9.275, b1.tStatistic(), 0.5e-3);
    }

    /**
     * The textbook form of the forecast standard error for a straight line, s sqrt(1 + 1/n +
     * (t0 - tbar)^2 / sum (t - tbar)^2) (e.g. Johnston & DiNardo 1997, Econometric Methods,
     * section 1.7; common practice), must equal our general s sqrt(1 + x'(X'X)^-1 x).
     */
    @Test
    void forecast_standard_error_matches_the_closed_form_for_a_straight_line() {
        double[] y = ReferenceData.column("nist-ehandbook/randwalk.csv", 1);
        TrendFit fit = Trends.fit(Observations.annual(y), TrendSpec.linear());
        int n = y.length;
        double tBar = (n + 1) / 2.0;
        double sxx = n * ((double) n * n - 1) / 12.0; // sum of (t - tbar)^2 for t = 1..n
        for (int t0 : new int[] {1, 250, 501, 520}) {
            double expected = fit.ols().standardErrorOfEstimate()
                    * Math.sqrt(1 + 1.0 / n + (t0 - tBar) * (t0 - tBar) / sxx);
            double actual = fit.predict(t0, LEVELS).forecast().points().get(0).standardError();
            assertEquals(expected, actual, 1e-12 * expected);
        }
    }

    /**
     * US real GDP, quarterly 1950-Q1..2019-Q4 (BEA, series GDPC1): the log-linear trend implies a
     * growth rate near 0.75-0.8% a quarter, about 3% a year, the well-known long-run US rate
     * (common practice). The fit must equal least squares of ln y on (1, t).
     */
    @Test
    void log_linear_trend_of_us_real_gdp_grows_about_three_percent_a_year() {
        double[] gdp = ReferenceData.column("open-series/us_real_gdp_quarterly_1950q1_2019q4.csv", 1);
        TrendFit fit = Trends.fit(Observations.consecutive(gdp, 4, 1), TrendSpec.logLinear());
        double quarterly = fit.growthRate().orElseThrow().perPeriod();
        assertTrue(quarterly > 0.0070 && quarterly < 0.0085, "quarterly growth " + quarterly);
        GrowthRate g = fit.growthRate().orElseThrow();
        assertTrue(g.lower95() < quarterly && quarterly < g.upper95());
    }

    /**
     * The three back-transformations obey their definitions: median e^m, lognormal mean
     * e^(m + s^2/2) (the lognormal mean, common practice) and Duan's (1983) smearing mean
     * e^m (1/n) sum e^(e_i); the log-scale interval maps to (e^lo, e^hi).
     */
    @Test
    void log_scale_forecasts_carry_the_median_lognormal_and_smearing_back_transformations() {
        double[] gdp = ReferenceData.column("open-series/us_real_gdp_quarterly_1950q1_2019q4.csv", 1);
        TrendFit fit = Trends.fit(Observations.consecutive(gdp, 4, 1), TrendSpec.logLinear());
        TrendForecast forecast = fit.forecast(4, LEVELS);
        double[] e = fit.residuals();
        double smearing = 0;
        for (double r : e) {
            smearing += Math.exp(r);
        }
        smearing /= e.length;
        for (int h = 0; h < 4; h++) {
            ForecastPoint point = forecast.forecast().points().get(h);
            double m = fit.ols().predict(new double[] {1, 281 + h});
            BackTransformed b = forecast.backTransformed().get(h);
            assertEquals(Math.exp(m), b.median(), 1e-9 * b.median());
            assertEquals(Math.exp(m + fit.ols().residualVariance() / 2), b.lognormalMean(), 1e-9 * b.median());
            assertEquals(Math.exp(m) * smearing, b.smearingMean(), 1e-9 * b.median());
            assertEquals(b.smearingMean(), point.value(), 0);
            assertTrue(point.interval(0.95).lower() < b.median() && b.median() < point.interval(0.95).upper());
        }
    }

    @Test
    void rejects_log_linear_fit_when_a_value_is_zero_and_names_the_period() {
        Observations series = Observations.annual(5, 6, 0, 8, 9);
        NonPositiveValueException e = assertThrows(NonPositiveValueException.class,
                () -> Trends.fit(series, TrendSpec.logLinear()));
        assertEquals(3, e.time());
        assertTrue(e.getMessage().contains("t = 3"), e.getMessage());
    }

    @Test
    void refuses_more_coefficients_than_observations_allow() {
        Observations series = Observations.consecutive(new double[] {1, 2, 3, 4, 5}, 4, 1);
        assertThrows(InsufficientDataException.class, () -> Trends.fit(series, TrendSpec.linearSeasonal()));
    }

    @Test
    void refuses_seasonal_dummies_on_annual_data() {
        Observations series = Observations.annual(1, 2, 3, 4, 5, 6);
        assertThrows(InvalidSpecificationException.class, () -> Trends.fit(series, TrendSpec.linearSeasonal()));
    }

    /** An exact quadratic with a seasonal pattern is recovered exactly (common practice). */
    @Test
    void recovers_an_exact_quadratic_with_seasonal_shifts_starting_mid_year() {
        double[] shifts = {0, 3, -2, 5};
        int firstSeason = 3; // the series starts in the third quarter
        double[] y = new double[20];
        for (int t = 1; t <= y.length; t++) {
            int season = (firstSeason - 1 + t - 1) % 4;
            y[t - 1] = 10 + 0.5 * t - 0.02 * t * t + shifts[season];
        }
        TrendFit fit = Trends.fit(Observations.consecutive(y, 4, firstSeason),
                TrendSpec.quadratic().withSeasonalDummies(true));
        assertEquals(10, fit.ols().coefficient("constant").estimate(), 1e-10);
        assertEquals(0.5, fit.ols().coefficient("t").estimate(), 1e-11);
        assertEquals(-0.02, fit.ols().coefficient("t^2").estimate(), 1e-12);
        assertEquals(3, fit.ols().coefficient("season 2").estimate(), 1e-10);
        assertEquals(-2, fit.ols().coefficient("season 3").estimate(), 1e-10);
        assertEquals(5, fit.ols().coefficient("season 4").estimate(), 1e-10);
        double next = fit.forecast(1, LEVELS).forecast().points().get(0).value();
        int season21 = (firstSeason - 1 + 20) % 4;
        assertEquals(10 + 0.5 * 21 - 0.02 * 441 + shifts[season21], next, 1e-9);
    }

    /** A missing period keeps its place in t: the slope stays per period (common practice). */
    @Test
    void a_gap_keeps_its_place_in_the_time_index() {
        int[] times = {1, 2, 3, 5, 6, 7, 8};
        double[] y = new double[times.length];
        for (int i = 0; i < times.length; i++) {
            y[i] = 4 + 2 * times[i];
        }
        TrendFit fit = Trends.fit(new Observations(times, y, 1, 1), TrendSpec.linear());
        assertEquals(2, fit.ols().coefficient("t").estimate(), 1e-12);
        assertEquals(4 + 2 * 9, fit.forecast(1, LEVELS).forecast().points().get(0).value(), 1e-10);
        assertEquals(9, fit.forecast(1, LEVELS).forecast().points().get(0).time());
    }

    /**
     * Seeded simulation: for y = 20 + 0.3 t + e with iid normal e, n = 40, the 95% and 80%
     * prediction intervals for the next period cover the new value in 95% and 80% of replications
     * (exact under the model, as the t-based interval is exact for normal errors). With 4,000
     * replications the binomial SD is 0.34% (95%) and 0.63% (80%); we accept 4 SDs.
     */
    @Test
    void prediction_intervals_cover_new_points_at_their_nominal_rate() {
        Random random = new Random(20261202L);
        int replications = 4000;
        int covered95 = 0;
        int covered80 = 0;
        for (int r = 0; r < replications; r++) {
            double[] y = new double[40];
            for (int t = 1; t <= 40; t++) {
                y[t - 1] = 20 + 0.3 * t + 2 * random.nextGaussian();
            }
            ForecastPoint point = Trends.fit(Observations.annual(y), TrendSpec.linear())
                    .forecast(3, LEVELS).forecast().points().get(2);
            double actual = 20 + 0.3 * 43 + 2 * random.nextGaussian();
            covered95 += contains(point, 0.95, actual) ? 1 : 0;
            covered80 += contains(point, 0.80, actual) ? 1 : 0;
        }
        assertEquals(0.95, covered95 / (double) replications, 4 * 0.0034);
        assertEquals(0.80, covered80 / (double) replications, 4 * 0.0063);
    }

    private static boolean contains(ForecastPoint point, double level, double value) {
        return point.interval(level).lower() <= value && value <= point.interval(level).upper();
    }
}
