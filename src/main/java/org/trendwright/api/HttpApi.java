package org.trendwright.api;

import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.Javalin;
import io.javalin.config.SizeUnit;
import io.javalin.json.JavalinJackson;
import io.micrometer.prometheusmetrics.PrometheusMeterRegistry;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.BooleanSupplier;
import org.eclipse.jetty.server.handler.GracefulHandler;
import org.trendwright.series.IntakeLimits;
import java.time.Clock;
import org.trendwright.store.AuditRepository;
import org.trendwright.store.BriefRepository;
import org.trendwright.store.FitResultRepository;
import org.trendwright.store.JobRepository;
import org.trendwright.store.MemberRepository;
import org.trendwright.store.TokenRepository;
import org.trendwright.team.SetupCode;
import org.trendwright.team.TeamSettings;
import org.trendwright.store.SeriesRepository;

/**
 * Builds the Javalin application: routes, the one error mapper, the JSON mapper, request logging
 * and metrics, the body size limit, the access gate of the team features (see {@link AuthGate}), a gate that holds requests until the store is ready, and a
 * graceful stop that lets requests in flight finish (up to {@code stopTimeout}) before the server
 * closes.
 */
public final class HttpApi {

    /**
     * What the HTTP layer needs.
     *
     * @param series            the series store
     * @param fits              the fit result store
     * @param databaseReachable the health check of the store
     * @param registry          the metrics registry /metrics shows
     * @param mapper            the JSON mapper (see {@link JsonMapping})
     * @param limits            intake limits
     * @param maxBodyBytes      the largest request body accepted
     * @param stopTimeout       how long a stop waits for requests in flight
     * @param storeReady        completes when the store is migrated (and seeded); requests that
     *                          arrive before wait for it, so the server can start while it migrates
     * @param maxConcurrentFits fits that may run at once
     * @param maxQueuedFits     fits that may wait for a turn; beyond both the fit routes answer 503
     * @param jobs              the batch fitting job store
     */
    public record Services(SeriesRepository series, FitResultRepository fits, BooleanSupplier databaseReachable,
                           PrometheusMeterRegistry registry, ObjectMapper mapper, IntakeLimits limits,
                           long maxBodyBytes, Duration stopTimeout, CompletableFuture<?> storeReady,
                           int maxConcurrentFits, int maxQueuedFits, JobRepository jobs) {
    }

    /**
     * What the team features need: members and sessions, API tokens, briefs, the audit log,
     * sign-in settings, the one-time setup code and the clock.
     */
    public record Team(MemberRepository members, TokenRepository tokens, BriefRepository briefs,
                       AuditRepository audit, TeamSettings settings, SetupCode setupCode, Clock clock) {
    }

    /** A built, not yet started application and the routes it registered ("GET /api/series"). */
    public record Built(Javalin app, List<String> routes) {
    }

    private HttpApi() {
    }

    public static Built create(Services services, Team team) {
        List<String> routes = new CopyOnWriteArrayList<>();
        Uploads uploads = new Uploads(services.mapper(), services.limits(), services.maxBodyBytes());
        FitService fitService = new FitService(services.fits(), services.mapper(), services.registry());
        RequestObserver observer = new RequestObserver(services.registry());
        Javalin app = Javalin.create(config -> {
            config.startup.showJavalinBanner = false;
            config.startup.showOldJavalinVersionWarning = false;
            config.jsonMapper(new JavalinJackson(services.mapper(), false));
            config.http.maxRequestSize = services.maxBodyBytes();
            config.http.prefer405over404 = true;
            config.jetty.multipartConfig.maxFileSize(services.maxBodyBytes(), SizeUnit.BYTES);
            config.jetty.multipartConfig.maxTotalRequestSize(services.maxBodyBytes(), SizeUnit.BYTES);
            config.jetty.modifyServer(server -> {
                server.setStopTimeout(services.stopTimeout().toMillis());
                server.setHandler(new GracefulHandler());
            });
            config.requestLogger.http(observer::observe);
            config.events.handlerAdded(h -> {
                if (h.getHttpMethod().isHttpMethod()) {
                    routes.add(h.getHttpMethod().name() + " " + h.getPath());
                }
            });
            PageRoutes.configure(config);
            ProblemMapper.register(config.routes);
            config.routes.before(ctx -> services.storeReady().join());
            new AuthGate(team.members(), team.tokens(), team.audit(), team.settings()).register(config.routes);
            new SeriesRoutes(services.series(), uploads, new UploadProgress(team.clock())).register(config.routes);
            new FitRoutes(services.series(), fitService, uploads,
                    new FitGate(services.maxConcurrentFits(), services.maxQueuedFits())).register(config.routes);
            new JobRoutes(services.jobs(), services.series(), uploads).register(config.routes);
            new TeamRoutes(team, uploads).register(config.routes);
            new BriefRoutes(services.series(), team.briefs(), fitService, uploads, services.mapper(), team.clock())
                    .register(config.routes);
            new PreviewRoutes(uploads).register(config.routes);
            new ComparisonRoutes(services.series(), uploads).register(config.routes);
            PageRoutes.register(config.routes);
            new OperationsRoutes(services.databaseReachable(), services.registry()).register(config.routes);
        });
        return new Built(app, routes);
    }
}
