package org.trendwright.core.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.Observations;
import org.trendwright.core.diagnostics.DurbinWatsonVerdict;
import org.trendwright.core.forecast.ForecastPoint;
import org.trendwright.core.trend.TrendSpec;
import org.trendwright.core.trend.Trends;
import org.trendwright.testing.ReferenceData;

class TrendAnalysesTest {

    private static Observations gistemp() {
        return Observations.annual(ReferenceData.column("open-series/nasa_gistemp_global_annual_anomaly_1880_2021.csv", 1));
    }

    /**
     * NASA GISTEMP annual global anomalies 1880-2021: residuals from a straight-line trend are
     * strongly positively autocorrelated (the series wanders in multi-decade swings around any
     * line; widely reported, e.g. the reference README's note; common practice). Every
     * serial-correlation check must say so.
     */
    @Test
    void flags_positive_serial_correlation_around_a_linear_trend_in_global_temperatures() {
        TrendAnalysis analysis = TrendAnalyses.analyze(gistemp(), TrendAnalysisSpec.of(TrendSpec.linear()));
        ResidualDiagnostics d = analysis.diagnostics().orElseThrow();
        assertEquals(DurbinWatsonVerdict.POSITIVE_SERIAL_CORRELATION, d.durbinWatson().verdict());
        assertTrue(d.breuschGodfrey().lagrangeMultiplier().rejected());
        assertTrue(d.ljungBox().test().rejected());
        assertTrue(d.durbinWatson().reading().toLowerCase().contains("positive"), d.durbinWatson().reading());
    }

    /** Classical treatment: the analysis forecast is exactly the trend fit's (identity). */
    @Test
    void classical_forecast_is_the_least_squares_trend_forecast() {
        TrendAnalysis analysis = TrendAnalyses.analyze(gistemp(), TrendAnalysisSpec.of(TrendSpec.quadratic()));
        List<ForecastPoint> expected = Trends.fit(gistemp(), TrendSpec.quadratic())
                .forecast(8, List.of(0.80, 0.95)).forecast().points();
        assertEquals(expected, analysis.forecast().points());
    }

    /**
     * Prais-Winsten on GISTEMP: after modelling AR(1) errors the transformed residuals' DW
     * statistic moves towards 2 (the point of the remedy; Prais & Winsten 1954), and the slope's
     * standard error grows relative to OLS, whose classical errors are too small under positive
     * correlation (common practice).
     */
    @Test
    void gls_treatment_brings_the_transformed_residuals_towards_independence() {
        TrendAnalysis ols = TrendAnalyses.analyze(gistemp(), TrendAnalysisSpec.of(TrendSpec.linear()));
        TrendAnalysis gls = TrendAnalyses.analyze(gistemp(),
                TrendAnalysisSpec.of(TrendSpec.linear()).withErrors(ErrorTreatment.PRAIS_WINSTEN));
        double olsDw = ols.diagnostics().orElseThrow().durbinWatson().statistic();
        double glsDw = gls.gls().orElseThrow().durbinWatson();
        assertTrue(Math.abs(glsDw - 2) < Math.abs(olsDw - 2), "DW " + olsDw + " -> " + glsDw);
        assertTrue(gls.coefficients().get(1).standardError() > ols.coefficients().get(1).standardError());
        assertTrue(gls.forecast().model().contains("AR(1) errors"), gls.forecast().model());
    }

    /** Newey-West: HAC standard errors exceed the classical ones under positive correlation (common practice). */
    @Test
    void newey_west_treatment_reports_wider_standard_errors_and_says_what_it_does_not_fix() {
        TrendAnalysisSpec spec = new TrendAnalysisSpec(TrendSpec.linear(), ErrorTreatment.NEWEY_WEST, OptionalInt.of(6),
                OptionalInt.empty(), 4, List.of(0.95), 0.05);
        TrendAnalysis hac = TrendAnalyses.analyze(gistemp(), spec);
        assertEquals(6, hac.hac().orElseThrow().lag());
        assertTrue(hac.coefficients().get(1).standardError() > hac.fit().ols().coefficients().get(1).standardError());
        assertTrue(hac.notes().stream().anyMatch(n -> n.contains("intervals are still those of least squares")));
    }

    /** A log model with GLS errors maps its log-scale intervals back by e^x (monotone; common practice). */
    @Test
    void log_scale_gls_forecasts_are_back_transformed() {
        double[] gdp = ReferenceData.column("open-series/us_real_gdp_quarterly_1950q1_2019q4.csv", 1);
        TrendAnalysis analysis = TrendAnalyses.analyze(Observations.consecutive(gdp, 4, 1),
                TrendAnalysisSpec.of(TrendSpec.logLinear()).withErrors(ErrorTreatment.COCHRANE_ORCUTT));
        ForecastPoint first = analysis.forecast().points().get(0);
        assertEquals(analysis.backTransformed().get(0).smearingMean(), first.value(), 0);
        assertTrue(first.interval(0.95).lower() > 15000 && first.interval(0.95).upper() < 25000,
                "US real GDP 2020-Q1 forecast interval " + first.interval(0.95));
    }

    @Test
    void skips_residual_checks_on_a_series_with_a_gap_and_says_why() {
        int[] times = {1, 2, 3, 4, 6, 7, 8, 9, 10, 11, 12, 13};
        double[] y = {3, 4, 6, 7, 9, 11, 12, 13, 15, 17, 18, 20};
        Observations series = new Observations(times, y, 1, 1);
        TrendAnalysis analysis = TrendAnalyses.analyze(series, TrendAnalysisSpec.of(TrendSpec.linear()));
        assertTrue(analysis.diagnostics().isEmpty());
        assertTrue(analysis.notes().get(0).contains("t = 5 is missing"), analysis.notes().get(0));
        InvalidSpecificationException e = assertThrows(InvalidSpecificationException.class,
                () -> TrendAnalyses.analyze(series,
                        TrendAnalysisSpec.of(TrendSpec.linear()).withErrors(ErrorTreatment.PRAIS_WINSTEN)));
        assertTrue(e.getMessage().contains("t = 5 is missing"), e.getMessage());
    }
}
