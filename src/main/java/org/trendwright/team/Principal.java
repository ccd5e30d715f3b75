package org.trendwright.team;

/**
 * Who makes a request and how: through a sign-in session (the cookie, with its CSRF token) or an
 * API token (with its scope; {@code csrfToken} null). A session carries the scope read-write: what
 * it may write is bounded by the member's role. Immutable and thread-safe.
 */
public record Principal(Member member, Scope scope, Via via, String csrfToken, Long tokenId) {

    /** How the request proved who it comes from. */
    public enum Via { SESSION, TOKEN }

    public static Principal session(Member member, String csrfToken) {
        return new Principal(member, Scope.READ_WRITE, Via.SESSION, csrfToken, null);
    }

    public static Principal token(Member member, Scope scope, long tokenId) {
        return new Principal(member, scope, Via.TOKEN, null, tokenId);
    }
}
