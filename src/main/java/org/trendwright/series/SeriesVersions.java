package org.trendwright.series;

import java.util.List;
import org.trendwright.core.Observations;

/** Conversions between stored points and the statistics core's series. Stateless and thread-safe. */
public final class SeriesVersions {

    private SeriesVersions() {
    }

    /**
     * The core's view of a series: time t = 1 at the first observed period and t = index -
     * firstIndex + 1 after it, so a missing period keeps its place (the next observation's t is
     * one larger than without the gap); periodsPerYear from the frequency; firstSeason the season
     * of the first period.
     */
    public static Observations observations(Frequency frequency, List<Point> points) {
        if (points.isEmpty()) {
            return new Observations(new int[0], new double[0], frequency.periodsPerYear(), 1);
        }
        long first = points.get(0).period().index();
        int[] times = new int[points.size()];
        double[] values = new double[points.size()];
        for (int i = 0; i < points.size(); i++) {
            times[i] = Math.toIntExact(points.get(i).period().index() - first + 1);
            values[i] = points.get(i).value();
        }
        return new Observations(times, values, frequency.periodsPerYear(), points.get(0).period().season());
    }

    /** The period at core time index t of a series whose first period is {@code first}. */
    public static Period periodAt(Period first, int t) {
        return first.plus(t - 1L);
    }
}
