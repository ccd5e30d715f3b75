package org.trendwright.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.trendwright.team.ApiToken;
import org.trendwright.team.Member;
import org.trendwright.team.Scope;
import org.trendwright.team.TeamException;

/** API tokens, kept by the SHA-256 digest of the token. Thread-safe. */
public final class TokenRepository {

    /** A live token's member and scope. */
    public record Holder(Member member, Scope scope, long tokenId) {
    }

    private final Jdbc jdbc;
    private final Clock clock;
    private final RecentTokenUses recent;

    /** {@code recent} is shared with the {@link MemberRepository} of the same instance. */
    public TokenRepository(Database database, Clock clock, RecentTokenUses recent) {
        this.jdbc = new Jdbc(database.dataSource());
        this.clock = clock;
        this.recent = recent;
    }

    public ApiToken create(long memberId, String name, Scope scope, String tokenDigest) {
        long now = clock.millis();
        return jdbc.transaction("create a token", c -> {
            try (PreparedStatement s = c.prepareStatement("INSERT INTO api_token (member_id, name, token_hash, scope,"
                    + " created_at) VALUES (?, ?, ?, ?, ?) RETURNING id")) {
                s.setLong(1, memberId);
                s.setString(2, name);
                s.setString(3, tokenDigest);
                s.setString(4, scope.jsonName());
                s.setLong(5, now);
                try (ResultSet rs = s.executeQuery()) {
                    rs.next();
                    return new ApiToken(rs.getLong(1), memberId, name, scope, Instant.ofEpochMilli(now), null, null);
                }
            }
        });
    }

    /** A member's tokens, newest first, revoked ones included. */
    public List<ApiToken> list(long memberId) {
        return jdbc.read("list tokens", c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT id, member_id, name, scope, created_at, last_used_at,"
                    + " revoked_at FROM api_token WHERE member_id = ? ORDER BY id DESC")) {
                s.setLong(1, memberId);
                try (ResultSet rs = s.executeQuery()) {
                    List<ApiToken> all = new ArrayList<>();
                    while (rs.next()) {
                        all.add(token(rs));
                    }
                    return all;
                }
            }
        });
    }

    /**
     * How stale the recorded last use of a token may get: a use is written only when the recorded
     * one is older than this (or absent), so a script sending many requests costs one write a
     * minute instead of one per request, and "last used" is accurate to the minute.
     */
    static final long LAST_USE_RESOLUTION_MILLIS = 60_000;

    /**
     * The member and scope of a live token with this digest, marking it used now (to the minute).
     * A token found live in the last second is not looked up again ({@link RecentTokenUses}).
     */
    public Optional<Holder> use(String tokenDigest) {
        long now = clock.millis();
        Optional<Holder> recentHolder = recent.recent(tokenDigest, now);
        if (recentHolder.isPresent()) {
            return recentHolder;
        }
        long lookupStart = recent.lookupStarts();
        Optional<Use> found = jdbc.read("check a token", c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT m.id, m.username, m.role, m.created_at, t.scope, t.id"
                    + " AS token_id, t.last_used_at FROM api_token t JOIN member m ON m.id = t.member_id"
                    + " WHERE t.token_hash = ? AND t.revoked_at IS NULL")) {
                s.setString(1, tokenDigest);
                try (ResultSet rs = s.executeQuery()) {
                    if (!rs.next()) {
                        return Optional.empty();
                    }
                    long lastUsed = rs.getLong("last_used_at");
                    boolean stale = rs.wasNull() || now - lastUsed >= LAST_USE_RESOLUTION_MILLIS;
                    return Optional.of(new Use(new Holder(MemberRepository.member(rs), Scope.of(rs.getString("scope")),
                            rs.getLong("token_id")), stale));
                }
            }
        });
        found.filter(Use::stale).ifPresent(u -> markUsed(u.holder().tokenId(), now));
        found.ifPresent(u -> recent.remember(tokenDigest, u.holder(), now, lookupStart));
        return found.map(Use::holder);
    }

    private record Use(Holder holder, boolean stale) {
    }

    private void markUsed(long id, long now) {
        jdbc.transaction("mark a token used", c -> {
            try (PreparedStatement s = c.prepareStatement("UPDATE api_token SET last_used_at = ? WHERE id = ?")) {
                s.setLong(1, now);
                s.setLong(2, id);
                return s.executeUpdate();
            }
        });
    }

    /** Revokes a token of this member (any member's when {@code anyMember}); 404 when there is none. */
    public void revoke(long id, long memberId, boolean anyMember) {
        jdbc.transaction("revoke a token", c -> {
            try (PreparedStatement s = c.prepareStatement("UPDATE api_token SET revoked_at = COALESCE(revoked_at, ?)"
                    + " WHERE id = ? AND (member_id = ? OR ?)")) {
                s.setLong(1, clock.millis());
                s.setLong(2, id);
                s.setLong(3, memberId);
                s.setBoolean(4, anyMember);
                if (s.executeUpdate() == 0) {
                    throw TeamException.notFound("token " + id + " of yours");
                }
                return null;
            }
        });
        recent.forgetAll();
    }

    private static ApiToken token(ResultSet rs) throws SQLException {
        return new ApiToken(rs.getLong("id"), rs.getLong("member_id"), rs.getString("name"),
                Scope.of(rs.getString("scope")), Instant.ofEpochMilli(rs.getLong("created_at")),
                instant(rs, "last_used_at"), instant(rs, "revoked_at"));
    }

    static Instant instant(ResultSet rs, String column) throws SQLException {
        long millis = rs.getLong(column);
        return rs.wasNull() ? null : Instant.ofEpochMilli(millis);
    }
}
