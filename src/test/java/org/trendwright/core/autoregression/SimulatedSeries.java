package org.trendwright.core.autoregression;

import java.util.SplittableRandom;

/**
 * Seeded Gaussian autoregressions for the simulation tests: y_t = c + Σ φ_i y_{t−i} + e_t,
 * e_t ~ N(0, σ²), started at 0 and run through a burn-in that is then dropped, so the start-up
 * transient does not matter for a stationary model.
 */
public final class SimulatedSeries {

    private SimulatedSeries() {
    }

    /** n values of the AR with coefficients phi (index 0 = lag 1) after burnIn discarded steps. */
    public static double[] autoregression(SplittableRandom random, double constant, double[] phi, double sigma,
                                          int n, int burnIn) {
        double[] all = new double[burnIn + n];
        for (int t = 0; t < all.length; t++) {
            double value = constant + sigma * random.nextGaussian();
            for (int i = 1; i <= phi.length && t - i >= 0; i++) {
                value += phi[i - 1] * all[t - i];
            }
            all[t] = value;
        }
        double[] kept = new double[n];
        System.arraycopy(all, burnIn, kept, 0, n);
        return kept;
    }

    /** A Gaussian random walk y_0 = 0, y_t = y_{t−1} + drift + e_t, e_t ~ N(0, 1), n values. */
    public static double[] randomWalk(SplittableRandom random, double drift, int n) {
        double[] y = new double[n];
        for (int t = 1; t < n; t++) {
            y[t] = y[t - 1] + drift + random.nextGaussian();
        }
        return y;
    }
}
