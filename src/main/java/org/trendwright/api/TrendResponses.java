package org.trendwright.api;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.trendwright.core.Observations;
import org.trendwright.core.analysis.ResidualDiagnostics;
import org.trendwright.core.analysis.SeriesScreening;
import org.trendwright.core.analysis.SeriesScreens;
import org.trendwright.core.analysis.TrendAnalyses;
import org.trendwright.core.analysis.TrendAnalysis;
import org.trendwright.core.analysis.TrendAnalysisSpec;
import org.trendwright.core.diagnostics.DurbinWatson;
import org.trendwright.core.forecast.Forecast;
import org.trendwright.core.forecast.ForecastPoint;
import org.trendwright.core.regression.Coefficient;
import org.trendwright.core.regression.OlsFit;
import org.trendwright.core.trend.BackTransformed;
import org.trendwright.core.trend.TrendFit;
import org.trendwright.series.Period;
import org.trendwright.series.SeriesVersions;

/**
 * Runs the core's trend analysis (fit, error treatment, residual checks, forecast) and its screens
 * of the series (unit root, trend break), and maps the results onto {@link FitResponse}.
 * Stateless and thread-safe.
 */
final class TrendResponses {

    private TrendResponses() {
    }

    static FitResponse fit(FitResponse.SeriesRef ref, Period first, Observations series, TrendModel model,
                           FitRequest request) {
        TrendAnalysisSpec spec = model.toSpec(request.horizon(), request.levels(), request.significanceLevel());
        TrendAnalysis analysis = TrendAnalyses.analyze(series, spec);
        SeriesScreening screening = SeriesScreens.screen(series, spec.trend().logScale(), spec.level());
        TrendFit fit = analysis.fit();
        List<FitResponse.ForecastRow> rows = forecastRows(first, analysis.forecast(), analysis.backTransformed());
        List<String> notes = new ArrayList<>(analysis.notes());
        notes.addAll(screening.notes());
        return new FitResponse(ref, model, request.horizon(), request.levels(), request.significanceLevel(),
                fit.spec().description(), rows(analysis.coefficients()), statistics(fit, series),
                fit.growthRate().map(g -> new FitResponse.Growth(g.perPeriod(), g.lower95(), g.upper95())).orElse(null),
                CheckBodies.treatment(analysis), CheckBodies.tests(analysis.diagnostics(), screening),
                CheckBodies.durbinWatson(analysis.diagnostics()), CheckBodies.screening(screening, first), notes, rows,
                trendChart(first, series, fit, analysis.diagnostics(), rows, request.levels()));
    }

    static List<FitResponse.CoefficientRow> rows(List<Coefficient> coefficients) {
        return coefficients.stream().map(c -> new FitResponse.CoefficientRow(c.name(), c.estimate(),
                c.standardError(), c.tStatistic(), c.pValue(), c.lower95(), c.upper95())).toList();
    }

    /** Statistics of the least-squares fit (also under Newey-West or GLS, whose checks test it). */
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

    /** One row per forecast point; {@code back} is aligned with the points or empty. */
    static List<FitResponse.ForecastRow> forecastRows(Period first, Forecast forecast, List<BackTransformed> back) {
        List<ForecastPoint> points = forecast.points();
        List<FitResponse.ForecastRow> rows = new ArrayList<>(points.size());
        for (int i = 0; i < points.size(); i++) {
            ForecastPoint p = points.get(i);
            BackTransformed b = back.isEmpty() ? null : back.get(i);
            rows.add(new FitResponse.ForecastRow(SeriesVersions.periodAt(first, p.time()).label(), p.horizon(),
                    p.value(), p.standardError(),
                    p.intervals().stream().map(v -> new FitResponse.Interval(v.level(), v.lower(), v.upper())).toList(),
                    b == null ? null : new FitResponse.BackTransform(b.median(), b.lognormalMean(), b.smearingMean())));
        }
        return rows;
    }

    private static FitResponse.Chart trendChart(Period first, Observations series, TrendFit fit,
                                                Optional<ResidualDiagnostics> diagnostics,
                                                List<FitResponse.ForecastRow> rows, List<Double> levels) {
        double[] autocorrelations = diagnostics.map(d -> d.correlogram().autocorrelations()).orElse(new double[0]);
        Double band = diagnostics.map(d -> d.correlogram().bandHalfWidth()).orElse(null);
        return chart(first, series, fit.fitted(), fit.residuals(), fit.spec().logScale() ? "log" : "level",
                autocorrelations, band, rows, levels);
    }

    /** Chart data of any model: observed periods and values, fit, residuals, forecast and bands. */
    static FitResponse.Chart chart(Period first, Observations series, double[] fitted, double[] residuals,
                                   String residualScale, double[] autocorrelations, Double band,
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
        return new FitResponse.Chart(periods, series.values(), fitted, residuals, residualScale, autocorrelations, band,
                rows.stream().map(FitResponse.ForecastRow::period).toList(),
                rows.stream().mapToDouble(FitResponse.ForecastRow::value).toArray(), bands);
    }
}
