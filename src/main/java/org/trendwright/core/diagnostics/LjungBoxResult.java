package org.trendwright.core.diagnostics;

import org.trendwright.core.TestResult;

/**
 * The outcome of a Ljung-Box portmanteau test on residuals.
 *
 * <p>Immutable and thread-safe.
 *
 * @param lags                 h, the number of autocorrelations pooled
 * @param lagRule              how h was chosen, in words (a caller's choice or the default rule)
 * @param fittedArmaParameters the AR and MA coefficients fitted before the residuals were taken (0
 *                             for regression residuals), subtracted from h in the degrees of freedom
 * @param correlogram          the residual autocorrelations r_1..r_h the statistic is made of
 * @param test                 Q, chi-square(h - fittedArmaParameters), p-value, decision and reading
 */
public record LjungBoxResult(int lags, String lagRule, int fittedArmaParameters, Correlogram correlogram,
                             TestResult test) {

    /** The statistic Q. */
    public double statistic() {
        return test.statistic();
    }

    /** The p-value of Q. */
    public double pValue() {
        return test.pValue();
    }
}
