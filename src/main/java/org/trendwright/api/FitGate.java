package org.trendwright.api;

import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;

/**
 * Bounds the fitting work in flight so an overload turns into quick 503 answers instead of a
 * growing heap: at most {@code maxConcurrent} fits run at once, at most {@code maxQueued} more wait
 * for a turn (each up to {@code maxWait}), and any request beyond that is refused at once with
 * {@link ServerBusyException}. Thread-safe.
 */
final class FitGate {

    /** Longest time a queued fit waits for a turn before it is refused too. */
    static final long MAX_WAIT_MILLIS = 5_000;

    private final Semaphore admitted;
    private final Semaphore running;

    FitGate(int maxConcurrent, int maxQueued) {
        if (maxConcurrent < 1 || maxQueued < 0) {
            throw new IllegalArgumentException("A fit gate needs at least one running fit and a queue of 0 or more,"
                    + " got " + maxConcurrent + " and " + maxQueued + ".");
        }
        this.admitted = new Semaphore(maxConcurrent + maxQueued);
        this.running = new Semaphore(maxConcurrent, true);
    }

    /** Runs {@code fit} when capacity allows; refuses with {@link ServerBusyException} otherwise. */
    <T> T run(Supplier<T> fit) {
        if (!admitted.tryAcquire()) {
            throw new ServerBusyException("The server is fitting as many series as it is configured for and its"
                    + " queue is full; retry after the time in Retry-After.");
        }
        try {
            awaitTurn();
            try {
                return fit.get();
            } finally {
                running.release();
            }
        } finally {
            admitted.release();
        }
    }

    private void awaitTurn() {
        try {
            if (!running.tryAcquire(MAX_WAIT_MILLIS, TimeUnit.MILLISECONDS)) {
                throw new ServerBusyException("The fit waited " + MAX_WAIT_MILLIS / 1000 + " s in the queue without"
                        + " a turn; retry after the time in Retry-After.");
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new ServerBusyException("The fit was interrupted while it waited for a turn; retry.");
        }
    }
}
