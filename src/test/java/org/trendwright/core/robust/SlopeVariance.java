package org.trendwright.core.robust;

import org.trendwright.core.regression.OlsFit;

/**
 * Exact variances of the OLS trend slope under stationary AR(1) errors with unit innovation
 * variance, autocovariances gamma(l) = rho^l / (1 - rho^2), for the Newey-West checks.
 */
final class SlopeVariance {

    private SlopeVariance() {
    }

    /** Var(b) = c' Sigma c with c the slope row of (X'X)^-1 X' and Sigma_ts = gamma(|t - s|). */
    static double exact(OlsFit fit, double rho) {
        return weighted(fit, rho, fit.observations() - 1, false);
    }

    /**
     * The Newey-West estimator's value when the true autocovariances replace the residual products:
     * the same sum with Bartlett weights 1 - l/(L + 1) up to lag L and none beyond.
     */
    static double bartlettLimit(OlsFit fit, double rho, int lag) {
        return weighted(fit, rho, lag, true);
    }

    private static double weighted(OlsFit fit, double rho, int lag, boolean bartlett) {
        double[] c = slopeWeights(fit);
        double variance = 0;
        for (int t = 0; t < c.length; t++) {
            for (int s = Math.max(0, t - lag); s <= Math.min(c.length - 1, t + lag); s++) {
                int l = Math.abs(t - s);
                double weight = bartlett ? 1 - l / (lag + 1.0) : 1;
                variance += weight * c[t] * c[s] * Math.pow(rho, l) / (1 - rho * rho);
            }
        }
        return variance;
    }

    private static double[] slopeWeights(OlsFit fit) {
        double[][] a = fit.xtxInverse();
        double[][] x = fit.design().toRows();
        double[] c = new double[x.length];
        for (int t = 0; t < x.length; t++) {
            for (int j = 0; j < x[t].length; j++) {
                c[t] += a[1][j] * x[t][j];
            }
        }
        return c;
    }
}
