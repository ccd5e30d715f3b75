package org.trendwright.api;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import java.time.Duration;
import java.util.regex.Pattern;
import org.trendwright.store.AuditRepository;
import org.trendwright.store.MemberRepository;
import org.trendwright.store.TokenRepository;
import org.trendwright.team.Member;
import org.trendwright.team.PasswordHasher;
import org.trendwright.team.Principal;
import org.trendwright.team.Role;
import org.trendwright.team.Scope;
import org.trendwright.team.Secrets;
import org.trendwright.team.SetupCode;
import org.trendwright.team.SignInThrottle;
import org.trendwright.team.TeamException;
import org.trendwright.team.TeamSettings;

/**
 * First setup, sign-in and sign-out, members (admins), a member's own API tokens, and the audit
 * log. Passwords, tokens, session ids and the setup code are never logged. Thread-safe.
 */
final class TeamRoutes {

    private static final Pattern USERNAME = Pattern.compile("[A-Za-z0-9._@-]{1,64}");
    /** OWASP Authentication Cheat Sheet: allow long passphrases; the upper bound keeps hashing cheap to refuse. */
    private static final int MIN_PASSWORD = 10;
    private static final int MAX_PASSWORD = 256;

    private final MemberRepository members;
    private final TokenRepository tokens;
    private final AuditRepository audit;
    private final TeamSettings settings;
    private final SetupCode setupCode;
    private final SignInThrottle throttle;
    private final PasswordHasher hasher = new PasswordHasher();
    private final Uploads uploads;

    TeamRoutes(HttpApi.Team team, Uploads uploads) {
        this.members = team.members();
        this.tokens = team.tokens();
        this.audit = team.audit();
        this.settings = team.settings();
        this.setupCode = team.setupCode();
        this.throttle = new SignInThrottle(team.settings(), team.clock());
        this.uploads = uploads;
    }

    void register(RoutesConfig routes) {
        routes.post("/api/setup", this::setup);
        routes.post("/api/session", this::signIn);
        routes.get("/api/session", this::whoAmI);
        routes.delete("/api/session", this::signOut);
        routes.get("/api/members", ctx -> ctx.json(new TeamBodies.Listing<>(members.list().stream()
                .map(TeamBodies.MemberBody::of).toList())));
        routes.post("/api/members", this::addMember);
        routes.patch("/api/members/{id}", this::changeMember);
        routes.delete("/api/members/{id}", ctx -> {
            members.delete(SeriesRoutes.id(ctx));
            ctx.status(204);
        });
        routes.get("/api/tokens", ctx -> ctx.json(new TeamBodies.Listing<>(tokens.list(AuthGate.required(ctx)
                .member().id()).stream().map(t -> TeamBodies.TokenBody.of(t, null)).toList())));
        routes.post("/api/tokens", this::createToken);
        routes.delete("/api/tokens/{id}", this::revokeToken);
        routes.get("/api/audit", ctx -> ctx.json(new TeamBodies.Listing<>(audit.latest(limit(ctx)))));
    }

    private void setup(Context ctx) {
        TeamBodies.SetupRequest body = uploads.body(ctx, TeamBodies.SetupRequest.class);
        throttle.check("(setup)", ctx.ip());
        if (!members.isEmpty()) {
            throw new TeamException(409, "already-set-up", "The first admin exists already; sign in.");
        }
        if (!setupCode.matches(body.setupCode())) {
            throttle.failed("(setup)", ctx.ip());
            throw new TeamException(403, "wrong-setup-code", "The setup code is wrong; it is shown on the server's"
                    + " console at its first start.");
        }
        Member admin = members.createFirstAdmin(username(body.username()), hasher.hash(password(body.password())));
        setupCode.used();
        startSession(ctx, admin);
    }

    private void signIn(Context ctx) {
        TeamBodies.SignIn body = uploads.body(ctx, TeamBodies.SignIn.class);
        String username = body.username() == null ? "" : body.username();
        throttle.check(username, ctx.ip());
        var found = members.credentials(username);
        boolean matches = hasher.matches(body.password() == null ? "" : body.password(),
                found.map(MemberRepository.Credentials::passwordHash).orElse(null));
        if (found.isEmpty() || !matches) {
            throttle.failed(username, ctx.ip());
            throw new TeamException(401, "sign-in-failed", "Wrong username or password.");
        }
        throttle.succeeded(username);
        startSession(ctx, found.get().member());
    }

    /**
     * Starts a session: a 256-bit id in an HttpOnly, SameSite=Strict cookie (Secure over TLS;
     * RFC 6265 and the OWASP Session Management Cheat Sheet) whose digest the store keeps.
     */
    private void startSession(Context ctx, Member member) {
        String id = Secrets.random("");
        String csrf = Secrets.random("");
        members.startSession(Secrets.digest(id), member.id(), csrf);
        ctx.header("Set-Cookie", cookie(ctx, id, settings.sessionIdle()));
        AuthGate.signedIn(ctx, Principal.session(member, csrf));
        ctx.json(new TeamBodies.SessionBody(TeamBodies.MemberBody.of(member), csrf));
    }

    private static String cookie(Context ctx, String value, Duration maxAge) {
        boolean tls = "https".equalsIgnoreCase(ctx.scheme());
        return AuthGate.COOKIE + "=" + value + "; Path=/; Max-Age=" + maxAge.toSeconds() + "; HttpOnly; SameSite=Strict"
                + (tls ? "; Secure" : "");
    }

    private void whoAmI(Context ctx) {
        Principal principal = AuthGate.required(ctx);
        ctx.json(new TeamBodies.SessionBody(TeamBodies.MemberBody.of(principal.member()), principal.csrfToken()));
    }

    private void signOut(Context ctx) {
        String session = ctx.cookie(AuthGate.COOKIE);
        if (session != null) {
            members.endSession(Secrets.digest(session));
        }
        ctx.header("Set-Cookie", cookie(ctx, "", Duration.ZERO));
        ctx.status(204);
    }

    private void addMember(Context ctx) {
        TeamBodies.NewMember body = uploads.body(ctx, TeamBodies.NewMember.class);
        Role role = Role.of(body.role() == null ? "viewer" : body.role());
        Member member = members.create(username(body.username()), role, hasher.hash(password(body.password())));
        ctx.status(201).json(TeamBodies.MemberBody.of(member));
    }

    private void changeMember(Context ctx) {
        TeamBodies.MemberChange body = uploads.body(ctx, TeamBodies.MemberChange.class);
        Role role = body.role() == null ? null : Role.of(body.role());
        String hash = body.password() == null ? null : hasher.hash(password(body.password()));
        ctx.json(TeamBodies.MemberBody.of(members.update(SeriesRoutes.id(ctx), role, hash)));
    }

    private void createToken(Context ctx) {
        TeamBodies.NewToken body = uploads.body(ctx, TeamBodies.NewToken.class);
        Scope scope = Scope.of(body.scope() == null ? "read" : body.scope());
        String name = body.name() == null || body.name().isBlank() ? "token" : body.name().strip();
        if (name.length() > 100) {
            throw new BadRequestException("name", "name must be at most 100 characters.");
        }
        String secret = Secrets.random("twk_");
        var token = tokens.create(AuthGate.required(ctx).member().id(), name, scope, Secrets.digest(secret));
        ctx.status(201).json(TeamBodies.TokenBody.of(token, secret));
    }

    private void revokeToken(Context ctx) {
        Member member = AuthGate.required(ctx).member();
        tokens.revoke(SeriesRoutes.id(ctx), member.id(), member.role() == Role.ADMIN);
        ctx.status(204);
    }

    private static int limit(Context ctx) {
        String text = ctx.queryParam("limit");
        try {
            int limit = text == null ? 200 : Integer.parseInt(text);
            if (limit < 1 || limit > 1000) {
                throw new NumberFormatException();
            }
            return limit;
        } catch (NumberFormatException e) {
            throw new BadRequestException("limit", "limit must be a whole number in 1..1000, got '" + text + "'.");
        }
    }

    private static String username(String username) {
        if (username == null || !USERNAME.matcher(username).matches()) {
            throw new BadRequestException("username", "username must be 1 to 64 letters, digits or . _ @ -.");
        }
        return username;
    }

    private static String password(String password) {
        if (password == null || password.length() < MIN_PASSWORD || password.length() > MAX_PASSWORD) {
            throw new BadRequestException("password", "password must be " + MIN_PASSWORD + " to " + MAX_PASSWORD
                    + " characters long.");
        }
        return password;
    }
}
