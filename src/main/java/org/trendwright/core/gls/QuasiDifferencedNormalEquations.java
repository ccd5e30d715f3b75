package org.trendwright.core.gls;

import java.util.Optional;
import org.trendwright.core.Matrices;
import org.trendwright.core.regression.Design;

/**
 * The coefficients b(rho) of the quasi-differenced regression y* = X* b + e by its normal
 * equations, X*'X* b = X*'y*, for the intermediate steps of the feasible-GLS iteration
 * ({@link Ar1Gls#estimate}), which only steer rho towards its fixed point.
 *
 * <p>The cross products are accumulated while each row is transformed (x*_t = x_t - rho x_{t-1},
 * and for Prais-Winsten x*_1 = sqrt(1 - rho^2) x_1, as {@link Ar1Gls#transform}), so no transformed
 * design is built: n k(k + 3)/2 multiply-adds instead of the Householder QR's 2 n k^2 and its
 * copies. The Gram matrix is scaled to unit diagonal, G = D X*'X* D with D = diag(1/||x*_j||),
 * and factored by Cholesky, G = L L'.
 *
 * <p>Forming X*'X* squares the condition number, so the normal equations give b only to about
 * c u cond(X*)^2 relative (Higham 2002, Accuracy and Stability of Numerical Algorithms, 2nd ed.,
 * section 20.4), against the QR route's c u (cond(X*) + cond(X*)^2 ||r|| / (||X*|| ||b||))
 * (Theorem 20.3); with a residual that is not small the two are of one order. No answer is given
 * when some pivot l_jj of the unit-diagonal factor falls below 1/{@value #WELL_CONDITIONED}:
 * 1/min l_jj is a lower bound on cond(D X*) (each l_jj is the distance of unit column j from the
 * span of the columns before it, at least its smallest singular value), so the bound is then
 * not known to be small, and the caller takes the QR route. Rank deficiency and invalid data
 * are the QR route's to report, with its messages. Stateless.
 */
final class QuasiDifferencedNormalEquations {

    /** The least pivot ratio accepted, 1/100: cond(X*)^2 u stays near 1e-12 where it is met. */
    static final double WELL_CONDITIONED = 100;

    private QuasiDifferencedNormalEquations() {
    }

    /** b(rho), or empty when the scaled Gram matrix is not clearly well conditioned (see the class comment). */
    static Optional<double[]> coefficients(Design design, double[] y, double rho, Ar1Method method) {
        int k = design.width();
        double[][] gram = Matrices.zeros(k, k);
        double[] moment = new double[k];
        accumulate(design, y, rho, method, gram, moment);
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

    /** The upper triangle of X*'X* and X*'y*, the rows transformed one at a time. */
    private static void accumulate(Design design, double[] y, double rho, Ar1Method method, double[][] gram,
                                   double[] moment) {
        int k = design.width();
        double[] row = new double[k];
        if (method == Ar1Method.PRAIS_WINSTEN) {
            double firstWeight = Math.sqrt(1 - rho * rho);
            for (int j = 0; j < k; j++) {
                row[j] = firstWeight * design.get(0, j);
            }
            addRow(row, firstWeight * y[0], gram, moment);
        }
        for (int t = 1; t < y.length; t++) {
            for (int j = 0; j < k; j++) {
                row[j] = design.get(t, j) - rho * design.get(t - 1, j);
            }
            addRow(row, y[t] - rho * y[t - 1], gram, moment);
        }
    }

    private static void addRow(double[] row, double response, double[][] gram, double[] moment) {
        for (int i = 0; i < row.length; i++) {
            double xi = row[i];
            moment[i] = Math.fma(xi, response, moment[i]);
            double[] gramRow = gram[i];
            for (int j = i; j < row.length; j++) {
                gramRow[j] = Math.fma(xi, row[j], gramRow[j]);
            }
        }
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
