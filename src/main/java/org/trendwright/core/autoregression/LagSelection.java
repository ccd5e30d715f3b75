package org.trendwright.core.autoregression;

/**
 * How the number of lags of an autoregression (or of the lagged differences in a unit-root test
 * regression) is chosen.
 *
 * <p>With a criterion, every candidate 0..maximum is fitted on the same estimation sample (the
 * observations left after dropping the first maximum-lag ones), so that the criteria compare
 * like with like; the chosen lag count is then refitted on all the observations it can use.
 * That is the usual practice (Ng & Perron 2005, "A note on the selection of time series models",
 * Oxford Bulletin of Economics and Statistics 67): comparing fits on samples of different length
 * favours long lags or short ones depending on the data at the start of the series.
 */
public enum LagSelection {
    /** The number of lags is set by the user. */
    FIXED,
    /** Akaike's information criterion, −2 ln L + 2k (Akaike 1974, IEEE Trans. Automatic Control 19). */
    AIC,
    /** Schwarz's Bayesian information criterion, −2 ln L + k ln n (Schwarz 1978, Ann. Statist. 6). */
    BIC
}
