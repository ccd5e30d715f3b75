package org.trendwright.api;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import java.util.List;
import java.util.Locale;
import org.trendwright.jobs.JobProgress;
import org.trendwright.jobs.SeriesVerdict;
import org.trendwright.store.JobRepository;
import org.trendwright.store.SeriesRepository;

/**
 * The batch fitting routes: create a job over stored series, named by id or by the upload that
 * created them (its items are judged in the
 * background by every instance's workers), read its progress, read its results as JSON or CSV.
 * Thread-safe.
 */
final class JobRoutes {

    /** Most series one job may name. */
    static final int MAX_SERIES_PER_JOB = 100_000;

    /** The body of POST /api/jobs: the series ids, or the id of the upload whose series to judge. */
    record JobRequest(List<Long> seriesIds, Long uploadId) {
    }

    /** A job's progress as JSON. */
    record Progress(long id, int total, int seriesDone, int failed, double percent, Double secondsLeft,
                    boolean finished, String createdAt, String results) {
        static Progress of(JobProgress p) {
            return new Progress(p.id(), p.total(), p.done(), p.failed(), p.percent(), p.secondsLeft(), p.finished(),
                    p.createdAt().toString(), "/api/jobs/" + p.id() + "/results");
        }
    }

    /** A job's results as JSON. */
    record Results(long jobId, List<SeriesVerdict> results) {
    }

    private final JobRepository jobs;
    private final SeriesRepository series;
    private final Uploads uploads;

    JobRoutes(JobRepository jobs, SeriesRepository series, Uploads uploads) {
        this.jobs = jobs;
        this.series = series;
        this.uploads = uploads;
    }

    void register(RoutesConfig routes) {
        routes.post("/api/jobs", this::create);
        routes.get("/api/jobs/{id}", this::progress);
        routes.get("/api/jobs/{id}/results", this::results);
    }

    private void create(Context ctx) {
        JobRequest request = uploads.body(ctx, JobRequest.class);
        List<Long> ids = request.uploadId() == null ? request.seriesIds() : uploadSeries(request);
        if (ids == null || ids.isEmpty() || ids.size() > MAX_SERIES_PER_JOB || ids.contains(null)) {
            throw new BadRequestException("seriesIds", "seriesIds must list 1.." + MAX_SERIES_PER_JOB
                    + " series ids, e.g. {\"seriesIds\": [1, 2, 3]}.");
        }
        if (ids.stream().distinct().count() != ids.size()) {
            throw new BadRequestException("seriesIds", "seriesIds names a series twice; name each once.");
        }
        long id = jobs.create(ids);
        ctx.header("Location", "/api/jobs/" + id);
        ctx.status(202).json(Progress.of(found(id)));
    }

    /** The series an upload created that still exist; the request names the upload or the series, not both. */
    private List<Long> uploadSeries(JobRequest request) {
        if (request.seriesIds() != null) {
            throw new BadRequestException("uploadId", "Name either seriesIds or uploadId, not both.");
        }
        long uploadId = request.uploadId();
        List<Long> ids = series.uploadSeries(uploadId).orElseThrow(() -> new BadRequestException(404, "not-found",
                "uploadId", "There is no upload " + uploadId + "; POST /api/series answers with the uploadId."));
        if (ids.isEmpty()) {
            throw new BadRequestException(409, "conflict", "uploadId", "Every series of upload " + uploadId
                    + " has been deleted; upload them again or name other seriesIds.");
        }
        return ids;
    }

    private void progress(Context ctx) {
        ctx.json(Progress.of(found(SeriesRoutes.id(ctx))));
    }

    private void results(Context ctx) {
        long id = found(SeriesRoutes.id(ctx)).id();
        List<SeriesVerdict> verdicts = jobs.results(id);
        if (wantsCsv(ctx)) {
            ctx.contentType("text/csv; charset=utf-8").result(csv(verdicts));
        } else {
            ctx.json(new Results(id, verdicts));
        }
    }

    private JobProgress found(long id) {
        return jobs.progress(id).orElseThrow(() -> new BadRequestException(404, "not-found", null,
                "There is no job " + id + "; create one with POST /api/jobs."));
    }

    private static boolean wantsCsv(Context ctx) {
        String format = ctx.queryParam("format");
        String accept = ctx.header("Accept");
        return "csv".equals(format) || format == null && accept != null
                && accept.toLowerCase(Locale.ROOT).startsWith("text/csv");
    }

    static String csv(List<SeriesVerdict> verdicts) {
        StringBuilder out = new StringBuilder("seriesId,version,recommendedModel,serialCorrelation,unitRoot,"
                + "trendBreak,nextForecast,failure\n");
        for (SeriesVerdict v : verdicts) {
            out.append(v.seriesId()).append(',').append(v.version()).append(',').append(quoted(v.recommendedModel()))
                    .append(',').append(text(v.serialCorrelation())).append(',').append(text(v.unitRoot()))
                    .append(',').append(text(v.trendBreak())).append(',').append(text(v.nextForecast()))
                    .append(',').append(quoted(v.failure())).append('\n');
        }
        return out.toString();
    }

    private static String text(Object value) {
        return value == null ? "" : value.toString();
    }

    /** A CSV cell in double quotes with inner quotes doubled (RFC 4180), or empty for null. */
    private static String quoted(String value) {
        return value == null ? "" : "\"" + value.replace("\"", "\"\"") + "\"";
    }
}
