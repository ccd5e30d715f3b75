package org.trendwright.core.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

/** {@link GaussianLikelihood} against a general-purpose reference library and the criteria's definitions. */
class GaussianLikelihoodTest {

    @Test
    void equals_the_sum_of_normal_log_densities_at_the_maximum_likelihood_variance() {
        // Apache Commons Math NormalDistribution.logDensity, summed over the residuals at sigma^2 = RSS/n.
        SplittableRandom random = new SplittableRandom(2026_12_02L);
        double[] residuals = new double[37];
        double rss = 0;
        for (int i = 0; i < residuals.length; i++) {
            residuals[i] = 3 * (random.nextDouble() - 0.5);
            rss += residuals[i] * residuals[i];
        }
        NormalDistribution normal = new NormalDistribution(null, 0, Math.sqrt(rss / residuals.length));
        double expected = 0;
        for (double e : residuals) {
            expected += normal.logDensity(e);
        }
        assertEquals(expected, GaussianLikelihood.logLikelihood(residuals.length, rss), 1e-12 * Math.abs(expected));
    }

    @Test
    void criteria_charge_two_per_parameter_and_ln_n_per_parameter() {
        // Akaike (1974): AIC = -2 ln L + 2p; Schwarz (1978): BIC = -2 ln L + p ln n.
        assertEquals(2 * 10.5 + 2 * 4, GaussianLikelihood.aic(-10.5, 4), 1e-12);
        assertEquals(2 * 10.5 + 4 * Math.log(50), GaussianLikelihood.bic(-10.5, 50, 4), 1e-12);
    }
}
