package org.trendwright.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Comparator;
import java.util.Locale;
import java.util.UUID;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.trendwright.store.Database;

/**
 * A fresh, migrated store for one test: a new SQLite file in a new temporary folder, or a new
 * randomly named schema in the PostgreSQL database named by TRENDWRIGHT_TEST_PG_URL. Without that
 * variable a PostgreSQL store is skipped through a JUnit assumption (reported as skipped, never
 * silently passed). {@link #close()} removes the file or drops the schema.
 */
public final class FreshStore implements AutoCloseable {

    /** The environment variable naming the PostgreSQL test database. */
    public static final String PG_URL_VARIABLE = "TRENDWRIGHT_TEST_PG_URL";

    /** The two kinds of store every storage test runs against. */
    public enum Kind { SQLITE, POSTGRESQL }

    private final Kind kind;
    private final String jdbcUrl;
    private final String schema;
    private final Path folder;

    private FreshStore(Kind kind, String jdbcUrl, String schema, Path folder) {
        this.kind = kind;
        this.jdbcUrl = jdbcUrl;
        this.schema = schema;
        this.folder = folder;
    }

    /** A new empty store of this kind (not yet opened). */
    public static FreshStore create(Kind kind) {
        return kind == Kind.SQLITE ? sqlite() : postgres();
    }

    private static FreshStore sqlite() {
        try {
            Path folder = Files.createTempDirectory("trendwright-test-");
            return new FreshStore(Kind.SQLITE, "jdbc:sqlite:" + folder.resolve("test.db"), null, folder);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static FreshStore postgres() {
        String url = System.getenv(PG_URL_VARIABLE);
        Assumptions.assumeTrue(url != null && !url.isBlank(), PG_URL_VARIABLE + " is not set; PostgreSQL variant skipped");
        String schema = "tw_test_" + UUID.randomUUID().toString().replace("-", "").substring(0, 16)
                .toLowerCase(Locale.ROOT);
        execute(url, "CREATE SCHEMA " + schema);
        return new FreshStore(Kind.POSTGRESQL, url, schema, null);
    }

    /** Opens (and migrates) the store; every call gives a new pool on the same data. */
    public Database open() {
        return Database.open(jdbcUrl, schema, 4);
    }

    public Kind kind() {
        return kind;
    }

    public String jdbcUrl() {
        return jdbcUrl;
    }

    /** The PostgreSQL schema, or null for SQLite. */
    public String schema() {
        return schema;
    }

    @Override
    public void close() {
        if (kind == Kind.POSTGRESQL) {
            execute(jdbcUrl, "DROP SCHEMA " + schema + " CASCADE");
            return;
        }
        try (Stream<Path> files = Files.walk(folder)) {
            for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void execute(String url, String sql) {
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
            s.execute(sql);
        } catch (SQLException e) {
            throw new IllegalStateException("Could not run '" + sql + "' on the PostgreSQL test database", e);
        }
    }

    @Override
    public String toString() {
        return kind.name().toLowerCase(Locale.ROOT);
    }
}
