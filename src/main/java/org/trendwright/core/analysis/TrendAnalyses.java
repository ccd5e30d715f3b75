package org.trendwright.core.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.ModelException;
import org.trendwright.core.Observations;
import org.trendwright.core.TestResult;
import org.trendwright.core.diagnostics.ArchTest;
import org.trendwright.core.diagnostics.BreuschGodfrey;
import org.trendwright.core.diagnostics.BreuschGodfreyResult;
import org.trendwright.core.diagnostics.DurbinWatson;
import org.trendwright.core.diagnostics.LjungBox;
import org.trendwright.core.diagnostics.LjungBoxResult;
import org.trendwright.core.diagnostics.ResidualAutocorrelations;
import org.trendwright.core.gls.Ar1Gls;
import org.trendwright.core.gls.Ar1GlsFit;
import org.trendwright.core.gls.Ar1Method;
import org.trendwright.core.regression.OlsFit;
import org.trendwright.core.robust.HacInference;
import org.trendwright.core.robust.NeweyWest;
import org.trendwright.core.trend.TrendFit;
import org.trendwright.core.trend.TrendForecast;
import org.trendwright.core.trend.Trends;

/**
 * Fits one trend model and runs everything reported with it: the residual checks of the
 * least-squares fit, the chosen error treatment (classical, Newey-West or feasible GLS) and the
 * forecast under that treatment. The residual checks always test the least-squares residuals,
 * because those are what reveal whether a treatment is needed.
 *
 * <p>Checks that need consecutive periods (every residual test, Newey-West, GLS) are skipped with
 * a note when the series has a gap; a residual check the series is too short for is skipped
 * with a note too, rather than failing the fit.
 *
 * <p>Stateless and thread-safe.
 */
public final class TrendAnalyses {

    private TrendAnalyses() {
    }

    /** Fits, checks and forecasts one trend model. */
    public static TrendAnalysis analyze(Observations series, TrendAnalysisSpec spec) {
        TrendFit fit = Trends.fit(series, spec.trend());
        List<String> notes = new ArrayList<>();
        Optional<ResidualDiagnostics> diagnostics = diagnose(fit, spec, notes);
        return switch (spec.errors()) {
            case CLASSICAL -> classical(fit, spec, diagnostics, notes);
            case NEWEY_WEST -> neweyWest(fit, spec, diagnostics, notes);
            case COCHRANE_ORCUTT -> gls(fit, spec, Ar1Method.COCHRANE_ORCUTT, diagnostics, notes);
            case PRAIS_WINSTEN -> gls(fit, spec, Ar1Method.PRAIS_WINSTEN, diagnostics, notes);
        };
    }

    /**
     * The serial-correlation checks (exact Durbin-Watson, Breusch-Godfrey at the seasonal order,
     * Ljung-Box) of a least-squares trend fit at the given level; empty when the series has a gap
     * or is too short for them.
     */
    public static List<TestResult> serialCorrelationChecks(TrendFit fit, double level) {
        if (fit.series().hasGaps()) {
            return List.of();
        }
        OlsFit ols = fit.ols();
        try {
            // Only the three checks a candidate must pass: model comparison calls this for every
            // candidate of every series, so ARCH and the correlogram are not computed to be dropped.
            return List.of(DurbinWatson.test(ols, level).toTestResult(),
                    BreuschGodfrey.testAtSeasonalOrder(ols, fit.series().periodsPerYear(), level).lagrangeMultiplier(),
                    LjungBox.testWithDefaultLags(ols.residuals(), fit.series().periodsPerYear(), 0, level).test());
        } catch (ModelException e) {
            return List.of();
        }
    }

    /** The residual checks of a least-squares fit, or empty with a note saying why they were skipped. */
    static Optional<ResidualDiagnostics> diagnose(TrendFit fit, TrendAnalysisSpec spec, List<String> notes) {
        Observations series = fit.series();
        if (series.hasGaps()) {
            notes.add("The residual checks were skipped because period t = " + series.firstMissingTime()
                    + " is missing; they compare each residual with the one before it, so they need consecutive"
                    + " periods. Fill or drop the gap to see them.");
            return Optional.empty();
        }
        try {
            return Optional.of(residualDiagnostics(fit.ols(), series.periodsPerYear(), spec));
        } catch (ModelException e) {
            notes.add("The residual checks were skipped: " + e.getMessage());
            return Optional.empty();
        }
    }

    private static ResidualDiagnostics residualDiagnostics(OlsFit ols, int periodsPerYear, TrendAnalysisSpec spec) {
        double[] residuals = ols.residuals();
        double level = spec.level();
        BreuschGodfreyResult bg = spec.serialCorrelationOrder().isPresent()
                ? BreuschGodfrey.test(ols, spec.serialCorrelationOrder().getAsInt(), level)
                : BreuschGodfrey.testAtSeasonalOrder(ols, periodsPerYear, level);
        LjungBoxResult ljungBox = LjungBox.testWithDefaultLags(residuals, periodsPerYear, 0, level);
        int chartLags = Math.min(Math.max(12, 2 * periodsPerYear), residuals.length - 2);
        return new ResidualDiagnostics(DurbinWatson.test(ols, level), bg, ljungBox,
                ArchTest.test(residuals, 1, level), ResidualAutocorrelations.compute(residuals, chartLags));
    }

    private static TrendAnalysis classical(TrendFit fit, TrendAnalysisSpec spec,
                                           Optional<ResidualDiagnostics> diagnostics, List<String> notes) {
        TrendForecast forecast = fit.forecast(spec.horizon(), spec.levels());
        return new TrendAnalysis(spec, fit, fit.ols().coefficients(), forecast.forecast(), forecast.backTransformed(),
                diagnostics, Optional.empty(), Optional.empty(), notes);
    }

    private static TrendAnalysis neweyWest(TrendFit fit, TrendAnalysisSpec spec,
                                           Optional<ResidualDiagnostics> diagnostics, List<String> notes) {
        requireConsecutive(fit.series(), "Newey-West standard errors");
        HacInference hac = spec.hacLag().isPresent()
                ? NeweyWest.standardErrors(fit.ols(), spec.hacLag().getAsInt())
                : NeweyWest.standardErrors(fit.ols());
        notes.add("Newey-West errors correct the coefficients' standard errors for serial correlation; the"
                + " forecast and its intervals are still those of least squares, which assume independent errors.");
        TrendForecast forecast = fit.forecast(spec.horizon(), spec.levels());
        return new TrendAnalysis(spec, fit, hac.coefficients(), forecast.forecast(), forecast.backTransformed(),
                diagnostics, Optional.of(hac), Optional.empty(), notes);
    }

    private static TrendAnalysis gls(TrendFit fit, TrendAnalysisSpec spec, Ar1Method method,
                                     Optional<ResidualDiagnostics> diagnostics, List<String> notes) {
        requireConsecutive(fit.series(), "Feasible GLS for AR(1) errors");
        OlsFit ols = fit.ols();
        Ar1GlsFit gls = Ar1Gls.fit(ols.design(), ols.y(), method, Ar1Gls.DEFAULT_TOLERANCE,
                Ar1Gls.DEFAULT_MAX_ITERATIONS);
        if (!gls.converged()) {
            notes.add("The GLS iterations did not settle within " + gls.iterations()
                    + " rounds; the reported rho is the last one reached.");
        }
        GlsTrendForecast forecast = GlsTrendForecast.of(fit, gls, spec.horizon(), spec.levels());
        return new TrendAnalysis(spec, fit, gls.coefficients(), forecast.forecast(), forecast.backTransformed(),
                diagnostics, Optional.empty(), Optional.of(gls), notes);
    }

    private static void requireConsecutive(Observations series, String method) {
        if (series.hasGaps()) {
            throw new InvalidSpecificationException(method + " needs consecutive periods, but period t = "
                    + series.firstMissingTime() + " is missing. Fill or drop the gap, or use classical errors.");
        }
    }
}
