package org.trendwright.series;

import java.util.ArrayList;
import java.util.List;

/**
 * A checked series ready to be stored as version 1 (or the points of a new version): one
 * frequency, periods strictly increasing, every value finite. The points are kept in two
 * primitive arrays (period index and value). Immutable and thread-safe.
 */
public final class SeriesDraft {

    private final String name;
    private final Frequency frequency;
    private final long[] periods;
    private final double[] values;

    /**
     * @param name      the series name
     * @param frequency the frequency detected from the periods
     * @param points    the observed values in period order (gaps are simply absent)
     */
    public SeriesDraft(String name, Frequency frequency, List<Point> points) {
        this(name, frequency, points.stream().mapToLong(p -> p.period().index()).toArray(),
                points.stream().mapToDouble(Point::value).toArray());
    }

    /** Takes ownership of the arrays: the caller must not change them afterwards. */
    SeriesDraft(String name, Frequency frequency, long[] periods, double[] values) {
        this.name = name;
        this.frequency = frequency;
        this.periods = periods;
        this.values = values;
    }

    public String name() {
        return name;
    }

    public Frequency frequency() {
        return frequency;
    }

    /** The number of observations. */
    public int size() {
        return periods.length;
    }

    /** The running index ({@link Period#index()}) of observation {@code i}. */
    public long periodIndex(int i) {
        return periods[i];
    }

    /** The value of observation {@code i}. */
    public double value(int i) {
        return values[i];
    }

    /** The observations as records, in period order (a copy; costs a few objects per point). */
    public List<Point> points() {
        List<Point> points = new ArrayList<>(periods.length);
        for (int i = 0; i < periods.length; i++) {
            points.add(new Point(new Period(frequency, periods[i]), values[i]));
        }
        return points;
    }
}
