package org.trendwright.team;

import java.util.Map;

/**
 * Who may call a route. Every registered route must have a rule ({@link #RULES}); a route without
 * one is refused to everybody (fail closed), so a new route cannot open by accident.
 */
public enum Access {
    /** Anyone, signed in or not. */
    PUBLIC,
    /** Any member (a read token is enough). */
    READ,
    /** Any member writing their own things (sign-out, own tokens): needs a read-write token. */
    OWN_WRITE,
    /** An editor or admin with a read-write token or a session. */
    EDIT,
    /** An admin (a read token is enough). */
    ADMIN_READ,
    /** An admin with a read-write token or a session. */
    ADMIN_WRITE;

    /** The rule of every route, keyed "METHOD /path/{param}" as the server registers it. */
    public static final Map<String, Access> RULES = Map.ofEntries(
            Map.entry("GET /health", PUBLIC), Map.entry("GET /metrics", PUBLIC),
            Map.entry("GET /api/openapi.json", PUBLIC),
            Map.entry("POST /api/setup", PUBLIC), Map.entry("POST /api/session", PUBLIC),
            Map.entry("GET /api/session", READ), Map.entry("DELETE /api/session", OWN_WRITE),
            Map.entry("GET /api/series", READ), Map.entry("GET /api/series/{id}", READ),
            Map.entry("GET /api/series/{id}/versions", READ), Map.entry("GET /api/series/{id}/versions/{version}", READ),
            Map.entry("POST /api/series", EDIT), Map.entry("DELETE /api/series/{id}", EDIT),
            Map.entry("POST /api/series/{id}/versions", EDIT),
            Map.entry("POST /api/series/{id}/versions/{version}/fit", EDIT), Map.entry("POST /api/fit", EDIT),
            Map.entry("GET /api/members", ADMIN_READ), Map.entry("POST /api/members", ADMIN_WRITE),
            Map.entry("PATCH /api/members/{id}", ADMIN_WRITE), Map.entry("DELETE /api/members/{id}", ADMIN_WRITE),
            Map.entry("GET /api/tokens", READ), Map.entry("POST /api/tokens", OWN_WRITE),
            Map.entry("DELETE /api/tokens/{id}", OWN_WRITE),
            Map.entry("POST /api/series/{id}/briefs", EDIT), Map.entry("GET /api/briefs", READ),
            Map.entry("GET /api/briefs/misses", READ), Map.entry("DELETE /api/briefs/{id}", EDIT),
            Map.entry("GET /api/public/briefs/{token}", PUBLIC),
            Map.entry("GET /api/audit", ADMIN_READ),
            Map.entry("POST /api/jobs", EDIT), Map.entry("GET /api/jobs/{id}", READ),
            Map.entry("GET /api/jobs/{id}/results", READ),
            Map.entry("POST /api/series/preview", EDIT), Map.entry("GET /api/upload-progress/{key}", EDIT),
            Map.entry("POST /api/series/{id}/versions/{version}/comparison", READ),
            Map.entry("GET /setup", PUBLIC), Map.entry("GET /b/{token}", PUBLIC));

    /**
     * Checks that {@code principal} (null when anonymous) may call a route with this rule: 401
     * when nobody is signed in, 403 when the role or token scope does not allow it.
     */
    public void check(Principal principal) {
        if (this == PUBLIC) {
            return;
        }
        if (principal == null) {
            throw TeamException.unauthenticated();
        }
        Role role = principal.member().role();
        boolean writes = this == OWN_WRITE || this == EDIT || this == ADMIN_WRITE;
        if (writes && principal.scope() != Scope.READ_WRITE) {
            throw forbidden("This API token is read-only; create a read-write token to make changes.");
        }
        Role needed = switch (this) {
            case EDIT -> Role.EDITOR;
            case ADMIN_READ, ADMIN_WRITE -> Role.ADMIN;
            default -> Role.VIEWER;
        };
        if (!role.includes(needed)) {
            throw forbidden("This needs the role " + needed.jsonName() + "; you are " + role.jsonName() + ".");
        }
    }

    private static TeamException forbidden(String detail) {
        return new TeamException(403, "forbidden", detail);
    }
}
