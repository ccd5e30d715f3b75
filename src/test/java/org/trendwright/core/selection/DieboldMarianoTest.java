package org.trendwright.core.selection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.trendwright.core.TestResult;

class DieboldMarianoTest {

    /**
     * For one-step errors the Harvey-Leybourne-Newbold (1997) corrected statistic reduces to the
     * one-sample t statistic of the loss differentials, mean(d) / (s_d / sqrt(T)) with s_d the
     * sample standard deviation (HLN 1997, section 2; follows from the correction factor
     * sqrt((T - 1)/T) at h = 1).
     */
    @Test
    void one_step_statistic_equals_the_t_statistic_of_the_loss_differentials() {
        double[] e1 = {1.2, -0.4, 2.1, 0.3, -1.5, 0.9, 1.1, -0.2};
        double[] e2 = {0.5, -0.9, 1.0, 0.8, -0.4, 0.2, 0.6, -0.7};
        int n = e1.length;
        double[] d = new double[n];
        double mean = 0;
        for (int t = 0; t < n; t++) {
            d[t] = e1[t] * e1[t] - e2[t] * e2[t];
            mean += d[t] / n;
        }
        double ss = 0;
        for (double v : d) {
            ss += (v - mean) * (v - mean);
        }
        double expected = mean / Math.sqrt(ss / (n - 1) / n);
        TestResult result = DieboldMariano.test("a", e1, "b", e2, 1, 0.05);
        assertEquals(expected, result.statistic(), 1e-12);
        assertEquals(n - 1, result.degreesOfFreedom().get(0), 0);
    }

    /**
     * Seeded simulation of the null: two forecasts with independent N(0,1) errors are equally
     * accurate, so the test at 5% rejects in about 5% of 4,000 replications (binomial SD 0.34%;
     * we accept 3.5%-6.5%, which also allows for the t approximation at T = 40).
     */
    @Test
    void rejects_about_five_percent_of_the_time_when_forecasts_are_equally_accurate() {
        Random random = new Random(7);
        int rejections = 0;
        int replications = 4000;
        for (int r = 0; r < replications; r++) {
            double[] e1 = new double[40];
            double[] e2 = new double[40];
            for (int t = 0; t < 40; t++) {
                e1[t] = random.nextGaussian();
                e2[t] = random.nextGaussian();
            }
            rejections += DieboldMariano.test("a", e1, "b", e2, 1, 0.05).rejected() ? 1 : 0;
        }
        double rate = rejections / (double) replications;
        assertTrue(rate > 0.035 && rate < 0.065, "rejection rate " + rate);
    }

    /** Power (common practice): errors with twice the SD are detected at T = 40. */
    @Test
    void detects_a_clearly_less_accurate_forecast() {
        Random random = new Random(11);
        double[] e1 = new double[40];
        double[] e2 = new double[40];
        for (int t = 0; t < 40; t++) {
            e1[t] = 3 * random.nextGaussian();
            e2[t] = random.nextGaussian();
        }
        TestResult result = DieboldMariano.test("wide", e1, "narrow", e2, 1, 0.05);
        assertTrue(result.rejected());
        assertTrue(result.reading().startsWith("narrow"), result.reading());
    }
}
