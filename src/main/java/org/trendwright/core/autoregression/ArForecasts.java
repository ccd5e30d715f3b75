package org.trendwright.core.autoregression;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.forecast.Forecast;
import org.trendwright.core.forecast.ForecastPoint;
import org.trendwright.core.forecast.PredictionInterval;

/**
 * h-step forecasts from a fitted autoregression (Box & Jenkins 1970, Time Series Analysis:
 * Forecasting and Control, Holden-Day, chapter 5).
 *
 * <p><b>Point forecasts</b> by the chain rule: ŷ_{n+h} = b0 + Σ φ_i ŷ_{n+h−i}, where ŷ_s = y_s for
 * observed periods s ≤ n. For a model on first differences the forecast changes are integrated:
 * ŷ_{n+h} = y_n + Σ_{j=1..h} Δŷ_{n+j}.
 *
 * <p><b>Forecast-error variance</b> from the ψ-weights of the MA(∞) form y_t = μ + Σ_j ψ_j e_{t−j},
 * ψ_0 = 1, ψ_j = Σ_{i=1..min(j,m)} φ_i ψ_{j−i}: Var(y_{n+h} − ŷ_{n+h}) = σ² Σ_{j=0..h−1} ψ_j²
 * (Box & Jenkins 1970, eq. 5.1.16). For a model on differences the levels are the integrated
 * process (1 − B)φ(B) y_t = b0 + e_t, whose weights are the partial sums ψ*_j = ψ_0 + ... + ψ_j.
 * σ² is estimated by s² = RSS / (T − k), the fit's squared standard error of estimate.
 *
 * <p><b>Intervals</b> are ŷ ± z_{(1+c)/2} s √(Σψ_j²) with z the standard normal quantile, at
 * coverage levels c (80% and 95% unless others are given). As is usual, they treat the estimated
 * coefficients as the true ones: parameter uncertainty is ignored, so with short series the
 * coverage falls somewhat short of c. The intervals rest on Gaussian errors.
 *
 * <p>A fit that is not stationary (see {@link Stationarity}) is still forecast, not refused: the
 * chain rule and the ψ-weights are defined for any coefficients, the intervals then widen without
 * bound, and the forecast's model description says so. Forecasts of an explosive fit far ahead
 * can overflow to infinity.
 *
 * <p>Stateless and thread-safe.
 */
public final class ArForecasts {

    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);

    private ArForecasts() {
    }

    /** Forecasts h = 1..horizon with 80% and 95% prediction intervals. */
    public static Forecast forecast(ArFit fit, int horizon) {
        return forecast(fit, horizon, 0.80, 0.95);
    }

    /**
     * Forecasts h = 1..horizon with prediction intervals at the given coverage levels. The time
     * index of step h is the last observation's time index plus h.
     *
     * @throws InvalidSpecificationException when horizon < 1 or a level is outside (0, 1)
     */
    public static Forecast forecast(ArFit fit, int horizon, double... levels) {
        checkArguments(horizon, levels);
        double[] phi = fit.lagCoefficients();
        double[] values = pointValues(fit.workingSeries(), fit.constant(), phi, horizon, fit.differenced(),
                fit.series().valueAt(fit.series().size() - 1));
        double[] psi = psiWeights(phi, horizon);
        if (fit.differenced()) {
            psi = integrate(psi, 0);
        }
        double sigma = fit.standardErrorOfEstimate();
        double[] quantiles = normalQuantiles(levels);
        List<ForecastPoint> points = new ArrayList<>(horizon);
        double sumOfSquares = 0;
        for (int h = 1; h <= horizon; h++) {
            sumOfSquares += psi[h - 1] * psi[h - 1];
            double se = sigma * Math.sqrt(sumOfSquares);
            points.add(new ForecastPoint(fit.series().lastTime() + h, h, values[h - 1], se,
                    intervals(values[h - 1], se, levels, quantiles)));
        }
        return new Forecast(modelDescription(fit), points);
    }

    /**
     * ψ_0..ψ_{count−1} of the MA(∞) representation of the AR with coefficients φ1..φm (index 0
     * holds φ1): ψ_0 = 1, ψ_j = Σ_{i=1..min(j,m)} φ_i ψ_{j−i} (Box & Jenkins 1970, eq. 5.2.3).
     */
    public static double[] psiWeights(double[] phi, int count) {
        double[] psi = new double[count];
        psi[0] = 1;
        for (int j = 1; j < count; j++) {
            double sum = 0;
            for (int i = 1; i <= Math.min(j, phi.length); i++) {
                sum += phi[i - 1] * psi[j - i];
            }
            psi[j] = sum;
        }
        return psi;
    }

    /**
     * The point forecasts of steps 1..horizon: the chain rule on the working series w, integrated
     * from the last level {@code lastLevel} when w holds first differences.
     */
    static double[] pointValues(double[] w, double constant, double[] phi, int horizon, boolean differenced,
                                double lastLevel) {
        double[] path = pointPath(w, constant, phi, horizon);
        return differenced ? integrate(path, lastLevel) : path;
    }

    /** Chain-rule forecasts of the working series w for steps 1..horizon. */
    private static double[] pointPath(double[] w, double constant, double[] phi, int horizon) {
        int n = w.length;
        double[] extended = new double[n + horizon];
        System.arraycopy(w, 0, extended, 0, n);
        for (int t = n; t < n + horizon; t++) {
            double value = constant;
            for (int i = 1; i <= phi.length; i++) {
                value += phi[i - 1] * extended[t - i];
            }
            extended[t] = value;
        }
        double[] path = new double[horizon];
        System.arraycopy(extended, n, path, 0, horizon);
        return path;
    }

    /** Partial sums start + x_1 + ... + x_j, j = 1..length. */
    private static double[] integrate(double[] x, double start) {
        double[] sums = new double[x.length];
        double sum = start;
        for (int j = 0; j < x.length; j++) {
            sum += x[j];
            sums[j] = sum;
        }
        return sums;
    }

    private static double[] normalQuantiles(double[] levels) {
        double[] z = new double[levels.length];
        for (int i = 0; i < levels.length; i++) {
            z[i] = STANDARD_NORMAL.inverseCumulativeProbability((1 + levels[i]) / 2);
        }
        return z;
    }

    private static List<PredictionInterval> intervals(double value, double se, double[] levels, double[] z) {
        List<PredictionInterval> intervals = new ArrayList<>(levels.length);
        for (int i = 0; i < levels.length; i++) {
            intervals.add(new PredictionInterval(levels[i], value - z[i] * se, value + z[i] * se));
        }
        return intervals;
    }

    private static String modelDescription(ArFit fit) {
        String model = fit.description() + (fit.differenced() ? ", forecasts integrated to levels" : "");
        if (fit.stationarity().stationary()) {
            return model;
        }
        return model + String.format(Locale.ROOT,
                "; not stationary (largest companion eigenvalue modulus %.4f), so the intervals widen without bound",
                fit.stationarity().largestRootModulus());
    }

    private static void checkArguments(int horizon, double[] levels) {
        if (horizon < 1) {
            throw new InvalidSpecificationException("A forecast horizon must be at least 1 period, got " + horizon
                    + ".");
        }
        for (double level : levels) {
            if (!(level > 0 && level < 1)) {
                throw new InvalidSpecificationException("A prediction interval's coverage level must lie strictly"
                        + " between 0 and 1, got " + level + "; 0.80 and 0.95 are usual.");
            }
        }
    }
}
