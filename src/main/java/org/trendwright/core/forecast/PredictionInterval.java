package org.trendwright.core.forecast;

/**
 * A two-sided prediction interval at a coverage level.
 *
 * @param level coverage probability in (0, 1), e.g. 0.80 or 0.95
 * @param lower lower end
 * @param upper upper end
 */
public record PredictionInterval(double level, double lower, double upper) {
}
