package org.trendwright.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.IntConsumer;
import org.trendwright.series.Period;
import org.trendwright.series.Point;
import org.trendwright.series.SeriesDraft;
import org.trendwright.series.SeriesNotFoundException;
import org.trendwright.series.SeriesSummary;
import org.trendwright.series.SeriesVersion;
import org.trendwright.series.StoredUpload;
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

    /** Rows of series_version sent to the database at once. */
    static final int BATCH_SIZE = 100;

    /** Stores every draft as version 1 of a new series under a new upload id, all in one transaction. */
    public StoredUpload createAll(List<SeriesDraft> drafts) {
        return createAll(drafts, stored -> { });
    }

    /**
     * Stores every draft as version 1 of a new series under a new upload id, all in one
     * transaction (a failure stores nothing), writing the versions in batches of
     * {@value #BATCH_SIZE} and telling {@code stored} how many series are written after each batch.
     */
    public StoredUpload createAll(List<SeriesDraft> drafts, IntConsumer stored) {
        return jdbc.transaction("store the uploaded series", c -> {
            long now = clock.millis();
            long uploadId = insertUpload(c, drafts.size(), now);
            List<SeriesSummary> created = new ArrayList<>(drafts.size());
            try (PreparedStatement versions = c.prepareStatement(INSERT_VERSION)) {
                for (SeriesDraft draft : drafts) {
                    long id = insertSeries(c, draft, uploadId, now);
                    addVersion(versions, id, 1, now, draft.size(), draft.periodIndex(0),
                            draft.periodIndex(draft.size() - 1), PackedPoints.pack(draft));
                    created.add(new SeriesSummary(id, draft.name(), draft.frequency(), 1, SeriesRows.instant(now),
                            SeriesRows.instant(now), draft.size(), new Period(draft.frequency(), draft.periodIndex(0)),
                            new Period(draft.frequency(), draft.periodIndex(draft.size() - 1))));
                    if (created.size() % BATCH_SIZE == 0) {
                        versions.executeBatch();
                        stored.accept(created.size());
                    }
                }
                versions.executeBatch();
            }
            stored.accept(created.size());
            return new StoredUpload(uploadId, created);
        });
    }

    /**
     * The ids of the series an upload created that still exist, in creation order; empty when
     * there is no such upload.
     */
    public Optional<List<Long>> uploadSeries(long uploadId) {
        return jdbc.read("read upload " + uploadId, c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT id FROM upload WHERE id = ?")) {
                s.setLong(1, uploadId);
                try (ResultSet rs = s.executeQuery()) {
                    if (!rs.next()) {
                        return Optional.empty();
                    }
                }
            }
            try (PreparedStatement s = c.prepareStatement("SELECT id FROM series WHERE upload_id = ? ORDER BY id")) {
                s.setLong(1, uploadId);
                List<Long> ids = new ArrayList<>();
                try (ResultSet rs = s.executeQuery()) {
                    while (rs.next()) {
                        ids.add(rs.getLong(1));
                    }
                }
                return Optional.of(ids);
            }
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

    /**
     * One version of a series, in one query (batch jobs read one per item); only when it is
     * missing does a second query tell a missing series from a missing version.
     */
    public SeriesVersion version(long id, int version) {
        return jdbc.read("read series " + id + " version " + version, c -> {
            try (PreparedStatement s = c.prepareStatement(SeriesRows.SELECT_SERIES_VERSION)) {
                s.setInt(1, version);
                s.setLong(2, id);
                Optional<SeriesVersion> found = SeriesRows.seriesVersion(s.executeQuery(), id, version);
                if (found.isPresent()) {
                    return found.get();
                }
            }
            summary(c, id);
            throw new SeriesNotFoundException(id, version);
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

    private static long insertUpload(Connection c, int seriesCount, long now) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("INSERT INTO upload (created_at, series_count) VALUES (?, ?)",
                new String[] {"id"})) {
            s.setLong(1, now);
            s.setInt(2, seriesCount);
            s.executeUpdate();
            try (ResultSet keys = s.getGeneratedKeys()) {
                keys.next();
                return keys.getLong(1);
            }
        }
    }

    private static long insertSeries(Connection c, SeriesDraft draft, long uploadId, long now) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("INSERT INTO series (name, frequency, current_version,"
                + " created_at, updated_at, upload_id) VALUES (?, ?, 1, ?, ?, ?)", new String[] {"id"})) {
            s.setString(1, draft.name());
            s.setString(2, draft.frequency().jsonName());
            s.setLong(3, now);
            s.setLong(4, now);
            s.setLong(5, uploadId);
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

    private static final String INSERT_VERSION = "INSERT INTO series_version (series_id, version, created_at,"
            + " observation_count, first_period, last_period, points) VALUES (?, ?, ?, ?, ?, ?, ?)";

    private static void insertVersion(Connection c, long id, int version, List<Point> points, long now)
            throws SQLException {
        try (PreparedStatement s = c.prepareStatement(INSERT_VERSION)) {
            addVersion(s, id, version, now, points.size(), points.get(0).period().index(),
                    points.get(points.size() - 1).period().index(), PackedPoints.pack(points));
            s.executeBatch();
        }
    }

    private static void addVersion(PreparedStatement s, long id, int version, long now, int count, long first,
                                   long last, byte[] points) throws SQLException {
        s.setLong(1, id);
        s.setInt(2, version);
        s.setLong(3, now);
        s.setInt(4, count);
        s.setLong(5, first);
        s.setLong(6, last);
        s.setBytes(7, points);
        s.addBatch();
    }
}
