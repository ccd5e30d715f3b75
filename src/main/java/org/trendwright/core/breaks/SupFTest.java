package org.trendwright.core.breaks;

import java.util.List;
import org.trendwright.core.Decision;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.RankDeficientDesignException;
import org.trendwright.core.TestResult;
import org.trendwright.core.regression.Design;

/**
 * The sup-F (Quandt-Andrews) test for one break in all k coefficients of a regression at an
 * unknown row (Quandt 1960, JASA 55; Andrews 1993, "Tests for parameter instability and structural
 * change with unknown change point", Econometrica 61).
 *
 * <p>The Chow F ({@link ChowTest}) is computed at every break row m with 0.15 n &lt;= m &lt;= 0.85 n
 * (15% trimmed at each end, so each regime keeps enough rows to be estimated); the statistic is
 * sup F = max_m F(m), and the row attaining it is the most likely break. Since the break row is
 * chosen by the data, sup F is not F-distributed.
 *
 * <p>The p-value comes from the null distribution of sup F for the caller's own design, simulated
 * with the regressors held fixed ({@link SupFNullDistribution}; Hansen 2000, J. Econometrics 97):
 * under independent normal errors that distribution depends on X alone, so the simulated p-value
 * is exact up to Monte Carlo error, whose standard error the result reports. It is reproducible
 * (seeded by the design), so the same request always gets the same p-value.
 *
 * <p>Andrews' asymptotic p-value, P(W &gt; k sup F) with W the supremum over [0.15, 0.85] of
 * ||B_k(pi) - pi B_k(1)||^2 / (pi (1 - pi)) ({@link SupWaldDistribution}), is reported beside it
 * for comparison. It assumes the regressors' second moments accumulate evenly over the sample (a
 * constant, stationary regressors), which a deterministic time trend does not do. Rejection rates
 * under the null, with independent normal errors, 10,000 seeded series per design
 * (SupFSizeMeasurement under src/test/java, seed 20261203):
 * <pre>
 *   design                     n     asymptotic      design-specific    design-specific
 *                                                    R = 1,999          R = 19,999
 *                                    5%     10%      5%     10%         5%     10%
 *   constant + t               100   6.0%   12.2%    5.1%   10.4%       4.8%    9.7%
 *   constant + t               200   6.3%   12.7%    4.6%    8.3%       5.0%    9.5%
 *   constant + t              1000   7.4%   15.0%    4.8%    9.7%       5.3%   10.0%
 *   constant + t + t^2         200   7.8%   15.2%    4.4%    9.7%       4.8%    9.7%
 *   constant + t + 3 quarters  120   5.9%   10.9%    5.5%   10.1%       5.3%    9.8%
 * </pre>
 * Each rate has a binomial sd of 0.22 points at 5% and 0.30 at 10% over the series. With R
 * replications a design's rate also carries the simulation's own error, sd sqrt(a (1 - a) / R):
 * 0.49 and 0.67 points for R = 1,999. The 8.3% for constant + t at n = 200 is such a deviation:
 * that design's 1,999 draws happen to put its 10% critical value low (its 19,999 draws, which
 * include those 1,999, give 9.5%). Averaged over seeds the size is a - 1/(R + 1) under the rule
 * p &lt; a of {@link TestResult#decide} (exactly a under p &lt;= a; Davison &amp; Hinkley 1997).
 * The asymptotic table's excess grows with n and with the degree of the trend.
 *
 * <p>Caveats, written down once:
 * <ul>
 *   <li>The simulation assumes independent, homoskedastic normal errors. Like the Chow test, the
 *       search rejects too often when the errors are serially correlated (check Durbin-Watson
 *       first) or their variance changes. With independent non-normal errors the simulated
 *       p-value is no longer exact, only asymptotically valid (Hansen 2000).</li>
 *   <li>A p-value within two standard errors of the level is a close call that another R (or a
 *       re-ordered design, hence another seed) could flip; the reported standard error says how
 *       close.</li>
 *   <li>k is limited to the 20 parameters of Andrews' table, since the asymptotic p-value is
 *       always reported alongside.</li>
 * </ul>
 *
 * <p>Stateless and thread-safe.
 */
public final class SupFTest {

    /** Fraction of the sample trimmed at each end, fixed because the asymptotic table is simulated for it. */
    public static final double TRIM = 0.15;

    private SupFTest() {
    }

    /**
     * Searches rows ceil(0.15 n) .. floor(0.85 n) for one break in all coefficients; the p-value
     * comes from {@link SupFNullDistribution#forDesign(Design)}.
     *
     * @throws InsufficientDataException when 15% of the sample is k rows or fewer, so a regime at
     *         the trimmed end could not be estimated
     * @throws InvalidSpecificationException when k exceeds the asymptotic table's 20 parameters,
     *         the level is not inside (0, 1), y has the wrong length or a non-finite value, a
     *         regressor has a non-finite value, or every candidate fits exactly (F would be 0/0)
     * @throws RankDeficientDesignException when the regressors are linearly dependent, over all
     *         rows or within the shortest first or last segment
     */
    public static BreakSearch test(Design design, double[] y, double level) {
        checkSpecification(design, level);
        checkResponse(design, y);
        return search(design, y, level, SupFNullDistribution.forDesign(design));
    }

    /**
     * As {@link #test(Design, double[], double)}, with a null distribution simulated earlier for
     * this design, e.g. kept in a cache to test many series on one design.
     *
     * @throws InvalidSpecificationException also when {@code nullDistribution} was simulated for
     *         another design (its seed is not {@link SupFNullDistribution#seedFor} of this one)
     */
    public static BreakSearch test(Design design, double[] y, double level, SupFNullDistribution nullDistribution) {
        checkSpecification(design, level);
        if (!nullDistribution.simulatedFor(design)) {
            throw new InvalidSpecificationException("The simulated sup-F distribution was made for another design"
                    + " (seed " + nullDistribution.seed() + ", this design's is " + SupFNullDistribution.seedFor(design)
                    + "); simulate it for this design with SupFNullDistribution.forDesign.");
        }
        checkResponse(design, y);
        return search(design, y, level, nullDistribution);
    }

    private static void checkSpecification(Design design, double level) {
        TestResult.checkLevel(level);
        BreakCandidates.checkSize(design.rows(), design.width());
        SupWaldDistribution.checkParameters(design.width());
    }

    private static void checkResponse(Design design, double[] y) {
        if (y.length != design.rows()) {
            throw new InvalidSpecificationException("The series has " + y.length + " values but the design has "
                    + design.rows() + " rows; a break search needs one value per row.");
        }
        for (int i = 0; i < y.length; i++) {
            if (!Double.isFinite(y[i])) {
                throw new InvalidSpecificationException("Value " + (i + 1) + " of the series is " + y[i]
                        + "; a break search needs finite numbers, so fill or drop that value first.");
            }
        }
    }

    private static BreakSearch search(Design design, double[] y, double level, SupFNullDistribution nullDistribution) {
        int k = design.width();
        int first = BreakCandidates.first(design.rows());
        int[] rows = new int[BreakCandidates.last(design.rows()) - first + 1];
        double[] f = chowSequence(design, y, first, rows);
        int best = 0;
        for (int i = 1; i < f.length; i++) {
            best = f[i] > f[best] ? i : best;
        }
        double supF = f[best];
        double p = nullDistribution.pValue(supF);
        return new BreakSearch(result(supF, p, k, nullDistribution.replications(), rows[best], level), rows[best],
                rows, f, nullDistribution.pValueStandardError(supF), nullDistribution.replications(),
                SupWaldDistribution.upperTail(k, k * supF));
    }

    /**
     * Fills rows with first, first + 1, ... and returns the Chow F at each, from segment sums; the
     * pooled RSS is the leading sum over all n rows, so one O(n k^2) pass in each direction gives
     * every residual sum of squares the search needs.
     */
    private static double[] chowSequence(Design design, double[] y, int first, int[] rows) {
        double[] leading = SegmentSums.leading(design, y);
        double[] trailing = SegmentSums.trailing(design, y);
        double pooled = leading[y.length];
        double[] f = new double[rows.length];
        for (int i = 0; i < rows.length; i++) {
            rows[i] = first + i;
            f[i] = ChowTest.fStatistic(pooled, leading[rows[i]] + trailing[rows[i]], design.width(), y.length);
        }
        return f;
    }

    private static TestResult result(double supF, double p, int k, int replications, int breakRow, double level) {
        Decision decision = TestResult.decide(p, level);
        return new TestResult("sup-F (Quandt-Andrews, 15% trimming)",
                "the regression coefficients are the same throughout the sample", supF,
                "sup-F null simulated for this design (fixed regressors, " + replications + " replications)",
                List.of((double) k), p, level, decision, reading(decision, breakRow));
    }

    private static String reading(Decision decision, int breakRow) {
        return decision == Decision.REJECT
                ? "The trend shifted around row " + breakRow + ": a single trend over the whole sample misstates"
                        + " the slope; fit the trend after the break or add a break dummy."
                : "No evidence of a break anywhere in the middle 70% of the sample: one trend over the whole"
                        + " sample is consistent with the data (a break in the first or last 15% cannot be"
                        + " detected).";
    }
}
