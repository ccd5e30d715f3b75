package org.trendwright.core;

/** A model on the log scale met a value that is zero or negative; the message names the period. */
public final class NonPositiveValueException extends ModelException {
    private static final long serialVersionUID = 1L;

    public NonPositiveValueException(String message) {
        super(message);
    }
}
