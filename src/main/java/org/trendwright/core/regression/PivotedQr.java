package org.trendwright.core.regression;

import java.util.Arrays;
import org.trendwright.core.Matrices;

/**
 * Householder QR factorisation with column pivoting, X P = Q R, that keeps its reflectors so that
 * Q and Q' can be applied to a vector in O(nk) operations (Golub 1965, "Numerical methods for
 * solving linear least squares problems", Numer. Math. 7, 206-216; pivoting after Businger &amp;
 * Golub 1965, "Linear least squares solutions by Householder transformations", Numer. Math. 7,
 * 269-276). Q = H_0 H_1 ... H_{k-1} with H_s = I - tau_s v_s v_s', v_s zero above row s.
 *
 * <p>Why not Commons Math's {@code RRQRDecomposition}: it hands Q out only as an explicit n x n
 * matrix ({@code getQ}, {@code getQT}), which costs O(n^2) memory and O(n^2 k) time (200 MB at
 * n = 5,000), and its solver only returns the least-squares solution. Björck's refinement of the
 * augmented system (see {@link AugmentedRefinement}) needs Q'f, Q[h; d], R^-1 v and R^-T v
 * separately, for vectors f, h, d and v of its own.
 *
 * <p>Pivoting: at step s the column with the largest remaining norm (rows s..n-1, after the
 * reflections so far) <em>relative to its full norm</em> is moved to position s. That is
 * Businger-Golub pivoting on the columns scaled to unit length, whichever scaling the caller
 * chose. The remaining norms are recomputed at every step rather than downdated, which costs no
 * more than the factorisation itself and avoids the cancellation that norm downdating suffers
 * (Drmač &amp; Bujanović 2008, "On the failure of rank-revealing QR factorization software",
 * SIAM J. Matrix Anal. Appl. 30(2)).
 *
 * <p>Immutable after construction, hence thread-safe.
 */
final class PivotedQr {

    /** Column s holds the Householder vector v_s in rows s..n-1. */
    private final double[][] reflectors;
    private final double[] tau;
    /** The k x k upper triangular factor, r[i][j] for j >= i. */
    private final double[][] r;
    /** pivot[s] = the column of X placed at position s. */
    private final int[] pivot;

    private PivotedQr(double[][] reflectors, double[] tau, double[][] r, int[] pivot) {
        this.reflectors = reflectors;
        this.tau = tau;
        this.r = r;
        this.pivot = pivot;
    }

    /**
     * Factorises the matrix given as k non-zero columns of equal length n >= k (left unchanged).
     * The columns should be scaled to about unit length, as {@link LeastSquares} does, so that
     * plain sums of squares can neither overflow nor underflow.
     */
    static PivotedQr factor(double[][] columns) {
        int k = columns.length;
        double[][] a = new double[k][];
        double[] fullNorm = new double[k];
        int[] pivot = new int[k];
        for (int j = 0; j < k; j++) {
            a[j] = columns[j].clone();
            fullNorm[j] = norm(a[j], 0);
            pivot[j] = j;
        }
        double[] tau = new double[k];
        double[][] r = Matrices.zeros(k, k);
        double[] remaining = new double[k];
        for (int s = 0; s < k; s++) {
            int chosen = largestRelativeRemainder(a, fullNorm, s, remaining);
            swap(a, s, chosen);
            swap(fullNorm, s, chosen);
            swap(pivot, s, chosen);
            r[s][s] = reflect(a[s], s, remaining[chosen], tau);
            for (int j = s + 1; j < k; j++) {
                applyReflector(a[s], tau[s], s, a[j]);
            }
        }
        // Row s of R lies in row s of the later columns, read once they have stopped moving.
        for (int j = 1; j < k; j++) {
            for (int i = 0; i < j; i++) {
                r[i][j] = a[j][i];
            }
        }
        return new PivotedQr(a, tau, r, pivot);
    }

    /**
     * Factorises, without pivoting, the columns that add something to the ones before them: taken
     * in their own order, a column whose remainder after the reflections so far is negligible (see
     * {@link #negligibleAsZero}), zero, or has no row left, is passed over, and {@code added[j]}
     * says which were kept. The result is X_kept = Q R, so that the first r columns of Q span the
     * first m columns of X whenever r of those m were kept, as nested regressions need. Columns
     * are left unchanged; there may be more of them than rows.
     */
    static PivotedQr ofAddedColumns(double[][] columns, boolean[] added) {
        int k = columns.length;
        double[][] pending = new double[k][];
        for (int j = 0; j < k; j++) {
            pending[j] = columns[j].clone();
        }
        double[][] kept = new double[k][];
        double[] tau = new double[k];
        double[] diagonal = new double[k];
        int rank = 0;
        for (int j = 0; j < k; j++) {
            double remaining = negligibleAsZero(norm(pending[j], rank), norm(columns[j], 0));
            added[j] = remaining > 0;
            if (added[j]) {
                diagonal[rank] = reflect(pending[j], rank, remaining, tau);
                for (int later = j + 1; later < k; later++) {
                    applyReflector(pending[j], tau[rank], rank, pending[later]);
                }
                kept[rank++] = pending[j];
            }
        }
        double[][] r = Matrices.zeros(rank, rank);
        int[] order = new int[rank];
        for (int s = 0; s < rank; s++) {
            order[s] = s;
            r[s][s] = diagonal[s];
            for (int i = 0; i < s; i++) {
                r[i][s] = kept[s][i];
            }
        }
        return new PivotedQr(Arrays.copyOf(kept, rank), Arrays.copyOf(tau, rank), r, order);
    }

    int width() {
        return pivot.length;
    }

    /** The column of X at pivoted position s. */
    int pivot(int s) {
        return pivot[s];
    }

    /** R[i][j] (zero below the diagonal). */
    double r(int i, int j) {
        return r[i][j];
    }

    /** Overwrites x (length n) with Q'x = H_{k-1} ... H_0 x. */
    void applyQTranspose(double[] x) {
        for (int s = 0; s < pivot.length; s++) {
            applyReflector(reflectors[s], tau[s], s, x);
        }
    }

    /** Overwrites x (length n) with Q x = H_0 ... H_{k-1} x. */
    void applyQ(double[] x) {
        for (int s = pivot.length - 1; s >= 0; s--) {
            applyReflector(reflectors[s], tau[s], s, x);
        }
    }

    /** R^-1 d for the first k entries of d, by back substitution. */
    double[] solveR(double[] d) {
        int k = pivot.length;
        double[] z = new double[k];
        for (int i = k - 1; i >= 0; i--) {
            double sum = d[i];
            for (int j = i + 1; j < k; j++) {
                sum -= r[i][j] * z[j];
            }
            z[i] = sum / r[i][i];
        }
        return z;
    }

    /** R^-T g, by forward substitution. */
    double[] solveRTranspose(double[] g) {
        int k = pivot.length;
        double[] h = new double[k];
        for (int i = 0; i < k; i++) {
            double sum = g[i];
            for (int j = 0; j < i; j++) {
                sum -= r[j][i] * h[j];
            }
            h[i] = sum / r[i][i];
        }
        return h;
    }

    /**
     * (A'A)^-1 = P R^-1 R^-T P' for the factorised matrix A, in A's column order: from the
     * triangular factor alone, without forming A'A (whose condition number is that of A squared).
     */
    double[][] inverseGram() {
        int k = pivot.length;
        double[][] rInverse = upperTriangularInverse();
        double[][] inverse = Matrices.zeros(k, k);
        for (int a = 0; a < k; a++) {
            for (int c = a; c < k; c++) {
                double sum = 0;
                for (int m = c; m < k; m++) {
                    sum += rInverse[a][m] * rInverse[c][m];
                }
                inverse[pivot[a]][pivot[c]] = sum;
                inverse[pivot[c]][pivot[a]] = sum;
            }
        }
        return inverse;
    }

    private double[][] upperTriangularInverse() {
        int k = pivot.length;
        double[][] inverse = Matrices.zeros(k, k);
        for (int j = 0; j < k; j++) {
            inverse[j][j] = 1 / r[j][j];
            for (int i = j - 1; i >= 0; i--) {
                double sum = 0;
                for (int m = i + 1; m <= j; m++) {
                    sum += r[i][m] * inverse[m][j];
                }
                inverse[i][j] = -sum / r[i][i];
            }
        }
        return inverse;
    }

    /**
     * The column j >= s whose remaining norm (rows s..n-1) is largest relative to its full norm,
     * the first on a tie; {@code remaining[j]} receives each remaining norm. Before the first
     * reflection every remaining norm is the full norm, so step 0 takes column 0 without summing.
     */
    private static int largestRelativeRemainder(double[][] a, double[] fullNorm, int s, double[] remaining) {
        if (s == 0) {
            remaining[0] = fullNorm[0];
            return 0;
        }
        int chosen = s;
        double largest = -1;
        for (int j = s; j < a.length; j++) {
            remaining[j] = norm(a[j], s);
            double relative = remaining[j] / fullNorm[j];
            if (relative > largest) {
                largest = relative;
                chosen = j;
            }
        }
        return chosen;
    }

    /**
     * A remaining norm at most {@link LeastSquares#RANK_TOLERANCE} times the column's full norm is
     * rounding noise: the column is a linear combination of the ones before it. Reflecting that
     * noise would remove an arbitrary direction, so it counts as 0. The pivoted factorisation needs
     * no such rule: {@link ScaledDesign#checkRank} refuses those designs.
     */
    private static double negligibleAsZero(double remaining, double fullNorm) {
        return remaining <= LeastSquares.RANK_TOLERANCE * fullNorm ? 0 : remaining;
    }

    /**
     * Turns column x (rows s..n-1), whose norm over those rows is {@code norm}, into the
     * Householder vector v with H x = alpha e_s, stores tau = 2 / v'v and returns
     * alpha = -sign(x_s) ||x||; the sign avoids cancellation in v_s = x_s - alpha. A zero remainder
     * gives H = I (tau = 0) and alpha = 0.
     */
    private static double reflect(double[] x, int s, double norm, double[] tau) {
        if (norm == 0) {
            tau[s] = 0;
            return 0;
        }
        double alpha = -Math.copySign(norm, x[s]);
        x[s] -= alpha;
        // v'v = 2 alpha (alpha - x_s) = -2 alpha v_s, so tau = 2 / v'v = -1 / (alpha v_s).
        tau[s] = -1 / (alpha * x[s]);
        return alpha;
    }

    /** x := (I - tau v v') x over rows s..n-1. */
    private static void applyReflector(double[] v, double tau, int s, double[] x) {
        double dot = 0;
        for (int i = s; i < x.length; i++) {
            dot += v[i] * x[i];
        }
        double factor = tau * dot;
        for (int i = s; i < x.length; i++) {
            x[i] -= factor * v[i];
        }
    }

    /** Euclidean norm of x[s..n-1]; plain squares suffice for columns of about unit length. */
    private static double norm(double[] x, int s) {
        double sum = 0;
        for (int i = s; i < x.length; i++) {
            sum += x[i] * x[i];
        }
        return Math.sqrt(sum);
    }

    private static void swap(double[][] a, int i, int j) {
        double[] t = a[i];
        a[i] = a[j];
        a[j] = t;
    }

    private static void swap(double[] a, int i, int j) {
        double t = a[i];
        a[i] = a[j];
        a[j] = t;
    }

    private static void swap(int[] a, int i, int j) {
        int t = a[i];
        a[i] = a[j];
        a[j] = t;
    }
}
