package org.trendwright.core.selection;

import java.util.ArrayList;
import java.util.List;
import org.trendwright.core.Observations;
import org.trendwright.core.forecast.ForecastPoint;

/**
 * A model that can be fitted to a training series and forecast from it: the unit that the model
 * comparison refits at every holdout split and forecast origin. Implementations are immutable
 * and thread-safe.
 */
public interface Candidate {

    /** A short name shown in the comparison table, e.g. "linear trend". */
    String name();

    /** Fits the model to {@code training}; throws a ModelException when the data cannot support it. */
    CandidateFit fit(Observations training);

    /**
     * The point forecasts of the {@code horizon} periods after {@code training}: the values of
     * {@code fit(training).forecast(horizon, levels)}, which do not depend on the levels. The
     * comparison refits at every forecast origin and scores only these values, so an
     * implementation may compute them without the intervals, inference and residual checks of a
     * full fit, but must give the same numbers.
     */
    default double[] pointForecasts(Observations training, int horizon) {
        return fit(training).forecast(horizon, List.of(0.95)).points().stream().mapToDouble(ForecastPoint::value)
                .toArray();
    }

    /**
     * The point forecasts from several training ends of one series: for each i, the values of
     * {@code pointForecasts(series.head(ends[i]), horizons[i])}, computed in the order given (so the
     * first end that fails is the one reported). An implementation may share work between the ends
     * but must give those numbers.
     */
    default List<double[]> pointForecastsFromEnds(Observations series, int[] ends, int[] horizons) {
        List<double[]> forecasts = new ArrayList<>(ends.length);
        for (int i = 0; i < ends.length; i++) {
            forecasts.add(pointForecasts(series.head(ends[i]), horizons[i]));
        }
        return forecasts;
    }
}
