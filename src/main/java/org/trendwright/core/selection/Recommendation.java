package org.trendwright.core.selection;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.trendwright.core.TestResult;

/** Writes the plain-language reasons behind a recommendation. Stateless and thread-safe. */
final class Recommendation {

    private Recommendation() {
    }

    static List<String> reasons(CandidateAssessment chosen, List<CandidateAssessment> evaluated,
                                boolean chosenPasses, Optional<TestResult> dm, double level) {
        List<String> reasons = new ArrayList<>();
        double rmse = chosen.rollingOrigin().orElseThrow().rmse();
        if (chosenPasses) {
            reasons.add(chosen.name() + " has the lowest rolling-origin RMSE (" + format(rmse)
                    + ") among the models whose residuals pass every check.");
        } else {
            reasons.add("No candidate passes every residual check, so no model here can be fully trusted: its"
                    + " intervals are likely too narrow. " + chosen.name() + " is shown because it has the lowest"
                    + " rolling-origin RMSE (" + format(rmse) + "); consider an AR model, HAC errors or GLS.");
        }
        if (evaluated.get(0) != chosen) {
            reasons.add(evaluated.get(0).name() + " forecast better (RMSE " + format(evaluated.get(0).score())
                    + ") but failed a residual check: " + failedChecks(evaluated.get(0), level) + ".");
        }
        chosen.holdout().ifPresent(h -> reasons.add("On the " + h.forecasts() + "-period holdout its RMSE is "
                + format(h.rmse()) + h.mase().map(m -> " and its MASE " + format(m)
                + (m < 1 ? " (better than the seasonal naive forecast)" : " (no better than the seasonal naive forecast)"))
                .orElse("") + "."));
        dm.ifPresent(test -> reasons.add(test.reading()));
        return reasons;
    }

    /** The checks whose p-value falls below the comparison's level: the same rule that decides passing. */
    private static String failedChecks(CandidateAssessment assessment, double level) {
        return String.join(", ", assessment.residualChecks().stream().filter(c -> c.pValue() < level)
                .map(TestResult::test).toList());
    }

    private static String format(double value) {
        return String.format(Locale.ROOT, "%.4g", value);
    }
}
