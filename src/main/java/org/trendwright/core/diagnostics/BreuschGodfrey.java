package org.trendwright.core.diagnostics;

import java.util.ArrayList;
import java.util.List;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.TestResult;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;
import org.trendwright.core.regression.SumsOfSquares;

/**
 * The Breusch-Godfrey Lagrange-multiplier test for serial correlation of order p in regression
 * errors (Breusch 1978, "Testing for autocorrelation in dynamic linear models", Australian Economic
 * Papers 17; Godfrey 1978, "Testing against general autoregressive and moving average error models
 * when the regressors include lagged dependent variables", Econometrica 46).
 *
 * <p>Given the OLS residuals e of y = X b + e (n rows, k regressors), the auxiliary regression is
 * e_t = x_t'a + c_1 e_{t-1} + ... + c_p e_{t-p} + v_t over all n rows, with the pre-sample residuals
 * e_0, e_{-1}, ... set to 0. That convention keeps every row, so the auxiliary regression nests the
 * original one exactly; dropping the first p rows instead would change X's sample as well.
 * Because X'e = 0, the regression of e on X alone leaves e itself, so the restricted residual sum of
 * squares is RSS_r = e'e and the auxiliary R^2 = 1 - RSS_u/RSS_r, whether or not X has an intercept.
 *
 * <ul>
 *   <li>LM = n R^2, asymptotically chi-square(p) under no serial correlation up to order p (against
 *       AR(p) and MA(p) errors alike);</li>
 *   <li>F = ((RSS_r - RSS_u)/p) / (RSS_u/(n - k - p)), referred to F(p, n - k - p), the usual
 *       small-sample variant of the same comparison.</li>
 * </ul>
 * An auxiliary fit with RSS_u = 0 gives LM = n and F = +Infinity, both with p-value 0.
 *
 * <p>The fit's rows must be consecutive periods in time order; the caller refuses series with gaps.
 *
 * <p>Stateless and thread-safe.
 */
public final class BreuschGodfrey {

    /** Residuals smaller than this relative to y (in Euclidean norm) count as an exact fit. */
    static final double EXACT_FIT_TOLERANCE = 1e-12;

    private BreuschGodfrey() {
    }

    /**
     * The default order: the number of periods per year (4 for quarterly, 12 for monthly data), so
     * the test reaches the same season a year earlier; 1 for annual data.
     *
     * @throws InvalidSpecificationException when periodsPerYear < 1
     */
    public static int defaultOrder(int periodsPerYear) {
        if (periodsPerYear < 1) {
            throw new InvalidSpecificationException("periodsPerYear must be at least 1, got " + periodsPerYear + ".");
        }
        return periodsPerYear;
    }

    /** The test at the default order {@link #defaultOrder(int)} for data with this many periods per year. */
    public static BreuschGodfreyResult testAtSeasonalOrder(OlsFit fit, int periodsPerYear, double level) {
        return test(fit, defaultOrder(periodsPerYear), level);
    }

    /**
     * The Breusch-Godfrey test of order p on an OLS fit.
     *
     * @throws InvalidSpecificationException when p < 1, the level is outside (0, 1), or the fit is
     *                                       exact: every residual 0, or ||e|| < 1e-12 ||y|| (rounding only)
     * @throws InsufficientDataException     when n < k + p + 1, so the auxiliary regression has no
     *                                       residual degrees of freedom
     * @throws org.trendwright.core.RankDeficientDesignException when a lagged residual column is a
     *                                       linear combination of X and the other lags (only in
     *                                       degenerate residual patterns)
     */
    public static BreuschGodfreyResult test(OlsFit fit, int order, double level) {
        TestResult.checkLevel(level);
        int n = fit.observations();
        int k = fit.design().width();
        checkOrder(order, n, k);
        double[] e = fit.residuals();
        ResidualAutocorrelations.requireUsable(e, k + order + 1, "The Breusch-Godfrey test");
        requireNonTrivialResiduals(fit);
        SumsOfSquares auxiliary = LeastSquares.sumsOfSquares(auxiliaryDesign(fit.design(), e, order), e);
        double restricted = sumOfSquares(e);
        // Nested fits: RSS_u <= RSS_r exactly; rounding can put it a hair above when the lags explain
        // nothing, which would make LM and F slightly negative and their p-values NaN.
        double unrestricted = Math.min(auxiliary.residual(), restricted);
        double rSquared = 1 - unrestricted / restricted;
        return new BreuschGodfreyResult(order, n, k, rSquared, restricted, unrestricted,
                lagrangeMultiplier(n * rSquared, order, level),
                fForm(restricted, unrestricted, order, n - k - order, level));
    }

    private static void checkOrder(int order, int n, int k) {
        if (order < 1) {
            throw new InvalidSpecificationException("The Breusch-Godfrey order must be at least 1, got " + order + ".");
        }
        if (n < k + order + 1) {
            throw new InsufficientDataException("The Breusch-Godfrey test of order " + order + " on a fit with "
                    + k + " regressors needs at least " + (k + order + 1) + " observations but the fit has " + n
                    + "; supply a longer series or test a lower order.");
        }
    }

    /**
     * Refuses an exact fit whose residuals are only rounding error (||e|| below 1e-12 ||y||): their
     * correlation pattern is an artefact of the arithmetic, not of the data.
     */
    private static void requireNonTrivialResiduals(OlsFit fit) {
        double yy = 0;
        for (double v : fit.y()) {
            yy += v * v;
        }
        if (fit.residualSumOfSquares() <= EXACT_FIT_TOLERANCE * EXACT_FIT_TOLERANCE * yy) {
            throw new InvalidSpecificationException("The trend fits the series exactly (the residuals are rounding"
                    + " error only), so the Breusch-Godfrey test has nothing to measure.");
        }
    }

    /** X with the columns e_{t-1}, ..., e_{t-p} appended, pre-sample values set to 0. */
    static Design auxiliaryDesign(Design design, double[] e, int order) {
        List<double[]> lags = new ArrayList<>(order);
        List<String> names = new ArrayList<>(order);
        for (int j = 1; j <= order; j++) {
            double[] lagged = new double[e.length];
            System.arraycopy(e, 0, lagged, j, e.length - j);
            lags.add(lagged);
            names.add("residual lag " + j);
        }
        return design.withColumns(lags, names);
    }

    private static double sumOfSquares(double[] e) {
        double sum = 0;
        for (double v : e) {
            sum += v * v;
        }
        return sum;
    }

    private static TestResult lagrangeMultiplier(double lm, int order, double level) {
        double p = UpperTails.chiSquare(lm, order);
        return new TestResult("Breusch-Godfrey LM (order " + order + ")", nullHypothesis(order), lm, "chi-square",
                List.of((double) order), p, level, TestResult.decide(p, level), reading(p < level, order));
    }

    private static TestResult fForm(double restricted, double unrestricted, int order, int df, double level) {
        double f = ((restricted - unrestricted) / order) / (unrestricted / df);
        double p = UpperTails.f(f, order, df);
        return new TestResult("Breusch-Godfrey F (order " + order + ")", nullHypothesis(order), f, "F",
                List.of((double) order, (double) df), p, level, TestResult.decide(p, level), reading(p < level, order));
    }

    private static String nullHypothesis(int order) {
        return "The regression errors are not correlated at lags 1 to " + order;
    }

    private static String reading(boolean rejected, int order) {
        return rejected
                ? "Residuals are correlated up to lag " + order + ": the reported standard errors are too small and"
                        + " the intervals too narrow; consider an AR model or HAC errors."
                : "No serial correlation up to lag " + order + " is detected, so the reported standard errors and"
                        + " intervals need no correction for it.";
    }
}
