package org.trendwright.core.selection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.trendwright.core.Observations;
import org.trendwright.core.analysis.TrendAnalyses;
import org.trendwright.core.trend.TrendSpec;
import org.trendwright.testing.ReferenceData;

class StandardCandidatesTest {

    /** A linear trend with AR(1) errors, rho = 0.8, n = 120 quarters (seeded). */
    private static Observations trendWithCorrelatedErrors(long seed) {
        Random random = new Random(seed);
        double[] y = new double[120];
        double u = 0;
        for (int t = 1; t <= y.length; t++) {
            u = 0.8 * u + random.nextGaussian();
            y[t - 1] = 500 + 2.5 * t + 4 * u;
        }
        return Observations.consecutive(y, 4, 1);
    }

    /**
     * Seeded simulation: with AR(1) errors (rho = 0.8) the plain trend models fail their
     * serial-correlation checks (Breusch-Godfrey's power at n = 120 is near 1 for rho = 0.8;
     * common practice), so in most of 20 replications the recommendation is a model that passes:
     * a trend with AR(1) errors or an autoregression.
     */
    @Test
    void recommends_a_remedy_over_a_plain_trend_when_errors_are_correlated() {
        int remedies = 0;
        for (long seed = 1; seed <= 20; seed++) {
            Observations series = trendWithCorrelatedErrors(seed);
            ModelComparison comparison = ModelSelection.compare(series, StandardCandidates.forSeries(series, 0.05),
                    ComparisonSpec.defaultsFor(4));
            String chosen = comparison.recommended().orElseThrow();
            assertFalse(comparison.noCandidatePasses());
            remedies += chosen.contains("AR") ? 1 : 0;
        }
        assertTrue(remedies >= 16, "a remedy was recommended in " + remedies + " of 20");
    }

    /**
     * When only plain trends are offered for such a series, none passes, and the comparison
     * says so plainly (the product owner's requirement).
     */
    @Test
    void says_plainly_when_no_candidate_passes_its_residual_checks() {
        Observations series = trendWithCorrelatedErrors(42);
        List<Candidate> trendsOnly = List.of(
                new TrendCandidate(TrendSpec.linear(), fit -> TrendAnalyses.serialCorrelationChecks(fit, 0.05)),
                new TrendCandidate(TrendSpec.quadratic(), fit -> TrendAnalyses.serialCorrelationChecks(fit, 0.05)));
        ModelComparison comparison = ModelSelection.compare(series, trendsOnly, ComparisonSpec.defaultsFor(4));
        assertTrue(comparison.noCandidatePasses());
        assertTrue(comparison.reasons().get(0).startsWith("No candidate passes every residual check"),
                comparison.reasons().get(0));
    }

    /** US real GDP (BEA, 1950-2019): every default candidate can be fitted to it (positive, no gaps). */
    @Test
    void fits_every_default_candidate_to_us_real_gdp() {
        double[] gdp = ReferenceData.column("open-series/us_real_gdp_quarterly_1950q1_2019q4.csv", 1);
        Observations series = Observations.consecutive(gdp, 4, 1);
        List<Candidate> candidates = StandardCandidates.forSeries(series, 0.05);
        ModelComparison comparison = ModelSelection.compare(series, candidates, ComparisonSpec.defaultsFor(4));
        assertEquals(candidates.size(), comparison.candidates().size());
        comparison.candidates().forEach(c -> assertTrue(c.evaluated(), c.name() + ": " + c.failure()));
        assertTrue(comparison.dieboldMariano().isPresent());
    }

    @Test
    void leaves_out_log_models_for_non_positive_series_and_autoregressions_for_series_with_gaps() {
        Observations withGap = new Observations(new int[] {1, 2, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13},
                new double[] {-1, 2, 3, 5, 4, 6, 8, 7, 9, 10, 12, 11}, 4, 1);
        List<String> names = StandardCandidates.forSeries(withGap, 0.05).stream().map(Candidate::name).toList();
        assertTrue(names.stream().noneMatch(n -> n.contains("log")), names.toString());
        assertTrue(names.stream().noneMatch(n -> n.contains("AR")), names.toString());
    }
}
