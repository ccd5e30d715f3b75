package org.trendwright.core.selection;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.trendwright.core.ModelException;
import org.trendwright.core.Observations;
import org.trendwright.core.TestResult;
import org.trendwright.core.forecast.Forecast;
import org.trendwright.core.trend.TrendSpec;

/**
 * The comparison refits each candidate once per training end and takes the point forecasts alone
 * ({@link Candidate#pointForecastsFromEnds}); the straightforward way fits every candidate in full
 * for every split (the holdout, each rolling origin, each origin again for its one-step error) and
 * reads the values off the full forecast. Both must give the same comparison: the same
 * recommendation and every metric equal to 1e-9 relative. Most candidates run the same arithmetic
 * either way; trend candidates solve each training end by the normal equations, whose coefficients
 * are within about c u cond(X)^2 of the QR route's (Higham 2002, Accuracy and Stability of
 * Numerical Algorithms, section 20.4): near 1e-12 on these designs, so 1e-9 holds with room.
 *
 * <p>The series are seeded simulations of the shapes the service meets: random walks with drift
 * (the batch benchmark's), a trend with seasons and AR(1) noise (the JMH benchmark's), exponential
 * growth with multiplicative noise (log models), monthly data (a 12-period holdout that is not a
 * rolling origin) and a quarterly series with a missing period (forecasts through the gap).
 */
class ComparisonFastPathTest {

    private static final double RELATIVE = 1e-9;

    @Test
    void the_fast_comparison_matches_full_fits_at_every_split_on_seeded_series() {
        for (Observations series : seededSeries()) {
            ComparisonSpec spec = ComparisonSpec.defaultsFor(series.periodsPerYear());
            List<Candidate> candidates = StandardCandidates.forSeries(series, spec.level());
            ModelComparison fast = ModelSelection.compare(series, candidates, spec);
            List<CandidateAssessment> reference = new ArrayList<>();
            for (Candidate candidate : candidates) {
                reference.add(StraightforwardComparison.assess(series, candidate, spec));
            }
            assertEquals(StraightforwardComparison.recommended(reference), fast.recommended());
            for (CandidateAssessment expected : reference) {
                CandidateAssessment actual = fast.candidates().stream().filter(a -> a.name().equals(expected.name()))
                        .findFirst().orElseThrow();
                assertSame(expected, actual);
            }
        }
    }

    @Test
    void every_candidates_point_forecasts_are_those_of_its_full_fit() {
        for (Observations series : seededSeries()) {
            for (Candidate candidate : StandardCandidates.forSeries(series, 0.05)) {
                Observations training = series.head(series.size() - 3);
                double[] fast = candidate.pointForecasts(training, 6);
                Forecast full = candidate.fit(training).forecast(6, List.of(0.8, 0.95));
                for (int h = 1; h <= 6; h++) {
                    assertClose(full.points().get(h - 1).value(), fast[h - 1], candidate.name() + " h=" + h);
                }
            }
        }
    }

    @Test
    void forecasts_from_several_ends_are_those_of_a_refit_at_each_end_in_the_order_given() {
        for (Observations series : seededSeries()) {
            int n = series.size();
            int[] ends = {n - 4, n - 1, n - 8, n - 5, n - 2};
            int[] horizons = {4, 1, 6, 2, 3};
            for (Candidate candidate : StandardCandidates.forSeries(series, 0.05)) {
                List<double[]> fromEnds = candidate.pointForecastsFromEnds(series, ends, horizons);
                for (int e = 0; e < ends.length; e++) {
                    double[] refit = candidate.pointForecasts(series.head(ends[e]), horizons[e]);
                    String where = candidate.name() + " end " + ends[e];
                    if (candidate instanceof GlsTrendCandidate) {
                        // Each end's GLS steering moments come from one pass over the longest prefix:
                        // the same sums in the same order as the refit's own, so the same bits.
                        assertArrayEquals(refit, fromEnds.get(e), where);
                        continue;
                    }
                    assertEquals(refit.length, fromEnds.get(e).length);
                    for (int h = 0; h < refit.length; h++) {
                        assertClose(refit[h], fromEnds.get(e)[h], where + " h=" + (h + 1));
                    }
                }
            }
        }
    }

    @Test
    void a_training_end_too_short_for_gls_fails_as_its_own_refit_does() {
        // Prais-Winsten GLS on k regressors needs k + 2 observations (one residual degree of freedom
        // for the transformed regression and one for rho; common practice).
        Observations series = seededSeries().get(0);
        Candidate candidate = new GlsTrendCandidate(TrendSpec.linear().withSeasonalDummies(true), 0.05);
        ModelException refit = assertThrows(ModelException.class, () -> candidate.pointForecasts(series.head(6), 2));
        ModelException fromEnds = assertThrows(ModelException.class,
                () -> candidate.pointForecastsFromEnds(series, new int[] {40, 6, 20}, new int[] {2, 2, 2}));
        assertEquals(refit.getMessage(), fromEnds.getMessage());
    }

    @Test
    void a_training_end_too_short_for_a_trend_fails_as_its_own_refit_does() {
        // The quadratic trend with quarterly dummies has 6 coefficients: 6 observations cannot fit it
        // (common practice: least squares needs more observations than coefficients).
        Observations series = seededSeries().get(0);
        Candidate candidate = StandardCandidates.forSeries(series, 0.05).stream()
                .filter(c -> c.name().equals(new TrendCandidate(TrendSpec.quadratic().withSeasonalDummies(true),
                        f -> List.of()).name()))
                .findFirst().orElseThrow();
        ModelException refit = assertThrows(ModelException.class, () -> candidate.pointForecasts(series.head(6), 2));
        ModelException fromEnds = assertThrows(ModelException.class,
                () -> candidate.pointForecastsFromEnds(series, new int[] {40, 6, 20}, new int[] {2, 2, 2}));
        assertEquals(refit.getMessage(), fromEnds.getMessage());
    }

    private static void assertSame(CandidateAssessment expected, CandidateAssessment actual) {
        String name = expected.name();
        assertEquals(expected.failure(), actual.failure(), name);
        assertEquals(expected.evaluated(), actual.evaluated(), name);
        if (!expected.evaluated()) {
            return;
        }
        assertClose(expected.aic(), actual.aic(), name + " AIC");
        assertClose(expected.bic(), actual.bic(), name + " BIC");
        assertEquals(expected.observationsUsed(), actual.observationsUsed(), name);
        assertMeasures(expected.holdout().orElseThrow(), actual.holdout().orElseThrow(), name + " holdout");
        assertMeasures(expected.rollingOrigin().orElseThrow(), actual.rollingOrigin().orElseThrow(),
                name + " rolling origin");
        double[] e = expected.oneStepErrors();
        double[] a = actual.oneStepErrors();
        assertEquals(e.length, a.length, name);
        for (int i = 0; i < e.length; i++) {
            assertClose(e[i], a[i], name + " one-step error " + i);
        }
        assertEquals(expected.residualChecks().size(), actual.residualChecks().size(), name);
        for (int i = 0; i < expected.residualChecks().size(); i++) {
            TestResult te = expected.residualChecks().get(i);
            TestResult ta = actual.residualChecks().get(i);
            assertEquals(te.test(), ta.test(), name);
            assertClose(te.pValue(), ta.pValue(), name + " " + te.test());
        }
        assertEquals(expected.passesChecks(), actual.passesChecks(), name);
    }

    private static void assertMeasures(AccuracyMeasures expected, AccuracyMeasures actual, String what) {
        assertEquals(expected.forecasts(), actual.forecasts(), what);
        assertClose(expected.rmse(), actual.rmse(), what + " RMSE");
        assertClose(expected.mae(), actual.mae(), what + " MAE");
        assertOptionalClose(expected.mape(), actual.mape(), what + " MAPE");
        assertOptionalClose(expected.mase(), actual.mase(), what + " MASE");
    }

    private static void assertOptionalClose(Optional<Double> expected, Optional<Double> actual, String what) {
        assertEquals(expected.isPresent(), actual.isPresent(), what);
        expected.ifPresent(e -> assertClose(e, actual.orElseThrow(), what));
    }

    private static void assertClose(double expected, double actual, String what) {
        if (Double.isNaN(expected) || Double.isNaN(actual) || expected == actual) {
            assertEquals(expected, actual, what);
            return;
        }
        double scale = Math.max(Math.abs(expected), Math.abs(actual));
        assertTrue(Math.abs(expected - actual) <= RELATIVE * scale,
                what + ": expected " + expected + " but the fast path gave " + actual);
    }

    /** Seeded series; the seeds are arbitrary and fixed. */
    private static List<Observations> seededSeries() {
        List<Observations> series = new ArrayList<>();
        Random random = new Random(20261202);
        for (int s = 0; s < 6; s++) {
            series.add(Observations.consecutive(randomWalk(random, 80), 4, 1));
        }
        series.add(Observations.consecutive(seasonalAr1(random, 120), 4, 1));
        series.add(Observations.consecutive(exponential(random, 60), 4, 2));
        series.add(Observations.consecutive(seasonalAr1(random, 96), 12, 1));
        series.add(withGap(randomWalk(random, 60)));
        return series;
    }

    private static double[] randomWalk(Random random, int n) {
        double[] y = new double[n];
        double level = 100;
        for (int t = 0; t < n; t++) {
            level += 0.5 + random.nextGaussian();
            y[t] = level;
        }
        return y;
    }

    private static double[] seasonalAr1(Random random, int n) {
        double[] seasons = {0, 12, -6, 20};
        double[] y = new double[n];
        double u = 0;
        for (int t = 1; t <= n; t++) {
            u = 0.5 * u + random.nextGaussian();
            y[t - 1] = 400 + 3 * t + seasons[(t - 1) % 4] + 8 * u;
        }
        return y;
    }

    private static double[] exponential(Random random, int n) {
        double[] y = new double[n];
        for (int t = 1; t <= n; t++) {
            y[t - 1] = 100 * Math.pow(1.04, t) * Math.exp(0.03 * random.nextGaussian());
        }
        return y;
    }

    /** Quarterly, with period t = 40 missing. */
    private static Observations withGap(double[] values) {
        int[] times = new int[values.length - 1];
        double[] kept = new double[values.length - 1];
        for (int i = 0, j = 0; i < values.length; i++) {
            if (i + 1 != 40) {
                times[j] = i + 1;
                kept[j++] = values[i];
            }
        }
        return new Observations(times, kept, 4, 1);
    }

    /**
     * The comparison as ModelSelection computed it before the fast path (commit 60a12a8): a full
     * fit for every split and every origin, the values read off the full forecast.
     */
    private static final class StraightforwardComparison {

        static CandidateAssessment assess(Observations series, Candidate candidate, ComparisonSpec spec) {
            try {
                CandidateFit full = candidate.fit(series);
                List<TestResult> checks = full.residualChecks();
                boolean passes = checks.stream().noneMatch(c -> c.pValue() < spec.level());
                int k = full.parameters();
                double ll = full.logLikelihood();
                return new CandidateAssessment(candidate.name(), Optional.empty(), -2 * ll + 2 * k,
                        -2 * ll + Math.log(full.observationsUsed()) * k, full.observationsUsed(),
                        Optional.of(holdout(series, candidate, spec)), Optional.of(rolling(series, candidate, spec)),
                        oneStepErrors(series, candidate, spec), checks, passes);
            } catch (org.trendwright.core.ModelException e) {
                return CandidateAssessment.failed(candidate.name(), e.getMessage());
            }
        }

        /** Best rolling-origin RMSE among the candidates that pass their checks, else the best. */
        static Optional<String> recommended(List<CandidateAssessment> assessments) {
            List<CandidateAssessment> ranked = assessments.stream().filter(CandidateAssessment::evaluated)
                    .sorted(java.util.Comparator.comparingDouble(a -> a.rollingOrigin().orElseThrow().rmse()))
                    .toList();
            return ranked.stream().filter(CandidateAssessment::passesChecks).findFirst()
                    .or(() -> ranked.stream().findFirst()).map(CandidateAssessment::name);
        }

        private static AccuracyMeasures holdout(Observations series, Candidate candidate, ComparisonSpec spec) {
            Observations training = series.head(series.size() - spec.holdout());
            double[][] errors = errors(series, training, candidate, spec, spec.holdout());
            return AccuracyMeasures.of(errors[0], errors[1], AccuracyMeasures.seasonalNaiveScale(training));
        }

        private static AccuracyMeasures rolling(Observations series, Candidate candidate, ComparisonSpec spec) {
            List<Double> actual = new ArrayList<>();
            List<Double> forecast = new ArrayList<>();
            for (int end = series.size() - spec.origins(); end < series.size(); end++) {
                double[][] errors = errors(series, series.head(end), candidate, spec, spec.holdout());
                for (int i = 0; i < errors[0].length; i++) {
                    actual.add(errors[0][i]);
                    forecast.add(errors[1][i]);
                }
            }
            return AccuracyMeasures.of(actual.stream().mapToDouble(Double::doubleValue).toArray(),
                    forecast.stream().mapToDouble(Double::doubleValue).toArray(),
                    AccuracyMeasures.seasonalNaiveScale(series.head(series.size() - spec.origins())));
        }

        private static double[] oneStepErrors(Observations series, Candidate candidate, ComparisonSpec spec) {
            double[] errors = new double[spec.origins()];
            for (int o = 0; o < spec.origins(); o++) {
                double[][] e = errors(series, series.head(series.size() - spec.origins() + o), candidate, spec, 1);
                errors[o] = e[0][0] - e[1][0];
            }
            return errors;
        }

        private static double[][] errors(Observations series, Observations training, Candidate candidate,
                                         ComparisonSpec spec, int steps) {
            int first = training.size();
            int last = Math.min(series.size(), first + steps);
            int horizon = series.timeAt(last - 1) - training.lastTime();
            Forecast forecast = candidate.fit(training).forecast(horizon, spec.levels());
            double[][] errors = new double[2][last - first];
            for (int i = first; i < last; i++) {
                errors[0][i - first] = series.valueAt(i);
                errors[1][i - first] = forecast.points().get(series.timeAt(i) - training.lastTime() - 1).value();
            }
            return errors;
        }
    }
}
