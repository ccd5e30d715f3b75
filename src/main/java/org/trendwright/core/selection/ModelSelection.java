package org.trendwright.core.selection;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.ModelException;
import org.trendwright.core.Observations;
import org.trendwright.core.TestResult;

/**
 * Honest model choice: every candidate is judged on periods it was not fitted to.
 *
 * <ol>
 *   <li><b>Holdout</b>: fit to all but the last H periods, forecast them 1..H steps ahead.</li>
 *   <li><b>Rolling origin</b> (Tashman 2000, "Out-of-sample tests of forecasting accuracy",
 *       International Journal of Forecasting 16, 437-450): the training sample ends in turn at
 *       each of the last O origins; each forecasts up to H steps as far as the data go; errors are
 *       pooled. Its RMSE ranks the candidates, because it averages over more forecasts than a
 *       single holdout.</li>
 *   <li><b>Residual checks</b> on the full-sample fit: a candidate whose residuals fail a check
 *       has intervals that cannot be trusted as stated, so the recommendation prefers the best
 *       candidate that passes, and says so plainly when none does.</li>
 *   <li><b>Information criteria</b> AIC and BIC on the original scale of y (the Jacobian term puts
 *       log models on it), shown for candidates fitted to the same observations.</li>
 *   <li><b>Diebold-Mariano</b> between the two best candidates' one-step errors at the rolling
 *       origins.</li>
 * </ol>
 *
 * <p>Cost: each candidate is fitted in full once, on the whole series, for its residual checks and
 * likelihood. Out of sample it is refitted once per training end (the holdout split and each
 * origin; the holdout split is usually an origin too, and an origin's one-step forecast is the
 * first of its forecasts), for its point forecasts only ({@link Candidate#pointForecastsFromEnds}),
 * which give the numbers of the full fit's forecast without its intervals and inference; a trend
 * candidate takes every end from one pass over the series.
 *
 * <p>Stateless and thread-safe.
 */
public final class ModelSelection {

    private ModelSelection() {
    }

    /** Compares the candidates on the series and recommends one. */
    public static ModelComparison compare(Observations series, List<Candidate> candidates, ComparisonSpec spec) {
        int minimumTraining = series.size() - spec.holdout() - spec.origins() + 1;
        if (minimumTraining < 3) {
            throw InsufficientDataException.forModel("A comparison with a " + spec.holdout() + "-period holdout and "
                    + spec.origins() + " forecast origins", spec.holdout() + spec.origins() + 2, series.size());
        }
        List<CandidateAssessment> assessments = new ArrayList<>();
        for (Candidate candidate : candidates) {
            assessments.add(assess(series, candidate, spec));
        }
        assessments.sort(Comparator.comparing(CandidateAssessment::evaluated).reversed()
                .thenComparingDouble(CandidateAssessment::score));
        return recommend(series, assessments, spec);
    }

    private static CandidateAssessment assess(Observations series, Candidate candidate, ComparisonSpec spec) {
        try {
            CandidateFit full = candidate.fit(series);
            List<TestResult> checks = full.residualChecks();
            boolean passes = checks.stream().noneMatch(c -> c.pValue() < spec.level());
            int k = full.parameters();
            double ll = full.logLikelihood();
            Map<Integer, double[]> forecasts = forecastsByEnd(series, candidate, spec);
            return new CandidateAssessment(candidate.name(), Optional.empty(), -2 * ll + 2 * k,
                    -2 * ll + Math.log(full.observationsUsed()) * k, full.observationsUsed(),
                    Optional.of(holdout(series, forecasts, spec)), Optional.of(rollingOrigin(series, forecasts, spec)),
                    oneStepErrors(series, forecasts, spec), checks, passes);
        } catch (ModelException e) {
            return CandidateAssessment.failed(candidate.name(), e.getMessage());
        }
    }

    /**
     * The candidate's point forecasts from each training end the comparison uses (the holdout's,
     * then each rolling origin's), up to {@code holdout} observations ahead, through the observed
     * periods after the end (a gap in the series is forecast through). Each end is fitted once: the
     * holdout split is often one of the origins, and an origin's one-step forecast is the first of
     * its forecasts (a point forecast does not depend on how far the forecast runs).
     */
    private static Map<Integer, double[]> forecastsByEnd(Observations series, Candidate candidate,
                                                         ComparisonSpec spec) {
        Set<Integer> ends = new LinkedHashSet<>();
        ends.add(series.size() - spec.holdout());
        for (int end = series.size() - spec.origins(); end < series.size(); end++) {
            ends.add(end);
        }
        int[] endArray = ends.stream().mapToInt(Integer::intValue).toArray();
        int[] horizons = new int[endArray.length];
        for (int i = 0; i < endArray.length; i++) {
            int last = Math.min(series.size(), endArray[i] + spec.holdout());
            horizons[i] = series.timeAt(last - 1) - series.timeAt(endArray[i] - 1);
        }
        List<double[]> forecasts = candidate.pointForecastsFromEnds(series, endArray, horizons);
        Map<Integer, double[]> byEnd = new HashMap<>();
        for (int i = 0; i < endArray.length; i++) {
            byEnd.put(endArray[i], forecasts.get(i));
        }
        return byEnd;
    }

    private static AccuracyMeasures holdout(Observations series, Map<Integer, double[]> forecasts,
                                            ComparisonSpec spec) {
        int end = series.size() - spec.holdout();
        Errors errors = errors(series, end, forecasts.get(end), spec.holdout());
        return AccuracyMeasures.of(errors.actual(), errors.forecast(), AccuracyMeasures.seasonalNaiveScale(
                series.head(end)));
    }

    private static AccuracyMeasures rollingOrigin(Observations series, Map<Integer, double[]> forecasts,
                                                  ComparisonSpec spec) {
        Errors pooled = new Errors(new double[0], new double[0]);
        double scale = AccuracyMeasures.seasonalNaiveScale(series.head(series.size() - spec.origins()));
        for (int end = series.size() - spec.origins(); end < series.size(); end++) {
            pooled = pooled.append(errors(series, end, forecasts.get(end), spec.holdout()));
        }
        return AccuracyMeasures.of(pooled.actual(), pooled.forecast(), scale);
    }

    private static double[] oneStepErrors(Observations series, Map<Integer, double[]> forecasts,
                                          ComparisonSpec spec) {
        double[] errors = new double[spec.origins()];
        for (int o = 0; o < spec.origins(); o++) {
            int end = series.size() - spec.origins() + o;
            Errors e = errors(series, end, forecasts.get(end), 1);
            errors[o] = e.actual()[0] - e.forecast()[0];
        }
        return errors;
    }

    /**
     * The observed values after the first {@code end} observations, up to {@code steps} of them,
     * beside the forecasts of their periods ({@code forecast[h - 1]} for h periods ahead).
     */
    private static Errors errors(Observations series, int end, double[] forecast, int steps) {
        int last = Math.min(series.size(), end + steps);
        int lastTrainingTime = series.timeAt(end - 1);
        double[] actual = new double[last - end];
        double[] predicted = new double[last - end];
        for (int i = end; i < last; i++) {
            actual[i - end] = series.valueAt(i);
            predicted[i - end] = forecast[series.timeAt(i) - lastTrainingTime - 1];
        }
        return new Errors(actual, predicted);
    }

    private static ModelComparison recommend(Observations series, List<CandidateAssessment> ranked,
                                             ComparisonSpec spec) {
        List<CandidateAssessment> evaluated = ranked.stream().filter(CandidateAssessment::evaluated).toList();
        if (evaluated.isEmpty()) {
            return new ModelComparison(spec, ranked, Optional.empty(),
                    List.of("No candidate model could be fitted to this series; see each candidate's reason."),
                    true, Optional.empty());
        }
        Optional<CandidateAssessment> bestPassing = evaluated.stream().filter(CandidateAssessment::passesChecks)
                .findFirst();
        CandidateAssessment chosen = bestPassing.orElse(evaluated.get(0));
        Optional<TestResult> dm = evaluated.size() < 2 ? Optional.empty()
                : Optional.of(DieboldMariano.test(evaluated.get(0).name(), evaluated.get(0).oneStepErrors(),
                        evaluated.get(1).name(), evaluated.get(1).oneStepErrors(), 1, spec.level()));
        List<String> reasons = Recommendation.reasons(chosen, evaluated, bestPassing.isPresent(), dm, spec.level());
        return new ModelComparison(spec, ranked, Optional.of(chosen.name()), reasons, bestPassing.isEmpty(), dm);
    }

    /** Aligned actual and forecast values. */
    private record Errors(double[] actual, double[] forecast) {

        Errors append(Errors more) {
            return new Errors(concat(actual, more.actual), concat(forecast, more.forecast));
        }

        private static double[] concat(double[] a, double[] b) {
            double[] all = java.util.Arrays.copyOf(a, a.length + b.length);
            System.arraycopy(b, 0, all, a.length, b.length);
            return all;
        }
    }
}
