package org.trendwright.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.trendwright.series.Point;
import org.trendwright.series.SeriesDraft;
import org.trendwright.series.SeriesNotFoundException;
import org.trendwright.series.SeriesSummary;
import org.trendwright.series.SeriesVersion;
import org.trendwright.series.VersionConflictException;
import org.trendwright.series.VersionInfo;

/**
 * Series and their versions. A version, once written, never changes; a new version is written
 * with an optimistic check on the series' current version, so two writers (threads or instances
 * on one PostgreSQL store) cannot both build on the same version: the second gets a
 * {@link VersionConflictException}. Thread-safe.
 */
public final class SeriesRepository {

    private final Jdbc jdbc;
    private final Clock clock;

    public SeriesRepository(Database database, Clock clock) {
        this.jdbc = new Jdbc(database.dataSource());
        this.clock = clock;
    }

    /** Stores every draft as version 1 of a new series, all in one transaction. */
    public List<SeriesVersion> createAll(List<SeriesDraft> drafts) {
        return jdbc.transaction("store the uploaded series", c -> {
            long now = clock.millis();
            List<SeriesVersion> created = new ArrayList<>(drafts.size());
            for (SeriesDraft draft : drafts) {
                long id = insertSeries(c, draft, now);
                insertVersion(c, id, 1, draft.points(), now);
                created.add(new SeriesVersion(id, draft.name(), 1, draft.frequency(), SeriesRows.instant(now),
                        draft.points()));
            }
            return created;
        });
    }

    /** Every series at its current version, by id. */
    public List<SeriesSummary> list() {
        return jdbc.read("list the series", c -> {
            try (PreparedStatement s = c.prepareStatement(SeriesRows.SELECT_SUMMARY + " ORDER BY s.id")) {
                return SeriesRows.summaries(s.executeQuery());
            }
        });
    }

    /** True when no series is stored. */
    public boolean isEmpty() {
        return jdbc.read("count the series", c -> {
            try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM series")) {
                rs.next();
                return rs.getLong(1) == 0;
            }
        });
    }

    /** The current version of a series. */
    public SeriesVersion latest(long id) {
        return jdbc.read("read series " + id, c -> {
            SeriesSummary summary = summary(c, id);
            return readVersion(c, summary, summary.version());
        });
    }

    /** One version of a series. */
    public SeriesVersion version(long id, int version) {
        return jdbc.read("read series " + id + " version " + version, c -> {
            SeriesSummary summary = summary(c, id);
            if (version < 1 || version > summary.version()) {
                throw new SeriesNotFoundException(id, version);
            }
            return readVersion(c, summary, version);
        });
    }

    /** The versions of a series, oldest first. */
    public List<VersionInfo> versions(long id) {
        return jdbc.read("list the versions of series " + id, c -> {
            SeriesSummary summary = summary(c, id);
            try (PreparedStatement s = c.prepareStatement(SeriesRows.SELECT_VERSIONS)) {
                s.setLong(1, id);
                return SeriesRows.versions(s.executeQuery(), summary.frequency());
            }
        });
    }

    /**
     * Writes the next version of a series, whose points {@code revise} computes from the current
     * version. Refuses with {@link VersionConflictException} when the current version is not
     * {@code expectedVersion}.
     */
    public SeriesVersion addVersion(long id, int expectedVersion, Function<SeriesVersion, List<Point>> revise) {
        return jdbc.transaction("write a new version of series " + id, c -> {
            SeriesSummary summary = summary(c, id);
            if (summary.version() != expectedVersion) {
                throw new VersionConflictException(id, expectedVersion, summary.version());
            }
            SeriesVersion current = readVersion(c, summary, expectedVersion);
            List<Point> points = revise.apply(current);
            long now = clock.millis();
            claimNextVersion(c, id, expectedVersion, now);
            insertVersion(c, id, expectedVersion + 1, points, now);
            return new SeriesVersion(id, summary.name(), expectedVersion + 1, summary.frequency(),
                    SeriesRows.instant(now), points);
        });
    }

    /** Deletes a series with all its versions and cached fits, if it is at {@code expectedVersion}. */
    public void delete(long id, int expectedVersion) {
        jdbc.transaction("delete series " + id, c -> {
            SeriesSummary summary = summary(c, id);
            try (PreparedStatement s = c.prepareStatement("DELETE FROM series WHERE id = ? AND current_version = ?")) {
                s.setLong(1, id);
                s.setInt(2, expectedVersion);
                if (s.executeUpdate() == 0) {
                    throw new VersionConflictException(id, expectedVersion, summary.version());
                }
            }
            return null;
        });
    }

    private static SeriesSummary summary(Connection c, long id) throws SQLException {
        try (PreparedStatement s = c.prepareStatement(SeriesRows.SELECT_SUMMARY + " WHERE s.id = ?")) {
            s.setLong(1, id);
            List<SeriesSummary> found = SeriesRows.summaries(s.executeQuery());
            if (found.isEmpty()) {
                throw new SeriesNotFoundException(id);
            }
            return found.get(0);
        }
    }

    private static SeriesVersion readVersion(Connection c, SeriesSummary summary, int version) throws SQLException {
        try (PreparedStatement s = c.prepareStatement(SeriesRows.SELECT_VERSION)) {
            s.setLong(1, summary.id());
            s.setInt(2, version);
            return SeriesRows.version(s.executeQuery(), summary, version);
        }
    }

    private static long insertSeries(Connection c, SeriesDraft draft, long now) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("INSERT INTO series (name, frequency, current_version,"
                + " created_at, updated_at) VALUES (?, ?, 1, ?, ?)", new String[] {"id"})) {
            s.setString(1, draft.name());
            s.setString(2, draft.frequency().jsonName());
            s.setLong(3, now);
            s.setLong(4, now);
            s.executeUpdate();
            try (ResultSet keys = s.getGeneratedKeys()) {
                keys.next();
                return keys.getLong(1);
            }
        }
    }

    private static void claimNextVersion(Connection c, long id, int expected, long now) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("UPDATE series SET current_version = ?, updated_at = ?"
                + " WHERE id = ? AND current_version = ?")) {
            s.setInt(1, expected + 1);
            s.setLong(2, now);
            s.setLong(3, id);
            s.setInt(4, expected);
            if (s.executeUpdate() == 0) {
                throw new VersionConflictException(id, expected, expected + 1);
            }
        }
    }

    private static void insertVersion(Connection c, long id, int version, List<Point> points, long now)
            throws SQLException {
        try (PreparedStatement s = c.prepareStatement("INSERT INTO series_version (series_id, version, created_at,"
                + " observation_count, first_period, last_period) VALUES (?, ?, ?, ?, ?, ?)")) {
            s.setLong(1, id);
            s.setInt(2, version);
            s.setLong(3, now);
            s.setInt(4, points.size());
            s.setLong(5, points.get(0).period().index());
            s.setLong(6, points.get(points.size() - 1).period().index());
            s.executeUpdate();
        }
        try (PreparedStatement s = c.prepareStatement("INSERT INTO observation (series_id, version, period_index,"
                + " value) VALUES (?, ?, ?, ?)")) {
            for (Point point : points) {
                s.setLong(1, id);
                s.setInt(2, version);
                s.setLong(3, point.period().index());
                s.setDouble(4, point.value());
                s.addBatch();
            }
            s.executeBatch();
        }
    }
}
