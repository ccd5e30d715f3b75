package org.trendwright.core;

/**
 * A model or test was asked for with options that make no sense (a negative lag, a level outside
 * (0, 1), a seasonal model on annual data, a series with gaps where the method needs none).
 */
public final class InvalidSpecificationException extends ModelException {
    private static final long serialVersionUID = 1L;

    public InvalidSpecificationException(String message) {
        super(message);
    }
}
