package org.trendwright.testing;

import org.trendwright.store.Database;

/**
 * A {@link FreshStore} with one pool open on it, for a storage test's before and after:
 * {@link #close()} closes the pool, then removes the store.
 */
public record OpenedStore(FreshStore store, Database database) implements AutoCloseable {

    /** A new migrated store of this kind, opened; a PostgreSQL one is skipped as {@link FreshStore} says. */
    public static OpenedStore of(FreshStore.Kind kind) {
        FreshStore store = FreshStore.create(kind);
        try {
            return new OpenedStore(store, store.open());
        } catch (RuntimeException e) {
            store.close();
            throw e;
        }
    }

    @Override
    public void close() {
        try {
            database.close();
        } finally {
            store.close();
        }
    }
}
