package org.trendwright.core;

/**
 * Base of the few unchecked exceptions the statistics core throws when the data cannot support a
 * model. Every message says what failed, where (the period or column) and what to do about it, so
 * the service can pass it to the user unchanged.
 */
public abstract class ModelException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    protected ModelException(String message) {
        super(message);
    }
}
