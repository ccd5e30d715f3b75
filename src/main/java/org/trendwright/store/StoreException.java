package org.trendwright.store;

/** The database failed (unreachable, or a statement failed); the caller answers with a 500. */
public final class StoreException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public StoreException(String message, Throwable cause) {
        super(message, cause);
    }
}
