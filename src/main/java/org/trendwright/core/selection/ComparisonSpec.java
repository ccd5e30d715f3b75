package org.trendwright.core.selection;

import java.util.List;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.TestResult;

/**
 * How to compare candidate models out of sample.
 *
 * @param holdout number of final periods held out; each model is fitted to the rest and forecasts
 *                them 1..holdout steps ahead
 * @param origins number of rolling forecast origins: the training sample ends at n - origins,
 *                ..., n - 1 in turn, and each origin forecasts up to {@code holdout} steps
 *                (as far as the data go)
 * @param levels  prediction-interval levels for the forecasts
 * @param level   significance level for the residual checks and the Diebold-Mariano test
 */
public record ComparisonSpec(int holdout, int origins, List<Double> levels, double level) {

    public ComparisonSpec {
        if (holdout < 1) {
            throw new InvalidSpecificationException("The holdout must be at least 1 period, got " + holdout + ".");
        }
        if (origins < 1) {
            throw new InvalidSpecificationException("At least one forecast origin is needed, got " + origins + ".");
        }
        levels = List.copyOf(levels);
        levels.forEach(TestResult::checkLevel);
        TestResult.checkLevel(level);
    }

    /** Holdout of one year (at least 4 periods), 8 origins, 80% and 95% intervals, 5% tests. */
    public static ComparisonSpec defaultsFor(int periodsPerYear) {
        return new ComparisonSpec(Math.max(4, periodsPerYear), 8, List.of(0.80, 0.95), 0.05);
    }
}
