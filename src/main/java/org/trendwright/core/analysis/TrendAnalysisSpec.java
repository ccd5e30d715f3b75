package org.trendwright.core.analysis;

import java.util.List;
import java.util.OptionalInt;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.TestResult;
import org.trendwright.core.trend.TrendSpec;

/**
 * What to fit and report for one trend model.
 *
 * @param trend                  the trend model
 * @param errors                 how its errors are treated (classical, Newey-West, GLS)
 * @param hacLag                 the Newey-West lag; empty for the automatic rule
 * @param serialCorrelationOrder the Breusch-Godfrey order; empty for the seasonal period (1 for
 *                               annual data)
 * @param horizon                periods to forecast, at least 1
 * @param levels                 prediction-interval levels, each in (0, 1)
 * @param level                  significance level of every test, in (0, 1)
 */
public record TrendAnalysisSpec(TrendSpec trend, ErrorTreatment errors, OptionalInt hacLag,
                                OptionalInt serialCorrelationOrder, int horizon, List<Double> levels, double level) {

    public TrendAnalysisSpec {
        if (horizon < 1) {
            throw new InvalidSpecificationException("The forecast horizon must be at least 1 period, got " + horizon + ".");
        }
        levels = List.copyOf(levels);
        levels.forEach(TestResult::checkLevel);
        TestResult.checkLevel(level);
    }

    /** Classical errors, default orders, 8 periods ahead, 80% and 95% intervals, 5% tests. */
    public static TrendAnalysisSpec of(TrendSpec trend) {
        return new TrendAnalysisSpec(trend, ErrorTreatment.CLASSICAL, OptionalInt.empty(), OptionalInt.empty(), 8,
                List.of(0.80, 0.95), 0.05);
    }

    /** This spec with another error treatment. */
    public TrendAnalysisSpec withErrors(ErrorTreatment treatment) {
        return new TrendAnalysisSpec(trend, treatment, hacLag, serialCorrelationOrder, horizon, levels, level);
    }
}
