package org.trendwright.core;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.distribution.TDistribution;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Remembered t quantiles against a printed t table and against Commons Math computing afresh. */
class StudentTTest {

    @ParameterizedTest
    @CsvSource({"1, 12.706", "2, 4.303", "5, 2.571", "10, 2.228", "30, 2.042", "120, 1.980"})
    void two_sided_95_percent_points_match_the_printed_table(int df, double printed) {
        // Upper 2.5% points of Student's t, as printed to three decimals in the t tables of statistics
        // handbooks (from memory; e.g. Fisher & Yates, Statistical Tables, table III).
        assertEquals(printed, StudentT.quantile(df, 0.975), 0.0005);
        assertEquals(-printed, StudentT.quantile(df, 0.025), 0.0005);
    }

    @Test
    void a_remembered_quantile_is_bit_for_bit_the_one_commons_math_computes() {
        for (int df = 1; df <= 300; df += 7) {
            for (double p : new double[] {0.9, 0.95, 0.975, 0.995}) {
                double fresh = new TDistribution(null, df).inverseCumulativeProbability(p);
                assertEquals(fresh, StudentT.quantile(df, p), 0.0);
                assertEquals(fresh, StudentT.quantile(df, p), 0.0, "asked a second time");
            }
        }
    }
}
