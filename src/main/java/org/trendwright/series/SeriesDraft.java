package org.trendwright.series;

import java.util.List;

/**
 * A checked series ready to be stored as version 1 (or the points of a new version): one
 * frequency, periods strictly increasing, every value finite. Immutable and thread-safe.
 *
 * @param name      the series name
 * @param frequency the frequency detected from the periods
 * @param points    the observed values in period order (gaps are simply absent)
 */
public record SeriesDraft(String name, Frequency frequency, List<Point> points) {

    public SeriesDraft {
        points = List.copyOf(points);
    }
}
