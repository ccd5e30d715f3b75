package org.trendwright.core.selection;

import java.util.List;
import java.util.Optional;
import org.trendwright.core.TestResult;

/**
 * One candidate's line in a model comparison. When the candidate could not be fitted,
 * {@code failure} says why and the numbers are absent.
 *
 * @param name             the candidate's name
 * @param failure          why it could not be fitted, if it could not
 * @param aic              AIC on the original scale of y (see {@link CandidateFit#logLikelihood()})
 * @param bic              BIC likewise
 * @param observationsUsed observations behind the information criteria; criteria compare only
 *                         between candidates with the same count
 * @param holdout          accuracy of forecasts of the held-out final periods
 * @param rollingOrigin    accuracy pooled over all rolling origins and horizons
 * @param oneStepErrors    the one-step-ahead errors at the rolling origins, oldest first
 * @param residualChecks   the checks of the full-sample fit
 * @param passesChecks     true when no residual check rejected at the comparison's level
 */
public record CandidateAssessment(String name, Optional<String> failure, double aic, double bic,
                                  int observationsUsed, Optional<AccuracyMeasures> holdout,
                                  Optional<AccuracyMeasures> rollingOrigin, double[] oneStepErrors,
                                  List<TestResult> residualChecks, boolean passesChecks) {

    public CandidateAssessment {
        oneStepErrors = oneStepErrors.clone();
        residualChecks = List.copyOf(residualChecks);
    }

    @Override
    public double[] oneStepErrors() {
        return oneStepErrors.clone();
    }

    static CandidateAssessment failed(String name, String reason) {
        return new CandidateAssessment(name, Optional.of(reason), Double.NaN, Double.NaN, 0, Optional.empty(),
                Optional.empty(), new double[0], List.of(), false);
    }

    /** True when the candidate was fitted and evaluated. */
    public boolean evaluated() {
        return failure.isEmpty();
    }

    /** The ranking score: rolling-origin RMSE (lower is better). */
    double score() {
        return rollingOrigin.map(AccuracyMeasures::rmse).orElse(Double.POSITIVE_INFINITY);
    }
}
