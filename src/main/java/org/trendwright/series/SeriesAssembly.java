package org.trendwright.series;

import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.trendwright.series.IntakeException.Reason;

/**
 * Checks an upload as a whole and lays it over the series' current points: new periods are
 * appended (or prepended), periods already present are revised, an empty value removes a period
 * when gaps are allowed. Refuses duplicate periods, a frequency other than the series', empty
 * values and skipped periods (unless {@link MissingValues#GAP}), an empty result and a result over
 * the observation limit. Stateless and thread-safe.
 */
public final class SeriesAssembly {

    /** Longest series name accepted, in characters. */
    public static final int MAX_NAME_LENGTH = 200;

    private SeriesAssembly() {
    }

    /** A new series from an upload. */
    public static SeriesDraft create(SeriesInput input, IntakeOptions options) {
        Frequency frequency = frequencyOf(input);
        String name = checkedName(input);
        return merge(name, frequency, new long[0], new double[0], input, options);
    }

    /** The points of the next version: {@code current} revised and extended by {@code input}. */
    public static List<Point> revise(List<Point> current, Frequency frequency, SeriesInput input,
                                     IntakeOptions options) {
        Frequency given = frequencyOf(input);
        if (given != frequency) {
            throw new IntakeException(Reason.INCONSISTENT, input.where(0), "the series is "
                    + frequency.jsonName() + " but the upload gives " + given.jsonName()
                    + " periods; send periods of the series' own frequency.");
        }
        long[] periods = current.stream().mapToLong(p -> p.period().index()).toArray();
        double[] values = current.stream().mapToDouble(Point::value).toArray();
        return merge(input.name(), frequency, periods, values, input, options).points();
    }

    private static Frequency frequencyOf(SeriesInput input) {
        if (input.size() == 0) {
            throw new IntakeException(Reason.INVALID_VALUE, input.where(), "series '" + input.name()
                    + "' has no rows; give at least one period and value.");
        }
        return input.frequency();
    }

    private static String checkedName(SeriesInput input) {
        String name = input.name() == null ? "" : input.name().trim();
        if (name.isEmpty() || name.length() > MAX_NAME_LENGTH) {
            throw new IntakeException(Reason.INVALID_VALUE, input.where(), "a series name must have 1 to "
                    + MAX_NAME_LENGTH + " characters, got " + name.length() + ".");
        }
        return name;
    }

    /**
     * Lays the input's rows over the current points (both in period order after sorting the
     * input): a row's value replaces the current one of its period, an empty row removes it (gaps
     * allowed) or is refused.
     */
    private static SeriesDraft merge(String name, Frequency frequency, long[] current, double[] currentValues,
                                     SeriesInput input, IntakeOptions options) {
        checkDuplicates(input);
        if (options.missing() != MissingValues.GAP) {
            checkNoEmptyValue(input);
        }
        int[] order = periodOrder(input);
        long[] periods = new long[current.length + order.length];
        double[] values = new double[periods.length];
        int n = 0;
        int i = 0;
        int j = 0;
        while (i < current.length || j < order.length) {
            long next = j < order.length ? input.periodIndex(order[j]) : Long.MAX_VALUE;
            if (i < current.length && current[i] < next) {
                periods[n] = current[i];
                values[n++] = currentValues[i++];
                continue;
            }
            i += i < current.length && current[i] == next ? 1 : 0;
            double value = input.valueOrNaN(order[j++]);
            if (!Double.isNaN(value)) {
                periods[n] = next;
                values[n++] = value;
            }
        }
        if (n == 0) {
            throw new IntakeException(Reason.INVALID_VALUE, input.where(), "series '" + input.name()
                    + "' has no values; give at least one number.");
        }
        SeriesDraft draft = new SeriesDraft(name, frequency, Arrays.copyOf(periods, n), Arrays.copyOf(values, n));
        if (options.missing() == MissingValues.REFUSE) {
            checkNoSkippedPeriod(draft);
        }
        checkSize(input, n, options.limits());
        return draft;
    }

    /** Row numbers of the input in period order (the rows' own order when already increasing). */
    private static int[] periodOrder(SeriesInput input) {
        int[] order = new int[input.size()];
        boolean increasing = true;
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
            increasing &= i == 0 || input.periodIndex(i) > input.periodIndex(i - 1);
        }
        if (increasing) {
            return order;
        }
        return Arrays.stream(order).boxed().sorted(Comparator.comparingLong(input::periodIndex))
                .mapToInt(Integer::intValue).toArray();
    }

    private static void checkDuplicates(SeriesInput input) {
        boolean increasing = true;
        for (int i = 1; i < input.size() && increasing; i++) {
            increasing = input.periodIndex(i) > input.periodIndex(i - 1);
        }
        if (increasing) {
            return;
        }
        Map<Long, Integer> seen = new HashMap<>();
        for (int i = 0; i < input.size(); i++) {
            Integer earlier = seen.putIfAbsent(input.periodIndex(i), i);
            if (earlier != null) {
                throw new IntakeException(Reason.INCONSISTENT, input.where(i), "period "
                        + new Period(input.frequency(), input.periodIndex(i)).label() + " appears twice (first at "
                        + input.where(earlier).describe() + "); give each period once.");
            }
        }
    }

    private static void checkNoEmptyValue(SeriesInput input) {
        for (int i = 0; i < input.size(); i++) {
            if (Double.isNaN(input.valueOrNaN(i))) {
                throw new IntakeException(Reason.MISSING_VALUE, input.where(i), "the value for "
                        + new Period(input.frequency(), input.periodIndex(i)).label() + " is empty; fill it in, or"
                        + " send missing=gap to keep the period as a gap.");
            }
        }
    }

    private static void checkNoSkippedPeriod(SeriesDraft draft) {
        for (int i = 1; i < draft.size(); i++) {
            if (draft.periodIndex(i) != draft.periodIndex(i - 1) + 1) {
                Period previous = new Period(draft.frequency(), draft.periodIndex(i - 1));
                throw new IntakeException(Reason.MISSING_VALUE, Where.NOWHERE, "period " + previous.plus(1).label()
                        + " is missing between " + previous.label() + " and "
                        + new Period(draft.frequency(), draft.periodIndex(i)).label()
                        + "; add it, or send missing=gap to keep it as a gap.");
            }
        }
    }

    private static void checkSize(SeriesInput input, int size, IntakeLimits limits) {
        if (size > limits.maxObservationsPerSeries()) {
            throw new IntakeException(Reason.LIMIT_EXCEEDED, input.where(), "series '" + input.name() + "' would hold "
                    + size + " observations; the limit is " + limits.maxObservationsPerSeries() + ".");
        }
    }
}
