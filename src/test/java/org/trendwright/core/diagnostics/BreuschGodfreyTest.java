package org.trendwright.core.diagnostics;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * Identities of the Breusch-Godfrey test (Breusch 1978; Godfrey 1978): LM = n R^2 of the auxiliary
 * regression, and the F form from the restricted and unrestricted residual sums of squares, each
 * rebuilt here from LeastSquares directly. Tolerances: the quantities are ratios of sums of squares
 * of a well-conditioned trend design, so they agree to ~1e-13; 1e-9 relative leaves room for the
 * different summation orders.
 */
class BreuschGodfreyTest {

    private static final int N = 40;

    private static OlsFit fitWithAr1Errors(long seed) {
        return SimulatedTrend.fit(SimulatedTrend.autoregressive(new Well19937c(seed), N, 0.5));
    }

    /** The auxiliary design built independently: X, then e_{t-j} with zeros before the sample. */
    private static Design augmented(Design design, double[] e, int order) {
        List<double[]> lags = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int j = 1; j <= order; j++) {
            double[] lag = new double[e.length];
            for (int t = j; t < e.length; t++) {
                lag[t] = e[t - j];
            }
            lags.add(lag);
            names.add("e(t-" + j + ")");
        }
        return design.withColumns(lags, names);
    }

    private static void assertRelative(double expected, double actual) {
        assertEquals(expected, actual, 1e-9 * Math.max(1, Math.abs(expected)));
    }

    @Test
    void lm_equals_n_times_the_auxiliary_r_squared_over_all_n_rows() {
        OlsFit fit = fitWithAr1Errors(11);
        double[] e = fit.residuals();
        OlsFit auxiliary = LeastSquares.fit(augmented(fit.design(), e, 3), e);
        BreuschGodfreyResult result = BreuschGodfrey.test(fit, 3, 0.05);
        assertAll(
                () -> assertEquals(N, auxiliary.observations()),
                () -> assertEquals(N, result.observations(), "pre-sample residuals are 0, so no row is dropped"),
                () -> assertRelative(auxiliary.rSquared(), result.auxiliaryRSquared()),
                () -> assertRelative(N * auxiliary.rSquared(), result.lagrangeMultiplier().statistic()),
                () -> assertEquals(List.of(3.0), result.lagrangeMultiplier().degreesOfFreedom()));
    }

    @Test
    void f_form_agrees_with_restricted_and_unrestricted_fits() {
        OlsFit fit = fitWithAr1Errors(12);
        double[] e = fit.residuals();
        int order = 2;
        double restricted = LeastSquares.fit(fit.design(), e).residualSumOfSquares();
        double unrestricted = LeastSquares.fit(augmented(fit.design(), e, order), e).residualSumOfSquares();
        int df = N - 2 - order;
        double f = ((restricted - unrestricted) / order) / (unrestricted / df);
        BreuschGodfreyResult result = BreuschGodfrey.test(fit, order, 0.05);
        assertAll(
                () -> assertRelative(restricted, result.restrictedRss()),
                () -> assertRelative(unrestricted, result.unrestrictedRss()),
                () -> assertRelative(f, result.fForm().statistic()),
                () -> assertEquals(List.of((double) order, (double) df), result.fForm().degreesOfFreedom()),
                () -> assertEquals("F", result.fForm().distribution()));
    }

    @Test
    void lm_p_value_of_order_two_is_the_exact_chi_square_tail() {
        BreuschGodfreyResult result = BreuschGodfrey.test(fitWithAr1Errors(13), 2, 0.05);
        double lm = result.lagrangeMultiplier().statistic();
        // Common practice: the chi-square(2) upper tail is exp(-x/2).
        assertEquals(Math.exp(-lm / 2), result.lagrangeMultiplier().pValue(), 1e-14);
    }

    @Test
    void lm_uses_the_uncentred_r_squared_when_the_design_has_no_intercept() {
        // With no intercept the residuals need not average 0; R^2 = 1 - RSS_u/e'e is then the
        // uncentred R^2 that LeastSquares reports for a design without intercept.
        double[] t = new double[N];
        double[] e0 = SimulatedTrend.autoregressive(new Well19937c(14), N, 0.5);
        double[] y = new double[N];
        for (int i = 0; i < N; i++) {
            t[i] = i + 1;
            y[i] = 3 + 0.5 * t[i] + e0[i];
        }
        OlsFit fit = LeastSquares.fit(new Design(List.of(t), List.of("trend"), false), y);
        double[] e = fit.residuals();
        OlsFit auxiliary = LeastSquares.fit(augmented(fit.design(), e, 2), e);
        assertRelative(N * auxiliary.rSquared(), BreuschGodfrey.test(fit, 2, 0.05).lagrangeMultiplier().statistic());
    }

    @Test
    void default_order_is_the_number_of_periods_per_year() {
        OlsFit fit = fitWithAr1Errors(15);
        assertAll(
                () -> assertEquals(1, BreuschGodfrey.defaultOrder(1)),
                () -> assertEquals(4, BreuschGodfrey.defaultOrder(4)),
                () -> assertEquals(12, BreuschGodfrey.defaultOrder(12)),
                () -> assertEquals(4, BreuschGodfrey.testAtSeasonalOrder(fit, 4, 0.05).order()),
                () -> assertThrows(InvalidSpecificationException.class, () -> BreuschGodfrey.defaultOrder(0)));
    }

    @Test
    void reading_names_the_consequence_for_the_intervals() {
        BreuschGodfreyResult result = BreuschGodfrey.test(
                SimulatedTrend.fit(SimulatedTrend.autoregressive(new Well19937c(16), 100, 0.9)), 1, 0.05);
        assertTrue(result.lagrangeMultiplier().rejected());
        assertTrue(result.lagrangeMultiplier().reading().contains("standard errors are too small"),
                result.lagrangeMultiplier().reading());
    }

    @Test
    void refuses_an_order_the_series_is_too_short_for() {
        OlsFit fit = SimulatedTrend.fit(SimulatedTrend.whiteNoise(new Well19937c(17), 6));
        // n = 6, k = 2: order 3 needs 6 rows (one residual degree of freedom), order 4 needs 7.
        BreuschGodfrey.test(fit, 3, 0.05);
        InsufficientDataException e = assertThrows(InsufficientDataException.class,
                () -> BreuschGodfrey.test(fit, 4, 0.05));
        assertTrue(e.getMessage().contains("at least 7 observations"), e.getMessage());
    }

    @Test
    void refuses_an_order_below_one() {
        assertThrows(InvalidSpecificationException.class, () -> BreuschGodfrey.test(fitWithAr1Errors(18), 0, 0.05));
    }

    @Test
    void refuses_an_exact_fit_whose_residuals_are_rounding_error() {
        OlsFit fit = LeastSquares.fit(SimulatedTrend.design(N), SimulatedTrend.response(new double[N]));
        InvalidSpecificationException e = assertThrows(InvalidSpecificationException.class,
                () -> BreuschGodfrey.test(fit, 1, 0.05));
        assertTrue(e.getMessage().contains("fits the series exactly"), e.getMessage());
    }
}
