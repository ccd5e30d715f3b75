package org.trendwright.api;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.trendwright.core.TestResult;
import org.trendwright.core.analysis.ResidualDiagnostics;
import org.trendwright.core.analysis.SeriesScreening;
import org.trendwright.core.analysis.TrendAnalysis;
import org.trendwright.core.diagnostics.DurbinWatsonBounds;
import org.trendwright.core.diagnostics.DurbinWatsonResult;
import org.trendwright.core.gls.Ar1GlsFit;
import org.trendwright.core.robust.HacInference;
import org.trendwright.series.Period;
import org.trendwright.series.SeriesVersions;

/**
 * Maps the core's checks onto the answer's records: every test in the common shape (residual
 * checks of the least-squares fit, then the screens of the series itself), the Durbin-Watson
 * detail, the error treatment and the screening summary. Stateless and thread-safe.
 */
final class CheckBodies {

    private CheckBodies() {
    }

    /** Every test the core ran: residual checks first, then the unit-root and break screens. */
    static List<FitResponse.Test> tests(Optional<ResidualDiagnostics> diagnostics, SeriesScreening screening) {
        List<FitResponse.Test> tests = new ArrayList<>();
        diagnostics.ifPresent(d -> d.tests().forEach(t -> tests.add(test(t))));
        screening.unitRoot().ifPresent(adf -> tests.add(test(adf.test())));
        screening.trendBreak().ifPresent(search -> tests.add(test(search.test())));
        return tests;
    }

    static FitResponse.Test test(TestResult t) {
        return new FitResponse.Test(t.test(), t.nullHypothesis(), t.statistic(), t.distribution(),
                t.degreesOfFreedom(), t.pValue(), t.level(), name(t.decision()), t.reading());
    }

    static FitResponse.DurbinWatsonDetail durbinWatson(Optional<ResidualDiagnostics> diagnostics) {
        return diagnostics.map(ResidualDiagnostics::durbinWatson).map(CheckBodies::durbinWatson).orElse(null);
    }

    private static FitResponse.DurbinWatsonDetail durbinWatson(DurbinWatsonResult dw) {
        Optional<DurbinWatsonBounds> bounds = dw.boundsAtLevel();
        return new FitResponse.DurbinWatsonDetail(dw.statistic(), dw.pValuePositive(), dw.pValueNegative(),
                dw.level(), bounds.map(DurbinWatsonBounds::lower).orElse(null),
                bounds.map(DurbinWatsonBounds::upper).orElse(null), name(dw.boundsVerdictPositive()),
                name(dw.boundsVerdictNegative()), name(dw.verdict()), dw.reading());
    }

    /** The treatment of the errors: its name and, for Newey-West or GLS, what it estimated. */
    static FitResponse.ErrorTreatmentBody treatment(TrendAnalysis analysis) {
        String name = name(analysis.spec().errors());
        Optional<HacInference> hac = analysis.hac();
        Optional<Ar1GlsFit> gls = analysis.gls();
        return new FitResponse.ErrorTreatmentBody(name, hac.map(HacInference::lag).orElse(null),
                hac.map(HacInference::lagRule).orElse(null), gls.map(g -> g.rho().value()).orElse(null),
                gls.map(g -> g.rho().standardError()).orElse(null), gls.map(Ar1GlsFit::iterations).orElse(null),
                gls.map(Ar1GlsFit::converged).orElse(null), gls.map(Ar1GlsFit::standardErrorOfEstimate).orElse(null),
                gls.map(Ar1GlsFit::durbinWatson).orElse(null));
    }

    /** The screens' summary: unit-root lags and the period where a break would start. */
    static FitResponse.Screening screening(SeriesScreening screening, Period first) {
        return new FitResponse.Screening(screening.unitRoot().map(adf -> adf.lags()).orElse(null),
                screening.breakTime().isPresent()
                        ? SeriesVersions.periodAt(first, screening.breakTime().getAsInt()).label() : null);
    }

    /** An enum constant as the API writes it: lower case with dashes, e.g. "do-not-reject". */
    static String name(Enum<?> value) {
        return value.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
