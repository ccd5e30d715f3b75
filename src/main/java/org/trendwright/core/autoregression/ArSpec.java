package org.trendwright.core.autoregression;

import org.trendwright.core.InvalidSpecificationException;

/**
 * What autoregression to fit: y_t = b0 + Σ_{i ∈ lags} b_i y_{t−i} + e_t on the series or on its
 * first differences.
 *
 * @param order        with {@link LagSelection#FIXED} the order p (lags 1..p); with AIC or BIC the
 *                     largest order tried
 * @param selection    fixed order or the criterion that chooses it
 * @param differenced  fit the model to Δy_t = y_t − y_{t−1} and forecast the levels by integrating
 * @param seasonalLag  add the seasonal lag s = periods per year (4 quarterly, 12 monthly) to lags
 *                     1..p: a subset AR with lags {1..p, s}; refused for annual data
 */
public record ArSpec(int order, LagSelection selection, boolean differenced, boolean seasonalLag) {

    public ArSpec {
        if (order < 0) {
            throw new InvalidSpecificationException("An AR order cannot be negative, got " + order + ".");
        }
        if (selection == null) {
            throw new InvalidSpecificationException("Say how the AR order is chosen: FIXED, AIC or BIC.");
        }
    }

    /** AR(p) with a constant on the levels, lags 1..p. */
    public static ArSpec ofOrder(int order) {
        return new ArSpec(order, LagSelection.FIXED, false, false);
    }

    /** The order chosen by AIC or BIC among 0..maxOrder on a common sample. */
    public static ArSpec selectedBy(LagSelection criterion, int maxOrder) {
        if (criterion == LagSelection.FIXED) {
            throw new InvalidSpecificationException("selectedBy needs a criterion (AIC or BIC); use ofOrder for a"
                    + " fixed order.");
        }
        return new ArSpec(maxOrder, criterion, false, false);
    }

    /** The same model on first differences. */
    public ArSpec onDifferences() {
        return new ArSpec(order, selection, true, seasonalLag);
    }

    /** The same model with the seasonal lag added. */
    public ArSpec withSeasonalLag() {
        return new ArSpec(order, selection, differenced, true);
    }
}
