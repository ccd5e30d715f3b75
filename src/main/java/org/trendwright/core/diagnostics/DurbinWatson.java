package org.trendwright.core.diagnostics;

import java.util.Optional;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.TestResult;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.OlsFit;

/**
 * The Durbin-Watson test for first-order serial correlation in regression residuals
 * (Durbin &amp; Watson 1950, 1951, Biometrika 37 and 38).
 *
 * <p>Stateless and thread-safe.
 */
public final class DurbinWatson {

    /**
     * The test needs n - k &gt;= 4 residual degrees of freedom. The published tables start there
     * (n = k' + 5: Durbin &amp; Watson 1951, Savin &amp; White 1977), and with fewer the null density
     * of d does not vanish at the ends of its range (for n - k = 2 it is U-shaped, the arcsine
     * law), so a small d is hardly evidence of correlation.
     */
    public static final int MIN_RESIDUAL_DEGREES_OF_FREEDOM = 4;

    /**
     * A residual vector shorter than this times max(1, condition number) times |y| is rounding
     * noise of an exact fit, not a set of errors whose correlation could be tested.
     */
    static final double EXACT_FIT = 1e-13;

    private DurbinWatson() {
    }

    /**
     * The statistic d = sum_{t=2..n} (e_t - e_{t-1})^2 / sum_{t=1..n} e_t^2 over residuals in time
     * order. d lies in [0, 4]; near 2 when successive residuals are uncorrelated, towards 0 under
     * positive and towards 4 under negative first-order correlation (d is about 2(1 - r_1)).
     * NaN when every residual is 0 (an exact fit), since the ratio is then 0/0.
     */
    public static double statistic(double[] residuals) {
        double numerator = 0;
        double denominator = residuals.length == 0 ? 0 : residuals[0] * residuals[0];
        for (int t = 1; t < residuals.length; t++) {
            double difference = residuals[t] - residuals[t - 1];
            numerator += difference * difference;
            denominator += residuals[t] * residuals[t];
        }
        return numerator / denominator;
    }

    /**
     * The complete test of a least-squares fit whose rows are consecutive, equally spaced periods.
     *
     * <ul>
     *   <li>Exact p-values for the fit's own design: P(d &lt;= d_obs) against positive and
     *       P(d &gt;= d_obs) against negative correlation, under iid normal errors, from the
     *       eigenvalues of the design's M A M ({@link DurbinWatsonSpectrum#forDesign}, which remembers
     *       them for recently used designs; the observed d is never part of what is remembered).</li>
     *   <li>Verdict: positive correlation when P(d &lt;= d_obs) &lt; level, negative when
     *       P(d &gt;= d_obs) &lt; level, else none detected.</li>
     *   <li>Bounds dL, dU at 5%, 1% and at {@code level} for this n and k'
     *       ({@link DurbinWatsonBounds}), with the bounds verdicts at {@code level}; when the design
     *       does not span the constant they are not applicable and reported as such.</li>
     * </ul>
     *
     * @param level the size of each one-sided test, in (0, 0.5) (so the two cannot both reject)
     * @throws InsufficientDataException     when n - k &lt; {@link #MIN_RESIDUAL_DEGREES_OF_FREEDOM}
     * @throws InvalidSpecificationException when the fit is exact (every residual 0 up to rounding) or
     *                                       the level is outside (0, 0.5)
     */
    public static DurbinWatsonResult test(OlsFit fit, double level) {
        checkLevel(level);
        Design design = fit.design();
        checkResidualDegreesOfFreedom(design.rows(), design.width());
        checkNotExactFit(fit);
        double d = statistic(fit.residuals());
        DurbinWatsonSpectrum spectrum = DurbinWatsonSpectrum.forDesign(design);
        DurbinWatsonDistribution distribution = new DurbinWatsonDistribution(spectrum.eigenvalues());
        // One inversion serves both tails: integrate the smaller one (below the mean, P(d <= d_obs))
        // and take the other as its complement, which loses nothing since it is then above 1/2.
        boolean lowerTailSmaller = d <= distribution.mean();
        double smallerTail = lowerTailSmaller ? distribution.probabilityAtMost(d) : distribution.probabilityAtLeast(d);
        double pPositive = lowerTailSmaller ? smallerTail : 1 - smallerTail;
        double pNegative = lowerTailSmaller ? 1 - smallerTail : smallerTail;
        DurbinWatsonVerdict verdict = pPositive < level ? DurbinWatsonVerdict.POSITIVE_SERIAL_CORRELATION
                : pNegative < level ? DurbinWatsonVerdict.NEGATIVE_SERIAL_CORRELATION : DurbinWatsonVerdict.NONE_DETECTED;
        int n = design.rows();
        if (!spectrum.spansConstant()) {
            return new DurbinWatsonResult(d, n, design.width(), false, level, pPositive, pNegative, Optional.empty(),
                    Optional.empty(), Optional.empty(), DurbinWatsonBoundsVerdict.NOT_APPLICABLE,
                    DurbinWatsonBoundsVerdict.NOT_APPLICABLE, verdict);
        }
        int kPrime = design.width() - 1;
        DurbinWatsonBounds five = DurbinWatsonBounds.of(n, kPrime, 0.05);
        DurbinWatsonBounds one = DurbinWatsonBounds.of(n, kPrime, 0.01);
        DurbinWatsonBounds atLevel = level == 0.05 ? five : level == 0.01 ? one : DurbinWatsonBounds.of(n, kPrime, level);
        return new DurbinWatsonResult(d, n, kPrime, true, level, pPositive, pNegative, Optional.of(five),
                Optional.of(one), Optional.of(atLevel), atLevel.againstPositive(d), atLevel.againstNegative(d), verdict);
    }

    /** Refuses n - k below {@link #MIN_RESIDUAL_DEGREES_OF_FREEDOM}. */
    static void checkResidualDegreesOfFreedom(int observations, int regressors) {
        if (observations - regressors < MIN_RESIDUAL_DEGREES_OF_FREEDOM) {
            throw InsufficientDataException.forModel("The Durbin-Watson test with " + regressors + " regressor"
                    + (regressors == 1 ? "" : "s") + " (" + MIN_RESIDUAL_DEGREES_OF_FREEDOM
                    + " residual degrees of freedom)", regressors + MIN_RESIDUAL_DEGREES_OF_FREEDOM, observations);
        }
    }

    private static void checkLevel(double level) {
        TestResult.checkLevel(level);
        if (level >= 0.5) {
            throw new InvalidSpecificationException("The Durbin-Watson test runs two one-sided tests, so its level must"
                    + " lie below 0.5, got " + level + "; 0.05 is the usual choice.");
        }
    }

    private static void checkNotExactFit(OlsFit fit) {
        double residualNorm = norm(fit.residuals());
        if (residualNorm <= EXACT_FIT * Math.max(1, fit.conditionNumber()) * norm(fit.y())) {
            throw new InvalidSpecificationException("The fit is exact: every residual is 0 up to rounding, so the"
                    + " Durbin-Watson statistic is 0/0 and there are no errors whose serial correlation could be tested;"
                    + " check whether the response was generated from the regressors.");
        }
    }

    private static double norm(double[] v) {
        double largest = 0;
        for (double x : v) {
            largest = Math.max(largest, Math.abs(x));
        }
        if (largest == 0) {
            return 0;
        }
        double sum = 0;
        for (double x : v) {
            sum += (x / largest) * (x / largest);
        }
        return largest * Math.sqrt(sum);
    }
}
