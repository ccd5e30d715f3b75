package org.trendwright.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

/** The audit log: who did what, to what, when. Append-only. Thread-safe. */
public final class AuditRepository {

    /** One entry; {@code memberId} is null for an action by no member (the first setup). */
    public record Entry(long id, Long memberId, String actor, String action, String target, Instant at) {
    }

    private final Jdbc jdbc;
    private final Clock clock;

    public AuditRepository(Database database, Clock clock) {
        this.jdbc = new Jdbc(database.dataSource());
        this.clock = clock;
    }

    public void record(Long memberId, String actor, String action, String target) {
        jdbc.transaction("write the audit log", c -> {
            try (PreparedStatement s = c.prepareStatement("INSERT INTO audit_entry (member_id, actor, action, target, at)"
                    + " VALUES (?, ?, ?, ?, ?)")) {
                if (memberId == null) {
                    s.setNull(1, java.sql.Types.BIGINT);
                } else {
                    s.setLong(1, memberId);
                }
                s.setString(2, actor);
                s.setString(3, action);
                s.setString(4, target);
                s.setLong(5, clock.millis());
                return s.executeUpdate();
            }
        });
    }

    /** The newest {@code limit} entries, newest first. */
    public List<Entry> latest(int limit) {
        return jdbc.read("read the audit log", c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT id, member_id, actor, action, target, at FROM"
                    + " audit_entry ORDER BY id DESC LIMIT ?")) {
                s.setInt(1, limit);
                try (ResultSet rs = s.executeQuery()) {
                    List<Entry> all = new ArrayList<>();
                    while (rs.next()) {
                        long member = rs.getLong("member_id");
                        Long memberId = rs.wasNull() ? null : member;
                        all.add(new Entry(rs.getLong("id"), memberId, rs.getString("actor"), rs.getString("action"),
                                rs.getString("target"), Instant.ofEpochMilli(rs.getLong("at"))));
                    }
                    return all;
                }
            }
        });
    }
}
