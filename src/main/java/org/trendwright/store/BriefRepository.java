package org.trendwright.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.trendwright.team.Brief;
import org.trendwright.team.TeamException;

/**
 * Published briefs. Publishing marks every earlier brief of the same series as superseded by the
 * new one, in the same transaction. The content is written once and never updated. Thread-safe.
 */
public final class BriefRepository {

    private static final String COLUMNS = "id, token, series_id, series_version, author_id, author_name, content,"
            + " published_at, expires_at, revoked_at, superseded_by";

    private final Jdbc jdbc;
    private final Clock clock;

    public BriefRepository(Database database, Clock clock) {
        this.jdbc = new Jdbc(database.dataSource());
        this.clock = clock;
    }

    /** Stores a brief (its id not yet set in {@code draft}) and supersedes the series' earlier ones. */
    public Brief publish(Brief draft) {
        return jdbc.transaction("publish a brief", c -> {
            long id = insert(c, draft);
            try (PreparedStatement s = c.prepareStatement("UPDATE brief SET superseded_by = ? WHERE series_id = ?"
                    + " AND id <> ?")) {
                s.setLong(1, id);
                s.setLong(2, draft.seriesId());
                s.setLong(3, id);
                s.executeUpdate();
            }
            return byId(c, id);
        });
    }

    private static long insert(Connection c, Brief b) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("INSERT INTO brief (token, series_id, series_version, author_id,"
                + " author_name, content, published_at, expires_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?) RETURNING id")) {
            s.setString(1, b.token());
            s.setLong(2, b.seriesId());
            s.setInt(3, b.seriesVersion());
            setNullable(s, 4, b.authorId());
            s.setString(5, b.authorName());
            s.setString(6, b.content());
            s.setLong(7, b.publishedAt().toEpochMilli());
            setNullable(s, 8, b.expiresAt() == null ? null : b.expiresAt().toEpochMilli());
            try (ResultSet rs = s.executeQuery()) {
                rs.next();
                return rs.getLong(1);
            }
        }
    }

    private static void setNullable(PreparedStatement s, int index, Long value) throws SQLException {
        if (value == null) {
            s.setNull(index, java.sql.Types.BIGINT);
        } else {
            s.setLong(index, value);
        }
    }

    /** Every brief, newest first. */
    public List<Brief> list() {
        return jdbc.read("list briefs", c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT " + COLUMNS + " FROM brief ORDER BY id DESC");
                 ResultSet rs = s.executeQuery()) {
                List<Brief> all = new ArrayList<>();
                while (rs.next()) {
                    all.add(brief(rs));
                }
                return all;
            }
        });
    }

    public Optional<Brief> byToken(String token) {
        return jdbc.read("read a brief", c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT " + COLUMNS + " FROM brief WHERE token = ?")) {
                s.setString(1, token);
                try (ResultSet rs = s.executeQuery()) {
                    return rs.next() ? Optional.of(brief(rs)) : Optional.empty();
                }
            }
        });
    }

    public Brief find(long id) {
        return jdbc.read("read a brief", c -> byId(c, id));
    }

    /** Revokes a brief (the first revocation time is kept); 404 when there is none. */
    public void revoke(long id) {
        jdbc.transaction("revoke a brief", c -> {
            try (PreparedStatement s = c.prepareStatement("UPDATE brief SET revoked_at = COALESCE(revoked_at, ?)"
                    + " WHERE id = ?")) {
                s.setLong(1, clock.millis());
                s.setLong(2, id);
                if (s.executeUpdate() == 0) {
                    throw TeamException.notFound("brief " + id);
                }
                return null;
            }
        });
    }

    private static Brief byId(Connection c, long id) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("SELECT " + COLUMNS + " FROM brief WHERE id = ?")) {
            s.setLong(1, id);
            try (ResultSet rs = s.executeQuery()) {
                if (!rs.next()) {
                    throw TeamException.notFound("brief " + id);
                }
                return brief(rs);
            }
        }
    }

    private static Brief brief(ResultSet rs) throws SQLException {
        long author = rs.getLong("author_id");
        Long authorId = rs.wasNull() ? null : author;
        long superseded = rs.getLong("superseded_by");
        Long supersededBy = rs.wasNull() ? null : superseded;
        return new Brief(rs.getLong("id"), rs.getString("token"), rs.getLong("series_id"), rs.getInt("series_version"),
                authorId, rs.getString("author_name"), rs.getString("content"),
                Instant.ofEpochMilli(rs.getLong("published_at")), TokenRepository.instant(rs, "expires_at"),
                TokenRepository.instant(rs, "revoked_at"), supersededBy);
    }
}
