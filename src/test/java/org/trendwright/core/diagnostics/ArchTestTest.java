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

class ArchTestTest {

    /**
     * Engle (1982): e_t^2 on a constant and e_{t-1}^2..e_{t-q}^2 over t = q+1..n, built here
     * independently from the unscaled squares.
     */
    private static OlsFit auxiliary(double[] e, int order) {
        int rows = e.length - order;
        double[] response = new double[rows];
        double[] ones = new double[rows];
        List<double[]> columns = new ArrayList<>(List.of(ones));
        List<String> names = new ArrayList<>(List.of("constant"));
        for (int j = 1; j <= order; j++) {
            columns.add(new double[rows]);
            names.add("e^2(t-" + j + ")");
        }
        for (int t = order; t < e.length; t++) {
            response[t - order] = e[t] * e[t];
            ones[t - order] = 1;
            for (int j = 1; j <= order; j++) {
                columns.get(j)[t - order] = e[t - j] * e[t - j];
            }
        }
        return LeastSquares.fit(new Design(columns, names, true), response);
    }

    @Test
    void lm_equals_t_times_the_auxiliary_r_squared_over_n_minus_q_rows() {
        double[] e = SimulatedTrend.fit(SimulatedTrend.arch(new Well19937c(21), 80, 0.4)).residuals();
        int order = 3;
        OlsFit direct = auxiliary(e, order);
        ArchTestResult result = ArchTest.test(e, order, 0.05);
        // The implementation squares e / max|e|, this check squares e itself: same R^2 up to
        // rounding of a well-conditioned 4-column regression, hence 1e-9 relative.
        assertAll(
                () -> assertEquals(77, result.observations()),
                () -> assertEquals(direct.rSquared(), result.auxiliaryRSquared(), 1e-9 * direct.rSquared()),
                () -> assertEquals(77 * direct.rSquared(), result.statistic(), 1e-9 * result.statistic()),
                () -> assertEquals(List.of(3.0), result.test().degreesOfFreedom()));
    }

    @Test
    void p_value_of_order_two_is_the_exact_chi_square_tail() {
        double[] e = SimulatedTrend.whiteNoise(new Well19937c(22), 50);
        ArchTestResult result = ArchTest.test(e, 2, 0.05);
        // Common practice: the chi-square(2) upper tail is exp(-x/2).
        assertEquals(Math.exp(-result.statistic() / 2), result.pValue(), 1e-14);
    }

    @Test
    void reading_speaks_of_interval_width_when_errors_cluster() {
        double[] e = SimulatedTrend.fit(SimulatedTrend.arch(new Well19937c(23), 500, 0.5)).residuals();
        ArchTestResult result = ArchTest.test(e, 1, 0.05);
        assertTrue(result.test().rejected());
        assertTrue(result.test().reading().contains("prediction interval"), result.test().reading());
    }

    @Test
    void refuses_a_series_too_short_for_the_order() {
        // q = 2 needs 2q + 2 = 6 residuals: 4 rows for 3 coefficients.
        ArchTest.test(new double[] {1, -2, 0.5, 3, -1, 2}, 2, 0.05);
        InsufficientDataException e = assertThrows(InsufficientDataException.class,
                () -> ArchTest.test(new double[] {1, -2, 0.5, 3, -1}, 2, 0.05));
        assertTrue(e.getMessage().contains("at least 6 residuals"), e.getMessage());
    }

    @Test
    void refuses_squared_residuals_without_variation() {
        double[] alternating = {1, -1, 1, -1, 1, -1, 1, -1};
        InvalidSpecificationException e = assertThrows(InvalidSpecificationException.class,
                () -> ArchTest.test(alternating, 1, 0.05));
        assertTrue(e.getMessage().contains("all equal"), e.getMessage());
    }

    @Test
    void refuses_an_order_below_one_and_all_zero_residuals() {
        assertThrows(InvalidSpecificationException.class, () -> ArchTest.test(new double[] {1, 2, 3, 4}, 0, 0.05));
        assertThrows(InvalidSpecificationException.class, () -> ArchTest.test(new double[6], 1, 0.05));
    }

    @Test
    void squares_of_very_large_residuals_do_not_overflow() {
        double[] e = SimulatedTrend.whiteNoise(new Well19937c(24), 40);
        double[] huge = new double[e.length];
        for (int t = 0; t < e.length; t++) {
            huge[t] = e[t] * 1e200; // e_t^2 would be ~1e400, beyond double range
        }
        // R^2 is scale-free; the scaled computation keeps it so (rounding only, hence 1e-9).
        double expected = ArchTest.test(e, 1, 0.05).statistic();
        assertEquals(expected, ArchTest.test(huge, 1, 0.05).statistic(), 1e-9 * Math.max(1, expected));
    }
}
