package org.trendwright.core.breaks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.apache.commons.math3.distribution.FDistribution;
import org.apache.commons.math3.special.Beta;
import org.junit.jupiter.api.Test;
import org.trendwright.core.Decision;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.RankDeficientDesignException;
import org.trendwright.core.TestResult;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;

/** The Chow (1960) test: its formula, its exact size under normal errors and its power. */
class ChowTests {

    @Test
    void statistic_equals_the_formula_from_three_separate_least_squares_fits() {
        int n = 40;
        int m = 17;
        Design design = BreakSeries.trend(n);
        double[] y = BreakSeries.shiftedTrend(n, 25, 0.8, new SplittableRandom(1));
        double pooled = LeastSquares.fit(design, y).residualSumOfSquares();
        double first = LeastSquares.fit(design.rowRange(0, m), Arrays.copyOfRange(y, 0, m)).residualSumOfSquares();
        double second = LeastSquares.fit(design.rowRange(m, n), Arrays.copyOfRange(y, m, n)).residualSumOfSquares();
        // Chow (1960), Econometrica 28: F = ((RSS_p - RSS_1 - RSS_2)/k) / ((RSS_1 + RSS_2)/(n - 2k)).
        double expected = ((pooled - first - second) / 2) / ((first + second) / (n - 4));
        TestResult result = ChowTest.test(design, y, m, 0.05);
        // Same three fits, same arithmetic: agreement to rounding.
        assertEquals(expected, result.statistic(), 1e-12 * expected);
        assertEquals(List.of(2.0, 36.0), result.degreesOfFreedom());
        // The p-value's incomplete-beta form against Commons Math's F distribution: 1e-10 covers the
        // latter's cumulative-probability accuracy.
        assertEquals(1 - new FDistribution(2, 36).cumulativeProbability(expected), result.pValue(), 1e-10);
    }

    @Test
    void rejects_at_its_level_without_a_break_and_with_the_power_the_noncentral_f_predicts() {
        int n = 60;
        int m = 30;
        double shift = 1.5;
        Design design = BreakSeries.trend(n);
        SplittableRandom random = new SplittableRandom(20250603);
        int replications = 1500;
        int falseAlarms = 0;
        int detections = 0;
        for (int r = 0; r < replications; r++) {
            double[] y = BreakSeries.shiftedTrend(n, m, 0, random);
            double[] shifted = y.clone();
            for (int t = m; t < n; t++) {
                shifted[t] += shift;
            }
            falseAlarms += ChowTest.test(design, y, m, 0.05).rejected() ? 1 : 0;
            detections += ChowTest.test(design, shifted, m, 0.05).rejected() ? 1 : 0;
        }
        // Under independent normal errors F is exactly F(2, 56) (Chow 1960), so the rejection rate is
        // 5% up to Monte Carlo error: sd sqrt(0.05 * 0.95 / 1500) = 0.0056; tolerance 3.5 sd.
        assertEquals(0.05, falseAlarms / (double) replications, 0.02);
        // Under the shift F is noncentral F(2, 56, lambda), lambda = the pooled RSS of the noise-free mean
        // (whose segment fits are exact) over sigma^2 = 1 (Scheffe 1959, The Analysis of Variance, ch. 2).
        double[] mean = new double[n];
        for (int t = 1; t <= n; t++) {
            mean[t - 1] = 1 + 0.1 * t + (t > m ? shift : 0);
        }
        double lambda = LeastSquares.fit(design, mean).residualSumOfSquares();
        double power = noncentralFPower(2, n - 4, lambda, new FDistribution(2, n - 4).inverseCumulativeProbability(0.95));
        // Binomial sd at power ~0.7 over 1500 series: 0.0118; tolerance 3.5 sd.
        assertEquals(power, detections / (double) replications, 0.04);
    }

    @Test
    void reading_names_the_break_row_and_what_to_do() {
        int n = 60;
        double[] y = BreakSeries.shiftedTrend(n, 30, 4, new SplittableRandom(2));
        TestResult result = ChowTest.test(BreakSeries.trend(n), y, 30, 0.05);
        assertEquals(Decision.REJECT, result.decision());
        assertTrue(result.reading().contains("after row 30"), result.reading());
        assertTrue(result.reading().contains("break dummy"), result.reading());
    }

    @Test
    void refuses_a_break_that_leaves_k_or_fewer_rows_on_one_side() {
        Design design = BreakSeries.trend(20);
        double[] y = BreakSeries.shiftedTrend(20, 10, 0, new SplittableRandom(3));
        InvalidSpecificationException early = assertThrows(InvalidSpecificationException.class,
                () -> ChowTest.test(design, y, 2, 0.05));
        assertTrue(early.getMessage().contains("between 3"), early.getMessage());
        assertTrue(early.getMessage().contains("and 17"), early.getMessage());
        assertThrows(InvalidSpecificationException.class, () -> ChowTest.test(design, y, 18, 0.05));
        assertThrows(InsufficientDataException.class,
                () -> ChowTest.test(BreakSeries.trend(5), Arrays.copyOf(y, 5), 3, 0.05));
    }

    @Test
    void names_the_segment_whose_regressors_are_dependent() {
        int n = 40;
        double[] step = new double[n];
        for (int t = 20; t < n; t++) {
            step[t] = 1;
        }
        Design design = BreakSeries.trend(n).withColumns(List.of(step), List.of("after 20"));
        double[] y = BreakSeries.shiftedTrend(n, 20, 1, new SplittableRandom(4));
        RankDeficientDesignException e = assertThrows(RankDeficientDesignException.class,
                () -> ChowTest.test(design, y, 20, 0.05));
        assertTrue(e.getMessage().contains("rows 1 to 20"), e.getMessage());
    }

    /**
     * P(F'(d1, d2, lambda) > c) as a Poisson(lambda/2) mixture of central tails (Tang 1938,
     * Statistical Research Memoirs 2): sum_j w_j I_{d2/(d2 + d1 c)}(d2/2, d1/2 + j).
     */
    static double noncentralFPower(int d1, int d2, double lambda, double c) {
        double x = d2 / (d2 + d1 * c);
        double weight = Math.exp(-lambda / 2);
        double power = 0;
        for (int j = 0; j < 500 && (j < lambda || weight > 1e-16); j++) {
            power += weight * Beta.regularizedBeta(x, d2 / 2.0, d1 / 2.0 + j);
            weight *= lambda / 2 / (j + 1);
        }
        return power;
    }
}
