package org.trendwright.api;

import java.time.Instant;
import org.trendwright.team.ApiToken;
import org.trendwright.team.Member;

/** Request and response bodies of the team routes. Immutable and thread-safe. */
final class TeamBodies {

    private TeamBodies() {
    }

    record SetupRequest(String setupCode, String username, String password) {
    }

    record SignIn(String username, String password) {
    }

    /** A member as shown: never the password hash. */
    record MemberBody(long id, String username, String role, Instant createdAt) {
        static MemberBody of(Member m) {
            return new MemberBody(m.id(), m.username(), m.role().jsonName(), m.createdAt());
        }
    }

    /** The signed-in member; {@code csrfToken} is null when the request came with an API token. */
    record SessionBody(MemberBody member, String csrfToken) {
    }

    record NewMember(String username, String password, String role) {
    }

    record MemberChange(String role, String password) {
    }

    record NewToken(String name, String scope) {
    }

    /** A token as listed; {@code token} (the secret) is set only in the answer that created it. */
    record TokenBody(long id, String name, String scope, Instant createdAt, Instant lastUsedAt, Instant revokedAt,
                     String token) {
        static TokenBody of(ApiToken t, String secret) {
            return new TokenBody(t.id(), t.name(), t.scope().jsonName(), t.createdAt(), t.lastUsedAt(), t.revokedAt(),
                    secret);
        }
    }

    record Listing<T>(java.util.List<T> items) {
    }
}
