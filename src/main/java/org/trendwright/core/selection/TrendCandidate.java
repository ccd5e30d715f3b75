package org.trendwright.core.selection;

import java.util.Arrays;
import java.util.List;
import java.util.function.Function;
import org.trendwright.core.ModelException;
import org.trendwright.core.Observations;
import org.trendwright.core.TestResult;
import org.trendwright.core.forecast.Forecast;
import org.trendwright.core.trend.TrendFit;
import org.trendwright.core.trend.TrendRegression;
import org.trendwright.core.trend.TrendSpec;
import org.trendwright.core.trend.Trends;

/**
 * A trend model as a comparison candidate.
 *
 * @param spec           the trend model
 * @param residualChecks the checks its fit must pass (applied to each full-sample fit)
 */
public record TrendCandidate(TrendSpec spec, Function<TrendFit, List<TestResult>> residualChecks)
        implements Candidate {

    @Override
    public String name() {
        return spec.description();
    }

    @Override
    public CandidateFit fit(Observations training) {
        TrendFit fit = Trends.fit(training, spec);
        return new Fitted(fit, residualChecks);
    }

    /** The least-squares point forecasts alone ({@link TrendRegression#pointForecasts}). */
    @Override
    public double[] pointForecasts(Observations training, int horizon) {
        return TrendRegression.of(training, spec).pointForecasts(horizon);
    }

    /**
     * The forecasts from every training end by one pass over the longest
     * ({@link TrendRegression#prefixPointForecasts}); where that regression cannot be set up (too
     * short, a value a log-scale model refuses), each end is refitted in turn, as the interface's
     * default does, so that the same end's error is reported.
     */
    @Override
    public List<double[]> pointForecastsFromEnds(Observations series, int[] ends, int[] horizons) {
        TrendRegression longest;
        try {
            longest = TrendRegression.of(series.head(Arrays.stream(ends).max().orElseThrow()), spec);
        } catch (ModelException e) {
            return Candidate.super.pointForecastsFromEnds(series, ends, horizons);
        }
        return longest.prefixPointForecasts(ends, horizons);
    }

    private record Fitted(TrendFit fit, Function<TrendFit, List<TestResult>> checks) implements CandidateFit {

        @Override
        public Forecast forecast(int horizon, List<Double> levels) {
            return fit.forecast(horizon, levels).forecast();
        }

        /** For ln y the Jacobian term -sum ln y_i puts the likelihood on the scale of y. */
        @Override
        public double logLikelihood() {
            double jacobian = 0;
            if (fit.spec().logScale()) {
                for (double y : fit.ols().y()) {
                    jacobian -= y; // y here is ln y: the fit was on the log scale
                }
            }
            return fit.ols().logLikelihood() + jacobian;
        }

        @Override
        public int parameters() {
            return fit.ols().coefficients().size() + 1;
        }

        @Override
        public int observationsUsed() {
            return fit.series().size();
        }

        @Override
        public List<TestResult> residualChecks() {
            return checks.apply(fit);
        }
    }
}
