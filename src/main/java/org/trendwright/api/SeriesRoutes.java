package org.trendwright.api;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import java.util.List;
import org.trendwright.series.IntakeOptions;
import org.trendwright.series.SeriesAssembly;
import org.trendwright.series.SeriesDraft;
import org.trendwright.series.SeriesInput;
import org.trendwright.series.SeriesSummary;
import org.trendwright.series.SeriesVersion;
import org.trendwright.store.SeriesRepository;

/**
 * The series routes: upload, list, read (current or any version), new versions under If-Match,
 * delete under If-Match. Every upload is one transaction: a refused upload stores nothing.
 * Thread-safe.
 */
final class SeriesRoutes {

    private final SeriesRepository repository;
    private final Uploads uploads;

    SeriesRoutes(SeriesRepository repository, Uploads uploads) {
        this.repository = repository;
        this.uploads = uploads;
    }

    void register(RoutesConfig routes) {
        routes.post("/api/series", this::create);
        routes.get("/api/series", this::list);
        routes.get("/api/series/{id}", this::current);
        routes.delete("/api/series/{id}", this::delete);
        routes.get("/api/series/{id}/versions", this::versions);
        routes.post("/api/series/{id}/versions", this::revise);
        routes.get("/api/series/{id}/versions/{version}", this::version);
    }

    private void create(Context ctx) {
        IntakeOptions options = uploads.options(ctx);
        List<SeriesDraft> drafts = uploads.readMany(ctx).stream().map(in -> SeriesAssembly.create(in, options))
                .toList();
        List<SeriesVersion> created = repository.createAll(drafts);
        if (created.size() == 1) {
            ctx.header("Location", "/api/series/" + created.get(0).seriesId());
            ctx.header("ETag", ETags.of(created.get(0).seriesId(), 1));
        }
        ctx.status(201).json(new SeriesBodies.Created(created.stream().map(SeriesBodies.Summary::of).toList()));
    }

    private void list(Context ctx) {
        List<SeriesSummary> all = repository.list();
        ctx.json(new SeriesBodies.Listing(all.stream().map(SeriesBodies.Summary::of).toList()));
    }

    private void current(Context ctx) {
        answer(ctx, repository.latest(id(ctx)));
    }

    private void version(Context ctx) {
        answer(ctx, repository.version(id(ctx), number(ctx, "version")));
    }

    private void answer(Context ctx, SeriesVersion version) {
        String etag = ETags.of(version.seriesId(), version.version());
        ctx.header("ETag", etag);
        if (ETags.noneMatch(ctx, etag)) {
            ctx.status(304);
            return;
        }
        ctx.json(SeriesBodies.Detail.of(version));
    }

    private void versions(Context ctx) {
        long id = id(ctx);
        var versions = repository.versions(id);
        int current = versions.get(versions.size() - 1).version();
        ctx.header("ETag", ETags.of(id, current));
        ctx.json(new SeriesBodies.Versions(id, current, versions.stream()
                .map(v -> SeriesBodies.Version.of(id, v)).toList()));
    }

    private void revise(Context ctx) {
        long id = id(ctx);
        SeriesVersion current = repository.latest(id);
        int expected = ETags.requireMatch(ctx, id, current.version());
        IntakeOptions options = uploads.options(ctx);
        SeriesInput input = uploads.readOne(ctx);
        SeriesVersion next = repository.addVersion(id, expected,
                base -> SeriesAssembly.revise(base.points(), base.frequency(), input, options));
        ctx.header("Location", "/api/series/" + id + "/versions/" + next.version());
        ctx.header("ETag", ETags.of(id, next.version()));
        ctx.status(201).json(SeriesBodies.Detail.of(next));
    }

    private void delete(Context ctx) {
        long id = id(ctx);
        SeriesVersion current = repository.latest(id);
        repository.delete(id, ETags.requireMatch(ctx, id, current.version()));
        ctx.status(204);
    }

    static long id(Context ctx) {
        return number(ctx, "id");
    }

    static int number(Context ctx, String name) {
        String text = ctx.pathParam(name);
        try {
            int value = Integer.parseInt(text);
            if (value < 1) {
                throw new NumberFormatException();
            }
            return value;
        } catch (NumberFormatException e) {
            throw new BadRequestException(name, "The path parameter " + name + " must be a positive whole number,"
                    + " got '" + text + "'.");
        }
    }
}
