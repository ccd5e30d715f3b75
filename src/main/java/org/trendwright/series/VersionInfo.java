package org.trendwright.series;

import java.time.Instant;

/**
 * One version of a series, without its observations. Immutable and thread-safe.
 *
 * @param version      the version number
 * @param createdAt    when it was stored
 * @param observations how many values it holds
 * @param firstPeriod  its first period
 * @param lastPeriod   its last period
 */
public record VersionInfo(int version, Instant createdAt, int observations, Period firstPeriod, Period lastPeriod) {
}
