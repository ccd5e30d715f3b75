package org.trendwright.series;

/**
 * Upper bounds on one upload, set in the configuration. Immutable and thread-safe.
 *
 * @param maxObservationsPerSeries most observations one series (one version) may hold
 * @param maxSeriesPerUpload       most series one upload may create
 */
public record IntakeLimits(int maxObservationsPerSeries, int maxSeriesPerUpload) {

    public static final IntakeLimits DEFAULT = new IntakeLimits(100_000, 1_000);

    public IntakeLimits {
        if (maxObservationsPerSeries < 1 || maxSeriesPerUpload < 1) {
            throw new IllegalArgumentException("Intake limits must be positive, got " + maxObservationsPerSeries
                    + " observations and " + maxSeriesPerUpload + " series.");
        }
    }
}
