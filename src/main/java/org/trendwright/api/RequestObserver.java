package org.trendwright.api;

import io.javalin.http.Context;
import io.micrometer.core.instrument.MeterRegistry;
import io.micrometer.core.instrument.Timer;
import java.util.concurrent.TimeUnit;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Logs one key=value line per request (method, path, route, status, ms) and records the timer
 * {@code http.server.requests} (tags method, route, status), which Prometheus shows as
 * {@code http_server_requests_seconds_*} with histogram buckets, from which Prometheus computes
 * percentiles. The route is the matched path template, so ids do not blow up the number of
 * series. Thread-safe.
 */
final class RequestObserver {

    private static final Logger LOG = LoggerFactory.getLogger("org.trendwright.requests");

    private final MeterRegistry registry;

    RequestObserver(MeterRegistry registry) {
        this.registry = registry;
    }

    void observe(Context ctx, Float millis) {
        String route = route(ctx);
        int status = ctx.statusCode();
        Timer.builder("http.server.requests").description("HTTP requests: count and time to answer")
                .tags("method", ctx.method().name(), "route", route, "status", Integer.toString(status))
                .publishPercentileHistogram().register(registry)
                .record((long) (millis * 1_000_000L), TimeUnit.NANOSECONDS);
        // A path that carries a secret (a brief link's token) is logged as its route template.
        String path = route.contains("{token}") ? route : ctx.path();
        LOG.info("method={} path={} route={} status={} ms={}", ctx.method().name(), path, route, status,
                String.format(java.util.Locale.ROOT, "%.2f", millis));
    }

    private static String route(Context ctx) {
        try {
            io.javalin.router.Endpoint matched = ctx.endpoints().matchedHttpEndpoint();
            String path = matched == null ? null : matched.path;
            return path == null || path.isEmpty() || path.equals("*") ? "unmatched" : path;
        } catch (RuntimeException e) {
            return "unmatched";
        }
    }
}
