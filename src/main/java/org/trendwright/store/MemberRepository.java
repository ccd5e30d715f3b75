package org.trendwright.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.trendwright.team.Member;
import org.trendwright.team.Role;
import org.trendwright.team.TeamException;

/**
 * Members, their password hashes and their sign-in sessions (kept by the SHA-256 digest of the
 * session id). A change that would leave no admin is refused inside its transaction, so two
 * concurrent demotions cannot both pass. Thread-safe.
 */
public final class MemberRepository {

    /** A member with the stored password hash, for sign-in only. */
    public record Credentials(Member member, String passwordHash) {
    }

    /** A live session: its member and CSRF token. */
    public record Session(Member member, String csrfToken, Instant lastSeenAt) {
    }

    private static final String COLUMNS = "id, username, role, created_at";

    private final Jdbc jdbc;
    private final Clock clock;
    private final RecentTokenUses recentTokenUses;

    /** {@code recentTokenUses} is shared with the {@link TokenRepository} of the same instance. */
    public MemberRepository(Database database, Clock clock, RecentTokenUses recentTokenUses) {
        this.jdbc = new Jdbc(database.dataSource());
        this.clock = clock;
        this.recentTokenUses = recentTokenUses;
    }

    public boolean isEmpty() {
        return jdbc.read("count members", c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT COUNT(*) FROM member");
                 ResultSet rs = s.executeQuery()) {
                return rs.next() && rs.getLong(1) == 0;
            }
        });
    }

    /** Creates the first admin, only while there are no members (409 otherwise). */
    public Member createFirstAdmin(String username, String passwordHash) {
        return jdbc.transaction("create the first admin", c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT COUNT(*) FROM member");
                 ResultSet rs = s.executeQuery()) {
                if (rs.next() && rs.getLong(1) > 0) {
                    throw new TeamException(409, "already-set-up", "The first admin exists already; sign in.");
                }
            }
            return insert(c, username, Role.ADMIN, passwordHash);
        });
    }

    /** Adds a member; 409 when the username is taken. */
    public Member create(String username, Role role, String passwordHash) {
        return jdbc.transaction("add a member", c -> {
            if (byUsername(c, username).isPresent()) {
                throw new TeamException(409, "username-taken", "The username '" + username + "' is taken.");
            }
            return insert(c, username, role, passwordHash);
        });
    }

    private Member insert(Connection c, String username, Role role, String passwordHash) throws SQLException {
        long now = clock.millis();
        try (PreparedStatement s = c.prepareStatement("INSERT INTO member (username, role, password_hash, created_at,"
                + " updated_at) VALUES (?, ?, ?, ?, ?) RETURNING id")) {
            s.setString(1, username);
            s.setString(2, role.jsonName());
            s.setString(3, passwordHash);
            s.setLong(4, now);
            s.setLong(5, now);
            try (ResultSet rs = s.executeQuery()) {
                rs.next();
                return new Member(rs.getLong(1), username, role, Instant.ofEpochMilli(now));
            }
        }
    }

    public List<Member> list() {
        return jdbc.read("list members", c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT " + COLUMNS + " FROM member ORDER BY id");
                 ResultSet rs = s.executeQuery()) {
                List<Member> all = new ArrayList<>();
                while (rs.next()) {
                    all.add(member(rs));
                }
                return all;
            }
        });
    }

    public Member find(long id) {
        return jdbc.read("read a member", c -> byId(c, id));
    }

    public Optional<Credentials> credentials(String username) {
        return jdbc.read("read a member", c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT " + COLUMNS + ", password_hash FROM member"
                    + " WHERE username = ?")) {
                s.setString(1, username);
                try (ResultSet rs = s.executeQuery()) {
                    return rs.next() ? Optional.of(new Credentials(member(rs), rs.getString("password_hash")))
                            : Optional.empty();
                }
            }
        });
    }

    /** Changes the role and/or password hash (null keeps it); 409 when it would leave no admin. */
    public Member update(long id, Role role, String passwordHash) {
        Member changed = jdbc.transaction("change a member", c -> {
            Member member = byId(c, id);
            if (role != null && role != Role.ADMIN) {
                refuseLastAdmin(c, member, "demote");
            }
            try (PreparedStatement s = c.prepareStatement("UPDATE member SET role = COALESCE(?, role), password_hash ="
                    + " COALESCE(?, password_hash), updated_at = ? WHERE id = ?")) {
                s.setString(1, role == null ? null : role.jsonName());
                s.setString(2, passwordHash);
                s.setLong(3, clock.millis());
                s.setLong(4, id);
                s.executeUpdate();
            }
            return byId(c, id);
        });
        recentTokenUses.forgetAll();
        return changed;
    }

    /** Removes a member with their sessions and tokens; 409 for the last admin. */
    public void delete(long id) {
        jdbc.transaction("remove a member", c -> {
            refuseLastAdmin(c, byId(c, id), "remove");
            try (PreparedStatement s = c.prepareStatement("DELETE FROM member WHERE id = ?")) {
                s.setLong(1, id);
                return s.executeUpdate();
            }
        });
        recentTokenUses.forgetAll();
    }

    private static void refuseLastAdmin(Connection c, Member member, String verb) throws SQLException {
        if (member.role() != Role.ADMIN) {
            return;
        }
        try (PreparedStatement s = c.prepareStatement("SELECT COUNT(*) FROM member WHERE role = ?")) {
            s.setString(1, Role.ADMIN.jsonName());
            try (ResultSet rs = s.executeQuery()) {
                if (rs.next() && rs.getLong(1) <= 1) {
                    throw new TeamException(409, "last-admin", "Cannot " + verb + " the last admin; make another"
                            + " member admin first.");
                }
            }
        }
    }

    /** Starts a session under the digest of its id. */
    public void startSession(String idDigest, long memberId, String csrfToken) {
        jdbc.transaction("start a session", c -> {
            try (PreparedStatement s = c.prepareStatement("INSERT INTO member_session (id_hash, member_id, csrf_token,"
                    + " created_at, last_seen_at) VALUES (?, ?, ?, ?, ?)")) {
                s.setString(1, idDigest);
                s.setLong(2, memberId);
                s.setString(3, csrfToken);
                s.setLong(4, clock.millis());
                s.setLong(5, clock.millis());
                return s.executeUpdate();
            }
        });
    }

    /**
     * The live session with this id digest: one idle longer than {@code idle} is ended here and
     * not returned. A session seen more than a minute ago is marked seen now (not on every request,
     * to spare the store a write per read).
     */
    public Optional<Session> session(String idDigest, Duration idle) {
        Optional<Session> found = jdbc.read("read a session", c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT m.id, m.username, m.role, m.created_at,"
                    + " s.csrf_token, s.last_seen_at FROM member_session s JOIN member m ON m.id = s.member_id"
                    + " WHERE s.id_hash = ?")) {
                s.setString(1, idDigest);
                try (ResultSet rs = s.executeQuery()) {
                    return rs.next() ? Optional.of(new Session(member(rs), rs.getString("csrf_token"),
                            Instant.ofEpochMilli(rs.getLong("last_seen_at")))) : Optional.empty();
                }
            }
        });
        Instant now = clock.instant();
        if (found.isPresent() && found.get().lastSeenAt().plus(idle).isBefore(now)) {
            endSession(idDigest);
            return Optional.empty();
        }
        if (found.isPresent() && found.get().lastSeenAt().plusSeconds(60).isBefore(now)) {
            touch(idDigest, now);
        }
        return found;
    }

    private void touch(String idDigest, Instant now) {
        jdbc.transaction("mark a session seen", c -> {
            try (PreparedStatement s = c.prepareStatement("UPDATE member_session SET last_seen_at = ? WHERE id_hash = ?")) {
                s.setLong(1, now.toEpochMilli());
                s.setString(2, idDigest);
                return s.executeUpdate();
            }
        });
    }

    public void endSession(String idDigest) {
        jdbc.transaction("end a session", c -> {
            try (PreparedStatement s = c.prepareStatement("DELETE FROM member_session WHERE id_hash = ?")) {
                s.setString(1, idDigest);
                return s.executeUpdate();
            }
        });
    }

    private static Member byId(Connection c, long id) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("SELECT " + COLUMNS + " FROM member WHERE id = ?")) {
            s.setLong(1, id);
            try (ResultSet rs = s.executeQuery()) {
                if (!rs.next()) {
                    throw TeamException.notFound("member " + id);
                }
                return member(rs);
            }
        }
    }

    private static Optional<Member> byUsername(Connection c, String username) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("SELECT " + COLUMNS + " FROM member WHERE username = ?")) {
            s.setString(1, username);
            try (ResultSet rs = s.executeQuery()) {
                return rs.next() ? Optional.of(member(rs)) : Optional.empty();
            }
        }
    }

    static Member member(ResultSet rs) throws SQLException {
        return new Member(rs.getLong("id"), rs.getString("username"), Role.of(rs.getString("role")),
                Instant.ofEpochMilli(rs.getLong("created_at")));
    }
}
