package org.trendwright.api;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;
import org.trendwright.core.ModelException;
import org.trendwright.core.Observations;
import org.trendwright.core.TestResult;
import org.trendwright.core.diagnostics.ArchTest;
import org.trendwright.core.diagnostics.BreuschGodfrey;
import org.trendwright.core.diagnostics.BreuschGodfreyResult;
import org.trendwright.core.diagnostics.LjungBox;
import org.trendwright.core.regression.OlsFit;
import org.trendwright.core.robust.HacInference;
import org.trendwright.core.robust.NeweyWest;

/**
 * The residual checks every least-squares fit answer carries: Breusch-Godfrey (LM and F form) at
 * the seasonal order, Ljung-Box at the default number of lags, the ARCH test at the seasonal order,
 * and Newey-West standard errors at the automatic lag. These compare neighbouring residuals, so a
 * series with gaps gets none of them, with a note saying why; a check the data cannot support (too
 * few observations, an exact fit) is left out with the core's message as its note, and the fit
 * itself still answers. Stateless and thread-safe.
 */
final class ResidualChecks {

    /** The checks of one fit. */
    record Result(List<FitResponse.Test> tests, FitResponse.Robust robust, List<String> notes) {
    }

    private ResidualChecks() {
    }

    static Result of(OlsFit ols, Observations series, double level) {
        List<FitResponse.Test> tests = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        if (series.hasGaps()) {
            notes.add("The series has gaps, so the residual checks (Durbin-Watson, Breusch-Godfrey, Ljung-Box,"
                    + " ARCH) and Newey-West errors, which compare neighbouring periods, are left out.");
            return new Result(tests, null, notes);
        }
        int order = BreuschGodfrey.defaultOrder(series.periodsPerYear());
        attempt(notes, () -> {
            BreuschGodfreyResult bg = BreuschGodfrey.test(ols, order, level);
            tests.add(test(bg.lagrangeMultiplier()));
            tests.add(test(bg.fForm()));
            return null;
        });
        attempt(notes, () -> tests.add(test(LjungBox.testWithDefaultLags(ols.residuals(), series.periodsPerYear(),
                0, level).test())));
        attempt(notes, () -> tests.add(test(ArchTest.test(ols.residuals(), order, level).test())));
        FitResponse.Robust robust = attempt(notes, () -> robust(NeweyWest.standardErrors(ols)));
        return new Result(tests, robust, notes);
    }

    private static <T> T attempt(List<String> notes, Supplier<T> check) {
        try {
            return check.get();
        } catch (ModelException e) {
            notes.add(e.getMessage());
            return null;
        }
    }

    static FitResponse.Test test(TestResult t) {
        return new FitResponse.Test(t.test(), t.nullHypothesis(), t.statistic(), t.distribution(),
                t.degreesOfFreedom(), t.pValue(), t.level(),
                t.decision().name().toLowerCase(Locale.ROOT).replace('_', '-'), t.reading());
    }

    private static FitResponse.Robust robust(HacInference hac) {
        return new FitResponse.Robust("Newey-West", hac.lag(), hac.lagRule(), TrendResponses.rows(hac.coefficients()));
    }
}
