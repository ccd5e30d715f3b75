package org.trendwright.series;

/**
 * An update named a version of the series that is no longer the current one: someone else
 * changed the series in between.
 */
public final class VersionConflictException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final int currentVersion;

    /** {@code expected} is the version the request named, or -1 when it named none of this series. */
    public VersionConflictException(long id, int expected, int currentVersion) {
        super((expected < 0 ? "If-Match names no version of series " + id + "; it is at version " + currentVersion
                : "Series " + id + " is at version " + currentVersion + ", not " + expected + " as the request assumed")
                + "; fetch it again, apply your change to the current version and resend with its ETag.");
        this.currentVersion = currentVersion;
    }

    public int currentVersion() {
        return currentVersion;
    }
}
