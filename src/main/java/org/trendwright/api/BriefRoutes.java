package org.trendwright.api;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import java.time.Clock;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.trendwright.series.Point;
import org.trendwright.series.SeriesNotFoundException;
import org.trendwright.series.SeriesVersion;
import org.trendwright.store.BriefRepository;
import org.trendwright.store.SeriesRepository;
import org.trendwright.team.Brief;
import org.trendwright.team.BriefTracking;
import org.trendwright.team.Member;
import org.trendwright.team.Secrets;
import org.trendwright.team.TeamException;

/**
 * Forecast briefs: an editor publishes a fit of a stored version as a frozen JSON snapshot at an
 * unguessable link; anyone with the link reads it (with tracking against the actuals that arrived
 * since, computed at read time); editors list and revoke them. Thread-safe.
 */
final class BriefRoutes {

    /** What to publish: the fit endpoint's request plus the version, a note and an optional expiry. */
    record BriefRequest(Integer version, ModelSpec model, Integer horizon, List<Double> levels,
                        Double significanceLevel, String note, String expiresAt) {
    }

    /** A brief as listed to members (never its content). */
    record BriefBody(long id, String token, String url, long seriesId, int seriesVersion, String author,
                     Instant publishedAt, Instant expiresAt, Instant revokedAt, Long supersededBy, boolean shared) {
        static BriefBody of(Brief b, Instant now) {
            return new BriefBody(b.id(), b.token(), b.url(), b.seriesId(), b.seriesVersion(), b.authorName(),
                    b.publishedAt(), b.expiresAt(), b.revokedAt(), b.supersededBy(), b.sharedAt(now));
        }
    }

    /** A brief whose actuals fell outside its 95% interval. */
    record Miss(BriefBody brief, BriefTracking tracking) {
    }

    private static final int MAX_NOTE = 10_000;

    private final SeriesRepository series;
    private final BriefRepository briefs;
    private final FitService fits;
    private final Uploads uploads;
    private final ObjectMapper mapper;
    private final Clock clock;

    BriefRoutes(SeriesRepository series, BriefRepository briefs, FitService fits, Uploads uploads, ObjectMapper mapper,
                Clock clock) {
        this.series = series;
        this.briefs = briefs;
        this.fits = fits;
        this.uploads = uploads;
        this.mapper = mapper;
        this.clock = clock;
    }

    void register(RoutesConfig routes) {
        routes.post("/api/series/{id}/briefs", this::publish);
        routes.get("/api/briefs", ctx -> ctx.json(new TeamBodies.Listing<>(briefs.list().stream()
                .map(b -> BriefBody.of(b, clock.instant())).toList())));
        routes.get("/api/briefs/misses", this::misses);
        routes.delete("/api/briefs/{id}", ctx -> {
            briefs.revoke(SeriesRoutes.id(ctx));
            ctx.status(204);
        });
        routes.get("/api/public/briefs/{token}", this::read);
    }

    private void publish(Context ctx) {
        BriefRequest body = uploads.body(ctx, BriefRequest.class);
        if (body.version() == null) {
            throw new BadRequestException("version", "version is required: the series version to publish.");
        }
        String note = body.note() == null ? "" : body.note();
        if (note.length() > MAX_NOTE) {
            throw new BadRequestException("note", "note must be at most " + MAX_NOTE + " characters.");
        }
        Instant expires = expiry(body.expiresAt());
        SeriesVersion version = series.version(SeriesRoutes.id(ctx), body.version());
        FitRequest request = new FitRequest(body.model(), body.horizon(), withTrackedLevels(body.levels()),
                body.significanceLevel()).normalized();
        String results = fits.stored(version, request).json();
        Member author = AuthGate.required(ctx).member();
        Instant now = clock.instant();
        String content = frozen(version, request, results, note, author.username(), now, expires);
        Brief brief = briefs.publish(new Brief(0, Secrets.random(""), version.seriesId(), version.version(),
                author.id(), author.username(), content, now, expires, null, null));
        ctx.status(201).json(BriefBody.of(brief, now));
    }

    /** The requested levels plus 80% and 95%, which tracking reports on. */
    private static List<Double> withTrackedLevels(List<Double> levels) {
        TreeSet<Double> all = new TreeSet<>(levels == null ? List.of() : levels);
        all.addAll(FitRequest.DEFAULT_LEVELS);
        return new ArrayList<>(all);
    }

    private Instant expiry(String text) {
        if (text == null) {
            return null;
        }
        try {
            Instant at = Instant.parse(text);
            if (!at.isAfter(clock.instant())) {
                throw new BadRequestException("expiresAt", "expiresAt must lie in the future.");
            }
            return at;
        } catch (DateTimeParseException e) {
            throw new BadRequestException("expiresAt", "expiresAt must be an ISO-8601 instant such as"
                    + " 2030-01-31T00:00:00Z, got '" + text + "'.");
        }
    }

    /** The frozen JSON: series version data, the model request, results, chart, note, author, time. */
    private String frozen(SeriesVersion version, FitRequest request, String results, String note, String author,
                          Instant publishedAt, Instant expiresAt) {
        try {
            ObjectNode fit = (ObjectNode) mapper.readTree(results);
            JsonNode chart = fit.remove("chart");
            // The page shows the series by name; its id in this store is nobody's business outside.
            ((ObjectNode) fit.path("series")).remove("id");
            ObjectNode root = mapper.createObjectNode();
            ObjectNode data = root.putObject("series");
            data.put("name", version.name()).put("version", version.version())
                    .put("frequency", version.frequency().jsonName());
            var observations = data.putArray("observations");
            for (Point p : version.points()) {
                observations.addObject().put("period", p.period().label()).put("value", p.value());
            }
            root.set("model", mapper.valueToTree(request));
            root.set("results", fit);
            root.set("chart", chart);
            root.put("note", note).put("author", author).put("publishedAt", publishedAt.toString())
                    .put("expiresAt", expiresAt == null ? null : expiresAt.toString());
            return mapper.writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("A brief could not be written as JSON", e);
        }
    }

    /**
     * The public brief: the frozen JSON exactly as published, followed by the fields computed now
     * (newer brief, tracking). Unknown, revoked and expired links all answer the same 404.
     */
    private void read(Context ctx) {
        Instant now = clock.instant();
        Brief brief = briefs.byToken(ctx.pathParam("token")).filter(b -> b.sharedAt(now))
                .orElseThrow(() -> TeamException.notFound("shared brief at this link"));
        String newer = null;
        if (brief.supersededBy() != null) {
            Brief successor = briefs.find(brief.supersededBy());
            newer = successor.sharedAt(now) ? successor.url() : null;
        }
        String live = "\"newerBriefExists\":" + (brief.supersededBy() != null) + ",\"supersededBy\":"
                + json(newer) + ",\"tracking\":" + json(tracking(brief));
        String content = brief.content();
        ctx.header("Cache-Control", "no-store");
        ctx.contentType("application/json").result(content.substring(0, content.length() - 1) + "," + live + "}");
    }

    private void misses(Context ctx) {
        Instant now = clock.instant();
        List<Miss> misses = new ArrayList<>();
        for (Brief brief : briefs.list()) {
            if (brief.revokedAt() == null) {
                BriefTracking tracking = tracking(brief);
                if (tracking.outside95() > 0) {
                    misses.add(new Miss(BriefBody.of(brief, now), tracking));
                }
            }
        }
        ctx.json(new TeamBodies.Listing<>(misses));
    }

    private BriefTracking tracking(Brief brief) {
        SeriesVersion latest;
        try {
            latest = series.latest(brief.seriesId());
        } catch (SeriesNotFoundException e) {
            return BriefTracking.seriesGone();
        }
        Map<String, Double> actuals = new HashMap<>();
        for (Point p : latest.points()) {
            actuals.put(p.period().label(), p.value());
        }
        try {
            return BriefTracking.of(mapper.readTree(brief.content()).path("chart"), latest.version(), actuals);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("Stored brief " + brief.id() + " is not JSON", e);
        }
    }

    private String json(Object value) {
        try {
            return mapper.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("Could not write JSON", e);
        }
    }
}
