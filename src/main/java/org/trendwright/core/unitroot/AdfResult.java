package org.trendwright.core.unitroot;

import java.util.List;
import org.trendwright.core.TestResult;
import org.trendwright.core.autoregression.CandidateOrder;

/**
 * The outcome of an augmented Dickey-Fuller test. Immutable and thread-safe.
 *
 * @param spec           what was asked for
 * @param lags           p, the number of lagged differences used (fixed or chosen)
 * @param maximumLags    the largest p tried (equal to p for a fixed choice)
 * @param candidates     AIC and BIC of every p tried on the common sample (one entry for a fixed p)
 * @param observations   T, the observations in the test regression
 * @param gamma          γ̂, the coefficient of y_{t−1}; near 0 under a unit root, negative when the
 *                       series reverts
 * @param tau            the statistic γ̂ / se(γ̂)
 * @param criticalValues 1%, 5%, 10% critical values for this case and this T
 * @param test           the decision, its p-value and a plain reading
 */
public record AdfResult(AdfSpec spec, int lags, int maximumLags, List<CandidateOrder> candidates,
                        int observations, double gamma, double tau, CriticalValues criticalValues,
                        TestResult test) {

    public AdfResult {
        candidates = List.copyOf(candidates);
    }

    /** The p-value P(tau_T ≤ tau) under the unit-root null. */
    public double pValue() {
        return test.pValue();
    }

    /** True when the unit root was rejected at the spec's level. */
    public boolean rejected() {
        return test.rejected();
    }
}
