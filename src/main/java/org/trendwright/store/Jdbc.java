package org.trendwright.store;

import java.sql.Connection;
import java.sql.SQLException;
import javax.sql.DataSource;

/** Runs JDBC work on a pooled connection, alone or in one transaction. Thread-safe. */
final class Jdbc {

    /** Work on a connection. */
    interface Work<T> {
        T run(Connection connection) throws SQLException;
    }

    private final DataSource dataSource;

    Jdbc(DataSource dataSource) {
        this.dataSource = dataSource;
    }

    /** Runs read-only work in auto-commit mode. */
    <T> T read(String what, Work<T> work) {
        try (Connection connection = dataSource.getConnection()) {
            return work.run(connection);
        } catch (SQLException e) {
            throw new StoreException("Could not " + what, e);
        }
    }

    /**
     * Runs work in one transaction: committed when it returns, rolled back when it throws, so a
     * failed request writes nothing.
     */
    <T> T transaction(String what, Work<T> work) {
        try (Connection connection = dataSource.getConnection()) {
            connection.setAutoCommit(false);
            try {
                T result = work.run(connection);
                connection.commit();
                return result;
            } catch (SQLException | RuntimeException e) {
                connection.rollback();
                throw e;
            } finally {
                connection.setAutoCommit(true);
            }
        } catch (SQLException e) {
            throw new StoreException("Could not " + what, e);
        }
    }
}
