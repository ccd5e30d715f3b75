package org.trendwright.core.regression;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.RankDeficientDesignException;

/** Cases of {@link LeastSquares#fit} with answers known in closed form. */
class LeastSquaresTest {

    @Test
    void names_the_fourth_quarter_when_all_four_quarterly_dummies_join_an_intercept() {
        // The dummy-variable trap (common practice): q1 + q2 + q3 + q4 = the intercept column.
        List<double[]> columns = new ArrayList<>();
        columns.add(RandomRegression.constant(12, 1.0));
        for (int quarter = 0; quarter < 4; quarter++) {
            double[] dummy = new double[12];
            for (int i = quarter; i < 12; i += 4) {
                dummy[i] = 1;
            }
            columns.add(dummy);
        }
        Design design = new Design(columns, List.of("intercept", "q1", "q2", "q3", "q4"), true);
        RankDeficientDesignException refusal = assertThrows(RankDeficientDesignException.class,
                () -> LeastSquares.fit(design, line(12, 1, 1)));
        assertTrue(refusal.getMessage().startsWith("Regressor 'q4' is (numerically) a linear combination"),
                refusal.getMessage());
    }

    @Test
    void refuses_a_regressor_that_is_zero_in_every_row() {
        Design design = new Design(List.of(RandomRegression.constant(5, 1.0), new double[5]),
                List.of("intercept", "promotion"), true);
        RankDeficientDesignException refusal = assertThrows(RankDeficientDesignException.class,
                () -> LeastSquares.fit(design, line(5, 1, 2)));
        assertTrue(refusal.getMessage().contains("'promotion' is zero in every row"), refusal.getMessage());
    }

    @Test
    void refuses_a_response_value_that_is_not_finite() {
        double[] y = line(5, 1, 2);
        y[3] = Double.NaN;
        InvalidSpecificationException refusal = assertThrows(InvalidSpecificationException.class,
                () -> LeastSquares.fit(trend(5), y));
        assertTrue(refusal.getMessage().startsWith("Response value 4 is NaN"), refusal.getMessage());
    }

    @Test
    void refuses_a_regressor_value_that_is_not_finite() {
        double[] t = line(5, 0, 1);
        t[0] = Double.POSITIVE_INFINITY;
        Design design = new Design(List.of(RandomRegression.constant(5, 1.0), t), List.of("intercept", "t"), true);
        InvalidSpecificationException refusal = assertThrows(InvalidSpecificationException.class,
                () -> LeastSquares.fit(design, line(5, 1, 2)));
        assertTrue(refusal.getMessage().startsWith("Regressor 't' row 1 is Infinity"), refusal.getMessage());
    }

    @Test
    void refuses_a_response_of_the_wrong_length() {
        assertThrows(InvalidSpecificationException.class, () -> LeastSquares.fit(trend(5), line(4, 1, 2)));
    }

    @Test
    void an_exact_straight_line_has_zero_residuals_and_zero_standard_errors() {
        // y = 2 + 3t exactly: the conventions OlsFit documents for an exact fit.
        OlsFit fit = LeastSquares.fit(trend(10), line(10, 2, 3));
        assertArrayEquals(new double[] {2, 3}, fit.estimates());
        assertArrayEquals(new double[10], fit.residuals());
        assertEquals(0, fit.residualSumOfSquares());
        assertEquals(0, fit.coefficient("t").standardError());
        assertEquals(Double.POSITIVE_INFINITY, fit.coefficient("t").tStatistic());
        assertEquals(Double.POSITIVE_INFINITY, fit.fStatistic());
        assertEquals(1, fit.rSquared());
    }

    @Test
    void an_intercept_only_model_estimates_the_mean_with_standard_error_s_over_root_n() {
        // Common practice: b = mean(y), se = s / sqrt(n), R^2 = 0, no F test.
        double[] y = {3, 8, 1, 9, 4};
        Design design = new Design(List.of(RandomRegression.constant(5, 1.0)), List.of("intercept"), true);
        OlsFit fit = LeastSquares.fit(design, y);
        double mean = 5;
        double s = Math.sqrt((4 + 9 + 16 + 16 + 1) / 4.0);
        assertEquals(mean, fit.estimates()[0], 1e-15 * mean, "mean, to rounding");
        assertEquals(s / Math.sqrt(5), fit.coefficient("intercept").standardError(), 1e-15 * s, "to rounding");
        assertEquals(0, fit.rSquared(), 1e-16, "no explained variation, to rounding");
        assertTrue(Double.isNaN(fit.fStatistic()));
    }

    @Test
    void reports_the_condition_number_of_two_columns_at_a_known_angle_whatever_their_scale() {
        // Unit columns u, v with u'v = c have singular values sqrt(1 + c) and sqrt(1 - c)
        // (common practice): here c = 1/2, so cond = sqrt(3). Scaling a column changes nothing.
        double[] u = {1, 1, 1, 1};
        double[] v = {1000, 1000, 1000, -1000};
        Design design = new Design(List.of(u, v), List.of("u", "v"), false);
        OlsFit fit = LeastSquares.fit(design, line(4, 1, 1));
        assertEquals(Math.sqrt(3), fit.conditionNumber(), 1e-14, "to rounding");
    }

    /** Intercept and t = 1..n. */
    private static Design trend(int n) {
        return new Design(List.of(RandomRegression.constant(n, 1.0), line(n, 0, 1)), List.of("intercept", "t"), true);
    }

    /** a + b t for t = 1..n. */
    private static double[] line(int n, double a, double b) {
        double[] values = new double[n];
        for (int i = 0; i < n; i++) {
            values[i] = a + b * (i + 1);
        }
        return values;
    }
}
