package org.trendwright.core.diagnostics;

import java.util.List;
import java.util.Optional;
import org.trendwright.core.Decision;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.TestResult;

/**
 * The complete Durbin-Watson test of a least-squares fit: the statistic, the exact p-values for the
 * fit's own design, Durbin &amp; Watson's bounds for its n and k', both verdicts and a plain reading.
 * Produced by {@link DurbinWatson#test}.
 *
 * <p>The verdict is decided by the exact p-values (two one-sided tests at {@code level}); the
 * bounds verdicts are shown alongside, and {@link #inconclusiveByBounds()} says when the bounds
 * alone could not have decided. When the design does not span the constant the bounds do not
 * hold: the three bounds are then empty and both bounds verdicts are
 * {@link DurbinWatsonBoundsVerdict#NOT_APPLICABLE} (never NaN).
 *
 * <p>Immutable and thread-safe.
 *
 * @param statistic                   d = sum (e_t - e_{t-1})^2 / sum e_t^2, in [0, 4]
 * @param observations                n
 * @param regressorsExcludingConstant k' (k - 1 when the design spans the constant, else k)
 * @param interceptIncluded           true when the design spans the constant, so the bounds apply
 * @param level                       the size of each one-sided test, in (0, 0.5)
 * @param pValuePositive              P(d &lt;= statistic) under the null: the exact p-value against
 *                                    positive serial correlation
 * @param pValueNegative              P(d &gt;= statistic): the exact p-value against negative correlation
 * @param boundsAtFivePercent         dL and dU at 5% for this n and k' (empty without intercept)
 * @param boundsAtOnePercent          dL and dU at 1% (empty without intercept)
 * @param boundsAtLevel               dL and dU at {@code level}, used for the bounds verdicts
 * @param boundsVerdictPositive       the bounds test against positive correlation at {@code level}
 * @param boundsVerdictNegative       the bounds test against negative correlation at {@code level}
 * @param verdict                     the conclusion of the exact test
 */
public record DurbinWatsonResult(double statistic, int observations, int regressorsExcludingConstant,
                                 boolean interceptIncluded, double level, double pValuePositive,
                                 double pValueNegative, Optional<DurbinWatsonBounds> boundsAtFivePercent,
                                 Optional<DurbinWatsonBounds> boundsAtOnePercent,
                                 Optional<DurbinWatsonBounds> boundsAtLevel,
                                 DurbinWatsonBoundsVerdict boundsVerdictPositive,
                                 DurbinWatsonBoundsVerdict boundsVerdictNegative, DurbinWatsonVerdict verdict) {

    public DurbinWatsonResult {
        if (!(statistic >= 0 && statistic <= 4)) {
            throw new InvalidSpecificationException("A Durbin-Watson statistic lies in [0, 4], got " + statistic + ".");
        }
        boolean anyBounds = boundsAtFivePercent.isPresent() || boundsAtOnePercent.isPresent() || boundsAtLevel.isPresent();
        boolean notApplicable = boundsVerdictPositive == DurbinWatsonBoundsVerdict.NOT_APPLICABLE;
        if (interceptIncluded == notApplicable || interceptIncluded != anyBounds) {
            throw new InvalidSpecificationException("Durbin-Watson bounds are reported exactly when the design"
                    + " includes an intercept.");
        }
    }

    /** True when either bounds verdict is inconclusive, so only the exact p-value could decide. */
    public boolean inconclusiveByBounds() {
        return boundsVerdictPositive == DurbinWatsonBoundsVerdict.INCONCLUSIVE
                || boundsVerdictNegative == DurbinWatsonBoundsVerdict.INCONCLUSIVE;
    }

    /**
     * "inconclusive by the bounds", "conclusive by the bounds", or, without an intercept,
     * "bounds not applicable (the design has no intercept)".
     */
    public String boundsNote() {
        if (!interceptIncluded) {
            return "bounds not applicable (the design has no intercept)";
        }
        return inconclusiveByBounds() ? "inconclusive by the bounds" : "conclusive by the bounds";
    }

    /** One plain sentence on what the outcome means for the fit and its forecasts. */
    public String reading() {
        return DurbinWatsonReading.of(this);
    }

    /**
     * The common summary. Its p-value is the smaller one-sided exact p-value, and it rejects the
     * null of independent errors exactly when the verdict is not NONE_DETECTED, i.e. when either
     * one-sided test rejects at {@code level} (so the overall size is 2 level). The exact
     * distribution has no degrees of freedom, so that list is empty.
     */
    public TestResult toTestResult() {
        double pValue = Math.min(pValuePositive, pValueNegative);
        Decision decision = verdict == DurbinWatsonVerdict.NONE_DETECTED ? Decision.DO_NOT_REJECT : Decision.REJECT;
        return new TestResult("Durbin-Watson", "The regression errors are serially independent (no first-order"
                + " serial correlation)", statistic, "exact null distribution of d for this design", List.of(),
                pValue, level, decision, reading());
    }
}
