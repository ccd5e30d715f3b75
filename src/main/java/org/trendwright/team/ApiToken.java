package org.trendwright.team;

import java.time.Instant;

/**
 * An API token as listed (never the secret itself). {@code lastUsedAt} and {@code revokedAt} are
 * null until it is used or revoked; {@code lastUsedAt} is recorded to the minute. Immutable and
 * thread-safe.
 */
public record ApiToken(long id, long memberId, String name, Scope scope, Instant createdAt, Instant lastUsedAt,
                       Instant revokedAt) {
}
