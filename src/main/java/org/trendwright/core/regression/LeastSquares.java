package org.trendwright.core.regression;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.RRQRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.apache.commons.math3.special.Beta;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.RankDeficientDesignException;

/**
 * Ordinary least squares by Householder QR with column pivoting, never by the normal equations.
 *
 * <p>With X = Q R (Q orthonormal, R upper triangular) the normal equations X'X b = X'y become
 * R'R b = R'Q'y, and since R is non-singular for a full-rank X, R b = Q'y, solved by back
 * substitution. Forming X'X squares the condition number; the QR route does not (Golub 1965,
 * "Numerical methods for solving linear least squares problems", Numer. Math. 7).
 *
 * <p>Three further steps buy accuracy on ill-conditioned designs such as high-degree polynomials:
 * <ol>
 *   <li>each column is scaled to unit Euclidean length before the decomposition (the fit is
 *       invariant; the scaling is undone afterwards);</li>
 *   <li>columns are pivoted by norm (Businger & Golub 1965), so |R_11| >= |R_22| >= ..., and the
 *       numerical rank is the number of |R_jj| above {@link #RANK_TOLERANCE} times |R_11|;</li>
 *   <li>one step of iterative refinement: the least-squares correction for the residual of the
 *       first solution is added to it (Golub & Wilkinson 1966, Numer. Math. 9).</li>
 * </ol>
 *
 * <p>(X'X)^-1 = P R^-1 R^-T P' comes from the triangular factor, again without forming X'X.
 *
 * <p>Stateless and thread-safe.
 */
public final class LeastSquares {

    /**
     * Relative rank tolerance on the pivoted, column-scaled R: a diagonal element smaller than
     * this times the largest marks the column as a linear combination of the others. 1e-13 sits
     * about 500 ulps above double rounding, so the NIST StRD Filip polynomial (degree 10) still
     * counts as full rank while exact collinearity is caught.
     */
    public static final double RANK_TOLERANCE = 1e-13;

    private LeastSquares() {
    }

    /**
     * Fits y = X b + e by least squares.
     *
     * @throws InsufficientDataException    when n <= k (no residual degrees of freedom)
     * @throws RankDeficientDesignException when a regressor is a linear combination of the others
     * @throws InvalidSpecificationException when y has the wrong length or a non-finite value
     */
    public static OlsFit fit(Design design, double[] y) {
        int n = design.rows();
        int k = design.width();
        checkInput(design, y);
        if (n <= k) {
            throw InsufficientDataException.forModel("A regression on " + k + " regressors", k + 1, n);
        }
        double[] scale = columnNorms(design);
        RealMatrix scaled = scaledMatrix(design, scale);
        RRQRDecomposition qr = new RRQRDecomposition(scaled, 0.0);
        RealMatrix r = qr.getR().getSubMatrix(0, k - 1, 0, k - 1);
        int[] pivot = pivotOrder(qr.getP(), k);
        checkRank(design, r, pivot);
        double[] b = refinedSolution(qr.getSolver(), scaled, y);
        double[] estimates = new double[k];
        for (int j = 0; j < k; j++) {
            estimates[j] = b[j] / scale[j];
        }
        double[][] xtxInverse = xtxInverse(r, pivot, scale);
        double conditionNumber = new SingularValueDecomposition(r).getConditionNumber();
        return summarize(design, y, estimates, xtxInverse, conditionNumber);
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
        for (int j = 0; j < design.width(); j++) {
            for (int i = 0; i < design.rows(); i++) {
                if (!Double.isFinite(design.get(i, j))) {
                    throw new InvalidSpecificationException("Regressor '" + design.names().get(j) + "' row " + (i + 1)
                            + " is " + design.get(i, j) + "; least squares needs finite numbers.");
                }
            }
        }
    }

    private static double[] columnNorms(Design design) {
        double[] norms = new double[design.width()];
        for (int j = 0; j < norms.length; j++) {
            norms[j] = new ArrayRealVector(design.columns().get(j), false).getNorm();
            if (norms[j] == 0) {
                throw new RankDeficientDesignException("Regressor '" + design.names().get(j)
                        + "' is zero in every row, so its coefficient cannot be estimated; drop it from the model.");
            }
        }
        return norms;
    }

    private static RealMatrix scaledMatrix(Design design, double[] scale) {
        double[][] rows = design.toRows();
        for (double[] row : rows) {
            for (int j = 0; j < scale.length; j++) {
                row[j] /= scale[j];
            }
        }
        return new Array2DRowRealMatrix(rows, false);
    }

    /** pivot[i] = the original column placed at position i by the pivoting. */
    private static int[] pivotOrder(RealMatrix permutation, int k) {
        int[] pivot = new int[k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                if (permutation.getEntry(j, i) != 0) {
                    pivot[i] = j;
                }
            }
        }
        return pivot;
    }

    private static void checkRank(Design design, RealMatrix r, int[] pivot) {
        double largest = Math.abs(r.getEntry(0, 0));
        for (int i = 1; i < pivot.length; i++) {
            if (Math.abs(r.getEntry(i, i)) <= RANK_TOLERANCE * largest) {
                throw new RankDeficientDesignException("Regressor '" + design.names().get(pivot[i])
                        + "' is (numerically) a linear combination of the others, so the coefficients are not"
                        + " unique; drop it or one of the regressors it depends on.");
            }
        }
    }

    private static double[] refinedSolution(DecompositionSolver solver, RealMatrix scaled, double[] y) {
        double[] b = solver.solve(new ArrayRealVector(y, false)).toArray();
        double[] residual = exactResidual(scaled, y, b);
        double[] correction = solver.solve(new ArrayRealVector(residual, false)).toArray();
        for (int j = 0; j < b.length; j++) {
            b[j] += correction[j];
        }
        return b;
    }

    /** y - X b with each row's dot product accumulated by fused multiply-adds. */
    private static double[] exactResidual(RealMatrix x, double[] y, double[] b) {
        double[] residual = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            double sum = -y[i];
            for (int j = 0; j < b.length; j++) {
                sum = Math.fma(x.getEntry(i, j), b[j], sum);
            }
            residual[i] = -sum;
        }
        return residual;
    }

    /** (X'X)^-1 = D^-1 P R^-1 R^-T P' D^-1 for the scaled, pivoted factorisation X D^-1 P = Q R. */
    private static double[][] xtxInverse(RealMatrix r, int[] pivot, double[] scale) {
        int k = pivot.length;
        double[][] rInverse = upperTriangularInverse(r);
        double[][] result = new double[k][k];
        for (int a = 0; a < k; a++) {
            for (int c = a; c < k; c++) {
                double sum = 0;
                for (int m = Math.max(a, c); m < k; m++) {
                    sum += rInverse[a][m] * rInverse[c][m];
                }
                int i = pivot[a];
                int j = pivot[c];
                result[i][j] = sum / (scale[i] * scale[j]);
                result[j][i] = result[i][j];
            }
        }
        return result;
    }

    private static double[][] upperTriangularInverse(RealMatrix r) {
        int k = r.getRowDimension();
        double[][] inverse = new double[k][k];
        for (int j = 0; j < k; j++) {
            inverse[j][j] = 1 / r.getEntry(j, j);
            for (int i = j - 1; i >= 0; i--) {
                double sum = 0;
                for (int m = i + 1; m <= j; m++) {
                    sum += r.getEntry(i, m) * inverse[m][j];
                }
                inverse[i][j] = -sum / r.getEntry(i, i);
            }
        }
        return inverse;
    }

    private static OlsFit summarize(Design design, double[] y, double[] b, double[][] xtxInverse,
                                    double conditionNumber) {
        int n = y.length;
        int k = b.length;
        int df = n - k;
        double[] fitted = new double[n];
        double[] residuals = new double[n];
        for (int i = 0; i < n; i++) {
            double sum = 0;
            for (int j = 0; j < k; j++) {
                sum = Math.fma(design.get(i, j), b[j], sum);
            }
            fitted[i] = sum;
            residuals[i] = y[i] - sum;
        }
        double rss = sumOfSquares(residuals, 0);
        double tss = design.hasIntercept() ? sumOfSquares(y, mean(y)) : sumOfSquares(y, 0);
        double variance = rss / df;
        List<Coefficient> coefficients = coefficients(design, b, xtxInverse, variance, df);
        int modelDf = k - (design.hasIntercept() ? 1 : 0);
        double fStatistic = modelDf == 0 ? Double.NaN : ((tss - rss) / modelDf) / variance;
        double fPValue = modelDf == 0 ? Double.NaN : upperTailF(fStatistic, modelDf, df);
        double rSquared = 1 - rss / tss;
        double adjusted = 1 - (1 - rSquared) * (n - (design.hasIntercept() ? 1 : 0)) / df;
        double logLikelihood = -0.5 * n * (Math.log(2 * Math.PI) + Math.log(rss / n) + 1);
        double aic = -2 * logLikelihood + 2.0 * (k + 1);
        double bic = -2 * logLikelihood + Math.log(n) * (k + 1);
        return new OlsFit(design, y, coefficients, fitted, residuals, rss, tss, rSquared, adjusted, fStatistic,
                fPValue, Math.sqrt(variance), df, logLikelihood, aic, bic, xtxInverse, conditionNumber);
    }

    private static List<Coefficient> coefficients(Design design, double[] b, double[][] xtxInverse,
                                                  double variance, int df) {
        TDistribution t = new TDistribution(null, df);
        double critical = t.inverseCumulativeProbability(0.975);
        List<Coefficient> coefficients = new ArrayList<>(b.length);
        for (int j = 0; j < b.length; j++) {
            double se = Math.sqrt(variance * xtxInverse[j][j]);
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

    static double mean(double[] values) {
        double sum = 0;
        for (double v : values) {
            sum += v;
        }
        double mean = sum / values.length;
        double correction = 0;
        for (double v : values) {
            correction += v - mean;
        }
        return mean + correction / values.length;
    }

    /** Sum of (v - centre)^2, two-pass so that a large mean does not swamp the squares. */
    static double sumOfSquares(double[] values, double centre) {
        double sum = 0;
        double compensation = 0;
        for (double v : values) {
            double d = v - centre;
            double term = d * d - compensation;
            double next = sum + term;
            compensation = (next - sum) - term;
            sum = next;
        }
        return sum;
    }
}
