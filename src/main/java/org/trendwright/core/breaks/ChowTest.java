package org.trendwright.core.breaks;

import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.special.Beta;
import org.trendwright.core.Decision;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.RankDeficientDesignException;
import org.trendwright.core.TestResult;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;

/**
 * The Chow (1960) test of whether a regression's k coefficients are the same before and after a
 * known break (G. C. Chow, "Tests of equality between sets of coefficients in two linear
 * regressions", Econometrica 28).
 *
 * <p>The break row m splits the n rows (in time order) into the first m and the last n - m.
 * With RSS_p the residual sum of squares of one regression over all rows and RSS_1, RSS_2 those of
 * separate regressions on the two segments,
 * <pre>
 *   F = ((RSS_p - RSS_1 - RSS_2) / k) / ((RSS_1 + RSS_2) / (n - 2k))   ~   F(k, n - 2k)
 * </pre>
 * under the null of equal coefficients, exactly so when the errors are independent normal with
 * one variance throughout. Serially correlated errors (check Durbin-Watson first) or a change in
 * the error variance make the test reject too often.
 *
 * <p>Stateless and thread-safe.
 */
public final class ChowTest {

    private ChowTest() {
    }

    /**
     * Tests for a change in all coefficients after the first {@code breakRow} rows.
     *
     * @param breakRow m, the number of rows before the break: the second regime starts at row
     *                 m + 1 (counting from 1); must satisfy k + 1 &lt;= m &lt;= n - k - 1
     * @throws InvalidSpecificationException when m leaves k or fewer rows on a side, the level is
     *         not inside (0, 1), y has the wrong length or a non-finite value, or all three
     *         regressions fit exactly (F would be 0/0)
     * @throws InsufficientDataException when n &lt; 2k + 2, so that no break position is possible
     * @throws RankDeficientDesignException when a segment's regressors are linearly dependent
     *         (for example a dummy that is constant within the segment)
     */
    public static TestResult test(Design design, double[] y, int breakRow, double level) {
        TestResult.checkLevel(level);
        double f = statistic(design, y, breakRow);
        int k = design.width();
        int df = design.rows() - 2 * k;
        double p = upperTailF(f, k, df);
        Decision decision = TestResult.decide(p, level);
        return new TestResult("Chow (break after row " + breakRow + ")",
                "the regression coefficients are the same before and after row " + breakRow, f, "F",
                List.of((double) k, (double) df), p, level, decision, reading(decision, breakRow));
    }

    /**
     * The Chow F statistic at break row m (see the class comment). When both segments fit
     * exactly but the pooled regression does not, F is +Infinity.
     */
    public static double statistic(Design design, double[] y, int breakRow) {
        checkBreak(design, breakRow);
        int n = design.rows();
        int k = design.width();
        double pooled = LeastSquares.fit(design, y).residualSumOfSquares();
        double first = segmentRss(design, y, 0, breakRow);
        double second = segmentRss(design, y, breakRow, n);
        return fStatistic(pooled, first + second, k, n);
    }

    /** F from the pooled and the summed segment RSS; a tiny negative difference is rounding, read as 0. */
    static double fStatistic(double pooled, double separate, int k, int n) {
        double gain = Math.max(0, pooled - separate);
        if (separate == 0 && gain == 0) {
            throw new InvalidSpecificationException("The regression fits the data exactly before and after the"
                    + " break, so there is no noise to test a change against; a break test needs noisy data.");
        }
        return (gain / k) / (separate / (n - 2 * k));
    }

    /** P(F(d1, d2) > f) = I_{d2/(d2 + d1 f)}(d2/2, d1/2), the regularized incomplete beta function. */
    static double upperTailF(double f, int d1, int d2) {
        return Double.isInfinite(f) ? 0 : Beta.regularizedBeta(d2 / (d2 + d1 * f), d2 / 2.0, d1 / 2.0);
    }

    private static void checkBreak(Design design, int breakRow) {
        int n = design.rows();
        int k = design.width();
        if (n < 2 * k + 2) {
            throw InsufficientDataException.forModel("A Chow test on " + k + " regressors", 2 * k + 2, n);
        }
        if (breakRow < k + 1 || breakRow > n - k - 1) {
            throw new InvalidSpecificationException("A Chow test on " + k + " regressors needs more than " + k
                    + " rows on each side of the break, so with " + n + " rows the break row must lie between "
                    + (k + 1) + " (the shortest allowed first segment) and " + (n - k - 1) + "; got " + breakRow
                    + ".");
        }
    }

    private static double segmentRss(Design design, double[] y, int from, int to) {
        try {
            return LeastSquares.fit(design.rowRange(from, to), Arrays.copyOfRange(y, from, to))
                    .residualSumOfSquares();
        } catch (RankDeficientDesignException e) {
            throw new RankDeficientDesignException("In rows " + (from + 1) + " to " + to + " (one side of the"
                    + " break): " + e.getMessage());
        }
    }

    private static String reading(Decision decision, int breakRow) {
        return decision == Decision.REJECT
                ? "The relationship shifted after row " + breakRow + ": one regression over the whole sample"
                        + " misstates it; fit the rows after the break on their own or add a break dummy (and its"
                        + " interaction with the trend)."
                : "No evidence that the relationship changed after row " + breakRow + ": one regression over"
                        + " the whole sample is consistent with the data.";
    }
}
