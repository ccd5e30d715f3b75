package org.trendwright.api;

import java.time.Instant;
import java.util.List;
import org.trendwright.series.Point;
import org.trendwright.series.SeriesSummary;
import org.trendwright.series.SeriesVersion;
import org.trendwright.series.VersionInfo;

/** The JSON bodies of the series routes. Periods are written in their canonical form (2024-Q1). */
public final class SeriesBodies {

    private SeriesBodies() {
    }

    /** A series at one version, without observations. */
    public record Summary(long id, String name, String frequency, int version, String etag, Instant createdAt,
                          Instant updatedAt, int observations, String firstPeriod, String lastPeriod) {

        static Summary of(SeriesSummary s) {
            return new Summary(s.id(), s.name(), s.frequency().jsonName(), s.version(), ETags.of(s.id(), s.version()),
                    s.createdAt(), s.updatedAt(), s.observations(), s.firstPeriod().label(), s.lastPeriod().label());
        }

        static Summary of(SeriesVersion v) {
            return new Summary(v.seriesId(), v.name(), v.frequency().jsonName(), v.version(),
                    ETags.of(v.seriesId(), v.version()), v.createdAt(), v.createdAt(), v.points().size(),
                    v.firstPeriod().label(), v.lastPeriod().label());
        }
    }

    /** The answer to an upload: its id (POST /api/jobs takes it) and every series it created. */
    public record Created(long uploadId, List<Summary> series) {
    }

    /** The list of series. */
    public record Listing(List<Summary> series) {
    }

    /** One observation. */
    public record Observation(String period, double value) {
    }

    /** A series version with its observations. */
    public record Detail(long id, String name, String frequency, int periodsPerYear, int version, String etag,
                         Instant versionCreatedAt, String firstPeriod, String lastPeriod, int observationCount,
                         List<Observation> observations) {

        static Detail of(SeriesVersion v) {
            List<Observation> observations = v.points().stream()
                    .map((Point p) -> new Observation(p.period().label(), p.value())).toList();
            return new Detail(v.seriesId(), v.name(), v.frequency().jsonName(), v.frequency().periodsPerYear(),
                    v.version(), ETags.of(v.seriesId(), v.version()), v.createdAt(), v.firstPeriod().label(),
                    v.lastPeriod().label(), observations.size(), observations);
        }
    }

    /** One version in the list of versions. */
    public record Version(int version, String etag, Instant createdAt, int observations, String firstPeriod,
                          String lastPeriod) {

        static Version of(long id, VersionInfo v) {
            return new Version(v.version(), ETags.of(id, v.version()), v.createdAt(), v.observations(),
                    v.firstPeriod().label(), v.lastPeriod().label());
        }
    }

    /** The versions of a series, oldest first. */
    public record Versions(long id, int currentVersion, List<Version> versions) {
    }
}
