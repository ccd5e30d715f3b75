package org.trendwright.core.diagnostics;

import java.util.List;
import org.apache.commons.math3.random.RandomGenerator;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * Seeded simulations of the linear trend y_t = 10 + 0.5 t + e_t, t = 1..n, with the error processes
 * the residual tests are checked against. Shared by the diagnostics and robust-errors tests.
 */
public final class SimulatedTrend {

    private SimulatedTrend() {
    }

    /** The design of intercept and time trend t = 1..n. */
    public static Design design(int n) {
        double[] ones = new double[n];
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            ones[i] = 1;
            t[i] = i + 1;
        }
        return new Design(List.of(ones, t), List.of("intercept", "trend"), true);
    }

    /** 10 + 0.5 t + e_t. */
    public static double[] response(double[] errors) {
        double[] y = new double[errors.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = 10 + 0.5 * (i + 1) + errors[i];
        }
        return y;
    }

    /** The OLS fit of the trend to 10 + 0.5 t + e_t. */
    public static OlsFit fit(double[] errors) {
        return LeastSquares.fit(design(errors.length), response(errors));
    }

    /** Independent standard normal errors. */
    public static double[] whiteNoise(RandomGenerator random, int n) {
        double[] e = new double[n];
        for (int i = 0; i < n; i++) {
            e[i] = random.nextGaussian();
        }
        return e;
    }

    /** Stationary AR(1) errors e_t = rho e_{t-1} + u_t, u_t standard normal, e_1 drawn from the stationary law. */
    public static double[] autoregressive(RandomGenerator random, int n, double rho) {
        double[] e = new double[n];
        e[0] = random.nextGaussian() / Math.sqrt(1 - rho * rho);
        for (int i = 1; i < n; i++) {
            e[i] = rho * e[i - 1] + random.nextGaussian();
        }
        return e;
    }

    /**
     * ARCH(1) errors e_t = sigma_t z_t with sigma_t^2 = 1 + a e_{t-1}^2 (Engle 1982), z_t standard
     * normal; 100 discarded start-up draws let the process forget its start at e_0 = 0.
     */
    public static double[] arch(RandomGenerator random, int n, double a) {
        double[] e = new double[n];
        double previous = 0;
        for (int i = -100; i < n; i++) {
            previous = Math.sqrt(1 + a * previous * previous) * random.nextGaussian();
            if (i >= 0) {
                e[i] = previous;
            }
        }
        return e;
    }
}
