package org.trendwright.team;

import java.time.Instant;

/**
 * A published forecast brief. {@code content} is the frozen JSON text written at publication and
 * never changed; {@code token} is the unguessable link secret (256 random bits). It is kept as is,
 * not as a digest, because the link is meant to be shown again to the team that shares it, and
 * it only ever opens this read-only, already public page. {@code supersededBy} is the id of the
 * newest brief published later from the same series. Immutable and thread-safe.
 */
public record Brief(long id, String token, long seriesId, int seriesVersion, Long authorId, String authorName,
                    String content, Instant publishedAt, Instant expiresAt, Instant revokedAt, Long supersededBy) {

    /** True when the link opens the brief at {@code now}: not revoked and not expired. */
    public boolean sharedAt(Instant now) {
        return revokedAt == null && (expiresAt == null || now.isBefore(expiresAt));
    }

    /** The page address of the brief. */
    public String url() {
        return "/b/" + token;
    }
}
