package org.trendwright.core.unitroot;

/**
 * Critical values of the Dickey-Fuller tau statistic: the unit root is rejected at a level when
 * tau lies below the value for that level.
 *
 * @param observations T, the observations in the test regression they apply to
 * @param onePercent   the 1% quantile of tau under the unit-root null
 * @param fivePercent  the 5% quantile
 * @param tenPercent   the 10% quantile
 */
public record CriticalValues(int observations, double onePercent, double fivePercent, double tenPercent) {
}
