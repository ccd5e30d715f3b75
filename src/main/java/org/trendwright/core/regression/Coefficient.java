package org.trendwright.core.regression;

/**
 * One estimated regression coefficient with its inference under the model's assumptions.
 *
 * @param name          the regressor's name
 * @param estimate      the least-squares estimate b_j
 * @param standardError se(b_j) = s * sqrt([(X'X)^-1]_jj), or another estimator's where stated
 * @param tStatistic    b_j / se(b_j)
 * @param pValue        two-sided p-value of t against Student's t with the residual degrees of freedom
 * @param lower95       lower end of the 95% confidence interval b_j - t(0.975, df) se(b_j)
 * @param upper95       upper end of that interval
 */
public record Coefficient(String name, double estimate, double standardError, double tStatistic,
                          double pValue, double lower95, double upper95) {
}
