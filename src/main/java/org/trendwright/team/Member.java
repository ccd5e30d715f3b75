package org.trendwright.team;

import java.time.Instant;

/** A member of the team (never with the password hash). Immutable and thread-safe. */
public record Member(long id, String username, Role role, Instant createdAt) {
}
