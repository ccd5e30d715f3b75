package org.trendwright.team;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Slows and then locks out repeated failed sign-ins, counted separately per username and per
 * client address (OWASP Authentication Cheat Sheet: throttle per account and per source). After
 * {@code slowAfter} failures, the next attempt must wait {@code slowStep}, doubling with each
 * further failure (capped at the lock-out time); after {@code lockAfter} failures the key is locked
 * for {@code lockFor}. A success clears the username's count (not the address's, so one known
 * account cannot be used to reset guessing at others). Counts live in memory: a restart clears
 * them. Thread-safe.
 */
public final class SignInThrottle {

    private record Failures(int count, Instant last) {
    }

    private final TeamSettings settings;
    private final Clock clock;
    private final ConcurrentHashMap<String, Failures> failures = new ConcurrentHashMap<>();

    public SignInThrottle(TeamSettings settings, Clock clock) {
        this.settings = settings;
        this.clock = clock;
    }

    /** Refuses (429, with the seconds to wait) when the username or the address must still wait. */
    public void check(String username, String address) {
        long wait = Math.max(secondsToWait("user:" + username), secondsToWait("addr:" + address));
        if (wait > 0) {
            throw new TeamException(429, "too-many-sign-ins", "Too many failed sign-ins for this username or"
                    + " address; try again in " + wait + " seconds.");
        }
    }

    public void failed(String username, String address) {
        Instant now = clock.instant();
        for (String key : new String[] {"user:" + username, "addr:" + address}) {
            failures.merge(key, new Failures(1, now), (old, one) -> new Failures(old.count() + 1, now));
        }
    }

    public void succeeded(String username) {
        failures.remove("user:" + username);
    }

    /** Seconds until the next attempt may be made (0 when it may be made now). */
    long secondsToWait(String key) {
        Failures f = failures.get(key);
        if (f == null || f.count() < settings.slowAfter()) {
            return 0;
        }
        Duration wait = f.count() >= settings.lockAfter() ? settings.lockFor() : slowWait(f.count());
        Duration left = Duration.between(clock.instant(), f.last().plus(wait));
        return left.isNegative() || left.isZero() ? 0 : Math.max(1, (left.toMillis() + 999) / 1000);
    }

    private Duration slowWait(int count) {
        int doublings = Math.min(count - settings.slowAfter(), 20);
        Duration wait = settings.slowStep().multipliedBy(1L << doublings);
        return wait.compareTo(settings.lockFor()) > 0 ? settings.lockFor() : wait;
    }
}
