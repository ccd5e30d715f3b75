package org.trendwright.core.regression;

import org.trendwright.core.Matrices;

/**
 * The singular values of a small square matrix by one-sided Jacobi rotations (Hestenes 1958,
 * "Inversion of matrices by biorthogonalization and related results", J. SIAM 6, 51-90): plane
 * rotations of column pairs, each chosen to make the pair orthogonal, are applied in cyclic sweeps
 * until every pair is orthogonal to working precision; the singular values are then the column
 * lengths. For a pair p, q with a = ||a_p||^2, b = ||a_q||^2 and c = a_p'a_q the rotation is
 * <pre>
 *   zeta = (b - a) / (2c),  t = sign(zeta) / (|zeta| + sqrt(1 + zeta^2)),
 *   cos = 1 / sqrt(1 + t^2),  sin = t cos,
 *   a_p := cos a_p - sin a_q,  a_q := sin a_p + cos a_q,
 * </pre>
 * and a pair counts as orthogonal once |c| &lt;= k u sqrt(a b), with u the unit round-off and k the
 * order: the rounding error of the k-term dot product c itself (Higham 2002, section 3.1), below
 * which a rotation only stirs rounding noise and the sweeps would never end. The method
 * computes every singular value, the smallest included, to high relative accuracy (Demmel &amp;
 * Veselić 1992, "Jacobi's method is more accurate than QR", SIAM J. Matrix Anal. Appl. 13(4),
 * 1204-1245), which is what a condition number needs.
 *
 * <p>Why not Commons Math's {@code SingularValueDecomposition}: for the k x k triangular factor of
 * a regression (k rarely above a dozen) it builds U and V and runs a general bidiagonal QR, and
 * its long constructor is compiled again and again by the JIT while a batch warms up (22 C2
 * compilations, about a tenth of all compile time, in the batch benchmark's first run).
 *
 * <p>Stateless and thread-safe.
 */
final class SmallSingularValues {

    /** Sweeps after which the iteration stops in any case; it converges quadratically in a few. */
    static final int MAX_SWEEPS = 60;

    private static final double UNIT_ROUNDOFF = 0x1p-53;

    private SmallSingularValues() {
    }

    /**
     * The 2-norm condition number sigma_max / sigma_min of the square matrix {@code a} (rows of
     * equal length k, left unchanged, entries of moderate size such as those of R for columns of unit
     * length); infinite when the matrix is singular.
     */
    static double conditionNumber(double[][] a) {
        double[] sigma = of(a);
        double largest = 0;
        double smallest = Double.POSITIVE_INFINITY;
        for (double s : sigma) {
            largest = Math.max(largest, s);
            smallest = Math.min(smallest, s);
        }
        return largest / smallest;
    }

    /** The singular values of the square matrix {@code a} (left unchanged), in no particular order. */
    static double[] of(double[][] a) {
        int k = a.length;
        double[][] columns = Matrices.zeros(k, k);
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                columns[j][i] = a[i][j];
            }
        }
        double[] squares = new double[k];
        boolean rotated = true;
        for (int sweep = 0; rotated && sweep < MAX_SWEEPS; sweep++) {
            for (int j = 0; j < k; j++) {
                squares[j] = dot(columns[j], columns[j]);
            }
            rotated = rotateEveryPair(columns, squares);
        }
        double[] sigma = new double[k];
        for (int j = 0; j < k; j++) {
            sigma[j] = Math.sqrt(dot(columns[j], columns[j]));
        }
        return sigma;
    }

    /**
     * One cyclic sweep over the column pairs; false when every pair was already orthogonal.
     * {@code squares} holds the columns' squared lengths, kept current through the sweep.
     */
    private static boolean rotateEveryPair(double[][] columns, double[] squares) {
        boolean rotated = false;
        for (int p = 0; p < columns.length - 1; p++) {
            for (int q = p + 1; q < columns.length; q++) {
                rotated |= orthogonalise(columns, squares, p, q);
            }
        }
        return rotated;
    }

    /**
     * Rotates columns p and q to be orthogonal (see the class comment); false when they already
     * are. The rotation changes their squared lengths a and b to a - t c and b + t c exactly in
     * exact arithmetic, which saves two dot products per pair; the lengths are summed afresh at the
     * start of every sweep, so rounding cannot pile up across sweeps.
     */
    private static boolean orthogonalise(double[][] columns, double[] squares, int p, int q) {
        double[] x = columns[p];
        double[] y = columns[q];
        double a = squares[p];
        double b = squares[q];
        double c = dot(x, y);
        double tolerance = x.length * UNIT_ROUNDOFF;
        if (c * c <= tolerance * tolerance * a * b) {
            return false;
        }
        double zeta = (b - a) / (2 * c);
        double t = zeta == 0 ? 1 : Math.signum(zeta) / (Math.abs(zeta) + Math.sqrt(1 + zeta * zeta));
        if (t == 0) {
            return false;
        }
        double cos = 1 / Math.sqrt(1 + t * t);
        double sin = t * cos;
        for (int i = 0; i < x.length; i++) {
            double xi = x[i];
            x[i] = cos * xi - sin * y[i];
            y[i] = sin * xi + cos * y[i];
        }
        squares[p] = a - t * c;
        squares[q] = b + t * c;
        return true;
    }

    private static double dot(double[] x, double[] y) {
        double sum = 0;
        for (int i = 0; i < x.length; i++) {
            sum += x[i] * y[i];
        }
        return sum;
    }
}
