package org.trendwright.core.regression;

/**
 * The sums of squares of a least-squares fit, for callers that need its fit but not its inference
 * (the auxiliary regressions of residual tests). Immutable and thread-safe.
 *
 * @param residual  RSS = sum e_i^2
 * @param total     TSS = sum (y_i - c)^2, c the mean of y with an intercept and 0 without
 * @param explained ESS = sum (yhat_i - c)^2, by the more accurate of two routes (see {@link LeastSquares#fit})
 */
public record SumsOfSquares(double residual, double total, double explained) {

    /** R^2 = ESS / TSS; NaN when y is constant about its centre (TSS = 0). */
    public double rSquared() {
        return explained / total;
    }
}
