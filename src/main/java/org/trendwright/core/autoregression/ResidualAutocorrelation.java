package org.trendwright.core.autoregression;

/**
 * The sample autocorrelation of a model's residuals at one lag, with the large-sample standard
 * error 1/√T of a white-noise autocorrelation (Bartlett 1946, JRSS Suppl. 8; Box & Jenkins 1970,
 * Time Series Analysis: Forecasting and Control, Holden-Day, section 8.2). A |t| above 2 flags
 * correlation the model has not captured; at the first few lags of an AR fit 1/√T overstates the
 * standard error (Box & Pierce 1970, JASA 65), so the check errs towards not flagging there.
 *
 * @param lag           the lag k ≥ 1
 * @param value         r_k = Σ_{t>k} ẽ_t ẽ_{t−k} / Σ ẽ_t², ẽ the residuals less their mean
 * @param standardError 1/√T, T the number of residuals
 * @param tStatistic    r_k √T
 */
public record ResidualAutocorrelation(int lag, double value, double standardError, double tStatistic) {

    /** The usual flag: |t| > 2, roughly a 5% two-sided check at this lag alone. */
    public boolean flagged() {
        return Math.abs(tStatistic) > 2;
    }
}
