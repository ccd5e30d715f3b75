package org.trendwright.store;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.trendwright.series.Frequency;
import org.trendwright.series.Period;
import org.trendwright.series.Point;
import org.trendwright.series.SeriesSummary;
import org.trendwright.series.SeriesVersion;
import org.trendwright.series.VersionInfo;

/** The queries that read series and the row mappers that turn their rows into records. */
final class SeriesRows {

    static final String SELECT_SUMMARY = "SELECT s.id, s.name, s.frequency, s.current_version, s.created_at,"
            + " s.updated_at, v.observation_count, v.first_period, v.last_period FROM series s"
            + " JOIN series_version v ON v.series_id = s.id AND v.version = s.current_version";

    static final String SELECT_VERSIONS = "SELECT version, created_at, observation_count, first_period, last_period"
            + " FROM series_version WHERE series_id = ? ORDER BY version";

    static final String SELECT_VERSION = "SELECT created_at, points FROM series_version"
            + " WHERE series_id = ? AND version = ?";

    static final String SELECT_SERIES_VERSION = "SELECT s.name, s.frequency, v.created_at, v.points FROM series s"
            + " JOIN series_version v ON v.series_id = s.id AND v.version = ? WHERE s.id = ?";

    private SeriesRows() {
    }

    static Instant instant(long epochMillis) {
        return Instant.ofEpochMilli(epochMillis);
    }

    static List<SeriesSummary> summaries(ResultSet rs) throws SQLException {
        try (rs) {
            List<SeriesSummary> found = new ArrayList<>();
            while (rs.next()) {
                Frequency frequency = frequency(rs.getString("frequency"));
                found.add(new SeriesSummary(rs.getLong("id"), rs.getString("name"), frequency,
                        rs.getInt("current_version"), instant(rs.getLong("created_at")),
                        instant(rs.getLong("updated_at")), rs.getInt("observation_count"),
                        new Period(frequency, rs.getLong("first_period")),
                        new Period(frequency, rs.getLong("last_period"))));
            }
            return found;
        }
    }

    static List<VersionInfo> versions(ResultSet rs, Frequency frequency) throws SQLException {
        try (rs) {
            List<VersionInfo> found = new ArrayList<>();
            while (rs.next()) {
                found.add(new VersionInfo(rs.getInt("version"), instant(rs.getLong("created_at")),
                        rs.getInt("observation_count"), new Period(frequency, rs.getLong("first_period")),
                        new Period(frequency, rs.getLong("last_period"))));
            }
            return found;
        }
    }

    static SeriesVersion version(ResultSet rs, SeriesSummary summary, int version) throws SQLException {
        try (rs) {
            List<Point> points = List.of();
            long createdAt = 0;
            if (rs.next()) {
                createdAt = rs.getLong("created_at");
                points = PackedPoints.unpack(rs.getBytes("points"), summary.frequency());
            }
            return new SeriesVersion(summary.id(), summary.name(), version, summary.frequency(), instant(createdAt),
                    points);
        }
    }

    /** The row of {@link #SELECT_SERIES_VERSION}, if there is one. */
    static Optional<SeriesVersion> seriesVersion(ResultSet rs, long id, int version) throws SQLException {
        try (rs) {
            if (!rs.next()) {
                return Optional.empty();
            }
            Frequency frequency = frequency(rs.getString("frequency"));
            return Optional.of(new SeriesVersion(id, rs.getString("name"), version, frequency,
                    instant(rs.getLong("created_at")), PackedPoints.unpack(rs.getBytes("points"), frequency)));
        }
    }

    private static Frequency frequency(String stored) {
        return Frequency.fromJsonName(stored).orElseThrow(() -> new IllegalStateException(
                "The database holds an unknown frequency '" + stored + "'."));
    }
}
