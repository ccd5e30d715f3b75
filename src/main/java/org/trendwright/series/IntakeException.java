package org.trendwright.series;

/**
 * An upload was refused. The message says what is wrong and what to do; {@link #where()} points
 * at the line and column or the JSON field. Nothing of a refused upload is stored.
 */
public final class IntakeException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** Why the upload was refused, so the API can give each reason its own problem type. */
    public enum Reason {
        /** A cell or field holds something that is not a period, a number, or a name. */
        INVALID_VALUE,
        /** The file's layout, delimiter or frequency cannot be told apart without guessing. */
        AMBIGUOUS,
        /** Two rows give the same period, or periods of different frequencies are mixed. */
        INCONSISTENT,
        /** A value or a whole period is missing and the request asked to refuse gaps. */
        MISSING_VALUE,
        /** More observations or series than the configured limits allow. */
        LIMIT_EXCEEDED
    }

    private final transient Where where;
    private final Reason reason;

    public IntakeException(Reason reason, Where where, String message) {
        super(where.describe().isEmpty() ? message : where.describe() + ": " + message);
        this.reason = reason;
        this.where = where;
    }

    public Where where() {
        return where;
    }

    public Reason reason() {
        return reason;
    }
}
