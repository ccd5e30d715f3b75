package org.trendwright.core.regression;

import java.util.List;
import org.trendwright.core.Matrices;

/**
 * The result of an ordinary least-squares fit y = X b + e. Immutable and thread-safe: array
 * accessors return copies, so hoist them out of loops.
 *
 * <p>Conventions, written down once:
 * <ul>
 *   <li>R-squared and the F test are centred (about the mean of y) when the design has an
 *       intercept and uncentred (about zero) when it has none, as the NIST StRD certified values
 *       are.</li>
 *   <li>The log-likelihood is the Gaussian one at the maximum-likelihood variance RSS/n:
 *       l = -n/2 (ln 2 pi + ln(RSS/n) + 1). AIC = -2l + 2(k+1) and BIC = -2l + ln(n)(k+1) count
 *       the error variance as a parameter.</li>
 *   <li>An exact fit (RSS = 0) has standard errors 0, infinite F, t statistics of +-Infinity (NaN
 *       for a coefficient that is exactly 0) and an infinite negative AIC; a design with only an
 *       intercept has no F test and reports F and its p-value as NaN.</li>
 * </ul>
 *
 * @param design                  the regressors the fit used
 * @param y                       the response
 * @param coefficients            the coefficients with their classical standard errors
 * @param fitted                  fitted values X b
 * @param residuals               residuals e = y - X b
 * @param residualSumOfSquares    RSS = e'e
 * @param totalSumOfSquares       TSS, centred or uncentred as above
 * @param rSquared                1 - RSS/TSS
 * @param adjustedRSquared        1 - (1 - R^2)(n - c)/(n - k), with c = 1 with an intercept, else 0
 * @param fStatistic              ((TSS - RSS)/(k - c)) / (RSS/(n - k))
 * @param fPValue                 upper tail of F(k - c, n - k) at the F statistic
 * @param standardErrorOfEstimate s = sqrt(RSS/(n - k)), the standard error of estimate (SEE)
 * @param residualDegreesOfFreedom n - k
 * @param logLikelihood           the Gaussian log-likelihood described above
 * @param aic                     Akaike's information criterion
 * @param bic                     Schwarz's Bayesian information criterion
 * @param xtxInverse              (X'X)^-1, k x k, for forecast variances and robust errors
 * @param conditionNumber         2-norm condition number of X after scaling each column to unit length
 */
public record OlsFit(Design design, double[] y, List<Coefficient> coefficients, double[] fitted,
                     double[] residuals, double residualSumOfSquares, double totalSumOfSquares,
                     double rSquared, double adjustedRSquared, double fStatistic, double fPValue,
                     double standardErrorOfEstimate, int residualDegreesOfFreedom, double logLikelihood,
                     double aic, double bic, double[][] xtxInverse, double conditionNumber) {

    public OlsFit {
        y = y.clone();
        coefficients = List.copyOf(coefficients);
        fitted = fitted.clone();
        residuals = residuals.clone();
        xtxInverse = Matrices.copy(xtxInverse);
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    @Override
    public double[] fitted() {
        return fitted.clone();
    }

    @Override
    public double[] residuals() {
        return residuals.clone();
    }

    @Override
    public double[][] xtxInverse() {
        return Matrices.copy(xtxInverse);
    }

    /** Number of observations n. */
    public int observations() {
        return y.length;
    }

    /** The coefficient estimates b as an array, in the design's column order. */
    public double[] estimates() {
        return coefficients.stream().mapToDouble(Coefficient::estimate).toArray();
    }

    /** The coefficient of the regressor with this name. */
    public Coefficient coefficient(String name) {
        return coefficients.stream().filter(c -> c.name().equals(name)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("No regressor named '" + name + "'."));
    }

    /** The residual variance estimate s^2 = RSS/(n - k). */
    public double residualVariance() {
        return residualSumOfSquares / residualDegreesOfFreedom;
    }

    /** The point prediction x'b for a new row of regressors x. */
    public double predict(double[] x) {
        double sum = 0;
        for (int j = 0; j < coefficients.size(); j++) {
            sum += x[j] * coefficients.get(j).estimate();
        }
        return sum;
    }

    /** The quadratic form x'(X'X)^-1 x, the leverage of a new row x. */
    public double leverage(double[] x) {
        double sum = 0;
        for (int i = 0; i < x.length; i++) {
            for (int j = 0; j < x.length; j++) {
                sum += x[i] * xtxInverse[i][j] * x[j];
            }
        }
        return sum;
    }
}
