package org.trendwright.core.selection;

import java.util.List;
import java.util.Optional;
import org.trendwright.core.TestResult;

/**
 * The outcome of comparing candidate models: every candidate's assessment, the recommended model
 * with its reasons, and the Diebold-Mariano test between the two best.
 *
 * @param spec              how the comparison was run
 * @param candidates        one assessment per candidate, in ranking order (best first; failed last)
 * @param recommended       the recommended candidate's name, when any candidate could be fitted
 * @param reasons           plain sentences explaining the recommendation
 * @param noCandidatePasses true when every fitted candidate failed a residual check, so even the
 *                          recommended model's intervals should not be trusted as stated
 * @param dieboldMariano    the test between the two best candidates' one-step holdout errors, when
 *                          at least two candidates were evaluated
 */
public record ModelComparison(ComparisonSpec spec, List<CandidateAssessment> candidates,
                              Optional<String> recommended, List<String> reasons, boolean noCandidatePasses,
                              Optional<TestResult> dieboldMariano) {

    public ModelComparison {
        candidates = List.copyOf(candidates);
        reasons = List.copyOf(reasons);
    }
}
