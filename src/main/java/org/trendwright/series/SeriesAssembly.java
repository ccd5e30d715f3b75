package org.trendwright.series;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
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
        return new SeriesDraft(checkedName(input), frequency, merge(List.of(), frequency, input, options));
    }

    /** The points of the next version: {@code current} revised and extended by {@code input}. */
    public static List<Point> revise(List<Point> current, Frequency frequency, SeriesInput input,
                                     IntakeOptions options) {
        Frequency given = frequencyOf(input);
        if (given != frequency) {
            throw new IntakeException(Reason.INCONSISTENT, input.changes().get(0).where(), "the series is "
                    + frequency.jsonName() + " but the upload gives " + given.jsonName()
                    + " periods; send periods of the series' own frequency.");
        }
        return merge(current, frequency, input, options);
    }

    private static Frequency frequencyOf(SeriesInput input) {
        if (input.changes().isEmpty()) {
            throw new IntakeException(Reason.INVALID_VALUE, input.where(), "series '" + input.name()
                    + "' has no rows; give at least one period and value.");
        }
        return input.changes().get(0).period().frequency();
    }

    private static String checkedName(SeriesInput input) {
        String name = input.name() == null ? "" : input.name().trim();
        if (name.isEmpty() || name.length() > MAX_NAME_LENGTH) {
            throw new IntakeException(Reason.INVALID_VALUE, input.where(), "a series name must have 1 to "
                    + MAX_NAME_LENGTH + " characters, got " + name.length() + ".");
        }
        return name;
    }

    private static List<Point> merge(List<Point> current, Frequency frequency, SeriesInput input,
                                     IntakeOptions options) {
        checkDuplicates(input);
        TreeMap<Period, Double> merged = new TreeMap<>();
        current.forEach(p -> merged.put(p.period(), p.value()));
        for (SeriesInput.Change change : input.changes()) {
            if (change.value() != null) {
                merged.put(change.period(), change.value());
            } else if (options.missing() == MissingValues.GAP) {
                merged.remove(change.period());
            } else {
                throw new IntakeException(Reason.MISSING_VALUE, change.where(), "the value for "
                        + change.period().label() + " is empty; fill it in, or send missing=gap to keep the"
                        + " period as a gap.");
            }
        }
        if (merged.isEmpty()) {
            throw new IntakeException(Reason.INVALID_VALUE, input.where(), "series '" + input.name()
                    + "' has no values; give at least one number.");
        }
        if (options.missing() == MissingValues.REFUSE) {
            checkNoSkippedPeriod(merged);
        }
        checkSize(input, merged.size(), options.limits());
        return merged.entrySet().stream().map(e -> new Point(e.getKey(), e.getValue())).toList();
    }

    private static void checkDuplicates(SeriesInput input) {
        Map<Period, Where> seen = new HashMap<>();
        for (SeriesInput.Change change : input.changes()) {
            Where earlier = seen.putIfAbsent(change.period(), change.where());
            if (earlier != null) {
                throw new IntakeException(Reason.INCONSISTENT, change.where(), "period " + change.period().label()
                        + " appears twice (first at " + earlier.describe() + "); give each period once.");
            }
        }
    }

    private static void checkNoSkippedPeriod(TreeMap<Period, Double> merged) {
        Period previous = null;
        for (Period period : merged.keySet()) {
            if (previous != null && period.index() != previous.index() + 1) {
                throw new IntakeException(Reason.MISSING_VALUE, Where.NOWHERE, "period " + previous.plus(1).label()
                        + " is missing between " + previous.label() + " and " + period.label()
                        + "; add it, or send missing=gap to keep it as a gap.");
            }
            previous = period;
        }
    }

    private static void checkSize(SeriesInput input, int size, IntakeLimits limits) {
        if (size > limits.maxObservationsPerSeries()) {
            throw new IntakeException(Reason.LIMIT_EXCEEDED, input.where(), "series '" + input.name() + "' would hold "
                    + size + " observations; the limit is " + limits.maxObservationsPerSeries() + ".");
        }
    }
}
