package org.trendwright.core;

/**
 * The regressors are (numerically) linearly dependent, so the least-squares coefficients are not
 * unique. The message names the regressor that adds nothing new given the others.
 */
public final class RankDeficientDesignException extends ModelException {
    private static final long serialVersionUID = 1L;

    public RankDeficientDesignException(String message) {
        super(message);
    }
}
