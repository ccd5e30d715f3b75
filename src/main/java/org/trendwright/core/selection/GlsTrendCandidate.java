package org.trendwright.core.selection;

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
        Ar1GlsEstimate gls = Ar1Gls.estimate(regression.design(), regression.response(), Ar1Method.PRAIS_WINSTEN,
                Ar1Gls.DEFAULT_TOLERANCE, Ar1Gls.DEFAULT_MAX_ITERATIONS);
        double[][] rows = new double[horizon][];
        int[] times = new int[horizon];
        for (int h = 1; h <= horizon; h++) {
            times[h - 1] = training.lastTime() + h;
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
