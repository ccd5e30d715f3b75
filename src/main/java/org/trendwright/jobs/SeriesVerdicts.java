package org.trendwright.jobs;

import java.util.List;
import org.trendwright.core.ModelException;
import org.trendwright.core.Observations;
import org.trendwright.core.TestResult;
import org.trendwright.core.analysis.SeriesScreening;
import org.trendwright.core.analysis.SeriesScreens;
import org.trendwright.core.selection.Candidate;
import org.trendwright.core.selection.CandidateAssessment;
import org.trendwright.core.selection.ComparisonSpec;
import org.trendwright.core.selection.ModelComparison;
import org.trendwright.core.selection.ModelSelection;
import org.trendwright.core.selection.StandardCandidates;
import org.trendwright.series.SeriesVersion;

/**
 * Judges one series for a batch job: the core's out-of-sample comparison of the standard
 * candidates (ModelSelection with StandardCandidates and the default comparison for the
 * frequency), the residual checks of the recommended model, the unit-root and break screens
 * (SeriesScreens), and the recommended model's one-step forecast. Stateless and thread-safe.
 */
public final class SeriesVerdicts {

    /** Significance level of every test behind a verdict. */
    static final double LEVEL = 0.05;

    private static final List<String> SERIAL_TESTS = List.of("Durbin-Watson", "Breusch-Godfrey", "Ljung-Box");

    private SeriesVerdicts() {
    }

    /** The verdict on one series version; a series the data cannot support yields a failed verdict. */
    public static SeriesVerdict judge(SeriesVersion version) {
        try {
            return judged(version, version.observations());
        } catch (ModelException e) {
            return SeriesVerdict.failed(version.seriesId(), version.version(), e.getMessage());
        }
    }

    private static SeriesVerdict judged(SeriesVersion version, Observations series) {
        List<Candidate> candidates = StandardCandidates.forSeries(series, LEVEL);
        ModelComparison comparison = ModelSelection.compare(series, candidates,
                ComparisonSpec.defaultsFor(series.periodsPerYear()));
        if (comparison.recommended().isEmpty()) {
            return SeriesVerdict.failed(version.seriesId(), version.version(), String.join(" ",
                    comparison.reasons()));
        }
        String name = comparison.recommended().get();
        CandidateAssessment chosen = comparison.candidates().stream().filter(a -> a.name().equals(name))
                .findFirst().orElseThrow();
        Candidate model = candidates.stream().filter(c -> c.name().equals(name)).findFirst().orElseThrow();
        double next = model.pointForecasts(series, 1)[0];
        SeriesScreening screens = SeriesScreens.screen(series, false, LEVEL);
        // The ADF null is a unit root: not rejecting it means one is present.
        Boolean unitRoot = screens.unitRoot().map(adf -> !adf.test().rejected()).orElse(null);
        Boolean trendBreak = screens.trendBreak().map(b -> b.test().rejected()).orElse(null);
        return new SeriesVerdict(version.seriesId(), version.version(), name, serialCorrelation(chosen), unitRoot,
                trendBreak, next, null);
    }

    private static boolean serialCorrelation(CandidateAssessment assessment) {
        return assessment.residualChecks().stream().filter(TestResult::rejected)
                .anyMatch(t -> SERIAL_TESTS.stream().anyMatch(t.test()::startsWith));
    }
}
