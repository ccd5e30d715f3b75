package org.trendwright.core.regression;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.special.Beta;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.StudentT;

/**
 * Ordinary least squares by Householder QR with column pivoting, never by the normal equations.
 *
 * <p>With X = Q R (Q orthonormal, R upper triangular) the normal equations X'X b = X'y become
 * R'R b = R'Q'y, and since R is non-singular for a full-rank X, R b = Q'y, solved by back
 * substitution. Forming X'X squares the condition number; the QR route does not (Golub 1965,
 * "Numerical methods for solving linear least squares problems", Numer. Math. 7).
 *
 * <p>Further steps buy accuracy on ill-conditioned designs such as high-degree polynomials:
 * <ol>
 *   <li>each column is scaled by the power of two nearest below its Euclidean length before the
 *       decomposition; scaling by a power of two is exact, so the scaled problem has the very
 *       same solution, undone exactly afterwards ({@link ScaledDesign});</li>
 *   <li>columns are pivoted as if scaled to unit length (Businger &amp; Golub 1965;
 *       {@link PivotedQr}), so that on the unit-scaled factor |R_11| &gt;= |R_22| &gt;= ...; the
 *       design counts as rank deficient when some |R_jj| falls to {@link #RANK_TOLERANCE} times
 *       |R_11| or below, and the error names the first regressor that is a linear combination of
 *       the ones before it;</li>
 *   <li>the solution is refined through the augmented system with residuals accumulated in
 *       double-double arithmetic (Björck 1967, BIT 7; see {@link AugmentedRefinement}), which
 *       also removes the cond(X)^2 ||r|| error term of large-residual problems;</li>
 *   <li>(X'X)^-1 = P R^-1 R^-T P' comes from the triangular factor and is refined against X'X
 *       accumulated in double-double arithmetic ({@link GramInverse}), unless the pivoted
 *       unit-column R has a diagonal ratio of at most {@value #WELL_CONDITIONED}, where the
 *       unrefined inverse is already accurate to about cond(X) u, below 1e-13 relative;</li>
 *   <li>fitted values, residuals and the sums of squares are accumulated in double-double
 *       arithmetic (Ogita, Rump &amp; Oishi 2005, SIAM J. Sci. Comput. 26).</li>
 * </ol>
 *
 * <p>On every NIST StRD linear dataset the coefficients are the correctly rounded exact
 * least-squares solution of the data as stored in double precision, and the other certified
 * quantities as close to it; src/docs/accuracy.md has the figures.
 *
 * <p>Stateless and thread-safe.
 */
public final class LeastSquares {

    /**
     * Relative rank tolerance on the pivoted R of the columns scaled to unit length: a diagonal
     * element at most this times the first (the largest) marks the column as a linear combination
     * of the others. 1e-13 sits about 500 ulps above double rounding, so the NIST StRD Filip polynomial
     * (degree 10) still counts as full rank while exact collinearity is caught.
     */
    public static final double RANK_TOLERANCE = 1e-13;

    private LeastSquares() {
    }

    /** Diagonal ratio of R up to which {@link #estimates} skips the refinement (see there). */
    static final double WELL_CONDITIONED = 100;

    /**
     * Whether |r_11 / r_kk| of the pivoted unit-column R, a lower estimate of cond(X), is at most
     * {@value #WELL_CONDITIONED}: where the refinements of the solution and of (X'X)^-1 may be skipped.
     */
    private static boolean isWellConditioned(double[][] unitR) {
        int last = unitR.length - 1;
        return Math.abs(unitR[0][0] / unitR[last][last]) <= WELL_CONDITIONED;
    }

    /**
     * Fits y = X b + e by least squares.
     *
     * <p>R^2 and F are NaN when y is constant about its centre (TSS = 0); OlsFit lists the other
     * conventions (exact fits, intercept-only designs).
     *
     * @throws InsufficientDataException    when n <= k (no residual degrees of freedom)
     * @throws RankDeficientDesignException when a regressor is zero in every row or a linear
     *                                      combination of the regressors before it
     * @throws InvalidSpecificationException when y has the wrong length or a non-finite value
     */
    public static OlsFit fit(Design design, double[] y) {
        Solved solved = solve(design, y, false);
        ScaledDesign scaled = solved.scaled();
        return summarize(design, y, fitted(scaled.columns(), solved.scaledB()), scaled.fitMagnitude(solved.scaledB()),
                solved, scaled.unscaled(solved.scaledB()), xtxInverse(solved),
                SmallSingularValues.conditionNumber(solved.unitR()));
    }

    /**
     * The coefficient of the regressor {@code name} with its classical standard error and the fit's
     * RSS, without the rest of the inference: no other t statistics or p-values, F test, condition
     * number, fitted values or summaries. For test regressions that read one t statistic, such as
     * the augmented Dickey-Fuller regression. The estimate and RSS equal {@link #fit}'s bit for bit
     * (the same factorisation and refinement). So does the standard error on a design whose diagonal
     * ratio is at most {@value #WELL_CONDITIONED}; above it, only column j of (X'X)^-1 is refined
     * ({@link GramInverse#refinedColumn}), which agrees with fit's refined inverse to its accuracy.
     *
     * @throws IllegalArgumentException     when the design has no regressor of that name
     * @throws InsufficientDataException    as {@link #fit}
     * @throws RankDeficientDesignException as {@link #fit}
     * @throws InvalidSpecificationException as {@link #fit}
     */
    public static SingleCoefficientFit singleCoefficient(Design design, double[] y, String name) {
        int j = design.names().indexOf(name);
        if (j < 0) {
            throw new IllegalArgumentException("No regressor named '" + name + "'.");
        }
        Solved solved = solve(design, y, false);
        ScaledDesign scaled = solved.scaled();
        double b = scaled.unscaled(solved.scaledB())[j];
        double scaledDiagonal = isWellConditioned(solved.unitR()) ? solved.qr().inverseGram()[j][j]
                : GramInverse.refinedColumn(scaled.columns(), solved.qr(), j)[j];
        double variance = solved.residualSumOfSquares() / (design.rows() - design.width());
        double standardError = standardError(variance, scaled.unscaledInverseEntry(scaledDiagonal, j, j));
        return new SingleCoefficientFit(name, b, standardError, design.rows(), solved.residualSumOfSquares());
    }

    /** (X'X)^-1 of the original columns, refined against X'X unless the design is well conditioned. */
    private static double[][] xtxInverse(Solved solved) {
        ScaledDesign scaled = solved.scaled();
        return scaled.unscaledInverse(isWellConditioned(solved.unitR())
                ? solved.qr().inverseGram() : GramInverse.refined(scaled.columns(), solved.qr()));
    }

    /** se(b_j) = sqrt(s^2 [(X'X)^-1]_jj). */
    private static double standardError(double variance, double inverseDiagonal) {
        return Math.sqrt(variance * inverseDiagonal);
    }

    /**
     * The sums of squares that {@link #fit} would report for the same data, bit for bit (the same
     * factorisation, refinement and double-double sums), without the inference: no (X'X)^-1,
     * standard errors, t quantile or condition number. For auxiliary regressions such as those of
     * the Breusch-Godfrey and ARCH tests, which use only RSS or R^2.
     *
     * @throws InsufficientDataException    when n <= k
     * @throws RankDeficientDesignException as {@link #fit}
     * @throws InvalidSpecificationException as {@link #fit}
     */
    public static SumsOfSquares sumsOfSquares(Design design, double[] y) {
        Solved solved = solve(design, y, false);
        double centre = design.hasIntercept() ? mean(y) : 0;
        double rss = solved.residualSumOfSquares();
        double tss = sumOfSquares(y, centre);
        double[] fitted = fitted(solved.scaled().columns(), solved.scaledB());
        return new SumsOfSquares(rss, tss, explainedSumOfSquares(fitted, centre, tss, rss,
                solved.scaled().fitMagnitude(solved.scaledB())));
    }

    /**
     * The solution on the scaled columns, with the residuals (exactly 0 for an exact fit) and their sum of
     * squares in double-double arithmetic ({@link #sumOfSquares}).
     */
    private record Solved(ScaledDesign scaled, PivotedQr qr, double[][] unitR, double[] scaledB, double[] residuals,
                          double residualSumOfSquares) {
    }

    /**
     * Checks, scales, factors and solves; with {@code maySkipRefinement} a design whose diagonal ratio is at
     * most {@link #WELL_CONDITIONED} gets the plain Householder solution (see {@link #estimates}).
     */
    private static Solved solve(Design design, double[] y, boolean maySkipRefinement) {
        int n = design.rows();
        int k = design.width();
        checkInput(design, y);
        if (n <= k) {
            throw InsufficientDataException.forModel("A regression on " + k + " regressors", k + 1, n);
        }
        ScaledDesign scaled = ScaledDesign.of(design);
        PivotedQr qr = PivotedQr.factor(scaled.columns());
        double[][] unitR = scaled.unitLengthR(qr);
        scaled.checkRank(unitR);
        AugmentedRefinement.Solution solution = maySkipRefinement && isWellConditioned(unitR)
                ? AugmentedRefinement.plain(scaled.columns(), qr, y)
                : AugmentedRefinement.solve(scaled.columns(), qr, y);
        double[] scaledB = solution.coefficients();
        double rss = sumOfSquares(solution.residuals(), 0);
        return isExactFit(scaled.columns(), y, scaledB, rss)
                ? new Solved(scaled, qr, unitR, scaledB, new double[n], 0)
                : new Solved(scaled, qr, unitR, scaledB, solution.residuals(), rss);
    }

    /**
     * The coefficients and residuals of {@link #fit} alone, without the inference and summaries: no
     * (X'X)^-1, condition number, t or F probabilities. For callers that refit many times and need
     * only the point estimates, such as out-of-sample forecasts and the iterations of feasible GLS.
     * Same checks, scaling and pivoted QR as {@link #fit}. The augmented-system refinement, which
     * costs several times the factorisation, is applied only when the pivoted unit-column R has a
     * diagonal ratio |r_11 / r_kk| above {@value #WELL_CONDITIONED} (a lower estimate of cond(X));
     * below it the plain Householder solution is already accurate to about c u cond(X)^2 &lt; 1e-11
     * relative (Higham 2002, Theorem 20.3), far inside what a forecast or a comparison can show.
     * Immutable.
     *
     * @throws InsufficientDataException    as {@link #fit}
     * @throws RankDeficientDesignException as {@link #fit}
     * @throws InvalidSpecificationException as {@link #fit}
     */
    public static Estimates estimates(Design design, double[] y) {
        Solved solved = solve(design, y, true);
        return new Estimates(solved.scaled().unscaled(solved.scaledB()), solved.residuals(),
                solved.residualSumOfSquares(), design.rows() - design.width());
    }

    /**
     * The residual sums of squares of nested regressions: for each p, y on the first
     * {@code widths[p]} columns of {@code largest}. One Householder QR of the design in its own
     * column order (no pivoting), X = Q R, serves them all: with c = Q'y, the regression on the
     * first m columns leaves RSS_m = sum_{j >= m} c_j^2 (Golub &amp; Van Loan 1996, Matrix
     * Computations, 3rd ed., section 5.3.5). A column that adds nothing to the ones before it (a
     * remainder of rounding noise) is left out of the factorisation ({@link PivotedQr#ofAddedColumns}),
     * so with r of the first m columns kept, RSS_m = sum_{j >= r} c_j^2: such a column leaves RSS
     * unchanged wherever it stands. No rank check is made, and the columns are used as given (no
     * scaling).
     *
     * @throws InvalidSpecificationException when y has the wrong length or a non-finite value, or a
     *                                       width is negative or above the design's
     */
    public static double[] nestedResidualSumsOfSquares(Design largest, double[] y, int[] widths) {
        checkInput(largest, y);
        int k = largest.width();
        boolean[] added = new boolean[k];
        PivotedQr qr = PivotedQr.ofAddedColumns(largest.sharedColumns(), added);
        double[] c = y.clone();
        qr.applyQTranspose(c);
        double[] tail = new double[c.length + 1];
        for (int j = c.length - 1; j >= 0; j--) {
            tail[j] = tail[j + 1] + c[j] * c[j];
        }
        int[] rankOfLeading = new int[k + 1];
        for (int j = 0; j < k; j++) {
            rankOfLeading[j + 1] = rankOfLeading[j] + (added[j] ? 1 : 0);
        }
        double[] rss = new double[widths.length];
        for (int p = 0; p < widths.length; p++) {
            if (widths[p] < 0 || widths[p] > k) {
                throw new InvalidSpecificationException("Nested regression " + p + " asks for " + widths[p]
                        + " columns of a design with " + k + ".");
            }
            rss[p] = tail[rankOfLeading[widths[p]]];
        }
        return rss;
    }

    /**
     * The point estimates of a least-squares fit, equal to those {@link #fit} reports.
     *
     * @param coefficients              b, in the design's column order
     * @param residuals                 y - X b as {@link OlsFit#residuals()}
     * @param residualSumOfSquares      as {@link OlsFit#residualSumOfSquares()}
     * @param residualDegreesOfFreedom  n - k
     */
    public record Estimates(double[] coefficients, double[] residuals, double residualSumOfSquares,
                            int residualDegreesOfFreedom) {

        public Estimates {
            coefficients = coefficients.clone();
            residuals = residuals.clone();
        }

        @Override
        public double[] coefficients() {
            return coefficients.clone();
        }

        @Override
        public double[] residuals() {
            return residuals.clone();
        }

        /** s^2 = RSS / (n - k), as {@link OlsFit#residualVariance()}. */
        public double residualVariance() {
            return residualSumOfSquares / residualDegreesOfFreedom;
        }

        /** The point prediction x'b, summed as {@link OlsFit#predict}. */
        public double predict(double[] x) {
            double sum = 0;
            for (int j = 0; j < coefficients.length; j++) {
                sum += x[j] * coefficients[j];
            }
            return sum;
        }
    }

    private static void checkInput(Design design, double[] y) {
        if (y.length != design.rows()) {
            throw new InvalidSpecificationException("The response has " + y.length + " values but the design has "
                    + design.rows() + " rows.");
        }
        for (int i = 0; i < y.length; i++) {
            if (!Double.isFinite(y[i])) {
                throw new InvalidSpecificationException("Response value " + (i + 1) + " is " + y[i]
                        + "; least squares needs finite numbers.");
            }
        }
        double[][] columns = design.sharedColumns();
        for (int j = 0; j < columns.length; j++) {
            for (int i = 0; i < columns[j].length; i++) {
                if (!Double.isFinite(columns[j][i])) {
                    throw new InvalidSpecificationException("Regressor '" + design.names().get(j) + "' row " + (i + 1)
                            + " is " + columns[j][i] + "; least squares needs finite numbers.");
                }
            }
        }
    }

    /**
     * The fit's statistics. The residuals are those of the refined solution: the least-squares
     * residuals to about u ||r||, orthogonal to every column to working precision; y - X b from the
     * rounded coefficients would add X (b - b_exact), which an ill-conditioned X inflates. The one
     * exception is an exact fit, where y - X b is exactly 0 (in double-double arithmetic) and is
     * reported as such, rather than the refinement's remnant of order u^2 ||y||, so that an exact
     * fit keeps the conventions OlsFit lists for it.
     *
     * <p>R^2 = ESS/TSS and F = (ESS/(k - c))/s^2, with the explained sum of squares ESS from
     * {@link #explainedSumOfSquares}.
     */
    private static OlsFit summarize(Design design, double[] y, double[] fitted, double fitMagnitude,
                                    Solved solved, double[] b, double[][] xtxInverse, double conditionNumber) {
        int n = y.length;
        int k = b.length;
        int df = n - k;
        double[] residuals = solved.residuals();
        double centre = design.hasIntercept() ? mean(y) : 0;
        double rss = solved.residualSumOfSquares();
        double tss = sumOfSquares(y, centre);
        double ess = explainedSumOfSquares(fitted, centre, tss, rss, fitMagnitude);
        double variance = rss / df;
        List<Coefficient> coefficients = coefficients(design, b, xtxInverse, variance, df);
        int modelDf = k - (design.hasIntercept() ? 1 : 0);
        double fStatistic = modelDf == 0 ? Double.NaN : (ess / modelDf) / variance;
        double fPValue = modelDf == 0 ? Double.NaN : upperTailF(fStatistic, modelDf, df);
        double rSquared = ess / tss;
        double adjusted = 1 - (rss / tss) * (n - (design.hasIntercept() ? 1 : 0)) / df;
        double logLikelihood = GaussianLikelihood.logLikelihood(n, rss);
        double aic = GaussianLikelihood.aic(logLikelihood, k + 1);
        double bic = GaussianLikelihood.bic(logLikelihood, n, k + 1);
        return new OlsFit(design, y, coefficients, fitted, residuals, rss, tss, rSquared, adjusted, fStatistic,
                fPValue, Math.sqrt(variance), df, logLikelihood, aic, bic, xtxInverse, conditionNumber);
    }

    /**
     * The explained sum of squares ESS = sum (yhat_i - c)^2, c the mean of y with an intercept and
     * 0 without, by the more accurate of two routes. For a least-squares fit ESS = TSS - RSS, whose
     * error is about u TSS: fine unless ESS is a small part of TSS (R^2 near 0), where it cancels.
     * Summed directly, the error is about 2 u sqrt(ESS) sum_j ||x_j|| |b_j| (the rounding of the
     * coefficients, moved through X): fine unless the fitted values vary little about a large
     * level. The direct sum is taken when its error bound is the smaller one. On NIST's Wampler5
     * (R^2 = 0.0022) that gains 1.2 digits of R^2.
     *
     * @param fitMagnitude sum_j ||x_j|| |b_j|
     */
    private static double explainedSumOfSquares(double[] fitted, double centre, double tss, double rss,
                                                double fitMagnitude) {
        double direct = sumOfSquares(fitted, centre);
        return 2 * Math.sqrt(direct) * fitMagnitude < tss ? direct : tss - rss;
    }

    /**
     * X b, each entry accumulated in double-double arithmetic and rounded once; the scaled columns
     * with their coefficients give exactly the products x_ij b_j of the original ones.
     */
    private static double[] fitted(double[][] columns, double[] scaledB) {
        double[] fitted = new double[columns[0].length];
        for (int i = 0; i < fitted.length; i++) {
            CompensatedDot sum = new CompensatedDot();
            for (int j = 0; j < scaledB.length; j++) {
                sum.addProduct(columns[j][i], scaledB[j]);
            }
            fitted[i] = sum.value();
        }
        return fitted;
    }

    /**
     * Whether y - X b is exactly 0 in double-double arithmetic. Only a refined residual at or below
     * the rounding level of y, ||r||^2 <= u^2 ||y||^2 with ||y||^2 summed in double-double, can belong
     * to an exact fit, so the n k check runs only then. A plain sum of the y_i^2 is within a factor
     * 1 + n u of the double-double one (Higham 2002, section 4.2), so a residual above 2 u^2 times the
     * plain sum is refused at once, with the same answer and without the double-double pass.
     */
    private static boolean isExactFit(double[][] columns, double[] y, double[] scaledB, double refinedRss) {
        if (refinedRss > 0x1p-105 * plainSumOfSquares(y) || refinedRss > 0x1p-106 * sumOfSquares(y, 0)) {
            return false;
        }
        for (int i = 0; i < y.length; i++) {
            CompensatedDot residual = new CompensatedDot().add(y[i]);
            for (int j = 0; j < scaledB.length; j++) {
                residual.addProduct(-columns[j][i], scaledB[j]);
            }
            if (residual.value() != 0) {
                return false;
            }
        }
        return true;
    }

    private static List<Coefficient> coefficients(Design design, double[] b, double[][] xtxInverse,
                                                  double variance, int df) {
        TDistribution t = new TDistribution(null, df);
        double critical = StudentT.quantile(df, 0.975);
        List<Coefficient> coefficients = new ArrayList<>(b.length);
        for (int j = 0; j < b.length; j++) {
            double se = standardError(variance, xtxInverse[j][j]);
            double tStat = b[j] / se;
            double p = Double.isNaN(tStat) ? Double.NaN : 2 * t.cumulativeProbability(-Math.abs(tStat));
            coefficients.add(new Coefficient(design.names().get(j), b[j], se, tStat, p,
                    b[j] - critical * se, b[j] + critical * se));
        }
        return coefficients;
    }

    /** Upper tail of F(d1, d2), exact even far out in the tail (1 - cdf would round to 0 there). */
    static double upperTailF(double f, int d1, int d2) {
        if (Double.isInfinite(f)) {
            return 0;
        }
        // P(F > f) = I_{d2/(d2 + d1 f)}(d2/2, d1/2), the regularized incomplete beta function.
        return Beta.regularizedBeta(d2 / (d2 + d1 * f), d2 / 2.0, d1 / 2.0);
    }

    private static double plainSumOfSquares(double[] values) {
        double sum = 0;
        for (double v : values) {
            sum += v * v;
        }
        return sum;
    }

    /** The mean, from a sum in double-double arithmetic rounded once. */
    static double mean(double[] values) {
        CompensatedDot sum = new CompensatedDot();
        for (double v : values) {
            sum.add(v);
        }
        return sum.value() / values.length;
    }

    /**
     * Sum of (v - centre)^2 in double-double arithmetic: each difference is rounded once (relative
     * error u), the squares and their sum are exact to twice the working precision.
     */
    static double sumOfSquares(double[] values, double centre) {
        CompensatedDot sum = new CompensatedDot();
        for (double v : values) {
            double d = v - centre;
            sum.addProduct(d, d);
        }
        return sum.value();
    }
}
