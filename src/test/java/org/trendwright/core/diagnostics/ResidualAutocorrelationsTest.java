package org.trendwright.core.diagnostics;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;

class ResidualAutocorrelationsTest {

    // e = (1, -1, 2, 0, -2); sum e^2 = 10.
    private static final double[] SHORT = {1, -1, 2, 0, -2};

    @Test
    void computes_the_first_autocorrelations_of_a_short_vector_as_by_hand() {
        Correlogram c = ResidualAutocorrelations.compute(SHORT, 2);
        // Common practice, worked by hand: lag 1 sum (-1)(1) + (2)(-1) + (0)(2) + (-2)(0) = -3, so
        // r_1 = -3/10; lag 2 sum (2)(1) + (0)(-1) + (-2)(2) = -2, so r_2 = -2/10. Exact up to one
        // rounding of each quotient, hence 1e-15.
        assertAll(
                () -> assertEquals(-0.3, c.at(1), 1e-15),
                () -> assertEquals(-0.2, c.at(2), 1e-15),
                () -> assertEquals(2, c.maxLag()),
                () -> assertEquals(5, c.observations()));
    }

    @Test
    void reports_the_white_noise_standard_error_t_statistics_and_chart_band() {
        Correlogram c = ResidualAutocorrelations.compute(SHORT, 2);
        double root5 = Math.sqrt(5);
        // Bartlett (1946), Box & Jenkins (1970): se(r_k) = 1/sqrt(n) under white noise; band +-2/sqrt(n).
        assertAll(
                () -> assertEquals(1 / root5, c.standardError(), 1e-15),
                () -> assertEquals(-0.3 * root5, c.tStatistics()[0], 1e-14),
                () -> assertEquals(-0.2 * root5, c.tStatistics()[1], 1e-14),
                () -> assertEquals(2 / root5, c.bandHalfWidth(), 1e-15),
                () -> assertFalse(c.outsideBand(1), "|r_1| = 0.3 lies inside 2/sqrt(5) = 0.894"));
    }

    @Test
    void flags_an_autocorrelation_outside_the_band() {
        // An alternating series has r_1 = -(n-1)/n = -0.9 at n = 10, far beyond 2/sqrt(10) = 0.632.
        double[] alternating = {1, -1, 1, -1, 1, -1, 1, -1, 1, -1};
        Correlogram c = ResidualAutocorrelations.compute(alternating, 1);
        assertEquals(-0.9, c.at(1), 1e-15); // common practice: 9 products of -1 over a sum of squares of 10
        assertTrue(c.outsideBand(1));
    }

    @Test
    void sampling_spread_of_r1_under_white_noise_matches_one_over_root_n() {
        // Bartlett (1946): under white noise sd(r_k) is about 1/sqrt(n) = 0.1 at n = 100. For iid
        // normal noise the exact E[r_1^2] of the uncentred r_1 is (n - 1)/(n(n + 2)), sd 0.0985: r_1 =
        // e'Ae/e'e is independent of e'e, so E[r_1^2] = E[(e'Ae)^2]/E[(e'e)^2] = (n - 1)/(n(n + 2))
        // (derived; the same moment as Moran 1948). With 2,000 seeded replications the sample SD has
        // relative Monte-Carlo error 1/sqrt(2 x 2000) = 1.6%, so 5% is three of those.
        Well19937c random = new Well19937c(20240601L);
        int n = 100;
        int replications = 2000;
        double sum = 0;
        double sumOfSquares = 0;
        for (int r = 0; r < replications; r++) {
            double r1 = ResidualAutocorrelations.compute(SimulatedTrend.whiteNoise(random, n), 1).at(1);
            sum += r1;
            sumOfSquares += r1 * r1;
        }
        double sd = Math.sqrt((sumOfSquares - sum * sum / replications) / (replications - 1));
        double exact = Math.sqrt((n - 1.0) / (n * (n + 2.0)));
        assertEquals(exact, sd, 0.05 * exact);
        assertEquals(1 / Math.sqrt(n), exact, 0.02 * exact, "the 1/sqrt(n) convention is within 2% of the exact value");
    }

    @Test
    void refuses_a_lag_the_series_is_too_short_for() {
        InsufficientDataException e = assertThrows(InsufficientDataException.class,
                () -> ResidualAutocorrelations.compute(SHORT, 5));
        assertTrue(e.getMessage().contains("at least 6 residuals"), e.getMessage());
    }

    @Test
    void refuses_a_lag_below_one() {
        assertThrows(InvalidSpecificationException.class, () -> ResidualAutocorrelations.compute(SHORT, 0));
    }

    @Test
    void refuses_residuals_of_an_exact_fit() {
        InvalidSpecificationException e = assertThrows(InvalidSpecificationException.class,
                () -> ResidualAutocorrelations.compute(new double[] {0, 0, 0, 0}, 1));
        assertTrue(e.getMessage().contains("fits the series exactly"), e.getMessage());
    }

    @Test
    void refuses_a_non_finite_residual() {
        assertThrows(InvalidSpecificationException.class,
                () -> ResidualAutocorrelations.compute(new double[] {1, Double.NaN, 2}, 1));
    }

    @Test
    void returns_copies_so_the_result_cannot_be_changed() {
        Correlogram c = ResidualAutocorrelations.compute(SHORT, 2);
        c.autocorrelations()[0] = 99;
        c.tStatistics()[0] = 99;
        assertEquals(-0.3, c.at(1), 1e-15);
        assertEquals(-0.3 * Math.sqrt(5), c.tStatistics()[0], 1e-14);
    }
}
