package org.trendwright.api;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpResponseException;
import io.javalin.http.HttpStatus;
import java.util.Locale;
import java.util.UUID;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.ModelException;
import org.trendwright.core.NonPositiveValueException;
import org.trendwright.core.RankDeficientDesignException;
import org.trendwright.series.IntakeException;
import org.trendwright.series.SeriesNotFoundException;
import org.trendwright.series.VersionConflictException;
import org.trendwright.team.TeamException;

/**
 * The one place where exceptions become HTTP answers, all as RFC 9457 problem+json:
 * <table>
 *   <caption>Exception to status</caption>
 *   <tr><td>BadRequestException</td><td>400 (or its own 4xx), naming the field</td></tr>
 *   <tr><td>IntakeException</td><td>422, naming the line and column or the JSON field</td></tr>
 *   <tr><td>ModelException (the core's)</td><td>422 with the core's message</td></tr>
 *   <tr><td>SeriesNotFoundException</td><td>404</td></tr>
 *   <tr><td>VersionConflictException</td><td>412 (stale If-Match)</td></tr>
 *   <tr><td>TeamException</td><td>its status: 401, 403, 404, 409 (last admin), 429 (sign-in lock-out)</td></tr>
 *   <tr><td>Javalin's HttpResponseException</td><td>its status (404 no route, 405, 413 body too large)</td></tr>
 *   <tr><td>anything else</td><td>500 with an error id; logged with the stack trace under that id</td></tr>
 * </table>
 * No answer carries a stack trace. Thread-safe.
 */
public final class ProblemMapper {

    private static final Logger LOG = LoggerFactory.getLogger(ProblemMapper.class);

    private ProblemMapper() {
    }

    /** Registers every handler on the routes. */
    public static void register(RoutesConfig routes) {
        routes.exception(BadRequestException.class, (e, ctx) ->
                send(ctx, e.status(), e.problem(), e.getMessage(), null, null, e.field()));
        routes.exception(IntakeException.class, (e, ctx) ->
                send(ctx, 422, intakeType(e.reason()), e.getMessage(), e.where().line(), e.where().column(),
                        e.where().field()));
        routes.exception(ModelException.class, (e, ctx) ->
                send(ctx, 422, modelType(e), e.getMessage(), null, null, null));
        routes.exception(SeriesNotFoundException.class, (e, ctx) ->
                send(ctx, 404, "not-found", e.getMessage(), null, null, null));
        routes.exception(VersionConflictException.class, (e, ctx) ->
                send(ctx, 412, "stale-version", e.getMessage(), null, null, "If-Match"));
        routes.exception(TeamException.class, (e, ctx) -> {
            if (e.status() == 401) {
                ctx.header("WWW-Authenticate", "Bearer");
            }
            send(ctx, e.status(), e.type(), e.getMessage(), null, null, null);
        });
        routes.exception(HttpResponseException.class, (e, ctx) ->
                send(ctx, e.getStatus(), slug(HttpStatus.forStatus(e.getStatus()).getMessage()),
                        httpDetail(e, ctx), null, null, null));
        routes.exception(Exception.class, ProblemMapper::unexpected);
    }

    private static void unexpected(Exception e, Context ctx) {
        String errorId = UUID.randomUUID().toString();
        LOG.error("errorId={} method={} path={} unexpected failure", errorId, ctx.method(), ctx.path(), e);
        Problem problem = new Problem(Problem.TYPE_PREFIX + "internal-error", "Internal server error", 500,
                "The server failed to answer this request. Report error id " + errorId
                        + " to the administrator; the log holds the details.", ctx.path(), null, null, null, errorId);
        write(ctx, problem);
    }

    private static void send(Context ctx, int status, String type, String detail, Integer line, Integer column,
                             String field) {
        write(ctx, new Problem(Problem.TYPE_PREFIX + type, title(status, type), status, detail, ctx.path(), line,
                column, field, null));
    }

    private static void write(Context ctx, Problem problem) {
        ctx.status(problem.status()).json(problem).contentType(Problem.MEDIA_TYPE);
    }

    private static String httpDetail(HttpResponseException e, Context ctx) {
        return switch (e.getStatus()) {
            case 404 -> "There is no resource at " + ctx.path() + "; the routes are listed in /api/openapi.json.";
            case 405 -> ctx.method() + " is not allowed on " + ctx.path() + "; see /api/openapi.json.";
            case 413 -> "The request body is larger than the configured limit; split the upload.";
            default -> e.getMessage();
        };
    }

    private static String intakeType(IntakeException.Reason reason) {
        return switch (reason) {
            case INVALID_VALUE -> "invalid-upload";
            case AMBIGUOUS -> "ambiguous-upload";
            case INCONSISTENT -> "inconsistent-upload";
            case MISSING_VALUE -> "missing-value";
            case LIMIT_EXCEEDED -> "limit-exceeded";
        };
    }

    private static String modelType(ModelException e) {
        if (e instanceof InsufficientDataException) {
            return "insufficient-data";
        }
        if (e instanceof NonPositiveValueException) {
            return "non-positive-value";
        }
        return e instanceof RankDeficientDesignException ? "rank-deficient-design" : "invalid-specification";
    }

    private static String title(int status, String type) {
        return switch (type) {
            case "invalid-upload" -> "The upload holds a value that cannot be read";
            case "ambiguous-upload" -> "The upload is ambiguous";
            case "inconsistent-upload" -> "The upload contradicts itself or the series";
            case "missing-value" -> "A value or period is missing";
            case "limit-exceeded" -> "The upload exceeds a configured limit";
            case "insufficient-data", "non-positive-value", "rank-deficient-design", "invalid-specification" ->
                    "The data cannot support this model";
            case "stale-version" -> "The series has changed since the version named in If-Match";
            default -> HttpStatus.forStatus(status).getMessage();
        };
    }

    private static String slug(String text) {
        return text.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-");
    }
}
