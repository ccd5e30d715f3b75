package org.trendwright.core.trend;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.Observations;
import org.trendwright.core.StudentT;
import org.trendwright.core.TestResult;
import org.trendwright.core.forecast.Forecast;
import org.trendwright.core.forecast.ForecastPoint;
import org.trendwright.core.forecast.PredictionInterval;
import org.trendwright.core.regression.OlsFit;

/**
 * A fitted trend model and prediction from it. Immutable and thread-safe.
 *
 * <p>Prediction at period t with regressor row x = x(t), b the coefficients, s the standard error
 * of estimate and (X'X)^-1 from the fit: the point prediction is m = x'b, the standard error of
 * the forecast error is s sqrt(1 + x'(X'X)^-1 x) (the 1 for the new error, the quadratic form for
 * the estimation error in b), and the interval at level c is m +- t(1 - (1-c)/2; n-k) times that
 * standard error (for example Johnston & DiNardo 1997, Econometric Methods, 4th ed., section 3.5).
 * These intervals assume the model's errors are independent, homoskedastic and normal; serial
 * correlation makes them too narrow.
 *
 * @param spec            the model
 * @param series          the data it was fitted to
 * @param ols             the least-squares fit (on ln y for a log-scale model)
 * @param growthRate      the per-period growth rate, for the log-linear model only
 * @param smearingFactor  Duan's (1983) factor (1/n) sum e^(e_i) for a log-scale model, 1 otherwise
 * @param fitted          fitted values on the original scale (smearing means for a log-scale model)
 * @param backTransformed for a log-scale model, the three back-transformations of each fitted
 *                        value; empty otherwise
 */
public record TrendFit(TrendSpec spec, Observations series, OlsFit ols, Optional<GrowthRate> growthRate,
                       double smearingFactor, double[] fitted, List<BackTransformed> backTransformed) {

    public TrendFit {
        fitted = fitted.clone();
        backTransformed = List.copyOf(backTransformed);
    }

    @Override
    public double[] fitted() {
        return fitted.clone();
    }

    /** Residuals on the scale the model was fitted on (ln y for a log-scale model). */
    public double[] residuals() {
        return ols.residuals();
    }

    /** The regressor row x(t) of this model for period index t (in-sample or future). */
    public double[] regressorsAt(int t) {
        return TrendDesign.of(spec, series).row(t);
    }

    /** Predicts period t (any t; t beyond the last observation is a forecast). */
    public TrendForecast predict(int t, List<Double> levels) {
        return predictAll(new int[] {t}, levels);
    }

    /** Forecasts the {@code horizon} periods after the last observation. */
    public TrendForecast forecast(int horizon, List<Double> levels) {
        if (horizon < 1) {
            throw new InvalidSpecificationException("The forecast horizon must be at least 1 period, got " + horizon + ".");
        }
        int[] times = new int[horizon];
        for (int h = 1; h <= horizon; h++) {
            times[h - 1] = series.lastTime() + h;
        }
        return predictAll(times, levels);
    }

    private TrendForecast predictAll(int[] times, List<Double> levels) {
        levels.forEach(TestResult::checkLevel);
        TrendDesign design = TrendDesign.of(spec, series);
        List<ForecastPoint> points = new ArrayList<>(times.length);
        List<BackTransformed> back = new ArrayList<>();
        double[] quantiles = levels.stream()
                .mapToDouble(level -> StudentT.quantile(ols.residualDegreesOfFreedom(), 1 - (1 - level) / 2))
                .toArray();
        for (int time : times) {
            double[] x = design.row(time);
            double m = ols.predict(x);
            double se = ols.standardErrorOfEstimate() * Math.sqrt(1 + ols.leverage(x));
            List<PredictionInterval> intervals = new ArrayList<>(levels.size());
            for (int l = 0; l < quantiles.length; l++) {
                double level = levels.get(l);
                double half = quantiles[l] * se;
                intervals.add(spec.logScale()
                        ? new PredictionInterval(level, Math.exp(m - half), Math.exp(m + half))
                        : new PredictionInterval(level, m - half, m + half));
            }
            double value = m;
            if (spec.logScale()) {
                BackTransformed b = BackTransformed.of(m, ols.residualVariance(), smearingFactor);
                back.add(b);
                value = b.smearingMean();
            }
            points.add(new ForecastPoint(time, time - series.lastTime(), value, se, intervals));
        }
        return new TrendForecast(new Forecast(spec.description(), points), back);
    }
}
