package org.trendwright.core.regression;

/**
 * One coefficient of a least-squares fit with its classical standard error, and the fit's residual
 * sum of squares: what a test regression that reads a single t statistic needs (the augmented
 * Dickey-Fuller regression reads that of y_{t-1}). Immutable and thread-safe.
 *
 * @param name                 the regressor's name
 * @param estimate             b_j, as {@link OlsFit#coefficient} reports it
 * @param standardError        se(b_j) = s sqrt([(X'X)^-1]_jj), as {@link OlsFit#coefficient} reports it
 * @param observations         n, the rows of the regression
 * @param residualSumOfSquares RSS, as {@link OlsFit#residualSumOfSquares()}
 */
public record SingleCoefficientFit(String name, double estimate, double standardError, int observations,
                                   double residualSumOfSquares) {

    /** t = b_j / se(b_j). */
    public double tStatistic() {
        return estimate / standardError;
    }
}
