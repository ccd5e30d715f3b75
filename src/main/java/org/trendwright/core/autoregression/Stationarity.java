package org.trendwright.core.autoregression;

/**
 * Whether a fitted autoregression is stationary, and the level it reverts to if it is.
 *
 * @param largestRootModulus the largest modulus of the eigenvalues of the companion matrix (the
 *                           reciprocals of the roots of 1 − φ1 z − ... − φm z^m); 0 for a model
 *                           without lags
 * @param stationary         true when that modulus is below 1 − {@link CharacteristicRoots#UNIT_CIRCLE_TOLERANCE}
 * @param meanRevertingLevel b0 / (1 − Σφ_i) when stationary, NaN otherwise; for a model on first
 *                           differences it is the mean change per period, not a level
 * @param statement          one plain sentence saying all this for the user
 */
public record Stationarity(double largestRootModulus, boolean stationary, double meanRevertingLevel,
                           String statement) {
}
