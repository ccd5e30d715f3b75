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
 * @param errors       how a trend model's errors were treated; null for other families
 * @param tests        every test run: residual checks of the least-squares fit, then the unit-root
 *                     and break screens of the series, each with its decision and a plain reading
 * @param durbinWatson the exact Durbin-Watson test in detail, or null when it was skipped or does
 *                     not apply (autoregressions)
 * @param screening    what the screens of the series found
 * @param notes        what was skipped or assumed, and why, in plain words
 * @param forecast     one row per future period
 * @param chart        actual, fitted, residuals, residual autocorrelations and forecast bands
 */
public record FitResponse(SeriesRef series, ModelSpec model, int horizon, List<Double> levels,
                          double significanceLevel, String description, List<CoefficientRow> coefficients,
                          Statistics statistics, Growth growthRate, ErrorTreatmentBody errors, List<Test> tests,
                          DurbinWatsonDetail durbinWatson, Screening screening, List<String> notes,
                          List<ForecastRow> forecast, Chart chart) {

    /**
     * One hypothesis test as the core reports it; {@code decision} is "reject" or "do-not-reject"
     * at {@code level}, and {@code reading} says in one sentence what it means for the forecast.
     */
    public record Test(String test, String nullHypothesis, double statistic, String distribution,
                       List<Double> degreesOfFreedom, double pValue, double level, String decision,
                       String reading) {
    }

    /**
     * The error treatment: "classical", "newey-west" (with its lag), or "cochrane-orcutt" /
     * "prais-winsten" (feasible GLS for AR(1) errors, with rho and the transformed regression's
     * standard error of estimate and Durbin-Watson statistic). Fields that do not apply are null.
     */
    public record ErrorTreatmentBody(String treatment, Integer lag, String lagRule, Double rho,
                                     Double rhoStandardError, Integer iterations, Boolean converged,
                                     Double standardErrorOfEstimate, Double durbinWatson) {
    }

    /**
     * The exact Durbin-Watson test: p-values against positive and negative correlation, the
     * bounds dL, dU at the test level (null when the design has no constant), both bounds
     * verdicts ("reject", "inconclusive", "do-not-reject", "not-applicable"), the exact verdict
     * ("positive-serial-correlation", "negative-serial-correlation", "none-detected") and its
     * reading.
     */
    public record DurbinWatsonDetail(double statistic, double pValuePositive, double pValueNegative, double level,
                                     Double lowerBound, Double upperBound, String boundsVerdictPositive,
                                     String boundsVerdictNegative, String verdict, String reading) {
    }

    /** The screens of the series: lags of the unit-root test, and where a trend break would start. */
    public record Screening(Integer unitRootLags, String breakPeriod) {
    }

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
     * Chart data: observed periods with actual, fitted (original scale) and least-squares residual
     * (model scale) values; residual autocorrelations r_1.. with the +-2/sqrt(n) band (empty and
     * null when the checks were skipped); then the forecast periods with point forecasts and one
     * band per level.
     */
    public record Chart(List<String> periods, double[] actual, double[] fitted, double[] residuals,
                        String residualScale, double[] autocorrelations, Double autocorrelationBand,
                        List<String> forecastPeriods, double[] forecast, List<Band> bands) {
    }
}
