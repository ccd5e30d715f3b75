package org.trendwright.testing;

import io.restassured.RestAssured;
import io.restassured.config.JsonConfig;
import io.restassured.path.json.config.JsonPathConfig.NumberReturnType;
import io.restassured.specification.RequestSpecification;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.List;
import org.trendwright.app.Settings;
import org.trendwright.app.TrendwrightApp;
import org.trendwright.store.Database;
import org.trendwright.team.TeamSettings;

/**
 * A really started Trendwright on a random port (port 0) over a {@link FreshStore}, for REST
 * Assured tests, with its first admin created (see {@link TeamAccess}). {@link #restart()} stops the server and its pool and starts a new one on the same
 * data, as a process restart would. {@link #close()} stops it and removes the store.
 */
public final class RunningServer implements AutoCloseable {

    private final FreshStore store;
    private final Settings settings;
    private final TeamSettings teamSettings;
    private Database database;
    private TrendwrightApp app;
    private String adminToken;

    private RunningServer(FreshStore store, Settings settings, TeamSettings teamSettings) {
        this.store = store;
        this.settings = settings;
        this.teamSettings = teamSettings;
        start();
    }

    /** A server with the default limits and no demo data. */
    public static RunningServer start(FreshStore.Kind kind) {
        return start(kind, testSettings());
    }

    public static RunningServer start(FreshStore.Kind kind, Settings settings) {
        return new RunningServer(FreshStore.create(kind), settings, TeamAccess.testSettings());
    }

    /** A server with the default limits and the given sign-in settings. */
    public static RunningServer start(FreshStore.Kind kind, TeamSettings teamSettings) {
        return new RunningServer(FreshStore.create(kind), testSettings(), teamSettings);
    }

    /** The defaults on port 0, demo data off, no shutdown grace (stops at once; GracefulShutdownTest sets one). */
    public static Settings testSettings() {
        return new Settings("127.0.0.1", 0, Path.of("unused"), null, null, 4, 10L * 1024 * 1024, 100_000, 1_000,
                false, Duration.ZERO);
    }

    private void start() {
        database = store.open();
        app = TrendwrightApp.start(settings, teamSettings, database, Clock.systemUTC());
        if (adminToken == null) {
            adminToken = TeamAccess.bootstrap(app.port());
        }
    }

    /** Stops the server and closes its pool, then starts both again on the same store. */
    public void restart() {
        stopServer();
        start();
    }

    /**
     * A REST Assured request aimed at this server as its first admin (with a read-write API
     * token); JSON numbers are read as doubles.
     */
    public RequestSpecification given() {
        return anonymous().header("Authorization", "Bearer " + adminToken);
    }

    /** A request aimed at this server that is not signed in. */
    public RequestSpecification anonymous() {
        return RestAssured.given().baseUri("http://127.0.0.1").port(app.port())
                .config(RestAssured.config().jsonConfig(JsonConfig.jsonConfig().numberReturnType(NumberReturnType.DOUBLE)));
    }

    /** The first admin's read-write API token. */
    public String adminToken() {
        return adminToken;
    }

    public int port() {
        return app.port();
    }

    public TrendwrightApp app() {
        return app;
    }

    public Database database() {
        return database;
    }

    private void stopServer() {
        app.close();
        database.close();
    }

    @Override
    public void close() {
        try {
            stopServer();
        } finally {
            store.close();
        }
    }
}
