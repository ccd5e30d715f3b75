package org.trendwright.store;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import org.flywaydb.core.api.MigrationVersion;
import org.flywaydb.core.api.migration.Context;
import org.flywaydb.core.api.migration.JavaMigration;

/**
 * SQLite migration V5: packs the observation rows of every version into series_version.points
 * (see {@link PackedPoints}) and drops the observation table. It is Java because SQLite's SQL
 * cannot give a REAL's exact bytes: its {@code printf('%!.17g', x)} misses the exact double for
 * about one random double in ten (measured over 200,000 with sqlite-jdbc 3.51), and the driver
 * has no ieee754 functions. PostgreSQL does the same in SQL (V4, with float8send).
 */
final class PackObservationsMigration implements JavaMigration {

    @Override
    public MigrationVersion getVersion() {
        return MigrationVersion.fromVersion("5");
    }

    @Override
    public String getDescription() {
        return "pack observations";
    }

    @Override
    public Integer getChecksum() {
        return 5;
    }

    @Override
    public boolean canExecuteInTransaction() {
        return true;
    }

    @Override
    public void migrate(Context context) throws SQLException {
        Connection c = context.getConnection();
        try (Statement s = c.createStatement();
             ResultSet rs = s.executeQuery("SELECT series_id, version, period_index, value FROM observation"
                     + " ORDER BY series_id, version, period_index");
             PreparedStatement update = c.prepareStatement("UPDATE series_version SET points = ?"
                     + " WHERE series_id = ? AND version = ?")) {
            ByteArrayOutputStream packed = new ByteArrayOutputStream();
            long series = -1;
            int version = -1;
            while (rs.next()) {
                if (rs.getLong(1) != series || rs.getInt(2) != version) {
                    write(update, packed, series, version);
                    series = rs.getLong(1);
                    version = rs.getInt(2);
                }
                packed.writeBytes(ByteBuffer.allocate(PackedPoints.BYTES_PER_POINT).putLong(rs.getLong(3))
                        .putDouble(rs.getDouble(4)).array());
            }
            write(update, packed, series, version);
        }
        try (Statement s = c.createStatement()) {
            s.executeUpdate("UPDATE series_version SET points = X'' WHERE points IS NULL");
            s.executeUpdate("DROP TABLE observation");
        }
    }

    private static void write(PreparedStatement update, ByteArrayOutputStream packed, long series, int version)
            throws SQLException {
        if (series < 0) {
            return;
        }
        update.setBytes(1, packed.toByteArray());
        update.setLong(2, series);
        update.setInt(3, version);
        update.executeUpdate();
        packed.reset();
    }
}
