package org.trendwright.api;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import java.util.ArrayList;
import java.util.List;
import org.trendwright.series.IntakeOptions;
import org.trendwright.series.SeriesAssembly;
import org.trendwright.series.SeriesDraft;
import org.trendwright.series.SeriesInput;
import org.trendwright.series.SeriesSummary;
import org.trendwright.series.SeriesVersion;
import org.trendwright.series.StoredUpload;
import org.trendwright.team.Principal;
import org.trendwright.store.SeriesRepository;

/**
 * The series routes: upload, list, read (current or any version), new versions under If-Match,
 * delete under If-Match, and the progress of an upload in flight (see {@link UploadProgress}).
 * Every upload is one transaction: a refused upload stores nothing.
 * Thread-safe.
 */
final class SeriesRoutes {

    private final SeriesRepository repository;
    private final Uploads uploads;
    private final UploadProgress progress;

    SeriesRoutes(SeriesRepository repository, Uploads uploads, UploadProgress progress) {
        this.repository = repository;
        this.uploads = uploads;
        this.progress = progress;
    }

    void register(RoutesConfig routes) {
        routes.post("/api/series", this::create);
        routes.get("/api/series", this::list);
        routes.get("/api/series/{id}", this::current);
        routes.delete("/api/series/{id}", this::delete);
        routes.get("/api/series/{id}/versions", this::versions);
        routes.post("/api/series/{id}/versions", this::revise);
        routes.get("/api/series/{id}/versions/{version}", this::version);
        routes.get("/api/upload-progress/{key}", this::progress);
    }

    /**
     * Reads, checks and stores an upload, reporting each phase to the progress key the request
     * names (query parameter {@code progress}), if any.
     */
    private void create(Context ctx) {
        IntakeOptions options = uploads.options(ctx);
        UploadProgress.Tracker tracker = progress.start(ctx.queryParam("progress"), memberId(ctx),
                ctx.req().getContentLengthLong() < 0 ? null : ctx.req().getContentLengthLong());
        try {
            StoredUpload stored = store(ctx, options, tracker);
            tracker.done();
            List<SeriesSummary> created = stored.series();
            if (created.size() == 1) {
                ctx.header("Location", "/api/series/" + created.get(0).id());
                ctx.header("ETag", ETags.of(created.get(0).id(), 1));
            }
            ctx.status(201).json(new SeriesBodies.Created(stored.uploadId(),
                    created.stream().map(SeriesBodies.Summary::of).toList()));
        } catch (RuntimeException e) {
            tracker.failed();
            throw e;
        }
    }

    private StoredUpload store(Context ctx, IntakeOptions options, UploadProgress.Tracker tracker) {
        List<SeriesInput> inputs = new ArrayList<>(uploads.readMany(ctx, tracker::bytesRead, tracker::rowsRead));
        List<SeriesDraft> drafts = new ArrayList<>(inputs.size());
        tracker.checked(0, inputs.size());
        for (int i = 0; i < inputs.size(); i++) {
            drafts.add(SeriesAssembly.create(inputs.get(i), options));
            inputs.set(i, null); // the checked draft replaces the rows as read
            tracker.checked(i + 1, inputs.size());
        }
        tracker.stored(0);
        return repository.createAll(drafts, tracker::stored);
    }

    private void progress(Context ctx) {
        String key = ctx.pathParam("key");
        ctx.json(progress.find(key, memberId(ctx)).orElseThrow(() -> new BadRequestException(404, "not-found", null,
                "This instance tracks no upload of yours with progress key " + key + "; it may not have started"
                        + " yet, may have finished over " + UploadProgress.KEEP.toMinutes() + " minutes ago, or may"
                        + " run on another instance.")));
    }

    private static Long memberId(Context ctx) {
        Principal principal = AuthGate.principal(ctx);
        return principal == null ? null : principal.member().id();
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
