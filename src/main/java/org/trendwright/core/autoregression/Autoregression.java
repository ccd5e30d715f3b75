package org.trendwright.core.autoregression;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.Observations;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * Autoregressions with a constant, y_t = b0 + Σ_{i ∈ lags} b_i y_{t−i} + e_t, fitted by conditional
 * least squares: OLS of y_t on 1 and its lags over t = m+1..n, m the largest lag, treating the
 * first m observations as fixed (Box & Jenkins 1970, Time Series Analysis: Forecasting and
 * Control, Holden-Day, section 7.1; for a Gaussian AR this is maximum likelihood conditional on
 * them). The same on first differences when the spec asks for it.
 *
 * <p>Lags are 1..p, plus the seasonal lag s (= periods per year) when asked for: a subset AR such
 * as lags {1, 4} for quarterly or {1, 12} for monthly data. With AIC or BIC every order
 * 0..pMax is fitted on the same sample (the first max(pMax, s) observations dropped; see
 * {@link LagSelection}), and the chosen order is then refitted on every observation it can use.
 *
 * <p>Stateless and thread-safe.
 */
public final class Autoregression {

    private Autoregression() {
    }

    /**
     * Fits the autoregression the spec describes.
     *
     * @throws InvalidSpecificationException when the series has a gap (the message names the first
     *         missing period) or a seasonal lag is asked for on annual data
     * @throws InsufficientDataException when, after dropping the first max-lag observations, the
     *         largest model would not have at least one residual degree of freedom
     * @throws org.trendwright.core.RankDeficientDesignException when a lag column duplicates the
     *         constant, as for a series that is constant after its start
     */
    public static ArFit fit(Observations series, ArSpec spec) {
        Specified model = specify(series, spec);
        OlsFit regression = LeastSquares.fit(model.design(), model.response());
        List<CandidateOrder> candidates = spec.selection() == LagSelection.FIXED
                ? List.of(new CandidateOrder(model.order(), regression.observations(), regression.aic(),
                        regression.bic()))
                : model.candidates();
        return assemble(series, spec, model.order(), model.lags(), regression, candidates);
    }

    /**
     * The point forecasts of h = 1..horizon that {@code ArForecasts.forecast(fit(series, spec), ...)}
     * reports, from the same order choice and the same coefficients ({@link LeastSquares#estimates}),
     * without the inference, residual autocorrelations and stationarity check of {@link #fit}. For
     * callers that refit many times, such as the out-of-sample model comparison.
     *
     * @throws InvalidSpecificationException as {@link #fit}
     * @throws InsufficientDataException as {@link #fit}
     * @throws org.trendwright.core.RankDeficientDesignException as {@link #fit}
     */
    public static double[] pointForecasts(Observations series, ArSpec spec, int horizon) {
        Specified model = specify(series, spec);
        double[] b = LeastSquares.estimates(model.design(), model.response()).coefficients();
        double[] phi = ArFit.phiByLag(model.lags(), b);
        return ArForecasts.pointValues(model.working(), b[0], phi, horizon, spec.differenced(),
                series.valueAt(series.size() - 1));
    }

    /** Checks the series, chooses the order and builds the regression of the chosen lags. */
    private static Specified specify(Observations series, ArSpec spec) {
        LagDesigns.requireConsecutive(series, "An autoregression");
        int seasonal = seasonalLag(series, spec);
        double[] w = series.values();
        w = spec.differenced() ? LagDesigns.differences(w) : w;
        int commonStart = Math.max(spec.order(), seasonal);
        checkLength(series.size(), w.length, commonStart, lags(spec.order(), seasonal).length, spec);
        int order = spec.order();
        List<CandidateOrder> candidates = List.of();
        if (spec.selection() != LagSelection.FIXED) {
            candidates = compareOrders(w, spec.order(), seasonal, commonStart);
            order = OrderSelection.choose(candidates, spec.selection());
        }
        int[] lags = lags(order, seasonal);
        int start = lags.length == 0 ? 0 : lags[lags.length - 1];
        return new Specified(w, order, lags, design(w, lags, start), LagDesigns.lagged(w, 0, start), candidates);
    }

    /**
     * An autoregression ready to fit: the working series (levels or differences), the chosen
     * order and its lags, the regression's design and response, and the orders compared.
     */
    private record Specified(double[] working, int order, int[] lags, Design design, double[] response,
                             List<CandidateOrder> candidates) {
    }

    private static ArFit assemble(Observations series, ArSpec spec, int order, int[] lags, OlsFit regression,
                                  List<CandidateOrder> candidates) {
        int maxLag = Autocorrelations.defaultMaxLag(regression.observations(), series.periodsPerYear());
        List<ResidualAutocorrelation> autocorrelations = Autocorrelations.ofResiduals(regression.residuals(), maxLag);
        double constant = regression.coefficients().get(0).estimate();
        Stationarity stationarity = CharacteristicRoots.assess(constant, ArFit.phiByLag(lags, regression),
                spec.differenced());
        return new ArFit(series, spec, order, lags, regression, candidates, autocorrelations, stationarity);
    }

    /** The lags 1..p, with the seasonal lag s appended when s > p (s = 0: none). */
    static int[] lags(int order, int seasonal) {
        int[] lags = new int[seasonal > order ? order + 1 : order];
        for (int i = 0; i < order; i++) {
            lags[i] = i + 1;
        }
        if (seasonal > order) {
            lags[order] = seasonal;
        }
        return lags;
    }

    /**
     * Criteria of the orders 0..maxOrder on the common sample t = start..: the columns are put in
     * nesting order (constant, seasonal lag, then lags 1..maxOrder without the seasonal one), so
     * that order p uses the first 1 + |lags(p)| of them.
     */
    private static List<CandidateOrder> compareOrders(double[] w, int maxOrder, int seasonal, int start) {
        IntStream others = IntStream.rangeClosed(1, maxOrder).filter(lag -> lag != seasonal);
        int[] nestingOrder = seasonal > 0 ? IntStream.concat(IntStream.of(seasonal), others).toArray()
                                          : others.toArray();
        int[] widths = new int[maxOrder + 1];
        for (int p = 0; p <= maxOrder; p++) {
            widths[p] = 1 + lags(p, seasonal).length;
        }
        return OrderSelection.compareNested(design(w, nestingOrder, start), LagDesigns.lagged(w, 0, start), widths);
    }

    /** The regressors 1 and w_{t−i}, i in lags (in that order), for t = start..end (0-based). */
    private static Design design(double[] w, int[] lags, int start) {
        int rows = w.length - start;
        List<double[]> columns = new ArrayList<>(lags.length + 1);
        List<String> names = new ArrayList<>(lags.length + 1);
        columns.add(LagDesigns.ones(rows));
        names.add("constant");
        for (int lag : lags) {
            columns.add(LagDesigns.lagged(w, lag, start));
            names.add("lag " + lag);
        }
        return new Design(columns, names, true);
    }

    private static int seasonalLag(Observations series, ArSpec spec) {
        if (!spec.seasonalLag()) {
            return 0;
        }
        if (series.periodsPerYear() < 2) {
            throw new InvalidSpecificationException("A seasonal lag needs a series with seasons (quarterly, monthly,"
                    + " ...), but this one has " + series.periodsPerYear()
                    + " period per year; drop the seasonal lag.");
        }
        return series.periodsPerYear();
    }

    /** Needs at least one residual degree of freedom for the largest model on the common sample. */
    private static void checkLength(int size, int workingLength, int start, int lagCount, ArSpec spec) {
        int coefficients = lagCount + 1;
        int needed = start + coefficients + 1;
        if (workingLength < needed) {
            int extra = size - workingLength;
            String what = "An autoregression with " + lagCount + " lags (largest lag " + start + ")"
                    + (spec.differenced() ? " on first differences" : "");
            throw InsufficientDataException.forModel(what, needed + extra, size);
        }
    }
}
