package org.trendwright.core.regression;

import java.util.Optional;
import org.trendwright.core.Matrices;

/**
 * Least-squares coefficients by the normal equations X'X b = X'y, for callers that solve many
 * small regressions and need b only to forecasting accuracy: the steering steps of feasible GLS
 * and the refits of a trend at each training end of a model comparison. Everything that is
 * reported with inference goes through {@link LeastSquares}, which never forms X'X.
 *
 * <p>The caller accumulates the upper triangle of X'X and X'y row by row ({@link #addRow}). The
 * Gram matrix is scaled to unit diagonal, G = D X'X D with D = diag(1/||x_j||), and factored by
 * Cholesky, G = L L'; then b = D L^-T L^-1 D X'y.
 *
 * <p>Forming X'X squares the condition number, so b is accurate only to about c u cond(X)^2
 * relative (Higham 2002, Accuracy and Stability of Numerical Algorithms, 2nd ed., section 20.4),
 * against the Householder route's c u (cond(X) + cond(X)^2 ||r|| / (||X|| ||b||))
 * (Theorem 20.3); with a residual that is not small the two are of one order. No answer is given
 * when some pivot l_jj of the unit-diagonal factor falls below 1/{@value #WELL_CONDITIONED}:
 * 1/min l_jj is a lower bound on cond(X D) (l_jj is the distance of unit column j from the span of
 * the columns before it, at least the smallest singular value), so the bound is then not known to
 * be small, and the caller takes the QR route, which also reports rank deficiency and invalid data
 * with its messages. Stateless.
 */
public final class NormalEquations {

    /** The least pivot accepted is 1/100: where it is met, cond(X)^2 u stays near 1e-12. */
    public static final double WELL_CONDITIONED = 100;

    private NormalEquations() {
    }

    /** Adds the row x with response y to the upper triangle of {@code gram} (X'X) and to {@code moment} (X'y). */
    public static void addRow(double[] x, double y, double[][] gram, double[] moment) {
        for (int i = 0; i < x.length; i++) {
            double xi = x[i];
            moment[i] = Math.fma(xi, y, moment[i]);
            double[] gramRow = gram[i];
            for (int j = i; j < x.length; j++) {
                gramRow[j] = Math.fma(xi, x[j], gramRow[j]);
            }
        }
    }

    /**
     * b from the upper triangle of X'X and from X'y (neither is changed), or empty when the scaled
     * Gram matrix is not clearly well conditioned (see the class comment).
     */
    public static Optional<double[]> solve(double[][] gram, double[] moment) {
        int k = moment.length;
        double[] scale = new double[k];
        for (int j = 0; j < k; j++) {
            if (!(gram[j][j] > 0) || !Double.isFinite(gram[j][j])) {
                return Optional.empty();
            }
            scale[j] = 1 / Math.sqrt(gram[j][j]);
        }
        double[][] factor = choleskyOfScaled(gram, scale);
        if (factor == null) {
            return Optional.empty();
        }
        double[] z = new double[k];
        for (int j = 0; j < k; j++) {
            z[j] = moment[j] * scale[j];
        }
        solveInPlace(factor, z);
        for (int j = 0; j < k; j++) {
            z[j] *= scale[j];
        }
        return Optional.of(z);
    }

    /**
     * The lower Cholesky factor L of D G D (from the upper triangle of G), or null when a pivot
     * l_jj is below 1/{@value #WELL_CONDITIONED} or not a positive number.
     */
    private static double[][] choleskyOfScaled(double[][] gram, double[] scale) {
        int k = scale.length;
        double[][] l = Matrices.zeros(k, k);
        for (int j = 0; j < k; j++) {
            double pivot = 1;
            for (int m = 0; m < j; m++) {
                pivot -= l[j][m] * l[j][m];
            }
            if (!(pivot >= 1 / (WELL_CONDITIONED * WELL_CONDITIONED))) {
                return null;
            }
            l[j][j] = Math.sqrt(pivot);
            for (int i = j + 1; i < k; i++) {
                double sum = gram[j][i] * scale[j] * scale[i];
                for (int m = 0; m < j; m++) {
                    sum -= l[i][m] * l[j][m];
                }
                l[i][j] = sum / l[j][j];
            }
        }
        return l;
    }

    /** Solves L L' z = v in place by forward and back substitution. */
    private static void solveInPlace(double[][] l, double[] v) {
        int k = v.length;
        for (int i = 0; i < k; i++) {
            double sum = v[i];
            for (int m = 0; m < i; m++) {
                sum -= l[i][m] * v[m];
            }
            v[i] = sum / l[i][i];
        }
        for (int i = k - 1; i >= 0; i--) {
            double sum = v[i];
            for (int m = i + 1; m < k; m++) {
                sum -= l[m][i] * v[m];
            }
            v[i] = sum / l[i][i];
        }
    }
}
