package org.trendwright.app;

import java.nio.file.Path;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;

/**
 * Every setting of the server. Each can be given as a command-line flag {@code --name=value} or
 * as the environment variable {@code TRENDWRIGHT_NAME} (upper case, dashes as underscores); a
 * flag wins over the environment, the environment over the default:
 * <pre>
 *   host                   127.0.0.1        bind address; 0.0.0.0 opens the server to the network
 *   port                   7070             0 picks a free port
 *   data-dir               ./trendwright-data  where the embedded SQLite file lives
 *   database-url           (SQLite file in data-dir)  e.g. jdbc:postgresql://db/trendwright?user=tw
 *   database-schema        (none)           PostgreSQL schema to use
 *   pool-size              4                pooled database connections
 *   max-body-bytes         10485760         largest request body (10 MB)
 *   max-observations       100000           most observations per series
 *   max-series-per-upload  1000             most series per upload
 *   demo-data              true             load the demo series into an empty store at start
 *   shutdown-grace-seconds 10               how long a stop waits for requests in flight
 *   max-concurrent-fits    (processor cores)  fits that run at once
 *   max-queued-fits        (4 x cores)      fits that wait for a turn; beyond both a fit answers 503
 *   job-workers            (processor cores)  background threads judging batch-job series (0: none)
 *   job-lease-seconds      60               how long a claimed job item is held before others may retake it
 * </pre>
 * Immutable and thread-safe.
 */
public record Settings(String host, int port, Path dataDirectory, String databaseUrl, String databaseSchema,
                       int poolSize, long maxBodyBytes, int maxObservationsPerSeries, int maxSeriesPerUpload,
                       boolean loadDemoData, Duration shutdownGrace, int maxConcurrentFits, int maxQueuedFits,
                       int jobWorkers, Duration jobLease) {

    /** The settings with the default fitting capacity (one fit per processor core, a queue of four per core). */
    public Settings(String host, int port, Path dataDirectory, String databaseUrl, String databaseSchema,
                    int poolSize, long maxBodyBytes, int maxObservationsPerSeries, int maxSeriesPerUpload,
                    boolean loadDemoData, Duration shutdownGrace) {
        this(host, port, dataDirectory, databaseUrl, databaseSchema, poolSize, maxBodyBytes, maxObservationsPerSeries,
                maxSeriesPerUpload, loadDemoData, shutdownGrace, cores(), 4 * cores(), cores(), Duration.ofSeconds(60));
    }

    private static int cores() {
        return Runtime.getRuntime().availableProcessors();
    }

    /** The defaults listed above. */
    public static Settings defaults() {
        return from(new String[0], Map.of());
    }

    /** Settings from flags and environment variables. */
    public static Settings from(String[] args, Map<String, String> environment) {
        Map<String, String> given = new LinkedHashMap<>();
        environment.forEach((key, value) -> {
            if (key.startsWith("TRENDWRIGHT_") && !key.startsWith("TRENDWRIGHT_TEST_")) {
                given.put(key.substring("TRENDWRIGHT_".length()).toLowerCase(Locale.ROOT).replace('_', '-'), value);
            }
        });
        java.util.Set<String> flags = new java.util.HashSet<>();
        for (String arg : args) {
            Map<String, String> one = flag(arg);
            given.putAll(one);
            flags.addAll(one.keySet());
        }
        Reader r = new Reader(given);
        Settings settings = new Settings(r.get("host", "127.0.0.1", s -> s),
                r.get("port", 7070, Integer::parseInt), r.get("data-dir", Path.of("trendwright-data"), Path::of),
                r.get("database-url", null, s -> s), r.get("database-schema", null, s -> s),
                r.get("pool-size", 4, Integer::parseInt), r.get("max-body-bytes", 10L * 1024 * 1024, Long::parseLong),
                r.get("max-observations", 100_000, Integer::parseInt),
                r.get("max-series-per-upload", 1_000, Integer::parseInt),
                r.get("demo-data", true, Settings::bool),
                Duration.ofSeconds(r.get("shutdown-grace-seconds", 10, Integer::parseInt)),
                r.get("max-concurrent-fits", cores(), Integer::parseInt),
                r.get("max-queued-fits", 4 * cores(), Integer::parseInt),
                r.get("job-workers", cores(), Integer::parseInt),
                Duration.ofSeconds(r.get("job-lease-seconds", 60, Integer::parseInt)));
        r.refuseUnknown(flags);
        return settings;
    }

    /** The JDBC URL: the configured one, or the SQLite file in the data directory. */
    public String jdbcUrl() {
        return databaseUrl != null ? databaseUrl
                : "jdbc:sqlite:" + dataDirectory.resolve("trendwright.db").toAbsolutePath();
    }

    /** True when the store is the embedded SQLite file in the data directory. */
    public boolean usesEmbeddedStore() {
        return databaseUrl == null;
    }

    /** These settings with another port (tests start on port 0). */
    public Settings withPort(int newPort) {
        return new Settings(host, newPort, dataDirectory, databaseUrl, databaseSchema, poolSize, maxBodyBytes,
                maxObservationsPerSeries, maxSeriesPerUpload, loadDemoData, shutdownGrace, maxConcurrentFits,
                maxQueuedFits, jobWorkers, jobLease);
    }

    /** These settings with another fitting capacity. */
    public Settings withFitCapacity(int concurrent, int queued) {
        return new Settings(host, port, dataDirectory, databaseUrl, databaseSchema, poolSize, maxBodyBytes,
                maxObservationsPerSeries, maxSeriesPerUpload, loadDemoData, shutdownGrace, concurrent, queued,
                jobWorkers, jobLease);
    }

    /** These settings with another number of job workers and lease. */
    public Settings withJobWorkers(int workers, Duration lease) {
        return new Settings(host, port, dataDirectory, databaseUrl, databaseSchema, poolSize, maxBodyBytes,
                maxObservationsPerSeries, maxSeriesPerUpload, loadDemoData, shutdownGrace, maxConcurrentFits,
                maxQueuedFits, workers, lease);
    }

    private static Map<String, String> flag(String arg) {
        if (arg.equals("--no-demo-data")) {
            return Map.of("demo-data", "false");
        }
        if (!arg.startsWith("--") || !arg.contains("=")) {
            throw new IllegalArgumentException("Unknown argument '" + arg + "'; settings are given as --name=value"
                    + " (see README.md).");
        }
        int eq = arg.indexOf('=');
        return Map.of(arg.substring(2, eq), arg.substring(eq + 1));
    }

    private static boolean bool(String text) {
        return switch (text.trim().toLowerCase(Locale.ROOT)) {
            case "true", "yes", "on", "1" -> true;
            case "false", "no", "off", "0" -> false;
            default -> throw new IllegalArgumentException("'" + text + "' is not true or false");
        };
    }

    /** Reads settings by name and remembers which were used, so unknown ones can be refused. */
    private static final class Reader {
        private final Map<String, String> given;

        Reader(Map<String, String> given) {
            this.given = new LinkedHashMap<>(given);
        }

        <T> T get(String name, T fallback, Function<String, T> parse) {
            String text = given.remove(name);
            if (text == null || text.isBlank()) {
                return fallback;
            }
            try {
                return parse.apply(text.trim());
            } catch (RuntimeException e) {
                throw new IllegalArgumentException("Setting " + name + " (--" + name + " or TRENDWRIGHT_"
                        + name.toUpperCase(Locale.ROOT).replace('-', '_') + ") cannot be '" + text + "': "
                        + e.getMessage(), e);
            }
        }

        /** Refuses unknown flags; unknown TRENDWRIGHT_* variables are left for other tools. */
        void refuseUnknown(java.util.Set<String> flags) {
            given.keySet().retainAll(flags);
            if (!given.isEmpty()) {
                throw new IllegalArgumentException("Unknown settings " + given.keySet() + "; see README.md for the"
                        + " list.");
            }
        }
    }
}
