package org.trendwright.core.regression;

import java.util.function.UnaryOperator;
import org.trendwright.core.Matrices;

/**
 * (X'X)^-1 from the QR factors, refined to about working precision.
 *
 * <p>From X P = Q R, (X'X)^-1 = P R^-1 R^-T P' ({@link PivotedQr#inverseGram()}). The computed R
 * is the exact factor of a matrix within about u ||x_j|| of each column of X, which leaves a
 * relative error of order cond(X) u in (X'X)^-1 and so in every standard error. Iterative
 * refinement removes it: with G = X'X accumulated in double-double arithmetic
 * ({@link CompensatedDot}) and Z the current inverse, E = I - G Z is formed in double-double
 * arithmetic and Z is corrected by P R^-1 R^-T P' E. These are the corrected semi-normal
 * equations of Björck (1987), "Stability analysis of the method of seminormal equations for
 * linear least squares problems", Linear Algebra Appl. 88/89, 31-48: although G has condition
 * number cond(X)^2, the correction uses the well-conditioned factor R, so each step shrinks the
 * error by a factor of about cond(X) u. The limit is set by the double-double residual E, whose
 * rounding leaves a relative error of about cond(X)^2 u^2: below u for condition numbers under
 * 1/sqrt(u), about 1e8, and 3e-13 on NIST's Filip (condition number 5e9).
 *
 * <p>Steps stop when a correction is at most u times the largest entry of Z, when it is no
 * smaller than the one before (that one is not applied), or after {@link #MAX_REFINEMENTS}.
 * The result is symmetrised, as the exact inverse is symmetric.
 *
 * <p>Stateless and thread-safe.
 */
final class GramInverse {

    /** At most this many corrections. */
    static final int MAX_REFINEMENTS = 3;

    private static final double UNIT_ROUNDOFF = 0x1p-53;

    private GramInverse() {
    }

    /** (X'X)^-1 for the columns x (original order), qr being their factorisation. */
    static double[][] refined(double[][] x, PivotedQr qr) {
        double[][] z = qr.inverseGram();
        double[][][] gram = gram(x);
        refine(z, current -> solveGram(qr, residual(gram, current)));
        return symmetrised(z);
    }

    /**
     * Column j of (X'X)^-1 for the columns x (original order), refined as {@link #refined} refines
     * the whole inverse, with the same stopping rules: from z = P R^-1 R^-T P' e_j, each step
     * corrects z by P R^-1 R^-T P' (e_j - X'X z). The residual is formed as X'(X z) in
     * double-double arithmetic, with X z kept as a double-double pair, which costs 3nk products a step
     * where forming X'X costs nk^2/2 and the whole residual 2k^3; its rounding is of the same
     * order, about cond(X)^2 u^2 relative, so the column is as accurate as that of {@link #refined}.
     */
    static double[] refinedColumn(double[][] x, PivotedQr qr, int j) {
        double[][] unit = Matrices.zeros(x.length, 1);
        unit[j][0] = 1;
        double[][] z = solveGram(qr, unit);
        refine(z, current -> solveGram(qr, columnResidual(x, current, j)));
        double[] column = new double[z.length];
        for (int i = 0; i < column.length; i++) {
            column[i] = z[i][0];
        }
        return column;
    }

    /**
     * Corrects z in place, step by step, with the corrections {@code correctionOf} computes from the
     * current z, under the stopping rules of the class comment.
     */
    private static void refine(double[][] z, UnaryOperator<double[][]> correctionOf) {
        double previous = Double.POSITIVE_INFINITY;
        for (int step = 0; step < MAX_REFINEMENTS; step++) {
            double[][] correction = correctionOf.apply(z);
            double size = largestMagnitude(correction);
            if (size >= previous) {
                return;
            }
            for (int i = 0; i < z.length; i++) {
                for (int c = 0; c < z[i].length; c++) {
                    z[i][c] += correction[i][c];
                }
            }
            if (size <= UNIT_ROUNDOFF * largestMagnitude(z)) {
                return;
            }
            previous = size;
        }
    }

    /** e_j - X'(X z) for the k x 1 column z, in double-double arithmetic, rounded. */
    private static double[][] columnResidual(double[][] x, double[][] z, int j) {
        int n = x[0].length;
        double[] high = new double[n];
        double[] low = new double[n];
        for (int row = 0; row < n; row++) {
            CompensatedDot sum = new CompensatedDot();
            for (int m = 0; m < z.length; m++) {
                sum.addProduct(x[m][row], z[m][0]);
            }
            high[row] = sum.value();
            low[row] = sum.lowPart();
        }
        double[][] e = Matrices.zeros(z.length, 1);
        for (int i = 0; i < z.length; i++) {
            CompensatedDot sum = new CompensatedDot().add(i == j ? 1 : 0);
            for (int row = 0; row < n; row++) {
                sum.addProduct(-x[i][row], high[row]);
                sum.addProduct(-x[i][row], low[row]);
            }
            e[i][0] = sum.value();
        }
        return e;
    }

    /** X'X as a pair of matrices {high, low} whose sum is the exact product to ~u^2. */
    private static double[][][] gram(double[][] x) {
        int k = x.length;
        double[][] high = Matrices.zeros(k, k);
        double[][] low = Matrices.zeros(k, k);
        for (int i = 0; i < k; i++) {
            for (int j = i; j < k; j++) {
                CompensatedDot sum = new CompensatedDot();
                for (int row = 0; row < x[i].length; row++) {
                    sum.addProduct(x[i][row], x[j][row]);
                }
                high[i][j] = sum.value();
                high[j][i] = high[i][j];
                low[i][j] = sum.lowPart();
                low[j][i] = low[i][j];
            }
        }
        return new double[][][] {high, low};
    }

    /** E = I - G Z in double-double arithmetic, rounded. */
    private static double[][] residual(double[][][] gram, double[][] z) {
        int k = z.length;
        double[][] e = Matrices.zeros(k, k);
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                CompensatedDot sum = new CompensatedDot().add(i == j ? 1 : 0);
                for (int m = 0; m < k; m++) {
                    sum.addProduct(-gram[0][i][m], z[m][j]);
                    sum.addProduct(-gram[1][i][m], z[m][j]);
                }
                e[i][j] = sum.value();
            }
        }
        return e;
    }

    /** P R^-1 R^-T P' E for a k x m matrix E, column by column. */
    private static double[][] solveGram(PivotedQr qr, double[][] e) {
        int k = e.length;
        int m = e[0].length;
        double[][] result = Matrices.zeros(k, m);
        double[] pivoted = new double[k];
        for (int j = 0; j < m; j++) {
            for (int s = 0; s < k; s++) {
                pivoted[s] = e[qr.pivot(s)][j];
            }
            double[] solved = qr.solveR(qr.solveRTranspose(pivoted));
            for (int s = 0; s < k; s++) {
                result[qr.pivot(s)][j] = solved[s];
            }
        }
        return result;
    }

    private static double largestMagnitude(double[][] m) {
        double largest = 0;
        for (double[] row : m) {
            for (double v : row) {
                largest = Math.max(largest, Math.abs(v));
            }
        }
        return largest;
    }

    private static double[][] symmetrised(double[][] z) {
        int k = z.length;
        double[][] result = Matrices.zeros(k, k);
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                result[i][j] = 0.5 * (z[i][j] + z[j][i]);
            }
        }
        return result;
    }
}
