package org.trendwright.app;

import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.Javalin;
import io.micrometer.core.instrument.binder.jvm.JvmMemoryMetrics;
import io.micrometer.core.instrument.binder.system.UptimeMetrics;
import io.micrometer.prometheusmetrics.PrometheusConfig;
import io.micrometer.prometheusmetrics.PrometheusMeterRegistry;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.time.Clock;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.function.Supplier;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.trendwright.api.HttpApi;
import org.trendwright.api.JsonMapping;
import org.trendwright.series.IntakeLimits;
import org.trendwright.store.Database;
import org.trendwright.jobs.JobWorker;
import org.trendwright.store.AuditRepository;
import org.trendwright.store.BriefRepository;
import org.trendwright.store.FitResultRepository;
import org.trendwright.store.JobRepository;
import org.trendwright.store.MemberRepository;
import org.trendwright.store.RecentTokenUses;
import org.trendwright.store.TokenRepository;
import org.trendwright.team.SetupCode;
import org.trendwright.team.TeamSettings;
import org.trendwright.store.SeriesRepository;

/**
 * The factory that wires Trendwright from its collaborators (settings, store, clock) and starts
 * it. Tests start it on port 0 with a fresh store; {@link Main} with the configured one.
 * Thread-safe; {@link #close()} stops the server gracefully and closes the store if this app
 * opened it.
 */
public final class TrendwrightApp implements AutoCloseable {

    private static final Logger LOG = LoggerFactory.getLogger(TrendwrightApp.class);

    private final Javalin server;
    private final List<String> routes;
    private final Database database;
    private final boolean ownsDatabase;
    private final HttpApi.Team team;
    private final String host;
    private final JobWorker worker;

    private TrendwrightApp(Javalin server, List<String> routes, Database database, boolean ownsDatabase,
                           HttpApi.Team team, String host, JobWorker worker) {
        this.server = server;
        this.routes = routes;
        this.database = database;
        this.ownsDatabase = ownsDatabase;
        this.team = team;
        this.host = host;
        this.worker = worker;
    }

    /**
     * Opens the configured store (creating the data directory for SQLite) and starts. The schema
     * migrations and the demo data run while the HTTP server starts (requests wait for them); this
     * returns once both are done.
     */
    public static TrendwrightApp start(Settings settings, Clock clock) {
        return start(settings, TeamSettings.from(System.getenv()), clock);
    }

    /**
     * As {@link #start(Settings, Clock)} with the given sign-in settings. Three threads share the
     * start-up: this one builds the HTTP server; one builds the JSON mapper and the metrics registry
     * the server needs; one migrates the store and loads the demo data.
     */
    public static TrendwrightApp start(Settings settings, TeamSettings team, Clock clock) {
        CompletableFuture<HttpParts> parts = onOwnThread("trendwright-start-http", HttpParts::build);
        if (settings.usesEmbeddedStore()) {
            createDirectory(settings);
        }
        Database database = Database.connect(settings.jdbcUrl(), settings.databaseSchema(), settings.poolSize());
        TrendwrightApp app = null;
        try {
            CompletableFuture<Void> ready = onOwnThread("trendwright-start-store", () -> {
                database.migrate();
                seed(settings, new SeriesRepository(database, clock));
                LOG.info("event=store-ready jvmUptimeMs={} threadCpuMs={}", uptimeMs(), threadCpuMs());
                return null;
            });
            app = start(settings, team, database, clock, true, ready, parts.join());
            ready.join();
            return app.announceSetup();
        } catch (RuntimeException e) {
            if (app != null) {
                app.close();
            } else {
                database.close();
            }
            throw e instanceof CompletionException && e.getCause() instanceof RuntimeException cause ? cause : e;
        }
    }

    /** Starts on a store opened and migrated by the caller, who keeps closing it. */
    public static TrendwrightApp start(Settings settings, Database database, Clock clock) {
        return start(settings, TeamSettings.defaults(), database, clock);
    }

    /** As {@link #start(Settings, Database, Clock)} with the given sign-in settings. */
    public static TrendwrightApp start(Settings settings, TeamSettings team, Database database, Clock clock) {
        seed(settings, new SeriesRepository(database, clock));
        return start(settings, team, database, clock, false, CompletableFuture.completedFuture(null), HttpParts.build())
                .announceSetup();
    }

    /**
     * What the HTTP server needs besides the store: the JSON mapper and the metrics registry with
     * the JVM's memory and uptime. Building them takes a few hundred milliseconds of class loading,
     * so start-up does it beside the server's own set-up.
     */
    private record HttpParts(ObjectMapper mapper, PrometheusMeterRegistry registry) {

        static HttpParts build() {
            PrometheusMeterRegistry registry = new PrometheusMeterRegistry(PrometheusConfig.DEFAULT);
            new JvmMemoryMetrics().bindTo(registry);
            new UptimeMetrics().bindTo(registry);
            return new HttpParts(JsonMapping.create(), registry);
        }
    }

    /** Runs {@code work} on a new thread of its own (the common pool has one thread on 2 cores). */
    private static <T> CompletableFuture<T> onOwnThread(String name, Supplier<T> work) {
        return CompletableFuture.supplyAsync(work, task -> {
            Thread thread = new Thread(task, name);
            thread.setDaemon(true);
            thread.start();
        });
    }

    private static void seed(Settings settings, SeriesRepository series) {
        if (settings.loadDemoData()) {
            DemoData.loadIfEmpty(series, limits(settings));
        }
    }

    private static IntakeLimits limits(Settings settings) {
        return new IntakeLimits(settings.maxObservationsPerSeries(), settings.maxSeriesPerUpload());
    }

    private static TrendwrightApp start(Settings settings, TeamSettings teamSettings, Database database, Clock clock,
                                        boolean owns, CompletableFuture<?> ready, HttpParts parts) {
        SeriesRepository series = new SeriesRepository(database, clock);
        HttpApi.Team team = team(database, clock, teamSettings);
        IntakeLimits limits = limits(settings);
        JobRepository jobs = new JobRepository(database, clock);
        HttpApi.Built built = HttpApi.create(new HttpApi.Services(series, new FitResultRepository(database, clock),
                database::isReachable, parts.registry(), parts.mapper(), limits, settings.maxBodyBytes(),
                settings.shutdownGrace(), ready, settings.maxConcurrentFits(), settings.maxQueuedFits(), jobs), team);
        built.app().start(settings.host(), settings.port());
        LOG.info("event=started url=http://{}:{} store={} jvmUptimeMs={} threadCpuMs={}", settings.host(),
                built.app().port(), database.dialect().name().toLowerCase(java.util.Locale.ROOT), uptimeMs(),
                threadCpuMs());
        // Workers start once the store is migrated; requests wait for the same moment.
        JobWorker worker = new JobWorker(jobs, series, settings.jobWorkers(), settings.jobLease(), ready);
        return new TrendwrightApp(built.app(), built.routes(), database, owns, team, settings.host(), worker);
    }

    /**
     * The team features' parts.
     */
    private static HttpApi.Team team(Database database, Clock clock, TeamSettings settings) {
        RecentTokenUses recentTokenUses = new RecentTokenUses();
        return new HttpApi.Team(new MemberRepository(database, clock, recentTokenUses),
                new TokenRepository(database, clock, recentTokenUses),
                new BriefRepository(database, clock), new AuditRepository(database, clock), settings,
                SetupCode.of(settings.setupCode()), clock);
    }

    /**
     * Prints, on the console only (never the log), how to create the first admin: the sign-in
     * address and the setup code, while no member exists.
     */
    private TrendwrightApp announceSetup() {
        if (team.members().isEmpty()) {
            System.out.println(team.setupCode().announcement("http://" + host + ":" + server.port()));
        }
        return this;
    }

    /** Milliseconds since the JVM started, for the start-up events of the log. */
    static long uptimeMs() {
        return ManagementFactory.getRuntimeMXBean().getUptime();
    }

    /** CPU milliseconds the calling thread has used: what a start-up phase cost, whatever the load. */
    static long threadCpuMs() {
        return ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime() / 1_000_000;
    }

    private static void createDirectory(Settings settings) {
        try {
            Files.createDirectories(settings.dataDirectory());
        } catch (IOException e) {
            throw new UncheckedIOException("Cannot create the data directory " + settings.dataDirectory(), e);
        }
    }

    /** The port the server listens on (the real one when started on port 0). */
    public int port() {
        return server.port();
    }

    /** Every registered route as "METHOD /path/{param}". */
    public List<String> routes() {
        return List.copyOf(routes);
    }

    @Override
    public void close() {
        worker.close();
        server.stop();
        if (ownsDatabase) {
            database.close();
        }
        LOG.info("event=stopped");
    }
}
