package org.trendwright.core.gls;

import java.util.List;
import java.util.SplittableRandom;
import org.trendwright.core.regression.Design;

/** Seeded simulated series for the GLS checks: a linear trend plus stationary AR(1) errors. */
final class Ar1Series {

    static final double INTERCEPT = 10;
    static final double SLOPE = 0.5;

    private Ar1Series() {
    }

    /**
     * n errors u_t = rho u_{t-1} + e_t, e_t ~ N(0, sigma^2), started from the stationary
     * distribution u_1 ~ N(0, sigma^2 / (1 - rho^2)), so no burn-in is needed.
     */
    static double[] errors(SplittableRandom random, int n, double rho, double sigma) {
        double[] u = new double[n];
        u[0] = sigma / Math.sqrt(1 - rho * rho) * random.nextGaussian();
        for (int t = 1; t < n; t++) {
            u[t] = rho * u[t - 1] + sigma * random.nextGaussian();
        }
        return u;
    }

    /** y_t = 10 + 0.5 t + u_t, t = 1..u.length. */
    static double[] trendPlus(double[] u) {
        double[] y = new double[u.length];
        for (int t = 0; t < u.length; t++) {
            y[t] = INTERCEPT + SLOPE * (t + 1) + u[t];
        }
        return y;
    }

    /** Columns "constant" and "t" for t = from..to (inclusive). */
    static Design trendDesign(int from, int to) {
        double[] constant = new double[to - from + 1];
        double[] time = new double[constant.length];
        for (int i = 0; i < constant.length; i++) {
            constant[i] = 1;
            time[i] = from + i;
        }
        return new Design(List.of(constant, time), List.of("constant", "t"), true);
    }

    static Design trendDesign(int n) {
        return trendDesign(1, n);
    }
}
