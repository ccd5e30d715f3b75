package org.trendwright.api;

import io.javalin.config.JavalinConfig;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.staticfiles.Location;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Map;

/**
 * The browser page: the files of web/ (packed into the jar under /web) served from the classpath
 * at /, Chart.js from its webjar under /webjars/, and two HTML entry points with paths of their
 * own: /setup (first start) and /b/{token} (a published brief, no sign-in). The
 * Content-Security-Policy and the other security headers of every answer are set by
 * {@link AuthGate#securityHeaders}. Thread-safe.
 */
final class PageRoutes {

    private PageRoutes() {
    }

    static void configure(JavalinConfig config) {
        config.staticFiles.add(files -> {
            files.hostedPath = "/";
            files.directory = "/web";
            files.location = Location.CLASSPATH;
            files.headers = Map.of("Cache-Control", "no-cache");
        });
        config.staticFiles.enableWebjars();
    }

    static void register(RoutesConfig routes) {
        routes.get("/setup", ctx -> page(ctx, "setup.html"));
        routes.get("/b/{token}", ctx -> page(ctx, "brief.html"));
    }

    private static void page(Context ctx, String file) {
        try (InputStream in = PageRoutes.class.getResourceAsStream("/web/" + file)) {
            if (in == null) {
                throw new IllegalStateException("The page /web/" + file + " is missing from the classpath");
            }
            ctx.header("Cache-Control", "no-cache").contentType("text/html; charset=utf-8").result(in.readAllBytes());
        } catch (IOException e) {
            throw new UncheckedIOException("The page /web/" + file + " could not be read", e);
        }
    }
}
