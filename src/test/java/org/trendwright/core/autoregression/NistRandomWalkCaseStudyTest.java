package org.trendwright.core.autoregression;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.trendwright.core.Observations;
import org.trendwright.core.regression.Coefficient;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;
import org.trendwright.testing.ReferenceData;

/**
 * The random-walk case study of the NIST/SEMATECH e-Handbook of Statistical Methods, section
 * 1.4.2.3 (data 1.4.2.3.1, model 1.4.2.3.3; reference/nist-ehandbook/). Every number NIST prints is
 * matched to the digits printed: the tolerance is half a unit in the last printed place, which is
 * all the printed value can say (the fits themselves are well conditioned, so our own error is
 * far smaller).
 */
class NistRandomWalkCaseStudyTest {

    private static final String DATA = "nist-ehandbook/randwalk.csv";
    private static final String PUBLISHED = "nist-ehandbook/randwalk.published.csv";

    @Test
    void ar1_fit_on_499_pairs_matches_the_published_estimates_errors_and_residual_sd() {
        ArFit fit = Autoregression.fit(series(), ArSpec.ofOrder(1));
        Coefficient a0 = fit.coefficients().get(0);
        Coefficient a1 = fit.coefficients().get(1);
        String model = "ar1_ols y(i)=a0+a1*y(i-1)";
        // NIST e-Handbook 1.4.2.3.3, AR(1) by least squares
        assertPrinted(model, "sample_size", fit.observationsUsed());
        assertPrinted(model, "a0", a0.estimate());
        assertPrintedStandardError(model, "a0", a0.standardError());
        assertPrinted(model, "a1", a1.estimate());
        assertPrintedStandardError(model, "a1", a1.standardError());
        assertPrinted(model, "t_a0", a0.tStatistic());
        assertPrinted(model, "t_a1", a1.tStatistic());
        assertPrinted(model, "residual_sd", fit.standardErrorOfEstimate());
        assertPrinted(model, "residual_df", fit.regression().residualDegreesOfFreedom());
    }

    @Test
    void mean_reverting_level_is_a0_over_one_minus_a1_of_the_published_fit() {
        ArFit fit = Autoregression.fit(series(), ArSpec.ofOrder(1));
        double a0 = published("ar1_ols y(i)=a0+a1*y(i-1)", "a0");
        double a1 = published("ar1_ols y(i)=a0+a1*y(i-1)", "a1");
        // From NIST's printed a0 and a1 (6 digits each); 1 - a1 = 0.012913 keeps only 5 digits,
        // so the level is known to about 1e-4 relative.
        assertEquals(a0 / (1 - a1), fit.stationarity().meanRevertingLevel(), 1e-4 * a0 / (1 - a1));
        assertEquals(a1, fit.stationarity().largestRootModulus(), 5e-7);
    }

    @Test
    void linear_trend_fit_matches_the_published_listing() {
        double[] y = ReferenceData.column(DATA, 1);
        double[] t = ReferenceData.column(DATA, 0);
        Design design = new Design(List.of(LagDesigns.ones(y.length), t), List.of("b0", "b1"), true);
        OlsFit trend = LeastSquares.fit(design, y);
        String model = "linear_trend y=b0+b1*t (t=1..500)";
        // NIST e-Handbook 1.4.2.3, companion output listing
        assertPrinted(model, "b0", trend.coefficient("b0").estimate());
        assertPrintedStandardError(model, "b0", trend.coefficient("b0").standardError());
        assertPrinted(model, "b1", trend.coefficient("b1").estimate());
        assertPrintedStandardError(model, "b1", trend.coefficient("b1").standardError());
        assertPrinted(model, "t_b0", trend.coefficient("b0").tStatistic());
        assertPrinted(model, "t_b1", trend.coefficient("b1").tStatistic());
    }

    @Test
    void lag_one_autocorrelation_of_the_series_matches_the_published_summary() {
        // NIST e-Handbook 1.4.2.3, summary statistics
        assertPrinted("summary", "lag1_autocorrelation", Autocorrelations.of(ReferenceData.column(DATA, 1), 1)[0]);
    }

    private static Observations series() {
        return Observations.consecutive(ReferenceData.column(DATA, 1), 1, 1);
    }

    private static void assertPrinted(String model, String quantity, double actual) {
        String printed = printed(model, quantity).get("value");
        assertEquals(Double.parseDouble(printed), actual, halfUnitInLastPlace(printed), model + " " + quantity);
    }

    private static void assertPrintedStandardError(String model, String quantity, double actual) {
        String printed = printed(model, quantity).get("std_error");
        assertEquals(Double.parseDouble(printed), actual, halfUnitInLastPlace(printed),
                model + " se(" + quantity + ")");
    }

    private static double published(String model, String quantity) {
        return Double.parseDouble(printed(model, quantity).get("value"));
    }

    private static Map<String, String> printed(String model, String quantity) {
        for (String[] row : ReferenceData.rows(PUBLISHED)) {
            if (row[0].replace("\"", "").equals(model) && row[1].equals(quantity)) {
                Map<String, String> fields = new HashMap<>();
                fields.put("value", row[2]);
                fields.put("std_error", row[3]);
                return fields;
            }
        }
        throw new IllegalArgumentException("No published " + model + " " + quantity);
    }

    /** Half a unit in the last printed digit, e.g. 0.5e-7 for "0.2931194" and for "0.501650E-01". */
    private static double halfUnitInLastPlace(String printed) {
        return 0.5 * BigDecimal.ONE.scaleByPowerOfTen(-new BigDecimal(printed).scale()).doubleValue();
    }
}
