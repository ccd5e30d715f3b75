package org.trendwright.store;

import com.zaxxer.hikari.HikariConfig;
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
     * Opens the connection pool without migrating, so that start-up can run the migrations while
     * the HTTP server starts; call {@link #migrate()} before the first query.
     */
    public static Database connect(String jdbcUrl, String schema, int poolSize) {
        Dialect dialect = Dialect.of(jdbcUrl);
        HikariConfig config = new HikariConfig();
        config.setJdbcUrl(jdbcUrl);
        config.setPoolName("trendwright-" + dialect.name().toLowerCase(java.util.Locale.ROOT));
        config.setMaximumPoolSize(poolSize);
        config.setMinimumIdle(1);
        config.setConnectionTimeout(5_000);
        config.setInitializationFailTimeout(5_000);
        if (schema != null) {
            config.setSchema(schema);
        }
        if (dialect == Dialect.SQLITE) {
            config.addDataSourceProperty("journal_mode", "WAL");
            config.addDataSourceProperty("foreign_keys", "true");
            config.addDataSourceProperty("busy_timeout", "5000");
            config.addDataSourceProperty("transaction_mode", "IMMEDIATE");
        }
        return new Database(new HikariDataSource(config), dialect, schema);
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
