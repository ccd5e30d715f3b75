package org.trendwright.core.trend;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.Matrices;
import org.trendwright.core.Observations;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.NormalEquations;

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
        return forecasts(LeastSquares.estimates(design, response), series.lastTime(), horizon);
    }

    /**
     * The point forecasts of the fits to prefixes of the series, for the training ends of a model
     * comparison: for each i, the values {@code of(series.head(ends[i]), spec).pointForecasts(horizons[i])}
     * gives. A prefix's design is the first rows of this one (each row is a function of its period
     * index alone), so one pass accumulates X'X and X'y of every prefix, and each is solved by
     * {@link NormalEquations}, to about c u cond(X)^2 of the Householder route's coefficients, far
     * inside what a forecast comparison can show. A prefix the normal equations decline, or one with
     * no more observations than coefficients, is refitted through {@link #of} and
     * {@link #pointForecasts}, which also report its errors.
     *
     * @param ends     training sizes, each from 1 to the series' size, in any order
     * @param horizons how many periods ahead of each training end to forecast
     */
    public List<double[]> prefixPointForecasts(int[] ends, int[] horizons) {
        int k = design.width();
        double[][][] grams = new double[ends.length][][];
        double[][] moments = new double[ends.length][];
        double[][] gram = Matrices.zeros(k, k);
        double[] moment = new double[k];
        double[] row = new double[k];
        int longest = Arrays.stream(ends).max().orElse(0);
        for (int i = 0; i < longest; i++) {
            for (int j = 0; j < k; j++) {
                row[j] = design.get(i, j);
            }
            NormalEquations.addRow(row, response[i], gram, moment);
            for (int e = 0; e < ends.length; e++) {
                if (ends[e] == i + 1) {
                    grams[e] = Matrices.copy(gram);
                    moments[e] = moment.clone();
                }
            }
        }
        List<double[]> forecasts = new ArrayList<>(ends.length);
        for (int e = 0; e < ends.length; e++) {
            int end = ends[e];
            Optional<double[]> b = end > k ? NormalEquations.solve(grams[e], moments[e]) : Optional.empty();
            forecasts.add(b.isPresent() ? forecasts(prefixEstimates(end, b.get()), series.timeAt(end - 1), horizons[e])
                    : of(series.head(end), spec).pointForecasts(horizons[e]));
        }
        return forecasts;
    }

    /** The estimates with coefficients b on the first {@code end} observations: their residuals and RSS. */
    private LeastSquares.Estimates prefixEstimates(int end, double[] b) {
        double[] residuals = new double[end];
        double rss = 0;
        for (int i = 0; i < end; i++) {
            double fitted = 0;
            for (int j = 0; j < b.length; j++) {
                fitted += design.get(i, j) * b[j];
            }
            residuals[i] = response[i] - fitted;
            rss += residuals[i] * residuals[i];
        }
        return new LeastSquares.Estimates(b, residuals, rss, end - b.length);
    }

    /** The point forecasts of {@link #pointForecasts} from a fit whose last observation is at {@code lastTime}. */
    private double[] forecasts(LeastSquares.Estimates fit, int lastTime, int horizon) {
        double smearing = spec.logScale() ? BackTransformed.smearingFactor(fit.residuals()) : 1.0;
        double[] values = new double[horizon];
        for (int h = 1; h <= horizon; h++) {
            double m = fit.predict(regressorsAt(lastTime + h));
            values[h - 1] = spec.logScale() ? BackTransformed.of(m, fit.residualVariance(), smearing).smearingMean()
                    : m;
        }
        return values;
    }
}
