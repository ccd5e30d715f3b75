package org.trendwright.api;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.trendwright.core.ModelException;
import org.trendwright.core.Observations;
import org.trendwright.core.analysis.SeriesScreening;
import org.trendwright.core.analysis.SeriesScreens;
import org.trendwright.core.autoregression.ArFit;
import org.trendwright.core.autoregression.ArForecasts;
import org.trendwright.core.autoregression.Autoregression;
import org.trendwright.core.diagnostics.LjungBox;
import org.trendwright.core.forecast.Forecast;
import org.trendwright.core.regression.OlsFit;
import org.trendwright.series.Period;
import org.trendwright.series.SeriesVersions;

/**
 * Fits an autoregression with the core and maps it onto {@link FitResponse}: coefficients and
 * statistics of its least-squares regression, the stationarity check, the Ljung-Box test of its
 * residuals (degrees of freedom reduced by the lags fitted) and the series screens. The
 * Durbin-Watson test does not apply (a lagged dependent variable biases it towards 2), so it is
 * null. The first max-lag periods have no fitted value or residual: null in the chart. Stateless
 * and thread-safe.
 */
final class ArResponses {

    private ArResponses() {
    }

    static FitResponse fit(FitResponse.SeriesRef ref, Period first, Observations series, ArModel model,
                           FitRequest request) {
        ArFit fit = Autoregression.fit(series, model.toSpec());
        double[] levels = request.levels().stream().mapToDouble(Double::doubleValue).toArray();
        Forecast forecast = ArForecasts.forecast(fit, request.horizon(), levels);
        SeriesScreening screening = SeriesScreens.screen(series, false, request.significanceLevel());
        List<String> notes = new ArrayList<>(List.of(fit.stationarity().statement()));
        List<FitResponse.Test> tests = new ArrayList<>();
        ljungBox(fit, series, request.significanceLevel(), tests, notes);
        tests.addAll(CheckBodies.tests(java.util.Optional.empty(), screening));
        notes.addAll(screening.notes());
        List<FitResponse.ForecastRow> rows = TrendResponses.forecastRows(first, forecast, List.of());
        return new FitResponse(ref, model, request.horizon(), request.levels(), request.significanceLevel(),
                description(fit), TrendResponses.rows(fit.coefficients()), statistics(fit.regression()), null,
                null, tests, null, CheckBodies.screening(screening, first), notes, rows,
                chart(first, series, fit, rows, request.levels()));
    }

    private static String description(ArFit fit) {
        return "autoregression with a constant and lags " + Arrays.toString(fit.lags())
                + (fit.differenced() ? ", on first differences" : "");
    }

    private static void ljungBox(ArFit fit, Observations series, double level, List<FitResponse.Test> tests,
                                 List<String> notes) {
        try {
            tests.add(CheckBodies.test(LjungBox.testWithDefaultLags(fit.regression().residuals(),
                    series.periodsPerYear(), fit.lags().length, level).test()));
        } catch (ModelException e) {
            notes.add("The Ljung-Box test was skipped: " + e.getMessage());
        }
    }

    private static FitResponse.Statistics statistics(OlsFit ols) {
        return new FitResponse.Statistics(ols.observations(), ols.coefficients().size(),
                ols.residualDegreesOfFreedom(), "level", ols.rSquared(), ols.adjustedRSquared(), ols.fStatistic(),
                ols.fPValue(), ols.standardErrorOfEstimate(), ols.residualSumOfSquares(), ols.totalSumOfSquares(),
                ols.logLikelihood(), ols.aic(), ols.bic(), ols.conditionNumber(), null, null);
    }

    /** Fitted levels and residuals aligned with the observed periods; NaN (null) before the first fitted one. */
    private static FitResponse.Chart chart(Period first, Observations series, ArFit fit,
                                           List<FitResponse.ForecastRow> rows, List<Double> levels) {
        int n = series.size();
        double[] values = series.values();
        double[] fittedWorking = fit.regression().fitted();
        double[] residualWorking = fit.regression().residuals();
        double[] fitted = new double[n];
        double[] residuals = new double[n];
        Arrays.fill(fitted, Double.NaN);
        Arrays.fill(residuals, Double.NaN);
        int offset = n - fittedWorking.length;
        for (int i = 0; i < fittedWorking.length; i++) {
            int t = offset + i;
            // On differences the regression fits y_t - y_(t-1), so the fitted level adds y_(t-1) back.
            fitted[t] = fit.differenced() ? values[t - 1] + fittedWorking[i] : fittedWorking[i];
            residuals[t] = residualWorking[i];
        }
        return TrendResponses.chart(first, series, fitted, residuals, "level", new double[0], null, rows, levels);
    }
}
