package org.trendwright.core.diagnostics;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;

class LjungBoxTest {

    private static final double[] SHORT = {1, -1, 2, 0, -2};

    @Test
    void statistic_equals_its_formula_for_given_autocorrelations() {
        // Ljung & Box (1978): Q = n(n+2) sum r_k^2/(n-k). By hand for r = (-0.3, -0.2), n = 5:
        // 35 (0.09/4 + 0.04/3) = 35 x 0.0358333... = 1.2541666...
        assertEquals(1.2541666666666667, LjungBox.statistic(new double[] {-0.3, -0.2}, 5), 1e-14);
    }

    @Test
    void test_on_residuals_uses_their_autocorrelations_and_the_chi_square_tail() {
        LjungBoxResult result = LjungBox.test(SHORT, 2, 0.05);
        double q = 1.2541666666666667; // r_1 = -0.3, r_2 = -0.2 by hand (see ResidualAutocorrelationsTest)
        // Common practice: the chi-square(2) upper tail is exactly exp(-x/2), independent of the
        // incomplete-gamma code. Tolerances: a few roundings of quantities of order 1.
        assertAll(
                () -> assertEquals(q, result.statistic(), 1e-14),
                () -> assertEquals(Math.exp(-q / 2), result.pValue(), 1e-14),
                () -> assertEquals(List.of(2.0), result.test().degreesOfFreedom()),
                () -> assertEquals("chi-square", result.test().distribution()),
                () -> assertEquals(-0.3, result.correlogram().at(1), 1e-15));
    }

    @Test
    void subtracts_fitted_arma_parameters_from_the_degrees_of_freedom() {
        double[] e = SimulatedTrend.whiteNoise(new Well19937c(7), 60);
        LjungBoxResult plain = LjungBox.test(e, 6, 0.05);
        LjungBoxResult afterAr2 = LjungBox.test(e, 6, 2, 0.05);
        assertAll(
                () -> assertEquals(plain.statistic(), afterAr2.statistic(), 0.0, "Q itself does not change"),
                () -> assertEquals(List.of(4.0), afterAr2.test().degreesOfFreedom()),
                () -> assertTrue(afterAr2.pValue() < plain.pValue(),
                        "fewer degrees of freedom make the same Q more significant"));
    }

    @ParameterizedTest(name = "n = {0}, {1} periods per year: {2} lags")
    @CsvSource({
        // Hyndman & Athanasopoulos (2018), section 3.3 (from memory): h = 10 non-seasonal, 2m seasonal,
        // at most T/5.
        "100, 1, 10",
        "30,  1, 6",
        "100, 4, 8",
        "100, 12, 20",
        "240, 12, 24",
        "5,   1, 1",
    })
    void default_lags_follow_the_stated_rule(int n, int periodsPerYear, int expected) {
        assertEquals(expected, LjungBox.defaultLags(n, periodsPerYear));
    }

    @Test
    void default_lag_test_states_its_rule() {
        double[] e = SimulatedTrend.whiteNoise(new Well19937c(3), 100);
        LjungBoxResult result = LjungBox.testWithDefaultLags(e, 12, 0, 0.05);
        assertEquals(20, result.lags());
        assertTrue(result.lagRule().contains("n/5"), result.lagRule());
    }

    @Test
    void refuses_the_default_rule_below_five_residuals() {
        InsufficientDataException e = assertThrows(InsufficientDataException.class,
                () -> LjungBox.testWithDefaultLags(new double[] {1, -1, 2, 0}, 1, 0, 0.05));
        assertTrue(e.getMessage().contains("at least 5"), e.getMessage());
    }

    @Test
    void refuses_as_many_fitted_parameters_as_lags() {
        assertThrows(InvalidSpecificationException.class, () -> LjungBox.test(SHORT, 2, 2, 0.05));
        assertThrows(InvalidSpecificationException.class, () -> LjungBox.test(SHORT, 2, -1, 0.05));
    }

    @Test
    void refuses_more_lags_than_the_residuals_allow() {
        assertThrows(InsufficientDataException.class, () -> LjungBox.test(SHORT, 5, 0.05));
        assertThrows(InvalidSpecificationException.class, () -> LjungBox.statistic(new double[5], 5));
    }

    @Test
    void refuses_a_level_outside_zero_and_one() {
        assertThrows(InvalidSpecificationException.class, () -> LjungBox.test(SHORT, 1, 1.5));
    }
}
