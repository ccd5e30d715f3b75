package org.trendwright.store;

import com.zaxxer.hikari.HikariDataSource;
import java.sql.Connection;
import java.sql.SQLException;
import javax.sql.DataSource;
import org.flywaydb.core.Flyway;

/**
 * The connection pool and schema of one store. Opening it runs the Flyway migrations of its
 * dialect, so the schema is current before the first request. SQLite runs with the WAL journal
 * (readers do not block the writer), foreign keys on, a 5 s busy timeout, and IMMEDIATE
 * transactions so that two writers queue instead of failing on a lock upgrade.
 *
 * <p>Thread-safe; close it once at shutdown.
 */
public final class Database implements AutoCloseable {

    private final HikariDataSource dataSource;
    private final Dialect dialect;

    private final String schema;

    private Database(HikariDataSource dataSource, Dialect dialect, String schema) {
        this.dataSource = dataSource;
        this.dialect = dialect;
        this.schema = schema;
    }

    /**
     * Opens the store at {@code jdbcUrl}, in {@code schema} when not null (PostgreSQL only), and
     * migrates it.
     */
    public static Database open(String jdbcUrl, String schema, int poolSize) {
        Database database = connect(jdbcUrl, schema, poolSize);
        try {
            database.migrate();
        } catch (RuntimeException e) {
            database.close();
            throw e;
        }
        return database;
    }

    /**
     * Sets up the connection pool without migrating, so that start-up can run the migrations while
     * the HTTP server starts; call {@link #migrate()} before the first query. The pool opens its
     * first connection on the first request for one (normally the migration, off the start-up
     * thread), and fails then, after at most 5 s, when the store cannot be reached.
     */
    public static Database connect(String jdbcUrl, String schema, int poolSize) {
        Dialect dialect = Dialect.of(jdbcUrl);
        // The no-argument data source starts its pool lazily: loading the driver (for SQLite, also
        // extracting its native library) and the first connection are not paid by the caller.
        HikariDataSource pool = new HikariDataSource();
        pool.setJdbcUrl(jdbcUrl);
        pool.setPoolName("trendwright-" + dialect.name().toLowerCase(java.util.Locale.ROOT));
        pool.setMaximumPoolSize(poolSize);
        pool.setMinimumIdle(1);
        pool.setConnectionTimeout(5_000);
        pool.setInitializationFailTimeout(5_000);
        if (schema != null) {
            pool.setSchema(schema);
        }
        if (dialect == Dialect.SQLITE) {
            pool.addDataSourceProperty("journal_mode", "WAL");
            pool.addDataSourceProperty("foreign_keys", "true");
            pool.addDataSourceProperty("busy_timeout", "5000");
            pool.addDataSourceProperty("transaction_mode", "IMMEDIATE");
        }
        return new Database(pool, dialect, schema);
    }

    /** Brings the schema up to date with this dialect's Flyway migrations. */
    public void migrate() {
        migrate(null);
    }

    /** Migrates up to version {@code target} (null: the latest); tests of a migration start below it. */
    void migrate(String target) {
        var flyway = Flyway.configure().dataSource(dataSource).locations(dialect.migrations())
                .loggers("slf4j");
        if (dialect == Dialect.SQLITE) {
            flyway.javaMigrations(new PackObservationsMigration());
        }
        if (target != null) {
            flyway.target(target);
        }
        if (schema != null) {
            flyway.schemas(schema).defaultSchema(schema);
        }
        flyway.load().migrate();
    }

    public DataSource dataSource() {
        return dataSource;
    }

    public Dialect dialect() {
        return dialect;
    }

    /** True when a connection can be had and answers within two seconds. */
    public boolean isReachable() {
        try (Connection connection = dataSource.getConnection()) {
            return connection.isValid(2);
        } catch (SQLException e) {
            return false;
        }
    }

    @Override
    public void close() {
        dataSource.close();
    }
}
