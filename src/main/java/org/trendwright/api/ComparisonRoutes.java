package org.trendwright.api;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import java.util.List;
import org.trendwright.core.Observations;
import org.trendwright.core.selection.AccuracyMeasures;
import org.trendwright.core.selection.CandidateAssessment;
import org.trendwright.core.selection.ComparisonSpec;
import org.trendwright.core.selection.ModelComparison;
import org.trendwright.core.selection.ModelSelection;
import org.trendwright.core.selection.StandardCandidates;
import org.trendwright.series.SeriesVersion;
import org.trendwright.store.SeriesRepository;

/**
 * {@code POST /api/series/{id}/versions/{version}/comparison}: compares the standard candidate
 * models out of sample ({@link ModelSelection} over {@link StandardCandidates}) and recommends
 * one with its reasons. Computed on each request, stores nothing. Thread-safe.
 */
final class ComparisonRoutes {

    private final SeriesRepository repository;
    private final Uploads uploads;

    ComparisonRoutes(SeriesRepository repository, Uploads uploads) {
        this.repository = repository;
        this.uploads = uploads;
    }

    void register(RoutesConfig routes) {
        routes.post("/api/series/{id}/versions/{version}/comparison", this::compare);
    }

    /**
     * How to compare; every member is optional (defaults: holdout of one year, at least 4
     * periods; 8 rolling origins; 5% tests).
     */
    record ComparisonRequest(Integer holdout, Integer origins, Double significanceLevel) {
    }

    /** Out-of-sample accuracy; MAPE and MASE are null when undefined, {@code note} says why. */
    record Accuracy(int forecasts, double rmse, double mae, Double mape, Double mase, String note) {

        static Accuracy of(AccuracyMeasures m) {
            return new Accuracy(m.forecasts(), m.rmse(), m.mae(), m.mape().orElse(null), m.mase().orElse(null),
                    m.note());
        }
    }

    /** One candidate's line; numbers are null when it could not be fitted ({@code failure} says why). */
    record CandidateRow(String name, boolean recommended, String failure, Double aic, Double bic,
                        Integer observationsUsed, Accuracy holdout, Accuracy rollingOrigin,
                        List<FitResponse.Test> residualChecks, int checksPassed, boolean passesChecks) {
    }

    /** The comparison: candidates best first, the recommended one, the reasons, and the DM test. */
    record ComparisonResponse(long seriesId, int version, int holdout, int origins, double significanceLevel,
                              String recommended, List<String> reasons, boolean noCandidatePasses,
                              FitResponse.Test dieboldMariano, List<CandidateRow> candidates) {
    }

    private void compare(Context ctx) {
        ComparisonRequest request = ctx.body().isBlank() ? new ComparisonRequest(null, null, null)
                : uploads.body(ctx, ComparisonRequest.class);
        SeriesVersion version = repository.version(SeriesRoutes.id(ctx), SeriesRoutes.number(ctx, "version"));
        Observations series = version.observations();
        ComparisonSpec defaults = ComparisonSpec.defaultsFor(series.periodsPerYear());
        ComparisonSpec spec = new ComparisonSpec(
                request.holdout() == null ? defaults.holdout() : request.holdout(),
                request.origins() == null ? defaults.origins() : request.origins(), defaults.levels(),
                request.significanceLevel() == null ? defaults.level() : request.significanceLevel());
        ModelComparison comparison = ModelSelection.compare(series,
                StandardCandidates.forSeries(series, spec.level()), spec);
        ctx.json(response(version, spec, comparison));
    }

    private static ComparisonResponse response(SeriesVersion version, ComparisonSpec spec, ModelComparison c) {
        String recommended = c.recommended().orElse(null);
        List<CandidateRow> rows = c.candidates().stream().map(a -> row(a, a.name().equals(recommended))).toList();
        return new ComparisonResponse(version.seriesId(), version.version(), spec.holdout(), spec.origins(),
                spec.level(), recommended, c.reasons(), c.noCandidatePasses(),
                c.dieboldMariano().map(CheckBodies::test).orElse(null), rows);
    }

    private static CandidateRow row(CandidateAssessment a, boolean recommended) {
        if (!a.evaluated()) {
            return new CandidateRow(a.name(), false, a.failure().orElse(null), null, null, null, null, null,
                    List.of(), 0, false);
        }
        List<FitResponse.Test> checks = a.residualChecks().stream().map(CheckBodies::test).toList();
        int passed = (int) checks.stream().filter(t -> "do-not-reject".equals(t.decision())).count();
        return new CandidateRow(a.name(), recommended, null, a.aic(), a.bic(), a.observationsUsed(),
                a.holdout().map(Accuracy::of).orElse(null), a.rollingOrigin().map(Accuracy::of).orElse(null),
                checks, passed, a.passesChecks());
    }
}
