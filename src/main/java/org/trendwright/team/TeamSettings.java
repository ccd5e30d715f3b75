package org.trendwright.team;

import java.time.Duration;
import java.util.Map;

/**
 * The settings of sign-in, read from environment variables (the server's flags stay as they are):
 * <pre>
 *   TRENDWRIGHT_SETUP_CODE              (random, printed)  the one-time code that creates the first admin
 *   TRENDWRIGHT_SESSION_IDLE_MINUTES    720     a session ends after this long without a request
 *   TRENDWRIGHT_SIGNIN_SLOW_AFTER       3       failures (per username or address) before waits begin
 *   TRENDWRIGHT_SIGNIN_SLOW_SECONDS     1       first wait; each further failure doubles it
 *   TRENDWRIGHT_SIGNIN_LOCK_AFTER       10      failures that lock the username or address out
 *   TRENDWRIGHT_SIGNIN_LOCK_MINUTES     15      how long a lock-out lasts
 * </pre>
 * Immutable and thread-safe.
 */
public record TeamSettings(String setupCode, Duration sessionIdle, int slowAfter, Duration slowStep, int lockAfter,
                           Duration lockFor) {

    /** The defaults above, with a random setup code. */
    public static TeamSettings defaults() {
        return from(Map.of());
    }

    /** Settings from TRENDWRIGHT_* environment variables. */
    public static TeamSettings from(Map<String, String> environment) {
        String code = environment.get("TRENDWRIGHT_SETUP_CODE");
        return new TeamSettings(code == null || code.isBlank() ? null : code.trim(),
                Duration.ofMinutes(number(environment, "TRENDWRIGHT_SESSION_IDLE_MINUTES", 720)),
                (int) number(environment, "TRENDWRIGHT_SIGNIN_SLOW_AFTER", 3),
                Duration.ofSeconds(number(environment, "TRENDWRIGHT_SIGNIN_SLOW_SECONDS", 1)),
                (int) number(environment, "TRENDWRIGHT_SIGNIN_LOCK_AFTER", 10),
                Duration.ofMinutes(number(environment, "TRENDWRIGHT_SIGNIN_LOCK_MINUTES", 15)));
    }

    /** These settings with a given setup code (tests). */
    public TeamSettings withSetupCode(String code) {
        return new TeamSettings(code, sessionIdle, slowAfter, slowStep, lockAfter, lockFor);
    }

    private static long number(Map<String, String> environment, String name, long fallback) {
        String text = environment.get(name);
        if (text == null || text.isBlank()) {
            return fallback;
        }
        try {
            return Long.parseLong(text.trim());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(name + " must be a whole number, got '" + text + "'.", e);
        }
    }
}
