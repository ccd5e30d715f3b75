package org.trendwright.core.selection;

import java.util.ArrayList;
import java.util.List;
import org.trendwright.core.ModelException;
import org.trendwright.core.Observations;
import org.trendwright.core.TestResult;
import org.trendwright.core.autoregression.ArFit;
import org.trendwright.core.autoregression.ArForecasts;
import org.trendwright.core.autoregression.ArSpec;
import org.trendwright.core.autoregression.Autoregression;
import org.trendwright.core.diagnostics.BreuschGodfrey;
import org.trendwright.core.diagnostics.LjungBox;
import org.trendwright.core.forecast.Forecast;

/**
 * An autoregression as a comparison candidate. Its residual checks are those valid with lagged
 * dependent variables: Breusch-Godfrey at the seasonal order (Durbin-Watson is biased towards 2
 * there; Durbin 1970, Econometrica 38) and Ljung-Box with its degrees of freedom reduced by the
 * number of AR coefficients.
 *
 * @param spec  the autoregression
 * @param level significance level of the residual checks
 */
public record ArCandidate(ArSpec spec, double level) implements Candidate {

    @Override
    public String name() {
        String base = spec.differenced() ? "AR on differences" : "AR";
        String order = switch (spec.selection()) {
            case FIXED -> "(" + spec.order() + ")";
            case AIC -> " (order by AIC)";
            case BIC -> " (order by BIC)";
        };
        return base + order + (spec.seasonalLag() ? " with seasonal lag" : "");
    }

    @Override
    public CandidateFit fit(Observations training) {
        return new Fitted(Autoregression.fit(training, spec), level);
    }

    /** The chain-rule point forecasts alone ({@link Autoregression#pointForecasts}). */
    @Override
    public double[] pointForecasts(Observations training, int horizon) {
        return Autoregression.pointForecasts(training, spec, horizon);
    }

    private record Fitted(ArFit fit, double level) implements CandidateFit {

        @Override
        public Forecast forecast(int horizon, List<Double> levels) {
            return ArForecasts.forecast(fit, horizon, levels.stream().mapToDouble(Double::doubleValue).toArray());
        }

        /** Conditional on the first values; a model of differences has Jacobian 1 with respect to the levels. */
        @Override
        public double logLikelihood() {
            return fit.regression().logLikelihood();
        }

        @Override
        public int parameters() {
            return fit.coefficients().size() + 1;
        }

        @Override
        public int observationsUsed() {
            return fit.observationsUsed();
        }

        @Override
        public List<TestResult> residualChecks() {
            List<TestResult> checks = new ArrayList<>();
            int periodsPerYear = fit.series().periodsPerYear();
            try {
                checks.add(BreuschGodfrey.testAtSeasonalOrder(fit.regression(), periodsPerYear, level)
                        .lagrangeMultiplier());
                int arTerms = fit.lags().length;
                int lags = Math.max(LjungBox.defaultLags(fit.observationsUsed(), periodsPerYear), arTerms + 1);
                checks.add(LjungBox.test(fit.regression().residuals(), lags, arTerms, level).test());
            } catch (ModelException e) {
                // Too few residuals for a check: the comparison then relies on the checks that ran.
            }
            return checks;
        }
    }
}
