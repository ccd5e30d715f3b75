package org.trendwright.core.unitroot;

import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.TestResult;
import org.trendwright.core.autoregression.LagSelection;

/**
 * What augmented Dickey-Fuller test to run.
 *
 * @param terms     the deterministic terms of the test regression
 * @param selection FIXED, or the criterion (AIC, BIC) that chooses the number of lagged differences
 * @param lags      with FIXED the number of lagged differences p; with a criterion the largest p
 *                  tried, or {@link #SCHWERT_MAXIMUM} for ⌊12 (n/100)^{1/4}⌋ (Schwert 1989)
 * @param level     the significance level of the decision, in (0, 1)
 */
public record AdfSpec(DeterministicTerms terms, LagSelection selection, int lags, double level) {

    /** Marks "largest lag by Schwert's rule" in {@link #lags}. */
    public static final int SCHWERT_MAXIMUM = -1;

    public AdfSpec {
        if (terms == null || selection == null) {
            throw new InvalidSpecificationException("A Dickey-Fuller test needs its deterministic terms and a lag"
                    + " choice.");
        }
        if (lags < 0 && !(lags == SCHWERT_MAXIMUM && selection != LagSelection.FIXED)) {
            throw new InvalidSpecificationException("The number of lagged differences cannot be negative, got " + lags
                    + "; use 0 for the plain Dickey-Fuller regression.");
        }
        TestResult.checkLevel(level);
    }

    /** The default: lagged differences chosen by AIC up to Schwert's maximum, 5% level. */
    public static AdfSpec of(DeterministicTerms terms) {
        return new AdfSpec(terms, LagSelection.AIC, SCHWERT_MAXIMUM, 0.05);
    }

    /** The same test with exactly p lagged differences. */
    public AdfSpec withFixedLags(int p) {
        return new AdfSpec(terms, LagSelection.FIXED, p, level);
    }

    /** The same test with p chosen by the criterion among 0..maxLags (or Schwert's maximum). */
    public AdfSpec withLagsSelectedBy(LagSelection criterion, int maxLags) {
        if (criterion == LagSelection.FIXED) {
            throw new InvalidSpecificationException("Choose AIC or BIC here; use withFixedLags for a fixed number of"
                    + " lags.");
        }
        return new AdfSpec(terms, criterion, maxLags, level);
    }

    /** The same test decided at another significance level. */
    public AdfSpec atLevel(double newLevel) {
        return new AdfSpec(terms, selection, lags, newLevel);
    }
}
