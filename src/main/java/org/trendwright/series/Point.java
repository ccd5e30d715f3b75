package org.trendwright.series;

/**
 * One observed value of a series. Immutable and thread-safe.
 *
 * @param period the period observed
 * @param value  the finite value observed in it
 */
public record Point(Period period, double value) {
}
