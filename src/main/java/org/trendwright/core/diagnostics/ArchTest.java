package org.trendwright.core.diagnostics;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.TestResult;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.SumsOfSquares;

/**
 * Engle's Lagrange-multiplier test for autoregressive conditional heteroskedasticity (ARCH) of order
 * q in residuals (Engle 1982, "Autoregressive conditional heteroscedasticity with estimates of the
 * variance of United Kingdom inflation", Econometrica 50).
 *
 * <p>The auxiliary regression is e_t^2 = a_0 + a_1 e_{t-1}^2 + ... + a_q e_{t-q}^2 + v_t over
 * t = q+1..n, so T = n - q rows with no pre-sample values. LM = T R^2, with R^2 the centred
 * R-squared of that regression, is asymptotically chi-square(q) when the error variance does not
 * depend on past errors. The residuals are divided by their largest absolute value before squaring:
 * R^2 does not change, and squares of residuals beyond 1e154 cannot overflow.
 *
 * <p>Residuals must be in time order over consecutive periods; the caller refuses series with gaps.
 *
 * <p>Stateless and thread-safe.
 */
public final class ArchTest {

    private ArchTest() {
    }

    /**
     * The ARCH LM test of order q.
     *
     * @throws InvalidSpecificationException when q < 1, the level is outside (0, 1), a residual is
     *                                       not finite, every residual is 0, or the squared residuals
     *                                       e_{q+1}^2..e_n^2 are all equal (R^2 would be 0/0)
     * @throws InsufficientDataException     when n < 2q + 2, so the auxiliary regression (q + 1
     *                                       coefficients on n - q rows) has no residual degrees of freedom
     * @throws org.trendwright.core.RankDeficientDesignException when a lagged squared-residual column
     *                                       is a linear combination of the constant and the others
     *                                       (only in degenerate residual patterns)
     */
    public static ArchTestResult test(double[] residuals, int order, double level) {
        TestResult.checkLevel(level);
        checkOrder(order, residuals.length);
        ResidualAutocorrelations.requireUsable(residuals, 2 * order + 2, "The ARCH test");
        int n = residuals.length;
        double[] squares = scaledSquares(residuals);
        double[] response = Arrays.copyOfRange(squares, order, n);
        requireVariation(response, order);
        SumsOfSquares auxiliary = LeastSquares.sumsOfSquares(auxiliaryDesign(squares, order), response);
        int rows = n - order;
        // Centred R^2 of a fit with an intercept is >= 0; rounding may leave it a hair below.
        double rSquared = Math.max(0, auxiliary.rSquared());
        double lm = rows * rSquared;
        double p = UpperTails.chiSquare(lm, order);
        TestResult result = new TestResult("ARCH LM (order " + order + ")",
                "The residual variance does not depend on the last " + order + " squared residuals", lm,
                "chi-square", List.of((double) order), p, level, TestResult.decide(p, level), reading(p < level));
        return new ArchTestResult(order, rows, rSquared, result);
    }

    private static void checkOrder(int order, int n) {
        if (order < 1) {
            throw new InvalidSpecificationException("The ARCH test order must be at least 1, got " + order + ".");
        }
        if (n < 2 * order + 2) {
            throw new InsufficientDataException("The ARCH test of order " + order + " needs at least "
                    + (2 * order + 2) + " residuals but got " + n + "; supply a longer series or test a lower order.");
        }
    }

    /** (e_t / max|e|)^2: same R^2 as e_t^2, no overflow. */
    private static double[] scaledSquares(double[] e) {
        double largest = 0;
        for (double v : e) {
            largest = Math.max(largest, Math.abs(v));
        }
        double[] squares = new double[e.length];
        for (int t = 0; t < e.length; t++) {
            double scaled = e[t] / largest;
            squares[t] = scaled * scaled;
        }
        return squares;
    }

    private static void requireVariation(double[] response, int order) {
        for (double v : response) {
            if (v != response[0]) {
                return;
            }
        }
        throw new InvalidSpecificationException("The squared residuals from period " + (order + 1)
                + " on are all equal, so there is no variation in their size for the ARCH test to explain.");
    }

    /** A constant and the squares lagged 1..q, each over rows t = q+1..n. */
    private static Design auxiliaryDesign(double[] squares, int order) {
        int rows = squares.length - order;
        List<double[]> columns = new ArrayList<>(order + 1);
        List<String> names = new ArrayList<>(order + 1);
        double[] constant = new double[rows];
        Arrays.fill(constant, 1);
        columns.add(constant);
        names.add("constant");
        for (int j = 1; j <= order; j++) {
            columns.add(Arrays.copyOfRange(squares, order - j, order - j + rows));
            names.add("squared residual lag " + j);
        }
        return new Design(columns, names, true);
    }

    private static String reading(boolean rejected) {
        return rejected
                ? "Large errors cluster in time, so a constant-width prediction interval is too narrow in volatile"
                        + " periods and too wide in calm ones."
                : "The size of the errors shows no dependence on recent errors, so a constant-width prediction"
                        + " interval is reasonable.";
    }
}
