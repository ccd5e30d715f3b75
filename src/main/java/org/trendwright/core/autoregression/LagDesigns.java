package org.trendwright.core.autoregression;

import java.util.Arrays;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.Observations;

/**
 * Building blocks of lag regressions: differences, lagged columns and the check that a series
 * has no gaps. Shared by autoregressions and unit-root tests.
 *
 * <p>Stateless and thread-safe.
 */
public final class LagDesigns {

    private LagDesigns() {
    }

    /**
     * Refuses a series with a missing period: lags are defined only between consecutive periods.
     *
     * @throws InvalidSpecificationException naming the first missing period
     */
    public static void requireConsecutive(Observations series, String what) {
        if (series.hasGaps()) {
            throw new InvalidSpecificationException(what + " needs consecutive observations, but the period t = "
                    + series.firstMissingTime() + " is missing; fill the gap or use only the part of the series"
                    + " after it.");
        }
    }

    /** The first differences Δy_t = y_t − y_{t−1}, one shorter than y. */
    public static double[] differences(double[] y) {
        double[] d = new double[Math.max(0, y.length - 1)];
        for (int t = 0; t < d.length; t++) {
            d[t] = y[t + 1] - y[t];
        }
        return d;
    }

    /**
     * The values w_{t−lag} for t = from..w.length−1 (0-based): the lag-{@code lag} regressor of a
     * regression whose first row is t = from (lag 0 gives the response).
     */
    public static double[] lagged(double[] w, int lag, int from) {
        return Arrays.copyOfRange(w, from - lag, w.length - lag);
    }

    /** A column of n ones. */
    public static double[] ones(int n) {
        double[] ones = new double[n];
        Arrays.fill(ones, 1);
        return ones;
    }
}
