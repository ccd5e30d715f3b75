package org.trendwright.core.selection;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.trendwright.core.ModelException;
import org.trendwright.core.Observations;
import org.trendwright.core.TestResult;
import org.trendwright.core.analysis.GlsTrendForecast;
import org.trendwright.core.diagnostics.LjungBox;
import org.trendwright.core.forecast.Forecast;
import org.trendwright.core.gls.Ar1Gls;
import org.trendwright.core.gls.Ar1GlsEstimate;
import org.trendwright.core.gls.Ar1GlsFit;
import org.trendwright.core.gls.Ar1Method;
import org.trendwright.core.gls.QuasiDifferencedNormalEquations;
import org.trendwright.core.regression.GaussianLikelihood;
import org.trendwright.core.trend.BackTransformed;
import org.trendwright.core.trend.TrendFit;
import org.trendwright.core.trend.TrendRegression;
import org.trendwright.core.trend.TrendSpec;
import org.trendwright.core.trend.Trends;

/**
 * A trend model with AR(1) errors, fitted by Prais-Winsten feasible GLS, as a comparison
 * candidate. Its residual check is Ljung-Box on the GLS innovations with one degree of freedom
 * taken for rho.
 *
 * @param trend the trend model
 * @param level significance level of the residual check
 */
public record GlsTrendCandidate(TrendSpec trend, double level) implements Candidate {

    @Override
    public String name() {
        return trend.description() + " with AR(1) errors";
    }

    @Override
    public CandidateFit fit(Observations training) {
        TrendFit ols = Trends.fit(training, trend);
        Ar1GlsFit gls = Ar1Gls.fit(ols.ols().design(), ols.ols().y(), Ar1Method.PRAIS_WINSTEN,
                Ar1Gls.DEFAULT_TOLERANCE, Ar1Gls.DEFAULT_MAX_ITERATIONS);
        return new Fitted(ols, gls, level);
    }

    /**
     * The GLS point forecasts alone: the same iteration ({@link Ar1Gls#estimate}) and the values
     * x'b + rho^h u_n of {@link GlsTrendForecast}, for a log-scale model e^(x'b + rho^h u_n) times
     * Duan's smearing factor of the GLS innovations.
     */
    @Override
    public double[] pointForecasts(Observations training, int horizon) {
        TrendRegression regression = TrendRegression.of(training, trend);
        return forecasts(regression, horizon, Ar1Gls.estimate(regression.design(), regression.response(),
                Ar1Method.PRAIS_WINSTEN, Ar1Gls.DEFAULT_TOLERANCE, Ar1Gls.DEFAULT_MAX_ITERATIONS));
    }

    /**
     * The forecasts {@link #pointForecasts} gives at each training end, bit for bit, with the moments
     * that steer each end's GLS iteration summed in one pass over the longest prefix
     * ({@link QuasiDifferencedNormalEquations#ofPrefixes}: a prefix's design is the first rows of the
     * longest one, each row a function of its period index alone) instead of once per end. A series
     * whose longest prefix has no regression is left to the end-by-end route, which reports the
     * first failing end's error; so does every end here, in the same order.
     */
    @Override
    public List<double[]> pointForecastsFromEnds(Observations series, int[] ends, int[] horizons) {
        if (ends.length == 0) {
            return List.of();
        }
        List<QuasiDifferencedNormalEquations> moments;
        try {
            TrendRegression longest = TrendRegression.of(series.head(Arrays.stream(ends).max().orElseThrow()), trend);
            moments = QuasiDifferencedNormalEquations.ofPrefixes(longest.design(), longest.response(), ends);
        } catch (ModelException e) {
            return Candidate.super.pointForecastsFromEnds(series, ends, horizons);
        }
        List<double[]> forecasts = new ArrayList<>(ends.length);
        for (int i = 0; i < ends.length; i++) {
            TrendRegression regression = TrendRegression.of(series.head(ends[i]), trend);
            forecasts.add(forecasts(regression, horizons[i], Ar1Gls.estimate(regression.design(),
                    regression.response(), moments.get(i), Ar1Method.PRAIS_WINSTEN, Ar1Gls.DEFAULT_TOLERANCE,
                    Ar1Gls.DEFAULT_MAX_ITERATIONS)));
        }
        return forecasts;
    }

    private double[] forecasts(TrendRegression regression, int horizon, Ar1GlsEstimate gls) {
        double[][] rows = new double[horizon][];
        int[] times = new int[horizon];
        for (int h = 1; h <= horizon; h++) {
            times[h - 1] = regression.series().lastTime() + h;
            rows[h - 1] = regression.regressorsAt(times[h - 1]);
        }
        double[] values = gls.pointForecasts(rows, times);
        if (trend.logScale()) {
            double smearing = BackTransformed.smearingFactor(gls.transformedResiduals());
            for (int i = 0; i < values.length; i++) {
                values[i] = Math.exp(values[i]) * smearing;
            }
        }
        return values;
    }

    private record Fitted(TrendFit ols, Ar1GlsFit gls, double level) implements CandidateFit {

        @Override
        public Forecast forecast(int horizon, List<Double> levels) {
            return GlsTrendForecast.of(ols, gls, horizon, levels).forecast();
        }

        /**
         * The Gaussian AR(1)-error log-likelihood at the Prais-Winsten estimates, concentrated in
         * the innovation variance (RSS_u the sum of squared innovations): -n/2 (ln 2 pi + ln(RSS_u / n) + 1) + 1/2 ln(1 - rho^2), the last
         * term the Jacobian of the first observation's transformation (Beach & MacKinnon 1978,
         * Econometrica 46), plus -sum ln y for a log-scale model.
         */
        @Override
        public double logLikelihood() {
            double[] u = gls.transformedResiduals();
            double rss = 0;
            for (double v : u) {
                rss += v * v;
            }
            int n = u.length;
            double rho = gls.rho().value();
            double ll = GaussianLikelihood.logLikelihood(n, rss) + 0.5 * Math.log(1 - rho * rho);
            if (ols.spec().logScale()) {
                for (double lnY : ols.ols().y()) {
                    ll -= lnY;
                }
            }
            return ll;
        }

        @Override
        public int parameters() {
            return gls.coefficients().size() + 2;
        }

        @Override
        public int observationsUsed() {
            return ols.series().size();
        }

        @Override
        public List<TestResult> residualChecks() {
            double[] innovations = gls.transformedResiduals();
            try {
                int periodsPerYear = ols.series().periodsPerYear();
                int lags = Math.max(LjungBox.defaultLags(innovations.length, periodsPerYear), 2);
                return List.of(LjungBox.test(innovations, lags, 1, level).test());
            } catch (ModelException e) {
                return List.of();
            }
        }
    }
}
