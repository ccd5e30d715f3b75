package org.trendwright.api;

import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;

/**
 * Bounds the fitting work in flight so an overload turns into quick 503 answers instead of a
 * growing heap: at most {@code maxConcurrent} fits run at once, the fits admitted (running or
 * waiting for a turn, each up to {@link #MAX_WAIT_MILLIS}) hold at most
 * {@code (maxConcurrent + maxQueued) x} {@value #OBSERVATIONS_PER_SLOT} observations between them,
 * and a fit beyond that is refused at once with {@link ServerBusyException}.
 *
 * <p>Why observations and not requests: the memory a fit holds (its series, design, residual
 * checks and answer) grows linearly with its number of observations, and requests differ by three
 * orders of magnitude (a 40-quarter trend, a 100,000-day series). Counting whole requests either
 * refuses a burst of small fits that fit easily in memory (64 clients posting 120 quarters each
 * need 7,680 observations) or admits too many large ones. So each configured slot stands for a
 * fit of up to {@value #OBSERVATIONS_PER_SLOT} observations; a fit weighs its observation count,
 * at least {@value #MIN_WEIGHT} (so that tiny fits cannot queue without limit) and at most the
 * whole budget (so that the longest series allowed can still run, alone). Thread-safe.
 */
final class FitGate {

    /** Longest time a queued fit waits for a turn before it is refused too. */
    static final long MAX_WAIT_MILLIS = 5_000;
    /** The observations one configured slot (running or queued) stands for. */
    static final int OBSERVATIONS_PER_SLOT = 1_000;
    /** The least weight of a fit, in observations. */
    static final int MIN_WEIGHT = 100;

    private final int budget;
    private final Semaphore admitted;
    private final Semaphore running;

    FitGate(int maxConcurrent, int maxQueued) {
        if (maxConcurrent < 1 || maxQueued < 0) {
            throw new IllegalArgumentException("A fit gate needs at least one running fit and a queue of 0 or more,"
                    + " got " + maxConcurrent + " and " + maxQueued + ".");
        }
        this.budget = Math.multiplyExact(maxConcurrent + maxQueued, OBSERVATIONS_PER_SLOT);
        this.admitted = new Semaphore(budget);
        this.running = new Semaphore(maxConcurrent, true);
    }

    /**
     * Runs {@code fit} of a series of {@code observations} when capacity allows; refuses with
     * {@link ServerBusyException} otherwise.
     */
    <T> T run(int observations, Supplier<T> fit) {
        int weight = weight(observations);
        if (!admitted.tryAcquire(weight)) {
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
            admitted.release(weight);
        }
    }

    /** The permits a fit of this many observations holds while admitted. */
    int weight(int observations) {
        return Math.min(budget, Math.max(MIN_WEIGHT, observations));
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
