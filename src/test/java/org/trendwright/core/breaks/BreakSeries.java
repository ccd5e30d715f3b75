package org.trendwright.core.breaks;

import java.util.List;
import java.util.SplittableRandom;
import org.trendwright.core.regression.Design;

/** Designs and seeded series for the break tests. */
final class BreakSeries {

    private BreakSeries() {
    }

    /** Columns "constant" and "t" = 1..n. */
    static Design trend(int n) {
        double[] constant = new double[n];
        double[] time = new double[n];
        for (int i = 0; i < n; i++) {
            constant[i] = 1;
            time[i] = i + 1;
        }
        return new Design(List.of(constant, time), List.of("constant", "t"), true);
    }

    /** Columns "constant" and "x", x_t independent N(0, 1): a stationary regressor. */
    static Design constantAndNoise(int n, SplittableRandom random) {
        double[] constant = new double[n];
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            constant[i] = 1;
            x[i] = random.nextGaussian();
        }
        return new Design(List.of(constant, x), List.of("constant", "x"), true);
    }

    /** y_t = 1 + 0.1 t + shift * [t > breakRow] + e_t, e_t ~ N(0, 1), t = 1..n. */
    static double[] shiftedTrend(int n, int breakRow, double shift, SplittableRandom random) {
        double[] y = new double[n];
        for (int t = 1; t <= n; t++) {
            y[t - 1] = 1 + 0.1 * t + (t > breakRow ? shift : 0) + random.nextGaussian();
        }
        return y;
    }

    /** n independent N(1, 1) values. */
    static double[] noise(int n, SplittableRandom random) {
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = 1 + random.nextGaussian();
        }
        return y;
    }
}
