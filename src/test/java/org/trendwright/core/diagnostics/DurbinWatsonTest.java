package org.trendwright.core.diagnostics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.arrays;
import static org.quicktheories.generators.SourceDSL.doubles;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Test;
import org.quicktheories.core.Gen;
import org.trendwright.core.Decision;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.TestResult;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/** The Durbin-Watson statistic and the complete test of a fit. */
class DurbinWatsonTest {

    /**
     * Two fits of transformed data differ by rounding: residuals of order |y| are exact to about
     * 1e-14 relative for these well-conditioned trend designs (values up to 1e3, n &lt;= 40), so d
     * agrees to about 1e-13; 1e-10 leaves room.
     */
    private static final double INVARIANCE = 1e-10;
    /** The p-value is accurate to about 1e-12 absolute and moves with d at a density below 10. */
    private static final double P_INVARIANCE = 1e-9;
    private static final long SEED = 19_500_519L;

    @Test
    void statistic_lies_between_zero_and_four() {
        // common practice: (a - b)^2 <= 2a^2 + 2b^2 bounds the numerator by 4 sum e_t^2
        qt().withFixedSeed(SEED).withExamples(300).forAll(series())
                .assuming(e -> Arrays.stream(e).anyMatch(v -> v != 0))
                .check(e -> DurbinWatson.statistic(e) >= 0 && DurbinWatson.statistic(e) <= 4);
    }

    @Test
    void statistic_is_near_two_for_independent_errors() {
        // common practice: under independent errors d is about N(2, 4/n); seeded, with 4 standard deviations
        int n = 400;
        double[] y = normal(n, new Random(SEED));
        DurbinWatsonResult result = DurbinWatson.test(LeastSquares.fit(trend(n), y), 0.05);
        assertEquals(2, result.statistic(), 4 * 2 / Math.sqrt(n));
    }

    @Test
    void adding_a_constant_to_the_series_leaves_the_test_unchanged() {
        // common practice: with a constant in the design the residuals, hence d and its null law, do not change
        qt().withFixedSeed(SEED).withExamples(60).forAll(series(), doubles().between(-1e3, 1e3))
                .assuming((y, shift) -> notExact(y))
                .checkAssert((y, shift) -> assertSameTest(y, Arrays.stream(y).map(v -> v + shift).toArray()));
    }

    @Test
    void rescaling_the_series_leaves_the_test_unchanged() {
        // common practice: residuals scale with y and d is a ratio of their squares (a sign flip included)
        qt().withFixedSeed(SEED).withExamples(60).forAll(series(), doubles().between(1e-3, 1e3))
                .assuming((y, scale) -> notExact(y))
                .checkAssert((y, scale) -> assertSameTest(y, Arrays.stream(y).map(v -> -scale * v).toArray()));
    }

    @Test
    void reversing_the_series_in_time_leaves_the_test_unchanged() {
        // common practice: constant + t on the reversed series spans the same space (n + 1 - t), so the
        // residuals are reversed, and d reads the same backwards
        UnaryOperator<double[]> reverse = y -> {
            double[] r = new double[y.length];
            for (int t = 0; t < y.length; t++) {
                r[t] = y[y.length - 1 - t];
            }
            return r;
        };
        qt().withFixedSeed(SEED).withExamples(60).forAll(series())
                .assuming(DurbinWatsonTest::notExact)
                .checkAssert(y -> assertSameTest(y, reverse.apply(y)));
    }

    private static void assertSameTest(double[] y, double[] transformed) {
        DurbinWatsonResult original = DurbinWatson.test(LeastSquares.fit(trend(y.length), y), 0.05);
        DurbinWatsonResult other = DurbinWatson.test(LeastSquares.fit(trend(y.length), transformed), 0.05);
        assertEquals(original.statistic(), other.statistic(), INVARIANCE * original.statistic());
        assertEquals(original.pValuePositive(), other.pValuePositive(), P_INVARIANCE);
    }

    @Test
    void detects_positive_serial_correlation_in_a_trend_with_ar1_errors() {
        // Seeded AR(1) errors with phi = 0.8, n = 100: d is about 2(1 - 0.8) = 0.4, far below the
        // 5% dL of 1.654 (Stanford table, n = 100, k' = 1), so any seed gives this verdict.
        DurbinWatsonResult result = DurbinWatson.test(LeastSquares.fit(trend(100), trendWithAr1(100, 0.8)), 0.05);
        assertEquals(DurbinWatsonVerdict.POSITIVE_SERIAL_CORRELATION, result.verdict());
        assertEquals(DurbinWatsonBoundsVerdict.REJECT, result.boundsVerdictPositive());
        assertTrue(result.pValuePositive() < 1e-6);
        assertTrue(result.reading().contains("standard errors are too small"), result.reading());
        assertTrue(result.reading().contains("AR model"), result.reading());
    }

    @Test
    void detects_negative_serial_correlation_in_a_trend_with_alternating_errors() {
        // phi = -0.8: d is about 3.6, so 4 - d lies far below dL (any seed)
        DurbinWatsonResult result = DurbinWatson.test(LeastSquares.fit(trend(100), trendWithAr1(100, -0.8)), 0.05);
        assertEquals(DurbinWatsonVerdict.NEGATIVE_SERIAL_CORRELATION, result.verdict());
        assertEquals(DurbinWatsonBoundsVerdict.REJECT, result.boundsVerdictNegative());
        assertTrue(result.pValueNegative() < 1e-6);
    }

    @Test
    void reports_the_bounds_at_five_and_one_percent_and_at_the_chosen_level() {
        DurbinWatsonResult result = DurbinWatson.test(LeastSquares.fit(trend(50), trendWithAr1(50, 0.3)), 0.10);
        // Cummins (Stanford), n = 50, k' = 1: 5% dL 1.5034 (truncated), dU 1.58486; 1% dL 1.3244, dU 1.40313
        assertEquals(1.5034, result.boundsAtFivePercent().orElseThrow().lower(), 1e-4);
        assertEquals(1.58486, result.boundsAtFivePercent().orElseThrow().upper(), 2e-5);
        assertEquals(1.3244, result.boundsAtOnePercent().orElseThrow().lower(), 1e-4);
        assertEquals(1.40313, result.boundsAtOnePercent().orElseThrow().upper(), 2e-5);
        assertEquals(0.10, result.boundsAtLevel().orElseThrow().level());
        assertEquals(1, result.regressorsExcludingConstant());
    }

    @Test
    void flags_a_statistic_between_the_bounds_as_inconclusive_by_the_bounds() {
        // Residuals close to cos(w t) have d close to 2(1 - cos w); w is chosen to land between the
        // 5% bounds for n = 50, k' = 1 (Cummins, Stanford: 1.5034 and 1.58486), which is checked first.
        int n = 50;
        double[] y = new double[n];
        for (int t = 0; t < n; t++) {
            y[t] = Math.cos(1.365 * t);
        }
        DurbinWatsonResult result = DurbinWatson.test(LeastSquares.fit(trend(n), y), 0.05);
        DurbinWatsonBounds bounds = result.boundsAtFivePercent().orElseThrow();
        assertTrue(result.statistic() > bounds.lower() && result.statistic() < bounds.upper(), "d = " + result.statistic());
        assertEquals(DurbinWatsonBoundsVerdict.INCONCLUSIVE, result.boundsVerdictPositive());
        assertTrue(result.inconclusiveByBounds());
        assertEquals("inconclusive by the bounds", result.boundsNote());
        assertTrue(result.reading().contains("inconclusive by the bounds"), result.reading());
        // the verdict follows the exact p-value, whichever way it falls
        assertEquals(result.pValuePositive() < 0.05, result.verdict() == DurbinWatsonVerdict.POSITIVE_SERIAL_CORRELATION);
    }

    @Test
    void without_an_intercept_reports_the_exact_p_value_and_no_bounds() {
        Design noIntercept = new Design(List.of(trend(40).column(1)), List.of("t"), false);
        double[] y = trendWithAr1(40, 0.0);
        DurbinWatsonResult result = DurbinWatson.test(LeastSquares.fit(noIntercept, y), 0.05);
        assertFalse(result.interceptIncluded());
        assertTrue(result.boundsAtFivePercent().isEmpty() && result.boundsAtOnePercent().isEmpty()
                && result.boundsAtLevel().isEmpty());
        assertEquals(DurbinWatsonBoundsVerdict.NOT_APPLICABLE, result.boundsVerdictPositive());
        assertEquals(DurbinWatsonBoundsVerdict.NOT_APPLICABLE, result.boundsVerdictNegative());
        assertFalse(result.inconclusiveByBounds());
        assertTrue(result.boundsNote().startsWith("bounds not applicable"));
        double exact = DurbinWatsonDistribution.forDesign(noIntercept).probabilityAtMost(result.statistic());
        assertEquals(exact, result.pValuePositive(), 0);
        assertTrue(result.reading().contains("do not apply without an intercept"), result.reading());
    }

    @Test
    void a_full_set_of_seasonal_dummies_counts_as_an_intercept() {
        // Four quarterly dummies add up to the constant, so the bounds hold with k' = k - 1 = 3.
        int n = 40;
        List<double[]> columns = new ArrayList<>();
        for (int quarter = 0; quarter < 4; quarter++) {
            double[] dummy = new double[n];
            for (int t = quarter; t < n; t += 4) {
                dummy[t] = 1;
            }
            columns.add(dummy);
        }
        Design design = new Design(columns, List.of("q1", "q2", "q3", "q4"), false);
        DurbinWatsonResult result = DurbinWatson.test(LeastSquares.fit(design, trendWithAr1(n, 0.2)), 0.05);
        assertTrue(result.interceptIncluded());
        assertEquals(3, result.regressorsExcludingConstant());
        assertEquals(3, result.boundsAtFivePercent().orElseThrow().regressorsExcludingConstant());
    }

    @Test
    void maps_to_the_common_test_result() {
        DurbinWatsonResult result = DurbinWatson.test(LeastSquares.fit(trend(60), trendWithAr1(60, 0.7)), 0.05);
        TestResult common = result.toTestResult();
        assertEquals(result.statistic(), common.statistic());
        assertEquals(Math.min(result.pValuePositive(), result.pValueNegative()), common.pValue());
        assertEquals(result.verdict() != DurbinWatsonVerdict.NONE_DETECTED, common.decision() == Decision.REJECT);
        assertEquals(result.reading(), common.reading());
        assertEquals(0.05, common.level());
    }

    @Test
    void refuses_an_exact_fit() {
        double[] y = new double[20];
        for (int t = 0; t < y.length; t++) {
            y[t] = 3 + 2 * (t + 1);
        }
        OlsFit fit = LeastSquares.fit(trend(20), y);
        InvalidSpecificationException e = assertThrows(InvalidSpecificationException.class,
                () -> DurbinWatson.test(fit, 0.05));
        assertTrue(e.getMessage().contains("exact"), e.getMessage());
    }

    @Test
    void refuses_fewer_than_four_residual_degrees_of_freedom() {
        OlsFit fit = LeastSquares.fit(trend(5), new double[] {1, 3, 2, 5, 4});
        assertThrows(InsufficientDataException.class, () -> DurbinWatson.test(fit, 0.05));
    }

    @Test
    void refuses_a_level_of_one_half_or_more() {
        OlsFit fit = LeastSquares.fit(trend(30), trendWithAr1(30, 0.1));
        assertThrows(InvalidSpecificationException.class, () -> DurbinWatson.test(fit, 0.5));
        assertThrows(InvalidSpecificationException.class, () -> DurbinWatson.test(fit, 0));
    }

    private static Gen<double[]> series() {
        return arrays().ofClass(doubles().between(-100, 100), Double.class).withLengthBetween(8, 40)
                .map(values -> Arrays.stream(values).mapToDouble(Double::doubleValue).toArray());
    }

    /**
     * True unless constant + t fits the series exactly to rounding: the residual norm must exceed
     * 1e-9 of the norm of y (a margin of four orders over the test's own 1e-13 relative cut-off, so
     * a series near that cut-off, such as a constant one, never enters the property).
     */
    private static boolean notExact(double[] y) {
        OlsFit fit = LeastSquares.fit(trend(y.length), y);
        double yNorm = Math.sqrt(Arrays.stream(y).map(v -> v * v).sum());
        return Math.sqrt(fit.residualSumOfSquares()) > 1e-9 * yNorm;
    }

    private static Design trend(int n) {
        return DurbinWatsonDistributionTest.trend(n, 1);
    }

    private static double[] normal(int n, Random random) {
        double[] values = new double[n];
        for (int t = 0; t < n; t++) {
            values[t] = random.nextGaussian();
        }
        return values;
    }

    /** y_t = 10 + 0.5 t + u_t with u_t = phi u_{t-1} + N(0, 1), seeded. */
    private static double[] trendWithAr1(int n, double phi) {
        Random random = new Random(SEED + n);
        double[] y = new double[n];
        double u = 0;
        for (int t = 0; t < n; t++) {
            u = phi * u + random.nextGaussian();
            y[t] = 10 + 0.5 * (t + 1) + u;
        }
        return y;
    }
}
