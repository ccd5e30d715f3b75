package org.trendwright.api;

import java.util.ArrayList;
import java.util.List;
import org.trendwright.core.Observations;
import org.trendwright.core.diagnostics.DurbinWatson;
import org.trendwright.core.forecast.ForecastPoint;
import org.trendwright.core.regression.Coefficient;
import org.trendwright.core.regression.OlsFit;
import org.trendwright.core.trend.TrendFit;
import org.trendwright.core.trend.TrendForecast;
import org.trendwright.core.trend.Trends;
import org.trendwright.series.Period;
import org.trendwright.series.SeriesVersions;

/** Fits a trend model with the core and maps its records onto {@link FitResponse}. Stateless and thread-safe. */
final class TrendResponses {

    private TrendResponses() {
    }

    static FitResponse fit(FitResponse.SeriesRef ref, Period first, Observations series, TrendModel model,
                           FitRequest request) {
        TrendFit fit = Trends.fit(series, model.toSpec());
        TrendForecast forecast = fit.forecast(request.horizon(), request.levels());
        List<FitResponse.ForecastRow> rows = forecastRows(first, forecast);
        ResidualChecks.Result checks = ResidualChecks.of(fit.ols(), series, request.significanceLevel());
        return new FitResponse(ref, model, request.horizon(), request.levels(), request.significanceLevel(),
                fit.spec().description(), rows(fit.ols().coefficients()), statistics(fit, series),
                fit.growthRate().map(g -> new FitResponse.Growth(g.perPeriod(), g.lower95(), g.upper95())).orElse(null),
                checks.tests(), checks.robust(), checks.notes(), rows, chart(first, series, fit, rows, request.levels()));
    }

    static List<FitResponse.CoefficientRow> rows(List<Coefficient> coefficients) {
        return coefficients.stream().map(c -> new FitResponse.CoefficientRow(c.name(), c.estimate(),
                c.standardError(), c.tStatistic(), c.pValue(), c.lower95(), c.upper95())).toList();
    }

    private static FitResponse.Statistics statistics(TrendFit fit, Observations series) {
        OlsFit ols = fit.ols();
        boolean log = fit.spec().logScale();
        // Durbin-Watson compares neighbouring residuals, which a gap would make non-neighbours.
        Double dw = series.hasGaps() ? null : DurbinWatson.statistic(ols.residuals());
        return new FitResponse.Statistics(ols.observations(), ols.coefficients().size(),
                ols.residualDegreesOfFreedom(), log ? "log" : "level", ols.rSquared(), ols.adjustedRSquared(),
                ols.fStatistic(), ols.fPValue(), ols.standardErrorOfEstimate(), ols.residualSumOfSquares(),
                ols.totalSumOfSquares(), ols.logLikelihood(), ols.aic(), ols.bic(), ols.conditionNumber(), dw,
                log ? fit.smearingFactor() : null);
    }

    private static List<FitResponse.ForecastRow> forecastRows(Period first, TrendForecast forecast) {
        List<ForecastPoint> points = forecast.forecast().points();
        List<FitResponse.ForecastRow> rows = new ArrayList<>(points.size());
        for (int i = 0; i < points.size(); i++) {
            ForecastPoint p = points.get(i);
            var back = forecast.backTransformed().isEmpty() ? null : forecast.backTransformed().get(i);
            rows.add(new FitResponse.ForecastRow(SeriesVersions.periodAt(first, p.time()).label(), p.horizon(),
                    p.value(), p.standardError(),
                    p.intervals().stream().map(v -> new FitResponse.Interval(v.level(), v.lower(), v.upper())).toList(),
                    back == null ? null
                            : new FitResponse.BackTransform(back.median(), back.lognormalMean(), back.smearingMean())));
        }
        return rows;
    }

    private static FitResponse.Chart chart(Period first, Observations series, TrendFit fit,
                                           List<FitResponse.ForecastRow> rows, List<Double> levels) {
        List<String> periods = new ArrayList<>(series.size());
        for (int i = 0; i < series.size(); i++) {
            periods.add(SeriesVersions.periodAt(first, series.timeAt(i)).label());
        }
        List<FitResponse.Band> bands = new ArrayList<>(levels.size());
        for (int j = 0; j < levels.size(); j++) {
            final int level = j;
            bands.add(new FitResponse.Band(levels.get(j),
                    rows.stream().mapToDouble(r -> r.intervals().get(level).lower()).toArray(),
                    rows.stream().mapToDouble(r -> r.intervals().get(level).upper()).toArray()));
        }
        return new FitResponse.Chart(periods, series.values(), fit.fitted(), fit.residuals(),
                fit.spec().logScale() ? "log" : "level", rows.stream().map(FitResponse.ForecastRow::period).toList(),
                rows.stream().mapToDouble(FitResponse.ForecastRow::value).toArray(), bands);
    }
}
