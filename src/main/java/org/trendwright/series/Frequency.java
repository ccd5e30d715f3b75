package org.trendwright.series;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;

/**
 * How often a series is observed. Each frequency fixes the number of seasons the core's
 * {@link org.trendwright.core.Observations} sees per year:
 * <ul>
 *   <li>annual 1, quarterly 4, monthly 12;</li>
 *   <li>weekly 52: ISO weeks 52 and 53 share season 52, so in a 53-week year the weekly season
 *       of later weeks drifts by one (a seasonal model on weekly data is an approximation);</li>
 *   <li>daily 7: the season of a day is its ISO weekday (Monday = 1), the cycle that matters for
 *       daily business data.</li>
 * </ul>
 * Immutable and thread-safe.
 */
public enum Frequency {
    ANNUAL(1), QUARTERLY(4), MONTHLY(12), WEEKLY(52), DAILY(7);

    private final int periodsPerYear;
    /** Kept, not derived per call: intake asks every cell's period for it. */
    private final String jsonName;

    Frequency(int periodsPerYear) {
        this.periodsPerYear = periodsPerYear;
        this.jsonName = name().toLowerCase(Locale.ROOT);
    }

    /** The season count per cycle handed to the core as {@code periodsPerYear}. */
    public int periodsPerYear() {
        return periodsPerYear;
    }

    /** The lower-case name used in the JSON API and the database, e.g. "quarterly". */
    public String jsonName() {
        return jsonName;
    }

    /** The frequency with this JSON name, ignoring case. */
    public static Optional<Frequency> fromJsonName(String name) {
        return Arrays.stream(values()).filter(f -> f.jsonName().equalsIgnoreCase(name.trim())).findFirst();
    }
}
