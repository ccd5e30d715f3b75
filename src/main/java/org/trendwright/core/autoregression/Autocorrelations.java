package org.trendwright.core.autoregression;

import java.util.ArrayList;
import java.util.List;

/**
 * Sample autocorrelations, the standard check of a fitted time-series model's residuals.
 *
 * <p>Stateless and thread-safe.
 */
public final class Autocorrelations {

    private Autocorrelations() {
    }

    /**
     * The sample autocorrelations r_1..r_maxLag of x, r_k = Σ_{t=k+1..T} (x_t − x̄)(x_{t−k} − x̄) /
     * Σ_{t=1..T} (x_t − x̄)² (Box & Jenkins 1970, Time Series Analysis, eq. 2.1.12). All NaN when x
     * is constant (0/0); r_k = 0 for k ≥ T.
     */
    public static double[] of(double[] x, int maxLag) {
        int n = x.length;
        double mean = 0;
        for (double v : x) {
            mean += v;
        }
        mean /= n;
        double[] centred = new double[n];
        double denominator = 0;
        for (int t = 0; t < n; t++) {
            centred[t] = x[t] - mean;
            denominator += centred[t] * centred[t];
        }
        double[] r = new double[maxLag];
        for (int k = 1; k <= maxLag; k++) {
            double numerator = 0;
            for (int t = k; t < n; t++) {
                numerator += centred[t] * centred[t - k];
            }
            r[k - 1] = numerator / denominator;
        }
        return r;
    }

    /**
     * The residual autocorrelations up to maxLag with the white-noise standard error 1/√T and
     * t = r_k √T (see {@link ResidualAutocorrelation}).
     */
    public static List<ResidualAutocorrelation> ofResiduals(double[] residuals, int maxLag) {
        double[] r = of(residuals, maxLag);
        double standardError = 1 / Math.sqrt(residuals.length);
        List<ResidualAutocorrelation> list = new ArrayList<>(maxLag);
        for (int k = 1; k <= maxLag; k++) {
            list.add(new ResidualAutocorrelation(k, r[k - 1], standardError, r[k - 1] / standardError));
        }
        return list;
    }

    /**
     * How many lags to check by default: min(max(10, 2s), ⌊T/4⌋) and at least 1, with s the
     * periods per year. Ten lags, or two years of a seasonal series, catch the usual misses; more
     * than T/4 lags rest on too few pairs (Box & Jenkins 1970, section 2.1.6: common practice).
     */
    public static int defaultMaxLag(int observations, int periodsPerYear) {
        return Math.max(1, Math.min(Math.max(10, 2 * periodsPerYear), observations / 4));
    }
}
