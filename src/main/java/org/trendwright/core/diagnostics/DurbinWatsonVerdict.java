package org.trendwright.core.diagnostics;

/**
 * The conclusion of the exact Durbin-Watson test: two one-sided tests at the chosen level, one
 * against positive and one against negative first-order serial correlation.
 */
public enum DurbinWatsonVerdict {
    /** P(d &lt;= d_observed) is below the level: successive errors are positively correlated. */
    POSITIVE_SERIAL_CORRELATION,
    /** Neither one-sided p-value is below the level. */
    NONE_DETECTED,
    /** P(d &gt;= d_observed) is below the level: successive errors are negatively correlated. */
    NEGATIVE_SERIAL_CORRELATION
}
