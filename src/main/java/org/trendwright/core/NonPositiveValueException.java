package org.trendwright.core;

/**
 * A model on the log scale met a value that is zero or negative. The message names the period;
 * {@link #time()} gives its time index so that a caller can name it in its own terms.
 */
public final class NonPositiveValueException extends ModelException {
    private static final long serialVersionUID = 1L;

    private final int time;

    public NonPositiveValueException(String message, int time) {
        super(message);
        this.time = time;
    }

    /** The time index t (1 = first observation) of the first offending value. */
    public int time() {
        return time;
    }
}
