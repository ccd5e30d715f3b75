package org.trendwright.core;

import java.util.Arrays;

/**
 * A regular time series as the statistics core sees it: values observed at period indices
 * {@code t = 1, 2, ...} counted from the first observation, with the number of periods per year
 * and the season of the first observation.
 *
 * <p>A missing period keeps its place: the observation after a one-period gap has a time index two
 * greater than the one before it, so trend slopes stay "per period" and seasons stay aligned.
 * Methods that need consecutive observations (autoregressions, Durbin-Watson) check
 * {@link #hasGaps()} and refuse with a clear message.
 *
 * <p>Immutable and thread-safe: arrays are copied in and out.
 *
 * @param times          strictly increasing period indices, the first equal to 1
 * @param values         finite observed values, one per time index
 * @param periodsPerYear 1 (annual), 4 (quarterly), 12 (monthly), 52 (weekly) or any positive count
 * @param firstSeason    the season (1..periodsPerYear) of the observation at t = 1
 */
public record Observations(int[] times, double[] values, int periodsPerYear, int firstSeason) {

    public Observations {
        if (times.length != values.length) {
            throw new InvalidSpecificationException("Got " + times.length + " time indices but "
                    + values.length + " values; every value needs exactly one period.");
        }
        if (periodsPerYear < 1) {
            throw new InvalidSpecificationException("periodsPerYear must be at least 1, got " + periodsPerYear + ".");
        }
        if (firstSeason < 1 || firstSeason > periodsPerYear) {
            throw new InvalidSpecificationException("firstSeason must lie in 1.." + periodsPerYear
                    + ", got " + firstSeason + ".");
        }
        times = times.clone();
        values = values.clone();
        checkTimes(times);
        checkFinite(times, values);
    }

    /** Consecutive observations at t = 1..n with no gaps. */
    public static Observations consecutive(double[] values, int periodsPerYear, int firstSeason) {
        int[] times = new int[values.length];
        for (int i = 0; i < times.length; i++) {
            times[i] = i + 1;
        }
        return new Observations(times, values, periodsPerYear, firstSeason);
    }

    /** Consecutive annual observations (one period per year). */
    public static Observations annual(double... values) {
        return consecutive(values, 1, 1);
    }

    private static void checkTimes(int[] times) {
        if (times.length > 0 && times[0] != 1) {
            throw new InvalidSpecificationException("The first time index must be 1, got " + times[0] + ".");
        }
        for (int i = 1; i < times.length; i++) {
            if (times[i] <= times[i - 1]) {
                throw new InvalidSpecificationException("Time indices must increase strictly; t = "
                        + times[i] + " follows t = " + times[i - 1] + " at position " + (i + 1) + ".");
            }
        }
    }

    private static void checkFinite(int[] times, double[] values) {
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new InvalidSpecificationException("The value at t = " + times[i] + " is " + values[i]
                        + "; every observation must be a finite number (leave a gap instead).");
            }
        }
    }

    @Override
    public int[] times() {
        return times.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    /** Number of observed values (gaps not counted). */
    public int size() {
        return values.length;
    }

    /** The value of the i-th observation, 0-based. */
    public double valueAt(int i) {
        return values[i];
    }

    /** The time index of the i-th observation, 0-based. */
    public int timeAt(int i) {
        return times[i];
    }

    /** The time index of the last observation (n when there are no gaps). */
    public int lastTime() {
        return times.length == 0 ? 0 : times[times.length - 1];
    }

    /** True when some period between the first and the last observation is missing. */
    public boolean hasGaps() {
        return lastTime() != times.length;
    }

    /** The season (1..periodsPerYear) of any time index t, including future ones. */
    public int seasonOf(int t) {
        return Math.floorMod(firstSeason - 1 + t - 1, periodsPerYear) + 1;
    }

    /** The first time index t whose period is missing, or -1 when there is none. */
    public int firstMissingTime() {
        for (int i = 0; i < times.length; i++) {
            if (times[i] != i + 1) {
                return i + 1;
            }
        }
        return -1;
    }

    /** The first {@code count} observations, as a new series starting at the same period. */
    public Observations head(int count) {
        return new Observations(Arrays.copyOf(times, count), Arrays.copyOf(values, count), periodsPerYear, firstSeason);
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof Observations o && periodsPerYear == o.periodsPerYear && firstSeason == o.firstSeason
                && Arrays.equals(times, o.times) && Arrays.equals(values, o.values);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(times) + Arrays.hashCode(values)) + 7 * periodsPerYear + firstSeason;
    }

    @Override
    public String toString() {
        return "Observations[n=" + values.length + ", periodsPerYear=" + periodsPerYear
                + ", firstSeason=" + firstSeason + "]";
    }
}
