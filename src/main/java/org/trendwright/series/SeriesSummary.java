package org.trendwright.series;

import java.time.Instant;

/**
 * A series at its current version, without its observations. Immutable and thread-safe.
 *
 * @param id           the series id
 * @param name         its name
 * @param frequency    its frequency
 * @param version      the current version number
 * @param createdAt    when version 1 was stored
 * @param updatedAt    when the current version was stored
 * @param observations observed values in the current version
 * @param firstPeriod  first period of the current version
 * @param lastPeriod   last period of the current version
 */
public record SeriesSummary(long id, String name, Frequency frequency, int version, Instant createdAt,
                            Instant updatedAt, int observations, Period firstPeriod, Period lastPeriod) {
}
