package org.trendwright.core.autoregression;

import org.trendwright.core.InvalidSpecificationException;

/**
 * One candidate lag count examined by an information criterion, fitted on the common estimation
 * sample shared by all candidates (see {@link LagSelection}).
 *
 * @param order        the number of lags p (for a unit-root test: of lagged differences)
 * @param observations observations in the common estimation sample
 * @param aic          Akaike's criterion of that fit, −2 ln L + 2(k + 1)
 * @param bic          Schwarz's criterion, −2 ln L + ln(n)(k + 1)
 */
public record CandidateOrder(int order, int observations, double aic, double bic) {

    /**
     * The candidate of a fit with {@code coefficients} regressors and residual sum of squares
     * {@code rss} over n observations, with the Gaussian log-likelihood at the maximum-likelihood
     * variance, ln L = −n/2 (ln 2π + ln(RSS/n) + 1), as {@link org.trendwright.core.regression.OlsFit}
     * computes it (Akaike 1974, IEEE Trans. Automatic Control 19; Schwarz 1978, Annals of Statistics 6).
     */
    public static CandidateOrder fromResidualSumOfSquares(int order, int n, int coefficients, double rss) {
        double logLikelihood = -0.5 * n * (Math.log(2 * Math.PI) + Math.log(rss / n) + 1);
        double aic = -2 * logLikelihood + 2.0 * (coefficients + 1);
        double bic = -2 * logLikelihood + Math.log(n) * (coefficients + 1);
        return new CandidateOrder(order, n, aic, bic);
    }

    /** The value of the given criterion (AIC or BIC). */
    public double criterion(LagSelection selection) {
        return switch (selection) {
            case AIC -> aic;
            case BIC -> bic;
            case FIXED -> throw new InvalidSpecificationException("A fixed lag count has no criterion value; ask for"
                    + " AIC or BIC.");
        };
    }
}
