package org.trendwright.core.robust;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.diagnostics.SimulatedTrend;
import org.trendwright.core.regression.Coefficient;
import org.trendwright.core.regression.OlsFit;

class NeweyWestTest {

    @ParameterizedTest(name = "n = {0}: L = {1}")
    @CsvSource({
        // Newey & West (1994) rule of thumb floor(4 (n/100)^(2/9)), worked by hand:
        // 4 x 0.02^(2/9) = 1.68; 4 x 0.05^(2/9) = 2.06; 4 x 0.5^(2/9) = 3.43; 4 x 1 = 4;
        // 4 x 2^(2/9) = 4.67; 4 x 10^(2/9) = 6.67; 4 x 50^(2/9) = 9.54.
        "2,    1",
        "5,    2",
        "50,   3",
        "100,  4",
        "200,  4",
        "1000, 6",
        "5000, 9",
    })
    void automatic_lag_follows_the_newey_west_rule_of_thumb(int n, int expected) {
        assertEquals(expected, NeweyWest.automaticLag(n));
    }

    @Test
    void lag_zero_is_whites_heteroskedasticity_consistent_estimator() {
        // White (1980, Econometrica 48): V = (X'X)^-1 (sum e_t^2 x_t x_t') (X'X)^-1, computed here
        // directly with dense matrices and an LU inverse of X'X (a different route from the QR-based
        // (X'X)^-1 the fit carries). The trend design at n = 50 has cond(X'X) near 1e4, so the two
        // routes agree to ~1e-12 relative; 1e-9 leaves ample room.
        OlsFit fit = SimulatedTrend.fit(SimulatedTrend.whiteNoise(new Well19937c(31), 50));
        RealMatrix x = new Array2DRowRealMatrix(fit.design().toRows());
        double[] e = fit.residuals();
        RealMatrix bread = new LUDecomposition(x.transpose().multiply(x)).getSolver().getInverse();
        RealMatrix weighted = x.copy();
        for (int t = 0; t < e.length; t++) {
            weighted.setRow(t, x.getRowVector(t).mapMultiply(e[t] * e[t]).toArray());
        }
        RealMatrix white = bread.multiply(x.transpose().multiply(weighted)).multiply(bread);
        double[][] hac = NeweyWest.standardErrors(fit, 0).covariance();
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < 2; j++) {
                double expected = white.getEntry(i, j);
                assertEquals(expected, hac[i][j], 1e-9 * Math.abs(expected), "V[" + i + "][" + j + "]");
            }
        }
    }

    @Test
    void keeps_the_ols_estimates_and_reports_t_p_and_intervals_from_the_hac_errors() {
        OlsFit fit = SimulatedTrend.fit(SimulatedTrend.autoregressive(new Well19937c(32), 60, 0.5));
        HacInference hac = NeweyWest.standardErrors(fit);
        // Student's t with n - k = 58 degrees of freedom (common practice for regression inference).
        TDistribution t = new TDistribution(58);
        double critical = t.inverseCumulativeProbability(0.975);
        for (Coefficient c : hac.coefficients()) {
            double se = c.standardError();
            double tStat = c.estimate() / se;
            assertAll(c.name(),
                    () -> assertEquals(fit.coefficient(c.name()).estimate(), c.estimate(), 0.0),
                    () -> assertEquals(tStat, c.tStatistic(), 1e-12 * Math.abs(tStat)),
                    () -> assertEquals(2 * (1 - t.cumulativeProbability(Math.abs(tStat))), c.pValue(), 1e-12),
                    () -> assertEquals(c.estimate() - critical * se, c.lower95(), 1e-12 * Math.abs(c.estimate())),
                    () -> assertEquals(c.estimate() + critical * se, c.upper95(), 1e-12 * Math.abs(c.estimate())));
        }
        assertEquals(58, hac.residualDegreesOfFreedom());
        assertEquals(3, hac.lag()); // floor(4 x 0.6^(2/9)) = floor(3.56), by hand
        assertTrue(hac.lagRule().contains("automatic"), hac.lagRule());
    }

    @Test
    void refuses_a_negative_lag_or_one_of_at_least_n() {
        OlsFit fit = SimulatedTrend.fit(SimulatedTrend.whiteNoise(new Well19937c(33), 20));
        NeweyWest.standardErrors(fit, 19);
        InvalidSpecificationException negative = assertThrows(InvalidSpecificationException.class,
                () -> NeweyWest.standardErrors(fit, -1));
        assertThrows(InvalidSpecificationException.class, () -> NeweyWest.standardErrors(fit, 20));
        assertTrue(negative.getMessage().contains("0..19"), negative.getMessage());
    }

    @Test
    void hac_slope_error_under_ar1_errors_comes_close_to_the_true_sd_while_the_classical_one_is_far_too_small() {
        // AR(1) errors, rho = 0.7, around a linear trend at n = 200; 1,000 seeded replications.
        int n = 200;
        double rho = 0.7;
        int replications = 1000;
        OlsFit template = SimulatedTrend.fit(new double[n]);
        double exactSd = Math.sqrt(SlopeVariance.exact(template, rho));
        double kernelSd = Math.sqrt(SlopeVariance.bartlettLimit(template, rho, NeweyWest.automaticLag(n)));
        Well19937c random = new Well19937c(19870501L);
        double sumB = 0;
        double sumB2 = 0;
        double sumHac = 0;
        double sumOls = 0;
        for (int r = 0; r < replications; r++) {
            OlsFit fit = SimulatedTrend.fit(SimulatedTrend.autoregressive(random, n, rho));
            double b = fit.coefficient("trend").estimate();
            sumB += b;
            sumB2 += b * b;
            sumOls += fit.coefficient("trend").standardError();
            sumHac += NeweyWest.standardErrors(fit).coefficient("trend").standardError();
        }
        double empiricalSd = Math.sqrt((sumB2 - sumB * sumB / replications) / (replications - 1));
        double meanHac = sumHac / replications;
        double meanOls = sumOls / replications;
        assertAll(
                // The simulation itself: the sample SD of 1,000 slopes has relative Monte-Carlo error
                // 1/sqrt(2 x 999) = 2.2%, so it must match the exact sandwich SD within 7% (3 SDs).
                () -> assertEquals(exactSd, empiricalSd, 0.07 * exactSd),
                // Bartlett truncation at L = 4 alone leaves the estimator's population value at about
                // 0.75 of the true SD (Newey & West 1987 weights; the downward bias Andrews 1991
                // documents), and residual autocovariances from a fitted trend run below those of the
                // errors, so the mean HAC SE must lie between 85% and 102% of that population value
                // (the mean over 1,000 runs has ~0.5% Monte-Carlo error; ~93% is typical here).
                () -> assertTrue(meanHac > 0.85 * kernelSd && meanHac < 1.02 * kernelSd,
                        "mean HAC SE " + meanHac + " vs Bartlett population value " + kernelSd),
                () -> assertTrue(meanHac > 0.60 * exactSd && meanHac <= exactSd,
                        "mean HAC SE " + meanHac + " vs true SD " + exactSd),
                // The classical SE ignores the correlation: its ratio to the true SD tends to
                // sqrt((1 - rho)/(1 + rho)) = 0.42 for a trend regressor (common practice).
                () -> assertTrue(meanOls > 0.35 * exactSd && meanOls < 0.50 * exactSd,
                        "mean OLS SE " + meanOls + " vs true SD " + exactSd),
                () -> assertTrue(meanHac > 1.5 * meanOls, "HAC should be far above the classical SE"));
    }
}
