package org.trendwright.core.forecast;

import java.util.List;

/**
 * An h-step forecast from a fitted model: one point per future period, each with its prediction
 * intervals. Every model family in the core produces this shape, so forecasts can be compared and
 * charted alike.
 *
 * @param model  a short description of the model that made it
 * @param points the forecast periods in increasing time order
 */
public record Forecast(String model, List<ForecastPoint> points) {

    public Forecast {
        points = List.copyOf(points);
    }

    /** The point forecasts as an array, h = 1..H. */
    public double[] values() {
        return points.stream().mapToDouble(ForecastPoint::value).toArray();
    }
}
