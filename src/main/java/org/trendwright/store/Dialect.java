package org.trendwright.store;

/** The two databases Trendwright stores series in, told apart by the JDBC URL. */
public enum Dialect {
    /** The embedded default: one file in the data directory, WAL journal. */
    SQLITE("sqlite"),
    /** A shared server, so that several instances can serve one store. */
    POSTGRESQL("postgresql");

    private final String migrationFolder;

    Dialect(String migrationFolder) {
        this.migrationFolder = migrationFolder;
    }

    /** The classpath folder of this database's Flyway migrations. */
    String migrations() {
        return "classpath:db/migration/" + migrationFolder;
    }

    /** The dialect of a JDBC URL. */
    public static Dialect of(String jdbcUrl) {
        if (jdbcUrl.startsWith("jdbc:sqlite:")) {
            return SQLITE;
        }
        if (jdbcUrl.startsWith("jdbc:postgresql:")) {
            return POSTGRESQL;
        }
        throw new IllegalArgumentException("Unsupported database URL '" + jdbcUrl
                + "'; use jdbc:sqlite:<file> or jdbc:postgresql://host/database.");
    }
}
