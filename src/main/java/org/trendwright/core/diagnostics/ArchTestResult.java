package org.trendwright.core.diagnostics;

import org.trendwright.core.TestResult;

/**
 * The outcome of Engle's ARCH LM test of order q.
 *
 * <p>Immutable and thread-safe.
 *
 * @param order             q, the number of lagged squared residuals in the auxiliary regression
 * @param observations      T = n - q, the rows of the auxiliary regression
 * @param auxiliaryRSquared the (centred) R^2 of e_t^2 on a constant and e_{t-1}^2, ..., e_{t-q}^2
 * @param test              LM = T R^2 against chi-square(q), p-value, decision and reading
 */
public record ArchTestResult(int order, int observations, double auxiliaryRSquared, TestResult test) {

    /** The statistic LM. */
    public double statistic() {
        return test.statistic();
    }

    /** The p-value of LM. */
    public double pValue() {
        return test.pValue();
    }
}
