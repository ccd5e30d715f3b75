package org.trendwright.api;

/**
 * The server refuses work it has no capacity for; the API answers 503 with a Retry-After header
 * of {@link #RETRY_AFTER_SECONDS}. Nothing of the request was done.
 */
public final class ServerBusyException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** Seconds a client should wait before it retries. */
    public static final int RETRY_AFTER_SECONDS = 1;

    public ServerBusyException(String message) {
        super(message);
    }
}
