package org.trendwright.core.forecast;

import java.util.List;

/**
 * The forecast for one future period.
 *
 * @param time          the period index t (counted from 1 at the series' first observation)
 * @param horizon       steps ahead of the last observation, h = 1, 2, ...
 * @param value         the point forecast on the series' own scale
 * @param standardError the standard error of the forecast error on the scale the model is fitted
 *                      on (for a log model: of ln y)
 * @param intervals     prediction intervals on the series' own scale, one per requested level
 */
public record ForecastPoint(int time, int horizon, double value, double standardError,
                            List<PredictionInterval> intervals) {

    public ForecastPoint {
        intervals = List.copyOf(intervals);
    }

    /** The interval at the given level, compared to within 1e-9. */
    public PredictionInterval interval(double level) {
        return intervals.stream().filter(i -> Math.abs(i.level() - level) < 1e-9).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("No interval at level " + level));
    }
}
