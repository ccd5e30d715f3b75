package org.trendwright.api;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import org.trendwright.series.IntakeOptions;
import org.trendwright.series.JsonIntake;
import org.trendwright.series.SeriesAssembly;
import org.trendwright.series.SeriesDraft;
import org.trendwright.series.SeriesInput;
import org.trendwright.series.SeriesVersion;
import org.trendwright.store.SeriesRepository;

/**
 * The fit routes: a stored series version (result kept per version and model; the header
 * {@code X-Trendwright-Cache} says hit or miss) and posted data (stores nothing). Both pass the
 * {@link FitGate}: beyond capacity they answer 503 with Retry-After. Thread-safe.
 */
final class FitRoutes {

    /** Name of a posted series that has none. */
    static final String POSTED_NAME = "posted series";

    private final SeriesRepository repository;
    private final FitService fits;
    private final Uploads uploads;
    private final FitGate gate;

    FitRoutes(SeriesRepository repository, FitService fits, Uploads uploads, FitGate gate) {
        this.repository = repository;
        this.fits = fits;
        this.uploads = uploads;
        this.gate = gate;
    }

    void register(RoutesConfig routes) {
        routes.post("/api/series/{id}/versions/{version}/fit", this::fitStored);
        routes.post("/api/fit", this::fitPosted);
    }

    private void fitStored(Context ctx) {
        FitRequest request = uploads.body(ctx, FitRequest.class);
        SeriesVersion version = repository.version(SeriesRoutes.id(ctx), SeriesRoutes.number(ctx, "version"));
        FitService.Answer answer = gate.run(version.points().size(), () -> fits.stored(version, request));
        ctx.header("X-Trendwright-Cache", answer.cached() ? "hit" : "miss");
        ctx.header("ETag", ETags.of(version.seriesId(), version.version()));
        ctx.contentType("application/json").result(answer.json());
    }

    private void fitPosted(Context ctx) {
        StatelessFitRequest request = uploads.body(ctx, StatelessFitRequest.class);
        FitRequest fit = request.fit().normalized();
        if (request.series() == null) {
            throw new BadRequestException("series", "series is required: {\"observations\": [{\"period\":"
                    + " \"2024-Q1\", \"value\": 12.5}, ...]}.");
        }
        IntakeOptions options = uploads.options(ctx);
        SeriesInput input = JsonIntake.readOne(request.series(), "series.", false);
        SeriesInput named = new SeriesInput(input.name() == null ? POSTED_NAME : input.name(), input.where(),
                input.changes());
        SeriesDraft draft = SeriesAssembly.create(named, options);
        String json = gate.run(draft.points().size(),
                () -> fits.stateless(draft.name(), draft.frequency(), draft.points(), fit));
        ctx.contentType("application/json").result(json);
    }
}
