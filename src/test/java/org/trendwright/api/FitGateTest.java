package org.trendwright.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;

/**
 * The fit gate counts admitted work in observations: many small fits queue where whole requests
 * would have been refused, a large one still takes the budget, and at most the configured number
 * run at once.
 */
class FitGateTest {

    @Test
    void admits_sixty_four_simultaneous_120_point_fits_at_the_default_capacity_of_two_cores() throws Exception {
        // Default capacity on two cores: 2 running and 4 x 2 = 8 queued slots (Settings).
        FitGate gate = new FitGate(2, 8);
        AtomicInteger runningNow = new AtomicInteger();
        AtomicInteger mostAtOnce = new AtomicInteger();
        CountDownLatch allArrived = new CountDownLatch(64);
        ExecutorService clients = Executors.newFixedThreadPool(64);
        try {
            List<Future<Integer>> answers = new ArrayList<>();
            for (int i = 0; i < 64; i++) {
                answers.add(clients.submit(() -> {
                    allArrived.countDown();
                    return gate.run(120, () -> {
                        mostAtOnce.accumulateAndGet(runningNow.incrementAndGet(), Math::max);
                        sleep(2);
                        runningNow.decrementAndGet();
                        return 1;
                    });
                }));
            }
            int served = 0;
            for (Future<Integer> answer : answers) {
                served += answer.get(30, TimeUnit.SECONDS);
            }
            assertEquals(64, served);
            assertTrue(mostAtOnce.get() <= 2, "at most two fits ran at once, saw " + mostAtOnce.get());
        } finally {
            clients.shutdownNow();
        }
    }

    @Test
    void refuses_a_fit_while_a_long_series_holds_the_whole_budget() throws Exception {
        FitGate gate = new FitGate(1, 1);
        CountDownLatch started = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        ExecutorService holder = Executors.newSingleThreadExecutor();
        try {
            Future<Integer> longFit = holder.submit(() -> gate.run(2_000, () -> {
                started.countDown();
                await(release);
                return 1;
            }));
            assertTrue(started.await(10, TimeUnit.SECONDS));
            assertThrows(ServerBusyException.class, () -> gate.run(120, () -> 1));
            release.countDown();
            assertEquals(1, longFit.get(10, TimeUnit.SECONDS));
            assertEquals(1, gate.run(120, () -> 1));
        } finally {
            release.countDown();
            holder.shutdownNow();
        }
    }

    @Test
    void a_fit_weighs_its_observations_between_the_floor_and_the_whole_budget() {
        FitGate gate = new FitGate(2, 8);
        assertEquals(FitGate.MIN_WEIGHT, gate.weight(12));
        assertEquals(480, gate.weight(480));
        // The longest series allowed (100,000 observations by default) can still run, alone.
        assertEquals(10 * FitGate.OBSERVATIONS_PER_SLOT, gate.weight(100_000));
    }

    private static void sleep(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private static void await(CountDownLatch latch) {
        try {
            latch.await(10, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
