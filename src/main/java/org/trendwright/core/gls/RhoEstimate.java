package org.trendwright.core.gls;

/**
 * The first-order autocorrelation of regression errors, estimated by the regression through the
 * origin of each residual on its predecessor, e_t = rho e_{t-1} + a_t, t = 2..n (Cochrane & Orcutt
 * 1949, JASA 44):
 *
 * <pre>
 *   rho = sum_{t=2..n} e_t e_{t-1} / sum_{t=2..n} e_{t-1}^2,
 *   se(rho) = s_a / sqrt(sum_{t=2..n} e_{t-1}^2),   s_a^2 = sum_{t=2..n} (e_t - rho e_{t-1})^2 / (n - 2).
 * </pre>
 *
 * The standard error is that auxiliary regression's classical one: it treats the residuals as if
 * they were the errors themselves and ignores that b was estimated, so read it as approximate.
 *
 * @param value            the estimate rho
 * @param standardError    se(rho) as above; 0 when the auxiliary regression fits exactly
 * @param degreesOfFreedom n - 2: n - 1 pairs less the one estimated coefficient
 */
public record RhoEstimate(double value, double standardError, int degreesOfFreedom) {

    /**
     * Estimates rho from residuals in time order (at least 3). NaN when every residual but the
     * last is 0 (0/0); callers refuse that case.
     */
    static RhoEstimate fromResiduals(double[] e) {
        double cross = 0;
        double lagged = 0;
        for (int t = 1; t < e.length; t++) {
            cross += e[t] * e[t - 1];
            lagged += e[t - 1] * e[t - 1];
        }
        return withStandardError(cross / lagged, e, lagged);
    }

    /**
     * A given value of rho (such as an extrapolated one) with the standard error the formula above
     * gives it against residuals e, s_a computed with this rho.
     */
    static RhoEstimate withValue(double rho, double[] e) {
        double lagged = 0;
        for (int t = 1; t < e.length; t++) {
            lagged += e[t - 1] * e[t - 1];
        }
        return withStandardError(rho, e, lagged);
    }

    private static RhoEstimate withStandardError(double rho, double[] e, double lagged) {
        double squares = 0;
        for (int t = 1; t < e.length; t++) {
            double a = e[t] - rho * e[t - 1];
            squares += a * a;
        }
        int df = e.length - 2;
        return new RhoEstimate(rho, Math.sqrt(squares / df / lagged), df);
    }
}
