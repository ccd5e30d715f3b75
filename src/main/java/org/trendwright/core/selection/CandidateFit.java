package org.trendwright.core.selection;

import java.util.List;
import org.trendwright.core.TestResult;
import org.trendwright.core.forecast.Forecast;

/** A candidate model fitted to one training series. */
public interface CandidateFit {

    /** Forecasts of the {@code horizon} periods after the training data, with intervals. */
    Forecast forecast(int horizon, List<Double> levels);

    /**
     * The Gaussian log-likelihood of the series on its original scale, so that level and log
     * models compare: a model of ln y adds the Jacobian term -sum ln y_i (the density of y is the
     * density of ln y times 1/y). Models that condition on initial values report it for the
     * observations they explain; see {@link #observationsUsed()}.
     */
    double logLikelihood();

    /** Number of estimated parameters, the error variance included. */
    int parameters();

    /** Number of observations the likelihood covers. */
    int observationsUsed();

    /** The residual checks the model must pass to be trusted (serial correlation and the like). */
    List<TestResult> residualChecks();
}
