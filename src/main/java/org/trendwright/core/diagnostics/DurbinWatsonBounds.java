package org.trendwright.core.diagnostics;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.TestResult;

/**
 * Durbin &amp; Watson's significance bounds dL and dU for a regression with an intercept, computed
 * for any n, k' and level rather than read from a table.
 *
 * <p>For every design with n observations, the constant and k' further regressors, the
 * eigenvalues of M A M satisfy lambda_i &lt;= nu_i &lt;= lambda_{i+k'} (i = 1..n-k'-1), where
 * lambda_j = 4 sin^2(pi j / (2n)) are the eigenvalues of the Durbin-Watson matrix A (Durbin &amp;
 * Watson 1950, Biometrika 37, 409-428). Hence d lies between the bounding statistics
 * d_L = sum lambda_i z_i^2 / sum z_i^2 and d_U = sum lambda_{i+k'} z_i^2 / sum z_i^2, and their
 * alpha-quantiles are the bounds: dL = F_L^(-1)(alpha), dU = F_U^(-1)(alpha) (Durbin &amp; Watson
 * 1951, Biometrika 38, 159-178; tabulated for extreme n and many regressors by Savin &amp; White
 * 1977, Econometrica 45, 1989-1996). The quantiles are found by root finding on the exact
 * distribution functions ({@link DurbinWatsonDistribution#quantile}), to 1e-10.
 *
 * <p>Since lambda_j + lambda_{n-j} = 4, 4 - d_L has the distribution of d_U, so the same two
 * numbers serve the test against negative correlation, mirrored at 4 - d.
 *
 * <p>Immutable and thread-safe.
 *
 * @param observations                n
 * @param regressorsExcludingConstant k', the regressors besides the constant
 * @param level                       alpha, the size of each one-sided test
 * @param lower                       dL
 * @param upper                       dU
 */
public record DurbinWatsonBounds(int observations, int regressorsExcludingConstant, double level, double lower,
                                 double upper) {

    public DurbinWatsonBounds {
        checkArguments(observations, regressorsExcludingConstant);
        TestResult.checkLevel(level);
        if (!(lower <= upper)) {
            throw new InvalidSpecificationException("The lower Durbin-Watson bound " + lower
                    + " must not exceed the upper bound " + upper + ".");
        }
    }

    /**
     * The bounds at level alpha for n observations and k' regressors besides the constant.
     *
     * @throws InsufficientDataException    when n - k' - 1 &lt; 4 (the published tables start at
     *                                      n = k' + 5; see {@link DurbinWatson#MIN_RESIDUAL_DEGREES_OF_FREEDOM})
     * @throws InvalidSpecificationException when k' &lt; 0 or the level is outside (0, 1)
     */
    public static DurbinWatsonBounds of(int observations, int regressorsExcludingConstant, double level) {
        checkArguments(observations, regressorsExcludingConstant);
        TestResult.checkLevel(level);
        return COMPUTED.computeIfAbsent(new Cell(observations, regressorsExcludingConstant, level),
                cell -> compute(observations, regressorsExcludingConstant, level));
    }

    /**
     * The bounds are a pure function of (n, k', level) and each costs a few dozen exact
     * distribution evaluations, while a service meets the same few cells again and again, so the
     * most recently used {@value #REMEMBERED_CELLS} are remembered, like a printed table that
     * grows as it is used. Access is synchronized; a miss computes under the lock (milliseconds).
     */
    private static final int REMEMBERED_CELLS = 512;

    private static final Map<Cell, DurbinWatsonBounds> COMPUTED = Collections.synchronizedMap(
            new LinkedHashMap<>(64, 0.75f, true) {
                private static final long serialVersionUID = 1L;

                @Override
                protected boolean removeEldestEntry(Map.Entry<Cell, DurbinWatsonBounds> eldest) {
                    return size() > REMEMBERED_CELLS;
                }
            });

    private record Cell(int observations, int regressorsExcludingConstant, double level) {
    }

    private static DurbinWatsonBounds compute(int observations, int regressorsExcludingConstant, double level) {
        double lower = DurbinWatsonDistribution.lowerBounding(observations, regressorsExcludingConstant).quantile(level);
        double upper = DurbinWatsonDistribution.upperBounding(observations, regressorsExcludingConstant).quantile(level);
        return new DurbinWatsonBounds(observations, regressorsExcludingConstant, level, lower, upper);
    }

    /** The bounds verdict against positive serial correlation: d &lt; dL reject, d &gt; dU do not, else inconclusive. */
    public DurbinWatsonBoundsVerdict againstPositive(double statistic) {
        if (statistic < lower) {
            return DurbinWatsonBoundsVerdict.REJECT;
        }
        return statistic > upper ? DurbinWatsonBoundsVerdict.DO_NOT_REJECT : DurbinWatsonBoundsVerdict.INCONCLUSIVE;
    }

    /** The bounds verdict against negative serial correlation: the positive verdict for 4 - d. */
    public DurbinWatsonBoundsVerdict againstNegative(double statistic) {
        return againstPositive(4 - statistic);
    }

    static void checkArguments(int observations, int regressorsExcludingConstant) {
        if (regressorsExcludingConstant < 0) {
            throw new InvalidSpecificationException("The number of regressors besides the constant cannot be negative,"
                    + " got " + regressorsExcludingConstant + ".");
        }
        DurbinWatson.checkResidualDegreesOfFreedom(observations, regressorsExcludingConstant + 1);
    }
}
