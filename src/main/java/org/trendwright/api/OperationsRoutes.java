package org.trendwright.api;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.micrometer.prometheusmetrics.PrometheusMeterRegistry;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.function.BooleanSupplier;

/**
 * Health, Prometheus metrics and the OpenAPI document. Thread-safe.
 */
final class OperationsRoutes {

    /** The classpath resource of the OpenAPI 3.1 document. */
    static final String OPENAPI_RESOURCE = "/openapi.json";

    /** Body of /health. */
    record Health(String status, String database) {
    }

    private final BooleanSupplier databaseReachable;
    private final PrometheusMeterRegistry registry;
    private final byte[] openApi;

    OperationsRoutes(BooleanSupplier databaseReachable, PrometheusMeterRegistry registry) {
        this.databaseReachable = databaseReachable;
        this.registry = registry;
        this.openApi = readOpenApi();
    }

    void register(RoutesConfig routes) {
        routes.get("/health", this::health);
        routes.get("/metrics", this::metrics);
        routes.get("/api/openapi.json", ctx -> ctx.contentType("application/json").result(openApi));
    }

    private void health(Context ctx) {
        boolean up = databaseReachable.getAsBoolean();
        ctx.status(up ? 200 : 503).json(new Health(up ? "up" : "down", up ? "reachable" : "unreachable"));
    }

    private void metrics(Context ctx) {
        ctx.contentType("text/plain; version=0.0.4; charset=utf-8").result(registry.scrape());
    }

    static byte[] readOpenApi() {
        try (InputStream in = OperationsRoutes.class.getResourceAsStream(OPENAPI_RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("The OpenAPI document " + OPENAPI_RESOURCE + " is missing from the"
                        + " class path.");
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
