package org.trendwright.core.diagnostics;

/**
 * The Durbin-Watson test for first-order serial correlation in regression residuals
 * (Durbin & Watson 1950, 1951, Biometrika 37 and 38).
 *
 * <p>Stateless and thread-safe.
 */
public final class DurbinWatson {

    private DurbinWatson() {
    }

    /**
     * The statistic d = sum_{t=2..n} (e_t - e_{t-1})^2 / sum_{t=1..n} e_t^2 over residuals in time
     * order. d lies in [0, 4]; near 2 when successive residuals are uncorrelated, towards 0 under
     * positive and towards 4 under negative first-order correlation (d is about 2(1 - r_1)).
     * NaN when every residual is 0 (an exact fit), since the ratio is then 0/0.
     */
    public static double statistic(double[] residuals) {
        double numerator = 0;
        double denominator = residuals.length == 0 ? 0 : residuals[0] * residuals[0];
        for (int t = 1; t < residuals.length; t++) {
            double difference = residuals[t] - residuals[t - 1];
            numerator += difference * difference;
            denominator += residuals[t] * residuals[t];
        }
        return numerator / denominator;
    }
}
