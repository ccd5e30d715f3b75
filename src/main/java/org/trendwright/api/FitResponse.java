package org.trendwright.api;

import java.util.List;

/**
 * The answer to a fit: the model as understood (defaults filled in), every coefficient and
 * statistic the core produced, the forecast table and the chart data. Non-finite numbers are
 * null (see {@link JsonMapping}). Immutable and thread-safe.
 *
 * @param series       which data was fitted (id and version null for the stateless endpoint)
 * @param model        the normalized model
 * @param horizon      the forecast horizon
 * @param levels       the interval levels
 * @param description  the core's short description of the model
 * @param coefficients the estimated coefficients with their inference
 * @param statistics   goodness of fit and information criteria
 * @param growthRate   for a log-linear trend, the growth per period; null otherwise
 * @param forecast     one row per future period
 * @param chart        actual, fitted, residuals and forecast bands, aligned by period
 */
public record FitResponse(SeriesRef series, ModelSpec model, int horizon, List<Double> levels, String description,
                          List<CoefficientRow> coefficients, Statistics statistics, Growth growthRate,
                          List<ForecastRow> forecast, Chart chart) {

    /** The fitted data. */
    public record SeriesRef(Long id, Integer version, String name, String frequency, int periodsPerYear,
                            String firstPeriod, String lastPeriod, int observations, boolean hasGaps) {
    }

    /** One coefficient: estimate, standard error, t, two-sided p and the 95% confidence interval. */
    public record CoefficientRow(String name, double estimate, double standardError, double tStatistic,
                                 double pValue, double lower95, double upper95) {
    }

    /**
     * Fit statistics. {@code scale} is "level" or "log" (the scale residuals and the standard
     * error of estimate are on); {@code durbinWatson} is null for a series with gaps.
     */
    public record Statistics(int observations, int parameters, int residualDegreesOfFreedom, String scale,
                             double rSquared, double adjustedRSquared, double fStatistic, double fPValue,
                             double standardErrorOfEstimate, double residualSumOfSquares, double totalSumOfSquares,
                             double logLikelihood, double aic, double bic, double conditionNumber,
                             Double durbinWatson, Double smearingFactor) {
    }

    /** Growth per period g = e^b1 - 1 of a log-linear trend, with its 95% interval. */
    public record Growth(double perPeriod, double lower95, double upper95) {
    }

    /** A prediction interval. */
    public record Interval(double level, double lower, double upper) {
    }

    /** The three back-transformations of a log-scale prediction. */
    public record BackTransform(double median, double lognormalMean, double smearingMean) {
    }

    /** One forecast period. {@code backTransformed} is null for a level model. */
    public record ForecastRow(String period, int horizon, double value, double standardError,
                              List<Interval> intervals, BackTransform backTransformed) {
    }

    /** Interval bounds at one level over the forecast periods. */
    public record Band(double level, double[] lower, double[] upper) {
    }

    /**
     * Chart data: observed periods with actual, fitted (original scale) and residual (model scale)
     * values, then the forecast periods with point forecasts and one band per level.
     */
    public record Chart(List<String> periods, double[] actual, double[] fitted, double[] residuals,
                        String residualScale, List<String> forecastPeriods, double[] forecast, List<Band> bands) {
    }
}
