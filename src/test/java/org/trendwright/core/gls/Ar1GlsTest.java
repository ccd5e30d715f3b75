package org.trendwright.core.gls;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.diagnostics.DurbinWatson;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * Iterated Cochrane-Orcutt and Prais-Winsten on seeded simulations of a linear trend plus AR(1)
 * errors, y_t = 10 + 0.5 t + u_t, u_t = rho u_{t-1} + e_t, e_t ~ N(0, 1), with the Monte Carlo
 * tolerance of each check stated beside it.
 */
class Ar1GlsTest {

    private static final int SERIES = 200;
    private static final int N = 500;
    private static final double RHO = 0.7;
    private static final Map<Ar1Method, Summary> SUMMARIES = new EnumMap<>(Ar1Method.class);

    /** What 200 fits at n = 500, rho = 0.7 produced, per method. */
    private record Summary(double meanRho, int within005, double meanDw, double meanOlsDw, int converged) {
    }

    @BeforeAll
    static void simulate() {
        for (Ar1Method method : Ar1Method.values()) {
            SplittableRandom random = new SplittableRandom(20250601);
            double rhoSum = 0;
            double dwSum = 0;
            double olsDwSum = 0;
            int within = 0;
            int converged = 0;
            for (int s = 0; s < SERIES; s++) {
                double[] y = Ar1Series.trendPlus(Ar1Series.errors(random, N, RHO, 1));
                Design design = Ar1Series.trendDesign(N);
                Ar1GlsFit fit = Ar1Gls.fit(design, y, method, Ar1Gls.DEFAULT_TOLERANCE, Ar1Gls.DEFAULT_MAX_ITERATIONS);
                rhoSum += fit.rho().value();
                within += Math.abs(fit.rho().value() - RHO) <= 0.05 ? 1 : 0;
                dwSum += fit.durbinWatson();
                olsDwSum += DurbinWatson.statistic(LeastSquares.fit(design, y).residuals());
                converged += fit.converged() ? 1 : 0;
            }
            SUMMARIES.put(method, new Summary(rhoSum / SERIES, within, dwSum / SERIES, olsDwSum / SERIES, converged));
        }
    }

    @ParameterizedTest
    @EnumSource(Ar1Method.class)
    void recovers_rho_of_0_7_within_0_05_at_n_500(Ar1Method method) {
        Summary summary = SUMMARIES.get(method);
        // The least-squares rho of an AR(1) has sd sqrt((1 - rho^2)/n) = 0.032 at n = 500 (Mann & Wald
        // 1943, Econometrica 11), so a single sample lands within 0.05 with probability about 0.88, not
        // always. Over 200 series the share must exceed 0.80: 0.88 less 3.5 binomial sd (0.023).
        assertTrue(summary.within005() >= 160, method + ": only " + summary.within005() + " of 200 within 0.05");
        // Mean of 200 estimates: Monte Carlo sd 0.032/sqrt(200) = 0.0023. The estimator is biased down
        // by O(1/n): -(1 + 3 rho)/n = -0.006 with a fitted mean (Marriott & Pope 1954, Biometrika 41,
        // from memory), somewhat more with a fitted trend. 0.015 allows 0.01 of bias plus 2 sd.
        assertEquals(RHO, summary.meanRho(), 0.015, method.toString());
        assertEquals(SERIES, summary.converged(), method + " converged in every series");
    }

    @ParameterizedTest
    @EnumSource(Ar1Method.class)
    void transformed_residuals_have_durbin_watson_near_2_while_ols_is_far_below(Ar1Method method) {
        Summary summary = SUMMARIES.get(method);
        // d is about 2(1 - r_1) (Durbin & Watson 1950): OLS residuals of AR(1) errors with rho = 0.7
        // give about 0.6; white-noise residuals give 2 with sd about 2/sqrt(n) = 0.09 per series,
        // 0.0063 for the mean of 200. 0.03 allows 4.5 Monte Carlo sd plus the small remaining
        // correlation from estimating rho.
        assertEquals(2, summary.meanDw(), 0.03, method + " mean transformed-residual DW");
        assertEquals(2 * (1 - RHO), summary.meanOlsDw(), 0.1, method + " mean OLS DW");
    }

    @Test
    void prais_winsten_and_cochrane_orcutt_agree_for_large_n() {
        int n = 2000;
        double[] y = Ar1Series.trendPlus(Ar1Series.errors(new SplittableRandom(11), n, RHO, 1));
        Design design = Ar1Series.trendDesign(n);
        Ar1GlsFit co = Ar1Gls.cochraneOrcutt(design, y);
        Ar1GlsFit pw = Ar1Gls.praisWinsten(design, y);
        // The two differ in one row out of n, so rho differs by O(1/n) (observed below 1e-4 here);
        // 0.002 is 4/n.
        assertEquals(co.rho().value(), pw.rho().value(), 0.002);
        for (int j = 0; j < 2; j++) {
            // The first row carries more weight on the intercept (its transformed constant is
            // sqrt(1 - rho^2) = 0.71 against 1 - rho = 0.3 for the others), so the coefficients agree
            // to a fraction of a standard error rather than to O(1/n): half a standard error.
            double se = pw.coefficients().get(j).standardError();
            assertEquals(co.estimates()[j], pw.estimates()[j], 0.5 * se, "coefficient " + j);
        }
    }

    @ParameterizedTest
    @EnumSource(Ar1Method.class)
    void with_uncorrelated_errors_gls_is_close_to_ols(Ar1Method method) {
        SplittableRandom random = new SplittableRandom(5);
        for (int s = 0; s < 20; s++) {
            double[] y = Ar1Series.trendPlus(Ar1Series.errors(random, N, 0, 1));
            Design design = Ar1Series.trendDesign(N);
            Ar1GlsFit gls = Ar1Gls.fit(design, y, method, Ar1Gls.DEFAULT_TOLERANCE, Ar1Gls.DEFAULT_MAX_ITERATIONS);
            OlsFit ols = LeastSquares.fit(design, y);
            // With rho = 0 the estimate is N(0, 1/n): 4 sd = 4/sqrt(500) = 0.18.
            assertEquals(0, gls.rho().value(), 0.18);
            for (int j = 0; j < 2; j++) {
                // The transformation with |rho| < 0.18 moves b by a fraction of its standard error
                // (0.26 se at most in 100 trial series); half a standard error is the bound.
                double se = ols.coefficients().get(j).standardError();
                assertEquals(ols.estimates()[j], gls.estimates()[j], 0.5 * se, "series " + s + ", coefficient " + j);
            }
        }
    }

    @ParameterizedTest
    @EnumSource(Ar1Method.class)
    void final_regression_is_the_quasi_difference_defined_by_the_method(Ar1Method method) {
        int n = 60;
        double[] y = Ar1Series.trendPlus(Ar1Series.errors(new SplittableRandom(3), n, 0.5, 1));
        Ar1GlsFit fit = Ar1Gls.fit(Ar1Series.trendDesign(n), y, method, 1e-10, 100);
        double rho = fit.rho().value();
        boolean keepFirst = method == Ar1Method.PRAIS_WINSTEN;
        // Cochrane & Orcutt (1949): y_t - rho y_{t-1} on (1 - rho, t - rho (t - 1)), t = 2..n;
        // Prais & Winsten (1954) add sqrt(1 - rho^2) (y_1; 1, 1). Built by hand here.
        int rows = keepFirst ? n : n - 1;
        double[] ys = new double[rows];
        double[] constant = new double[rows];
        double[] time = new double[rows];
        int offset = keepFirst ? 1 : 0;
        if (keepFirst) {
            double w = Math.sqrt(1 - rho * rho);
            ys[0] = w * y[0];
            constant[0] = w;
            time[0] = w;
        }
        for (int t = 2; t <= n; t++) {
            ys[t - 2 + offset] = y[t - 1] - rho * y[t - 2];
            constant[t - 2 + offset] = 1 - rho;
            time[t - 2 + offset] = t - rho * (t - 1);
        }
        OlsFit byHand = LeastSquares.fit(new Design(List.of(constant, time), List.of("constant", "t"), false), ys);
        for (int j = 0; j < 2; j++) {
            // Same least-squares problem solved twice: agreement to rounding (condition number ~1e2).
            assertEquals(byHand.estimates()[j], fit.estimates()[j], 1e-10 * Math.abs(byHand.estimates()[j]));
            assertEquals(byHand.coefficients().get(j).standardError(), fit.coefficients().get(j).standardError(),
                    1e-10 * byHand.coefficients().get(j).standardError());
        }
        assertEquals(byHand.standardErrorOfEstimate(), fit.standardErrorOfEstimate(), 1e-12);
        assertEquals(rows - 2, fit.residualDegreesOfFreedom());
        assertEquals(DurbinWatson.statistic(byHand.residuals()), fit.durbinWatson(), 1e-12);
    }

    @Test
    void converged_rho_is_the_through_origin_regression_of_the_final_residuals() {
        int n = 300;
        double[] y = Ar1Series.trendPlus(Ar1Series.errors(new SplittableRandom(8), n, RHO, 1));
        Ar1GlsFit fit = Ar1Gls.cochraneOrcutt(Ar1Series.trendDesign(n), y);
        double[] u = fit.structuralResiduals();
        double lagged = laggedSquares(u);
        double rho = throughOriginRho(u);
        double squares = 0;
        for (int t = 1; t < n; t++) {
            squares += Math.pow(u[t] - rho * u[t - 1], 2);
        }
        // Cochrane & Orcutt (1949): at the fixed point rho reproduces itself from the residuals; the
        // reported rho was used for the final fit, and the next one differs by less than 1e-8.
        assertTrue(fit.converged());
        assertEquals(rho, fit.rho().value(), 1e-8);
        // Classical standard error of a regression through the origin (common practice), and its
        // large-sample value sqrt((1 - rho^2)/n) = 0.041 (Mann & Wald 1943) within 15%.
        assertEquals(Math.sqrt(squares / (n - 2) / lagged), fit.rho().standardError(), 1e-7);
        assertEquals(Math.sqrt((1 - RHO * RHO) / n), fit.rho().standardError(), 0.15 * 0.041);
    }

    @ParameterizedTest
    @EnumSource(Ar1Method.class)
    void estimate_reports_the_qr_solution_at_its_rho_and_a_fixed_point_as_fit_does(Ar1Method method) {
        // The steering steps solve the normal equations; the last step is the QR route's, so b and the
        // transformed residuals are LeastSquares.estimates at the reported rho bit for bit, and that
        // rho reproduces itself from the structural residuals to the tolerance (Cochrane & Orcutt 1949).
        SplittableRandom random = new SplittableRandom(2026_12_02L);
        for (double rho : new double[] {-0.5, 0.3, 0.7, 0.95}) {
            int n = 40 + random.nextInt(200);
            double[] y = Ar1Series.trendPlus(Ar1Series.errors(random, n, rho, 1));
            Design design = Ar1Series.trendDesign(n);
            Ar1GlsEstimate estimate = Ar1Gls.estimate(design, y, method, Ar1Gls.DEFAULT_TOLERANCE,
                    Ar1Gls.DEFAULT_MAX_ITERATIONS);
            double used = estimate.rho().value();
            LeastSquares.Estimates qr = LeastSquares.estimates(Ar1Gls.transform(design, used, method),
                    Ar1Gls.transform(y, used, method));
            assertTrue(estimate.converged(), "rho " + rho);
            assertArrayEquals(qr.coefficients(), estimate.coefficients(), 0.0, "rho " + rho);
            assertArrayEquals(qr.residuals(), estimate.transformedResiduals(), 0.0, "rho " + rho);
            assertEquals(used, throughOriginRho(estimate.structuralResiduals()), Ar1Gls.DEFAULT_TOLERANCE);
            Ar1GlsFit fit = Ar1Gls.fit(design, y, method, Ar1Gls.DEFAULT_TOLERANCE, Ar1Gls.DEFAULT_MAX_ITERATIONS);
            assertEquals(used, fit.rho().value(), 0.0);
            assertEquals(estimate.iterations(), fit.iterations());
        }
    }

    @Test
    void aitken_extrapolation_is_exact_for_a_linear_iteration_and_refuses_to_leave_the_unit_interval() {
        // For g(x) = a x + c the errors x_k - x* shrink geometrically by a, and the delta-squared
        // formula returns x* = c / (1 - a) from any three iterates (Aitken 1926; the textbook property
        // that motivates it). Here a = 0.9, c = 0.05: x0 = 0, x1 = 0.05, x2 = 0.095, x* = 0.5.
        assertEquals(0.5, Ar1Gls.aitken(0, 0.05, 0.095), 1e-15);
        // No x0 yet, a zero second difference (0.5 - 2 x 0.25 + 0 is exactly 0), or a point outside
        // (-1, 1): no extrapolation.
        assertTrue(Double.isNaN(Ar1Gls.aitken(Double.NaN, 0.05, 0.095)));
        assertTrue(Double.isNaN(Ar1Gls.aitken(0, 0.25, 0.5)));
        assertTrue(Double.isNaN(Ar1Gls.aitken(0, 0.5, 0.75)));
    }

    @Test
    void accelerated_iteration_reaches_the_fixed_point_of_a_slowly_converging_plain_iteration() {
        // Strongly correlated errors make the plain Cochrane-Orcutt map converge slowly; the
        // fixed-point property (Cochrane & Orcutt 1949: rho reproduces itself from its own
        // residuals) must hold at the end all the same, to the tolerance asked for.
        int n = 80;
        double[] y = Ar1Series.trendPlus(Ar1Series.errors(new SplittableRandom(21), n, 0.95, 1));
        Ar1GlsFit fit = Ar1Gls.fit(Ar1Series.trendDesign(n), y, Ar1Method.PRAIS_WINSTEN, 1e-12, 100);
        assertTrue(fit.converged());
        assertEquals(throughOriginRho(fit.structuralResiduals()), fit.rho().value(), 1e-12);
    }

    /** sum u_t u_{t-1} / sum u_{t-1}^2, t = 2..n: the regression of each residual on its predecessor. */
    private static double throughOriginRho(double[] u) {
        double cross = 0;
        for (int t = 1; t < u.length; t++) {
            cross += u[t] * u[t - 1];
        }
        return cross / laggedSquares(u);
    }

    private static double laggedSquares(double[] u) {
        double lagged = 0;
        for (int t = 1; t < u.length; t++) {
            lagged += u[t - 1] * u[t - 1];
        }
        return lagged;
    }

    @Test
    void reports_no_convergence_when_the_iteration_cap_stops_it() {
        double[] y = Ar1Series.trendPlus(Ar1Series.errors(new SplittableRandom(9), 100, RHO, 1));
        Ar1GlsFit capped = Ar1Gls.fit(Ar1Series.trendDesign(100), y, Ar1Method.COCHRANE_ORCUTT, 1e-8, 1);
        assertFalse(capped.converged());
        assertEquals(1, capped.iterations());
    }

    @Test
    void refuses_errors_that_look_non_stationary() {
        // An explosive series x_t = 1.1 x_{t-1} + e_t around a trend: its detrended residuals grow
        // geometrically, so their lag-one regression gives rho above 1.
        double[] u = new double[60];
        SplittableRandom random = new SplittableRandom(2);
        u[0] = 1;
        for (int t = 1; t < u.length; t++) {
            u[t] = 1.1 * u[t - 1] + random.nextGaussian();
        }
        InvalidSpecificationException e = assertThrows(InvalidSpecificationException.class,
                () -> Ar1Gls.praisWinsten(Ar1Series.trendDesign(60), Ar1Series.trendPlus(u)));
        assertTrue(e.getMessage().contains("non-stationary"), e.getMessage());
        assertTrue(e.getMessage().contains("differences"), e.getMessage());
    }

    @Test
    void refuses_a_series_too_short_for_the_regressors() {
        double[] y = {1, 2.5, 2.9};
        assertThrows(InsufficientDataException.class, () -> Ar1Gls.cochraneOrcutt(Ar1Series.trendDesign(3), y));
    }

    @Test
    void refuses_an_exact_fit_since_there_is_no_error_to_model() {
        double[] y = Ar1Series.trendPlus(new double[20]);
        InvalidSpecificationException e = assertThrows(InvalidSpecificationException.class,
                () -> Ar1Gls.cochraneOrcutt(Ar1Series.trendDesign(20), y));
        assertTrue(e.getMessage().contains("exactly"), e.getMessage());
    }

    @Test
    void refuses_a_tolerance_that_is_not_positive() {
        double[] y = Ar1Series.trendPlus(Ar1Series.errors(new SplittableRandom(1), 30, 0.3, 1));
        assertThrows(InvalidSpecificationException.class,
                () -> Ar1Gls.fit(Ar1Series.trendDesign(30), y, Ar1Method.PRAIS_WINSTEN, 0, 10));
    }
}
