/**
 * Autoregressive models: AR(p) with a constant fitted by conditional least squares on a series or
 * its first differences ({@link org.trendwright.core.autoregression.Autoregression}), order choice
 * by AIC or BIC on a common sample, seasonal subset lags, the residual-autocorrelation check, the
 * companion-root stationarity check ({@link org.trendwright.core.autoregression.CharacteristicRoots})
 * and chain-rule forecasts with ψ-weight intervals
 * ({@link org.trendwright.core.autoregression.ArForecasts}). Imports only java.* and Commons Math.
 */
package org.trendwright.core.autoregression;
