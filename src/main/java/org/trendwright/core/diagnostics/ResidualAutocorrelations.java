package org.trendwright.core.diagnostics;

import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;

/**
 * Autocorrelations of regression or model residuals, the raw material of the correlogram and of
 * the Ljung-Box test.
 *
 * <p>Convention: r_k = sum_{t=k+1..n} e_t e_{t-k} / sum_{t=1..n} e_t^2, with both sums over the
 * residuals as they are, not centred on their mean (residuals of a regression with an intercept
 * have mean zero anyway), and the same divisor for every lag (Box & Jenkins 1970, "Time Series
 * Analysis: Forecasting and Control", ch. 2), which keeps the sequence r_1, r_2, ... a valid
 * (positive semi-definite) autocorrelation function. Under white noise each r_k is approximately
 * normal with mean 0 and variance 1/n (Bartlett 1946, "On the theoretical specification and sampling
 * properties of autocorrelated time-series", JRSS Supplement 8); that white-noise standard error is
 * used at every lag, as the usual +-2/sqrt(n) chart band does. Bartlett's wider band for lag k under
 * an MA(k-1) alternative is not used.
 *
 * <p>Residuals must be in time order over consecutive periods; the caller refuses series with gaps.
 *
 * <p>Stateless and thread-safe.
 */
public final class ResidualAutocorrelations {

    private ResidualAutocorrelations() {
    }

    /**
     * r_1..r_m as defined above, with standard error 1/sqrt(n), t statistics r_k sqrt(n) and the
     * band 2/sqrt(n).
     *
     * @throws InvalidSpecificationException when maxLag < 1, a residual is not finite, or every
     *                                       residual is 0 (an exact fit: every r_k would be 0/0)
     * @throws InsufficientDataException     when n <= maxLag (lag m needs at least one pair)
     */
    public static Correlogram compute(double[] residuals, int maxLag) {
        if (maxLag < 1) {
            throw new InvalidSpecificationException("The largest autocorrelation lag must be at least 1, got "
                    + maxLag + ".");
        }
        requireUsable(residuals, maxLag + 1, "Residual autocorrelations up to lag " + maxLag);
        int n = residuals.length;
        double[] r = autocorrelations(residuals, maxLag);
        double[] t = new double[maxLag];
        for (int k = 0; k < maxLag; k++) {
            t[k] = r[k] * Math.sqrt(n);
        }
        return new Correlogram(n, r, 1 / Math.sqrt(n), t, 2 / Math.sqrt(n));
    }

    /** r_1..r_m by the formula above, without checks. */
    static double[] autocorrelations(double[] e, int maxLag) {
        double denominator = 0;
        for (double v : e) {
            denominator += v * v;
        }
        double[] r = new double[maxLag];
        for (int k = 1; k <= maxLag; k++) {
            double numerator = 0;
            for (int t = k; t < e.length; t++) {
                numerator += e[t] * e[t - k];
            }
            r[k - 1] = numerator / denominator;
        }
        return r;
    }

    /**
     * Refuses residuals the tests cannot use: fewer than {@code needed}, a non-finite value, or all
     * zero. {@code what} names the calculation in the message.
     */
    static void requireUsable(double[] residuals, int needed, String what) {
        if (residuals.length < needed) {
            throw new InsufficientDataException(what + " needs at least " + needed + " residuals but got "
                    + residuals.length + "; supply a longer series or use fewer lags.");
        }
        boolean allZero = true;
        for (int t = 0; t < residuals.length; t++) {
            if (!Double.isFinite(residuals[t])) {
                throw new InvalidSpecificationException("Residual " + (t + 1) + " is " + residuals[t]
                        + "; " + what + " needs finite residuals.");
            }
            allZero &= residuals[t] == 0;
        }
        if (allZero) {
            throw new InvalidSpecificationException("Every residual is 0: the model fits the series exactly, so "
                    + what + " has nothing to measure; check the series is not a copy of the fitted values.");
        }
    }
}
