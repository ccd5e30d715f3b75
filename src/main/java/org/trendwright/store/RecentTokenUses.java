package org.trendwright.store;

import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;

/**
 * The API tokens this instance found live in the last {@link #REUSE_MILLIS} ms, so that a script
 * sending hundreds of requests a second costs one token lookup a second instead of one per
 * request (the lookup was 5-9% of a stateless fit's CPU under load; src/docs/benchmarks.md).
 *
 * <p>What it may delay: a token revoked, or a member changed or removed, on <em>another</em>
 * instance sharing the store is refused here at most {@link #REUSE_MILLIS} ms later. Changes made
 * through this instance forget every entry at once ({@link #forgetAll()}, called by the
 * repositories that make them), so they take effect on the next request. Unknown tokens are never
 * kept. At most {@link #MAX_ENTRIES} tokens are held; past that the whole map starts again.
 * Thread-safe.
 */
public final class RecentTokenUses {

    /** How long a successful lookup is reused. */
    public static final long REUSE_MILLIS = 1_000;
    /** Most tokens held at once. */
    static final int MAX_ENTRIES = 10_000;

    private record Seen(TokenRepository.Holder holder, long atMillis) {
    }

    private final Map<String, Seen> seen = new ConcurrentHashMap<>();
    /** Counts {@link #forgetAll()} calls, so a lookup that overlapped one is not remembered. */
    private final AtomicLong forgettings = new AtomicLong();

    /** The holder looked up for this token digest at most {@link #REUSE_MILLIS} ms before {@code nowMillis}. */
    Optional<TokenRepository.Holder> recent(String tokenDigest, long nowMillis) {
        Seen found = seen.get(tokenDigest);
        if (found == null || nowMillis - found.atMillis() >= REUSE_MILLIS || nowMillis < found.atMillis()) {
            return Optional.empty();
        }
        return Optional.of(found.holder());
    }

    /** The value to pass to {@link #remember}, read before the store is asked. */
    long lookupStarts() {
        return forgettings.get();
    }

    /**
     * Remembers that the store said {@code holder} owns this token digest at {@code nowMillis},
     * unless a {@link #forgetAll()} came after {@code lookupStart} (then the answer may predate it).
     */
    void remember(String tokenDigest, TokenRepository.Holder holder, long nowMillis, long lookupStart) {
        if (seen.size() >= MAX_ENTRIES) {
            seen.clear();
        }
        seen.put(tokenDigest, new Seen(holder, nowMillis));
        if (forgettings.get() != lookupStart) {
            seen.remove(tokenDigest);
        }
    }

    /** Forgets every token: called after a revocation or a member change made through this instance. */
    void forgetAll() {
        forgettings.incrementAndGet();
        seen.clear();
    }
}
