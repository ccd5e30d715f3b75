package org.trendwright.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.trendwright.jobs.JobItem;
import org.trendwright.jobs.JobProgress;
import org.trendwright.jobs.SeriesVerdict;
import org.trendwright.series.SeriesNotFoundException;

/**
 * Batch fitting jobs and their items. Correctness lives in the database, not in memory: a worker
 * claims items with a lease in one statement (PostgreSQL: {@code FOR UPDATE SKIP LOCKED}, so
 * workers of several instances never take the same item and never wait on each other; SQLite: one
 * {@code UPDATE ... RETURNING}, atomic under its single writer). An item whose lease ran out (its
 * worker died) is claimable again, and a result is stored only by the worker that holds the lease.
 * Thread-safe.
 */
public final class JobRepository {

    /*
     * A claim takes abandoned items (claimed, lease run out) first, then pending ones, each in
     * (job, series) order. The two are separate ordered scans of the (status, job_id, series_id)
     * index: one query with "pending OR expired" made both databases collect and sort every open
     * item of every job at each claim, which cost a 10,000-item job seconds of write-lock time.
     */
    private static final String EXPIRED_ITEMS = "FROM fit_job_item"
            + " WHERE status = 'claimed' AND claimed_until < ? ORDER BY job_id, series_id LIMIT ?";
    private static final String PENDING_ITEMS = "FROM fit_job_item"
            + " WHERE status = 'pending' ORDER BY job_id, series_id LIMIT ?";
    private static final String CLAIM_POSTGRESQL = "UPDATE fit_job_item i SET status = 'claimed', claimed_by = ?,"
            + " claimed_until = ?, attempts = i.attempts + 1 FROM (SELECT * FROM (SELECT job_id, series_id "
            + EXPIRED_ITEMS + " FOR UPDATE SKIP LOCKED) e UNION ALL SELECT * FROM (SELECT job_id, series_id "
            + PENDING_ITEMS + " FOR UPDATE SKIP LOCKED) p LIMIT ?) c"
            + " WHERE i.job_id = c.job_id AND i.series_id = c.series_id RETURNING i.job_id, i.series_id, i.version";
    /* SQLite matches the chosen rows by rowid: a (job_id, series_id) IN (...) test scanned the whole table. */
    private static final String CLAIM_SQLITE = "UPDATE fit_job_item SET status = 'claimed', claimed_by = ?,"
            + " claimed_until = ?, attempts = attempts + 1 WHERE rowid IN (SELECT rowid FROM (SELECT rowid "
            + EXPIRED_ITEMS + ") UNION ALL SELECT rowid FROM (SELECT rowid " + PENDING_ITEMS + ") LIMIT ?)"
            + " RETURNING job_id, series_id, version";
    private static final String RESULT_COLUMNS = "series_id, version, recommended_model, serial_correlation,"
            + " unit_root, trend_break, next_forecast, failure";

    private final Jdbc jdbc;
    private final Clock clock;
    private final String claimSql;

    public JobRepository(Database database, Clock clock) {
        this.jdbc = new Jdbc(database.dataSource());
        this.clock = clock;
        this.claimSql = database.dialect() == Dialect.POSTGRESQL ? CLAIM_POSTGRESQL : CLAIM_SQLITE;
    }

    /** A new job over the current versions of the series; refuses the whole job if one is missing. */
    public long create(List<Long> seriesIds) {
        return jdbc.transaction("create the fitting job", c -> {
            long id = insertJob(c, seriesIds.size());
            try (PreparedStatement s = c.prepareStatement("INSERT INTO fit_job_item (job_id, series_id, version,"
                    + " status) SELECT ?, id, current_version, 'pending' FROM series WHERE id = ?")) {
                for (long seriesId : seriesIds) {
                    s.setLong(1, id);
                    s.setLong(2, seriesId);
                    s.addBatch();
                }
                int[] counts = s.executeBatch();
                for (int i = 0; i < counts.length; i++) {
                    if (counts[i] == 0) {
                        throw new SeriesNotFoundException(seriesIds.get(i));
                    }
                }
            }
            return id;
        });
    }

    private long insertJob(Connection c, int total) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("INSERT INTO fit_job (total, created_at) VALUES (?, ?)",
                new String[] {"id"})) {
            s.setInt(1, total);
            s.setLong(2, clock.millis());
            s.executeUpdate();
            try (ResultSet keys = s.getGeneratedKeys()) {
                keys.next();
                return keys.getLong(1);
            }
        }
    }

    /** Claims up to {@code limit} pending (or abandoned) items for {@code worker} for {@code lease}. */
    public List<JobItem> claim(String worker, int limit, Duration lease) {
        return jdbc.transaction("claim job items", c -> {
            long now = clock.millis();
            try (PreparedStatement s = c.prepareStatement(claimSql)) {
                s.setString(1, worker);
                s.setLong(2, now + lease.toMillis());
                s.setLong(3, now);
                s.setInt(4, limit);
                s.setInt(5, limit);
                s.setInt(6, limit);
                List<JobItem> items = new ArrayList<>();
                try (ResultSet rs = s.executeQuery()) {
                    while (rs.next()) {
                        items.add(new JobItem(rs.getLong(1), rs.getLong(2), rs.getInt(3)));
                    }
                }
                return items;
            }
        });
    }

    /** Stores the verdicts of items {@code worker} still holds; returns how many were stored. */
    public int complete(String worker, long jobId, List<SeriesVerdict> verdicts) {
        return jdbc.transaction("store job results", c -> {
            try (PreparedStatement s = c.prepareStatement("UPDATE fit_job_item SET status = ?, finished_at = ?,"
                    + " recommended_model = ?, serial_correlation = ?, unit_root = ?, trend_break = ?,"
                    + " next_forecast = ?, failure = ?, claimed_until = NULL WHERE job_id = ? AND series_id = ?"
                    + " AND claimed_by = ? AND status = 'claimed'")) {
                for (SeriesVerdict v : verdicts) {
                    bindResult(s, v, clock.millis());
                    s.setLong(9, jobId);
                    s.setLong(10, v.seriesId());
                    s.setString(11, worker);
                    s.addBatch();
                }
                int stored = 0;
                for (int count : s.executeBatch()) {
                    stored += count;
                }
                return stored;
            }
        });
    }

    private static void bindResult(PreparedStatement s, SeriesVerdict v, long now) throws SQLException {
        s.setString(1, v.failure() == null ? "done" : "failed");
        s.setLong(2, now);
        s.setString(3, v.recommendedModel());
        setBoolean(s, 4, v.serialCorrelation());
        setBoolean(s, 5, v.unitRoot());
        setBoolean(s, 6, v.trendBreak());
        if (v.nextForecast() == null) {
            s.setNull(7, Types.DOUBLE);
        } else {
            s.setDouble(7, v.nextForecast());
        }
        s.setString(8, v.failure());
    }

    private static void setBoolean(PreparedStatement s, int index, Boolean value) throws SQLException {
        if (value == null) {
            s.setNull(index, Types.BOOLEAN);
        } else {
            s.setBoolean(index, value);
        }
    }

    /** How far the job has come, or empty when there is no such job. */
    public Optional<JobProgress> progress(long id) {
        return jdbc.read("read job " + id, c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT j.total, j.created_at,"
                    + " (SELECT COUNT(*) FROM fit_job_item i WHERE i.job_id = j.id AND i.status IN ('done', 'failed')),"
                    + " (SELECT COUNT(*) FROM fit_job_item i WHERE i.job_id = j.id AND i.status = 'failed')"
                    + " FROM fit_job j WHERE j.id = ?")) {
                s.setLong(1, id);
                try (ResultSet rs = s.executeQuery()) {
                    if (!rs.next()) {
                        return Optional.empty();
                    }
                    return Optional.of(new JobProgress(id, rs.getInt(1), rs.getInt(3), rs.getInt(4),
                            Instant.ofEpochMilli(rs.getLong(2)), clock.instant()));
                }
            }
        });
    }

    /** The verdicts stored so far, by series id. */
    public List<SeriesVerdict> results(long id) {
        return jdbc.read("read the results of job " + id, c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT " + RESULT_COLUMNS + " FROM fit_job_item"
                    + " WHERE job_id = ? AND status IN ('done', 'failed') ORDER BY series_id")) {
                s.setLong(1, id);
                List<SeriesVerdict> verdicts = new ArrayList<>();
                try (ResultSet rs = s.executeQuery()) {
                    while (rs.next()) {
                        verdicts.add(verdict(rs));
                    }
                }
                return verdicts;
            }
        });
    }

    private static SeriesVerdict verdict(ResultSet rs) throws SQLException {
        double forecast = rs.getDouble(7);
        Double next = rs.wasNull() ? null : forecast;
        return new SeriesVerdict(rs.getLong(1), rs.getInt(2), rs.getString(3), bool(rs, 4), bool(rs, 5),
                bool(rs, 6), next, rs.getString(8));
    }

    private static Boolean bool(ResultSet rs, int column) throws SQLException {
        boolean value = rs.getBoolean(column);
        return rs.wasNull() ? null : value;
    }

    /** How many times each item of the job was claimed, summed (equals the total when none was redone). */
    public long attempts(long id) {
        return jdbc.read("count the attempts of job " + id, c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT COALESCE(SUM(attempts), 0) FROM fit_job_item"
                    + " WHERE job_id = ?")) {
                s.setLong(1, id);
                try (ResultSet rs = s.executeQuery()) {
                    rs.next();
                    return rs.getLong(1);
                }
            }
        });
    }
}
