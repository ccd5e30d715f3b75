package org.trendwright.api;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HandlerType;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.trendwright.store.AuditRepository;
import org.trendwright.store.MemberRepository;
import org.trendwright.store.TokenRepository;
import org.trendwright.team.Access;
import org.trendwright.team.Principal;
import org.trendwright.team.Secrets;
import org.trendwright.team.TeamException;
import org.trendwright.team.TeamSettings;

/**
 * Guards every route: sets the security headers on every answer, finds who is asking (an API
 * token in {@code Authorization: Bearer}, else the session cookie), checks the route's
 * {@link Access} rule (a route without one is refused), requires the CSRF token on writes made with
 * the cookie, and writes every successful write to the audit log. Thread-safe.
 *
 * <p>Routes that take a POST body only to compute an answer and store nothing
 * ({@link #STORES_NOTHING}) are not writes for the audit log: there is no change to record, and a
 * database write per request would cap their rate at what the store can commit.
 */
final class AuthGate {

    static final String COOKIE = "tw_session";
    static final String CSRF_HEADER = "X-CSRF-Token";
    private static final String PRINCIPAL = "tw.principal";
    private static final String ROUTE = "tw.route";
    /** POST routes that answer from the posted or stored data and change nothing. */
    static final Set<String> STORES_NOTHING = Set.of("POST /api/fit", "POST /api/series/preview",
            "POST /api/series/{id}/versions/{version}/comparison");

    private final MemberRepository members;
    private final TokenRepository tokens;
    private final AuditRepository audit;
    private final TeamSettings settings;

    AuthGate(MemberRepository members, TokenRepository tokens, AuditRepository audit, TeamSettings settings) {
        this.members = members;
        this.tokens = tokens;
        this.audit = audit;
        this.settings = settings;
    }

    void register(RoutesConfig routes) {
        routes.before(AuthGate::securityHeaders);
        routes.beforeMatched(this::authorize);
        routes.after(this::audit);
    }

    /** The headers of every answer (OWASP HTTP Headers Cheat Sheet; common practice). */
    static void securityHeaders(Context ctx) {
        ctx.header("Content-Security-Policy", "default-src 'self'; script-src 'self'; style-src 'self'; img-src 'self'"
                + " data: blob:; frame-ancestors 'none'; base-uri 'none'; form-action 'self'");
        ctx.header("X-Content-Type-Options", "nosniff");
        ctx.header("Referrer-Policy", "no-referrer");
        ctx.header("X-Frame-Options", "DENY");
    }

    private void authorize(Context ctx) {
        if (ctx.endpoints().matchedHttpEndpoint() == null) {
            // No route matched: a static file of the page (web/, webjars), public like the page itself.
            return;
        }
        String route = ctx.method().name() + " " + ctx.endpoints().matchedHttpEndpoint().path;
        ctx.attribute(ROUTE, route);
        Access access = Access.RULES.get(route);
        if (access == null) {
            throw new TeamException(403, "forbidden", "The route " + route + " has no access rule.");
        }
        if (access == Access.PUBLIC) {
            // Open routes (health, sign-in, brief links) do not look at credentials at all.
            return;
        }
        Principal principal = identify(ctx).orElse(null);
        ctx.attribute(PRINCIPAL, principal);
        access.check(principal);
        if (principal != null && principal.via() == Principal.Via.SESSION && isWrite(ctx)
                && !Secrets.same(principal.csrfToken(), ctx.header(CSRF_HEADER))) {
            throw new TeamException(403, "csrf-token-missing", "A change made with the sign-in cookie needs the"
                    + " header " + CSRF_HEADER + " with the csrfToken from POST /api/session.");
        }
    }

    private Optional<Principal> identify(Context ctx) {
        String authorization = ctx.header("Authorization");
        if (authorization != null) {
            if (!authorization.startsWith("Bearer ")) {
                throw TeamException.unauthenticated();
            }
            return Optional.of(tokens.use(Secrets.digest(authorization.substring(7).trim()))
                    .map(h -> Principal.token(h.member(), h.scope(), h.tokenId()))
                    .orElseThrow(TeamException::unauthenticated));
        }
        String session = ctx.cookie(COOKIE);
        if (session == null) {
            return Optional.empty();
        }
        return members.session(Secrets.digest(session), settings.sessionIdle())
                .map(s -> Principal.session(s.member(), s.csrfToken()));
    }

    private void audit(Context ctx) {
        Principal principal = principal(ctx);
        String route = ctx.attribute(ROUTE);
        if (principal == null || route == null || !isWrite(ctx) || STORES_NOTHING.contains(route)
                || ctx.statusCode() >= 400) {
            return;
        }
        Map<String, String> target = new java.util.TreeMap<>(ctx.pathParamMap());
        audit.record(principal.member().id(), principal.member().username(), route, target.toString());
    }

    static boolean isWrite(Context ctx) {
        HandlerType method = ctx.method();
        return method != HandlerType.GET && method != HandlerType.HEAD && method != HandlerType.OPTIONS;
    }

    /** Who makes this request, or null when nobody is signed in. */
    static Principal principal(Context ctx) {
        return ctx.attribute(PRINCIPAL);
    }

    /** Records who a sign-in or setup request turned out to be, for the audit log. */
    static void signedIn(Context ctx, Principal principal) {
        ctx.attribute(PRINCIPAL, principal);
    }

    /** The member asking; the gate has made sure there is one on every non-public route. */
    static Principal required(Context ctx) {
        Principal principal = principal(ctx);
        if (principal == null) {
            throw TeamException.unauthenticated();
        }
        return principal;
    }
}
