package org.trendwright.team;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Duration;
import java.time.Instant;
import org.junit.jupiter.api.Test;
import org.trendwright.testing.ManualClock;

/** Slow-down and lock-out of failed sign-ins, on a clock the test moves. */
class SignInThrottleTest {

    private final ManualClock clock = new ManualClock(Instant.parse("2026-01-01T00:00:00Z"));
    private final SignInThrottle throttle = new SignInThrottle(new TeamSettings(null, Duration.ofHours(12), 3,
            Duration.ofSeconds(1), 6, Duration.ofMinutes(15)), clock);

    private void fail(int times, String user, String address) {
        for (int i = 0; i < times; i++) {
            throttle.failed(user, address);
        }
    }

    @Test
    void lets_the_first_failures_through_without_waiting() {
        fail(2, "ann", "10.0.0.1");
        assertDoesNotThrow(() -> throttle.check("ann", "10.0.0.1"));
    }

    @Test
    void doubles_the_wait_with_each_failure_after_the_third() {
        fail(3, "ann", "10.0.0.1");
        assertEquals(1, throttle.secondsToWait("user:ann"));
        throttle.failed("ann", "10.0.0.1");
        assertEquals(2, throttle.secondsToWait("user:ann"));
        throttle.failed("ann", "10.0.0.1");
        assertEquals(4, throttle.secondsToWait("user:ann"));
        clock.advance(Duration.ofSeconds(4));
        assertDoesNotThrow(() -> throttle.check("ann", "10.0.0.1"));
    }

    @Test
    void locks_a_username_out_for_the_lock_time_after_the_limit_from_any_address() {
        for (int i = 0; i < 6; i++) {
            throttle.failed("ann", "10.0.0." + i);
        }
        TeamException refused = assertThrows(TeamException.class, () -> throttle.check("ann", "192.168.1.1"));
        assertEquals(429, refused.status());
        clock.advance(Duration.ofMinutes(15));
        assertDoesNotThrow(() -> throttle.check("ann", "192.168.1.1"));
    }

    @Test
    void locks_an_address_out_that_guesses_at_many_usernames() {
        for (int i = 0; i < 6; i++) {
            throttle.failed("user" + i, "10.0.0.9");
        }
        assertThrows(TeamException.class, () -> throttle.check("someone-else", "10.0.0.9"));
        assertDoesNotThrow(() -> throttle.check("someone-else", "10.0.0.10"));
    }

    @Test
    void a_success_clears_the_username_but_not_the_address() {
        fail(3, "ann", "10.0.0.1");
        throttle.succeeded("ann");
        assertEquals(0, throttle.secondsToWait("user:ann"));
        assertEquals(1, throttle.secondsToWait("addr:10.0.0.1"));
    }
}
