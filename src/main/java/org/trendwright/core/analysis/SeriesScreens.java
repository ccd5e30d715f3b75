package org.trendwright.core.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.trendwright.core.ModelException;
import org.trendwright.core.Observations;
import org.trendwright.core.breaks.BreakSearch;
import org.trendwright.core.breaks.SupFTest;
import org.trendwright.core.trend.TrendFit;
import org.trendwright.core.trend.TrendSpec;
import org.trendwright.core.trend.Trends;
import org.trendwright.core.unitroot.AdfResult;
import org.trendwright.core.unitroot.AdfSpec;
import org.trendwright.core.unitroot.AugmentedDickeyFuller;
import org.trendwright.core.unitroot.DeterministicTerms;

/**
 * Screens a series for a unit root and for a break in its trend. Each check that the series
 * cannot support (too short, a gap, a non-positive value on the log scale) is skipped with a note
 * rather than failing the screen.
 *
 * <p>Stateless and thread-safe.
 */
public final class SeriesScreens {

    private SeriesScreens() {
    }

    /**
     * The augmented Dickey-Fuller test with constant and trend (lags by AIC up to Schwert's
     * maximum) and the sup-F search for one break in a linear trend, both on ln y when
     * {@code logScale}, both at {@code level}.
     */
    public static SeriesScreening screen(Observations series, boolean logScale, double level) {
        List<String> notes = new ArrayList<>();
        Optional<Observations> working = workingSeries(series, logScale, notes);
        Optional<AdfResult> unitRoot = working.flatMap(s -> unitRoot(s, level, notes));
        Optional<BreakSearch> trendBreak = working.flatMap(s -> trendBreak(s, level, notes));
        OptionalInt breakTime = trendBreak.map(b -> OptionalInt.of(series.timeAt(b.breakRow())))
                .orElse(OptionalInt.empty());
        return new SeriesScreening(unitRoot, trendBreak, breakTime, notes);
    }

    private static Optional<Observations> workingSeries(Observations series, boolean logScale, List<String> notes) {
        if (!logScale) {
            return Optional.of(series);
        }
        double[] logs = new double[series.size()];
        for (int i = 0; i < logs.length; i++) {
            if (series.valueAt(i) <= 0) {
                notes.add("The series was not screened on the log scale because the value at t = " + series.timeAt(i)
                        + " is not above zero.");
                return Optional.empty();
            }
            logs[i] = Math.log(series.valueAt(i));
        }
        return Optional.of(new Observations(series.times(), logs, series.periodsPerYear(), series.firstSeason()));
    }

    private static Optional<AdfResult> unitRoot(Observations series, double level, List<String> notes) {
        try {
            return Optional.of(AugmentedDickeyFuller.test(series,
                    AdfSpec.of(DeterministicTerms.CONSTANT_AND_TREND).atLevel(level)));
        } catch (ModelException e) {
            notes.add("The unit-root test was skipped: " + e.getMessage());
            return Optional.empty();
        }
    }

    private static Optional<BreakSearch> trendBreak(Observations series, double level, List<String> notes) {
        try {
            TrendFit line = Trends.fit(series, TrendSpec.linear());
            return Optional.of(SupFTest.test(line.ols().design(), line.ols().y(), level));
        } catch (ModelException e) {
            notes.add("The search for a break in the trend was skipped: " + e.getMessage());
            return Optional.empty();
        }
    }
}
