package org.trendwright.core.diagnostics;

import org.trendwright.core.TestResult;

/**
 * The outcome of a Breusch-Godfrey test for serial correlation up to order p, in both its
 * Lagrange-multiplier (chi-square) and its F form.
 *
 * <p>Immutable and thread-safe.
 *
 * @param order              p, the highest residual lag tested
 * @param observations       n, the rows of the auxiliary regression (all of the original fit's rows)
 * @param regressors         k, the regressors of the original fit
 * @param auxiliaryRSquared  R^2 = 1 - RSS_u / RSS_r of the auxiliary regression
 * @param restrictedRss      RSS_r = e'e, the residual sum of squares of e on X alone
 * @param unrestrictedRss    RSS_u, the residual sum of squares of e on X and e_{t-1..t-p}
 * @param lagrangeMultiplier LM = n R^2 against chi-square(p)
 * @param fForm              F = ((RSS_r - RSS_u)/p) / (RSS_u/(n - k - p)) against F(p, n - k - p)
 */
public record BreuschGodfreyResult(int order, int observations, int regressors, double auxiliaryRSquared,
                                   double restrictedRss, double unrestrictedRss, TestResult lagrangeMultiplier,
                                   TestResult fForm) {
}
