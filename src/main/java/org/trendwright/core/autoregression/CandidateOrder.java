package org.trendwright.core.autoregression;

import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.regression.GaussianLikelihood;

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
     * {@code rss} over n observations, its criteria counting the error variance as a parameter, as
     * {@link org.trendwright.core.regression.OlsFit} does ({@link GaussianLikelihood}).
     */
    public static CandidateOrder fromResidualSumOfSquares(int order, int n, int coefficients, double rss) {
        double logLikelihood = GaussianLikelihood.logLikelihood(n, rss);
        return new CandidateOrder(order, n, GaussianLikelihood.aic(logLikelihood, coefficients + 1),
                GaussianLikelihood.bic(logLikelihood, n, coefficients + 1));
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
