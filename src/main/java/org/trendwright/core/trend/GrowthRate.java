package org.trendwright.core.trend;

/**
 * The constant growth rate per period implied by a log-linear trend ln y = b0 + b1 t: y grows by
 * the factor e^b1 each period, a rate of g = e^b1 - 1. The interval maps the 95% confidence
 * interval of b1 through the same monotone transformation.
 *
 * @param perPeriod g = e^b1 - 1 (0.02 means 2% per period)
 * @param lower95   e^(lower end of b1's 95% interval) - 1
 * @param upper95   e^(upper end of b1's 95% interval) - 1
 */
public record GrowthRate(double perPeriod, double lower95, double upper95) {
}
