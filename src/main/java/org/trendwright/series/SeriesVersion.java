package org.trendwright.series;

import java.time.Instant;
import java.util.List;
import org.trendwright.core.Observations;

/**
 * One stored, immutable version of a series. Versions are numbered 1, 2, ... per series; a new
 * upload of new or revised periods makes the next one and leaves earlier versions readable.
 * Immutable and thread-safe.
 *
 * @param seriesId  the series' id
 * @param name      the series' name
 * @param version   this version's number
 * @param frequency the series' frequency
 * @param createdAt when this version was stored
 * @param points    the observed values in period order
 */
public record SeriesVersion(long seriesId, String name, int version, Frequency frequency, Instant createdAt,
                            List<Point> points) {

    public SeriesVersion {
        points = List.copyOf(points);
    }

    /** The series as the statistics core takes it; see {@link SeriesVersions#observations}. */
    public Observations observations() {
        return SeriesVersions.observations(frequency, points);
    }

    public Period firstPeriod() {
        return points.get(0).period();
    }

    public Period lastPeriod() {
        return points.get(points.size() - 1).period();
    }
}
