package org.trendwright.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.time.Duration;
import java.time.Instant;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.team.Member;
import org.trendwright.team.Role;
import org.trendwright.team.Scope;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.OpenedStore;
import org.trendwright.testing.ManualClock;

/**
 * Token lookups and their one-second reuse ({@link RecentTokenUses}) on SQLite and PostgreSQL:
 * a change made through this instance takes effect on the next request, a change made by another
 * instance (here: straight in the database) within {@link RecentTokenUses#REUSE_MILLIS}.
 */
@ParameterizedClass
@EnumSource(FreshStore.Kind.class)
class TokenRepositoryTest {

    private static final String DIGEST = "digest-of-a-token";

    private final FreshStore.Kind kind;
    private final ManualClock clock = new ManualClock(Instant.parse("2026-03-02T09:00:00Z"));
    private OpenedStore opened;
    private Database database;
    private MemberRepository members;
    private TokenRepository tokens;
    private Member editor;
    private long tokenId;

    TokenRepositoryTest(FreshStore.Kind kind) {
        this.kind = kind;
    }

    @BeforeEach
    void open() {
        opened = OpenedStore.of(kind);
        database = opened.database();
        RecentTokenUses recent = new RecentTokenUses();
        members = new MemberRepository(database, clock, recent);
        tokens = new TokenRepository(database, clock, recent);
        members.createFirstAdmin("admin", "hash-a");
        editor = members.create("editor", Role.EDITOR, "hash-e");
        tokenId = tokens.create(editor.id(), "script", Scope.READ_WRITE, DIGEST).id();
    }

    @AfterEach
    void close() {
        if (opened != null) { // null when the PostgreSQL variant was skipped
            opened.close();
        }
    }

    @Test
    void a_revocation_by_another_instance_is_honoured_within_the_reuse_period() throws SQLException {
        assertEquals(Role.EDITOR, tokens.use(DIGEST).orElseThrow().member().role());
        behindTheRepositorysBack("UPDATE api_token SET revoked_at = 1 WHERE id = ?", tokenId);

        clock.advance(Duration.ofMillis(RecentTokenUses.REUSE_MILLIS - 1));
        assertTrue(tokens.use(DIGEST).isPresent(), "still reused within the period");
        clock.advance(Duration.ofMillis(1));
        assertTrue(tokens.use(DIGEST).isEmpty(), "looked up again once the period is over");
    }

    @Test
    void a_revocation_through_this_instance_takes_effect_on_the_next_request() {
        tokens.use(DIGEST).orElseThrow();
        tokens.revoke(tokenId, editor.id(), false);
        assertTrue(tokens.use(DIGEST).isEmpty());
    }

    @Test
    void a_role_change_or_removal_through_this_instance_takes_effect_on_the_next_request() {
        tokens.use(DIGEST).orElseThrow();
        members.update(editor.id(), Role.VIEWER, null);
        assertEquals(Role.VIEWER, tokens.use(DIGEST).orElseThrow().member().role());

        members.delete(editor.id());
        assertTrue(tokens.use(DIGEST).isEmpty());
    }

    @Test
    void an_unknown_token_is_not_remembered() {
        String later = "digest-of-a-later-token";
        assertTrue(tokens.use(later).isEmpty());
        tokens.create(editor.id(), "later", Scope.READ, later);
        assertEquals(Scope.READ, tokens.use(later).orElseThrow().scope());
    }

    @Test
    void a_lookup_that_overlapped_a_change_is_not_remembered() {
        RecentTokenUses recent = new RecentTokenUses();
        TokenRepository.Holder holder = new TokenRepository.Holder(editor, Scope.READ_WRITE, tokenId);
        long start = recent.lookupStarts();
        recent.forgetAll();
        recent.remember(DIGEST, holder, 0, start);
        assertTrue(recent.recent(DIGEST, 0).isEmpty());

        recent.remember(DIGEST, holder, 0, recent.lookupStarts());
        assertEquals(holder, recent.recent(DIGEST, 0).orElseThrow());
    }

    private void behindTheRepositorysBack(String sql, long id) throws SQLException {
        try (Connection c = database.dataSource().getConnection(); PreparedStatement s = c.prepareStatement(sql)) {
            s.setLong(1, id);
            assertEquals(1, s.executeUpdate());
        }
    }
}
