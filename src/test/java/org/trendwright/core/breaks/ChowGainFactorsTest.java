package org.trendwright.core.breaks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.RankDeficientDesignException;
import org.trendwright.core.regression.Design;

/**
 * The fast sup F of the null simulation against Chow's (1960) definition: three least-squares fits
 * per candidate row ({@link ChowTest#statistic}), maximised over the same rows.
 */
class ChowGainFactorsTest {

    @Test
    void sup_f_from_the_factors_equals_the_largest_chow_statistic_on_trend_designs() {
        SplittableRandom random = new SplittableRandom(31);
        List<Design> designs = List.of(BreakSeries.trend(60), SupFNullDistributionTest.polynomialTrend(200, 2),
                monthlyTrend(120), BreakSeries.constantAndNoise(100, random));
        for (Design design : designs) {
            ChowGainFactors factors = ChowGainFactors.of(design);
            int n = design.rows();
            double[] y = BreakSeries.shiftedTrend(n, n / 3, 1, random);
            double largest = 0;
            for (int m = BreakCandidates.first(n); m <= BreakCandidates.last(n); m++) {
                largest = Math.max(largest, ChowTest.statistic(design, y, m));
            }
            // Both routes are backward stable; the quadratic trend's scaled condition number (~1e3)
            // and the monthly design's 13 columns put the agreement at 1e-11 or better, so 1e-9.
            assertEquals(largest, factors.supF(y), 1e-9 * largest, design.toString());
        }
    }

    @Test
    void names_a_regressor_that_repeats_another_over_the_whole_sample() {
        Design design = BreakSeries.trend(50).withColumns(List.of(BreakSeries.trend(50).column(1)), List.of("t again"));
        RankDeficientDesignException e = assertThrows(RankDeficientDesignException.class,
                () -> ChowGainFactors.of(design));
        assertTrue(e.getMessage().contains("'t again'"), e.getMessage());
    }

    @Test
    void refuses_a_non_finite_regressor() {
        double[] x = new double[50];
        x[7] = Double.NaN;
        Design design = BreakSeries.trend(50).withColumns(List.of(x), List.of("x"));
        InvalidSpecificationException e = assertThrows(InvalidSpecificationException.class,
                () -> ChowGainFactors.of(design));
        assertTrue(e.getMessage().contains("'x' row 8"), e.getMessage());
    }

    /** Constant, t and dummies for months 2 to 12. */
    private static Design monthlyTrend(int n) {
        List<double[]> dummies = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int month = 1; month < 12; month++) {
            double[] dummy = new double[n];
            for (int t = month; t < n; t += 12) {
                dummy[t] = 1;
            }
            dummies.add(dummy);
            names.add("month " + (month + 1));
        }
        return BreakSeries.trend(n).withColumns(dummies, names);
    }
}
