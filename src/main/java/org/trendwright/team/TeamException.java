package org.trendwright.team;

/**
 * A refused team request: not signed in (401), not allowed (403), unknown member, token or brief
 * (404), a change that would leave no admin (409), too many failed sign-ins (429). Answered as an
 * RFC 9457 problem with this status and type.
 */
public final class TeamException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final int status;
    private final String type;

    public TeamException(int status, String type, String detail) {
        super(detail);
        this.status = status;
        this.type = type;
    }

    public int status() {
        return status;
    }

    /** The last part of the problem type URI. */
    public String type() {
        return type;
    }

    public static TeamException unauthenticated() {
        return new TeamException(401, "unauthenticated", "Sign in (POST /api/session) or send an API token as"
                + " 'Authorization: Bearer <token>'.");
    }

    public static TeamException notFound(String what) {
        return new TeamException(404, "not-found", "There is no " + what + ".");
    }
}
