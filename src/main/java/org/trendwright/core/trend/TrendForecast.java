package org.trendwright.core.trend;

import java.util.List;
import org.trendwright.core.forecast.Forecast;

/**
 * Forecasts from a trend model. For a log-scale model each point also carries its three
 * back-transformations (median, lognormal mean, smearing mean), aligned with
 * {@code forecast.points()}; the point value of {@code forecast} is the smearing mean and the
 * intervals are the log-scale intervals mapped back by e^x (exact for y itself, since e^x is
 * monotone). For a level model {@code backTransformed} is empty.
 *
 * @param forecast        the forecast in the shape every model shares
 * @param backTransformed per point, the log-scale model's back-transformations, or empty
 */
public record TrendForecast(Forecast forecast, List<BackTransformed> backTransformed) {

    public TrendForecast {
        backTransformed = List.copyOf(backTransformed);
    }
}
