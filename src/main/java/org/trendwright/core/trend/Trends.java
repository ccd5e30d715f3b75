package org.trendwright.core.trend;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.NonPositiveValueException;
import org.trendwright.core.Observations;
import org.trendwright.core.regression.Coefficient;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * Fits deterministic trend models by least squares on the period index t, counted from 1 at the
 * first observation; a missing period keeps its place in t.
 *
 * <ul>
 *   <li>linear: y_t = b0 + b1 t + e_t, b1 the change per period;</li>
 *   <li>log-linear: ln y_t = b0 + b1 t + e_t, growth of e^b1 - 1 per period;</li>
 *   <li>quadratic: y_t = b0 + b1 t + b2 t^2 + e_t;</li>
 *   <li>any of these plus s - 1 seasonal dummies for s periods per year.</li>
 * </ul>
 *
 * <p>Stateless and thread-safe.
 */
public final class Trends {

    private Trends() {
    }

    /**
     * Fits the model to the series.
     *
     * @throws InsufficientDataException when there are not more observations than coefficients
     * @throws NonPositiveValueException when a log-scale model meets a value <= 0; the message
     *                                   names the first such period
     * @throws org.trendwright.core.InvalidSpecificationException for seasonal dummies on a
     *                                   series with one period per year
     */
    public static TrendFit fit(Observations series, TrendSpec spec) {
        TrendDesign design = TrendDesign.of(spec, series);
        if (series.size() <= design.width()) {
            throw InsufficientDataException.forModel("A " + spec.description() + " (" + design.width()
                    + " coefficients)", design.width() + 1, series.size());
        }
        double[] y = spec.logScale() ? logValues(series) : series.values();
        OlsFit ols = LeastSquares.fit(design.design(series.times()), y);
        return spec.logScale() ? logScaleFit(series, spec, ols) : levelFit(series, spec, ols);
    }

    private static TrendFit levelFit(Observations series, TrendSpec spec, OlsFit ols) {
        return new TrendFit(spec, series, ols, Optional.empty(), 1.0, ols.fitted(), List.of());
    }

    private static TrendFit logScaleFit(Observations series, TrendSpec spec, OlsFit ols) {
        double smearing = BackTransformed.smearingFactor(ols.residuals());
        double[] logFitted = ols.fitted();
        double[] fitted = new double[logFitted.length];
        List<BackTransformed> back = new ArrayList<>(logFitted.length);
        for (int i = 0; i < logFitted.length; i++) {
            BackTransformed b = BackTransformed.of(logFitted[i], ols.residualVariance(), smearing);
            back.add(b);
            fitted[i] = b.smearingMean();
        }
        Optional<GrowthRate> growth = spec.shape() == TrendShape.LINEAR
                ? Optional.of(growthRate(ols.coefficient("t")))
                : Optional.empty();
        return new TrendFit(spec, series, ols, growth, smearing, fitted, back);
    }

    static double[] logValues(Observations series) {
        double[] logs = new double[series.size()];
        for (int i = 0; i < logs.length; i++) {
            double v = series.valueAt(i);
            if (v <= 0) {
                throw new NonPositiveValueException("A log-scale trend needs values above zero, but the value at t = "
                        + series.timeAt(i) + " is " + v + ". Use a linear or quadratic trend, or drop or"
                        + " correct that period.", series.timeAt(i));
            }
            logs[i] = Math.log(v);
        }
        return logs;
    }

    /** g = e^b1 - 1 with the 95% interval of b1 mapped the same way. */
    static GrowthRate growthRate(Coefficient slope) {
        return new GrowthRate(Math.expm1(slope.estimate()), Math.expm1(slope.lower95()), Math.expm1(slope.upper95()));
    }

}
