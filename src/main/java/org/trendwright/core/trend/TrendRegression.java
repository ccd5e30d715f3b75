package org.trendwright.core.trend;

import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.Observations;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;

/**
 * The regression behind a trend model on one series, before any fitting: the design of the
 * observed periods, the response (ln y for a log-scale model) and the regressor row of any
 * period. It lets a caller that refits many times (the out-of-sample model comparison) take the
 * point forecasts alone, without the inference and diagnostics of {@link Trends#fit}; the values
 * are those of {@code Trends.fit(series, spec).forecast(horizon, levels)}, computed by the same
 * steps. Immutable and thread-safe.
 *
 * @param spec     the model
 * @param series   the data
 * @param design   the regressors of the observed periods
 * @param response y, or ln y for a log-scale model
 */
public record TrendRegression(TrendSpec spec, Observations series, Design design, double[] response) {

    public TrendRegression {
        response = response.clone();
    }

    @Override
    public double[] response() {
        return response.clone();
    }

    /**
     * The model's regression on the series, refused exactly as {@link Trends#fit} refuses it.
     *
     * @throws InsufficientDataException when there are not more observations than coefficients
     * @throws org.trendwright.core.NonPositiveValueException for a log-scale model and a value <= 0
     * @throws org.trendwright.core.InvalidSpecificationException for seasonal dummies on a series
     *                                   with one period per year
     */
    public static TrendRegression of(Observations series, TrendSpec spec) {
        TrendDesign design = TrendDesign.of(spec, series);
        if (series.size() <= design.width()) {
            throw InsufficientDataException.forModel("A " + spec.description() + " (" + design.width()
                    + " coefficients)", design.width() + 1, series.size());
        }
        double[] y = spec.logScale() ? Trends.logValues(series) : series.values();
        return new TrendRegression(spec, series, design.design(series.times()), y);
    }

    /** The regressor row x(t) for period index t (in-sample or future). */
    public double[] regressorsAt(int t) {
        return TrendDesign.of(spec, series).row(t);
    }

    /**
     * The least-squares point forecasts of the {@code horizon} periods after the last
     * observation: x(t)'b, and for a log-scale model Duan's smearing mean e^(x(t)'b) (1/n) sum
     * e^(e_i), as {@link TrendFit#forecast} reports them.
     */
    public double[] pointForecasts(int horizon) {
        LeastSquares.Estimates fit = LeastSquares.estimates(design, response);
        double smearing = spec.logScale() ? BackTransformed.smearingFactor(fit.residuals()) : 1.0;
        double[] values = new double[horizon];
        for (int h = 1; h <= horizon; h++) {
            double m = fit.predict(regressorsAt(series.lastTime() + h));
            values[h - 1] = spec.logScale() ? BackTransformed.of(m, fit.residualVariance(), smearing).smearingMean()
                    : m;
        }
        return values;
    }
}
