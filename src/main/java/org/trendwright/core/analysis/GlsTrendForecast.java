package org.trendwright.core.analysis;

import java.util.ArrayList;
import java.util.List;
import org.trendwright.core.forecast.Forecast;
import org.trendwright.core.forecast.ForecastPoint;
import org.trendwright.core.forecast.PredictionInterval;
import org.trendwright.core.gls.Ar1GlsFit;
import org.trendwright.core.gls.Ar1GlsForecast;
import org.trendwright.core.trend.BackTransformed;
import org.trendwright.core.trend.TrendFit;

/**
 * The forecast of a trend model with AR(1) errors fitted by feasible GLS. On the level scale it
 * is {@link Ar1GlsForecast}'s. For a log-scale model that forecast is of ln y: the intervals map
 * back by e^x, and the point value is Duan's (1983) smearing mean e^m (1/n) sum e^(u_i) over the
 * GLS innovations u_i, matching the least-squares log model's convention.
 *
 * @param forecast        the forecast on the series' own scale
 * @param backTransformed for a log-scale model, each point's three back-transformations; else empty
 */
public record GlsTrendForecast(Forecast forecast, List<BackTransformed> backTransformed) {

    public GlsTrendForecast {
        backTransformed = List.copyOf(backTransformed);
    }

    /** Forecasts {@code horizon} periods after the trend fit's last observation. */
    public static GlsTrendForecast of(TrendFit fit, Ar1GlsFit gls, int horizon, List<Double> levels) {
        double[][] rows = new double[horizon][];
        int[] times = new int[horizon];
        for (int h = 1; h <= horizon; h++) {
            times[h - 1] = fit.series().lastTime() + h;
            rows[h - 1] = fit.regressorsAt(times[h - 1]);
        }
        double[] levelArray = levels.stream().mapToDouble(Double::doubleValue).toArray();
        Forecast onFittedScale = Ar1GlsForecast.forecast(gls, rows, times, levelArray);
        String model = fit.spec().description() + " with AR(1) errors (" + gls.method().name().toLowerCase()
                .replace('_', '-') + ")";
        if (!fit.spec().logScale()) {
            return new GlsTrendForecast(new Forecast(model, onFittedScale.points()), List.of());
        }
        return backTransform(onFittedScale, gls, model);
    }

    private static GlsTrendForecast backTransform(Forecast logForecast, Ar1GlsFit gls, String model) {
        double variance = gls.standardErrorOfEstimate() * gls.standardErrorOfEstimate();
        double smearing = BackTransformed.smearingFactor(gls.transformedResiduals());
        List<ForecastPoint> points = new ArrayList<>();
        List<BackTransformed> back = new ArrayList<>();
        for (ForecastPoint p : logForecast.points()) {
            BackTransformed b = BackTransformed.of(p.value(), variance, smearing);
            back.add(b);
            List<PredictionInterval> intervals = p.intervals().stream()
                    .map(i -> new PredictionInterval(i.level(), Math.exp(i.lower()), Math.exp(i.upper()))).toList();
            points.add(new ForecastPoint(p.time(), p.horizon(), b.smearingMean(), p.standardError(), intervals));
        }
        return new GlsTrendForecast(new Forecast(model, points), back);
    }
}
