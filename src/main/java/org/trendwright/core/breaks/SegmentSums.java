package org.trendwright.core.breaks;

import org.trendwright.core.Matrices;
import org.trendwright.core.regression.Design;

/**
 * Residual sums of squares of the least-squares fits to every leading and every trailing segment
 * of a regression, in O(n k^2) operations instead of one fit per segment.
 *
 * <p>Rows are added one at a time to the triangular factor R of a QR decomposition by Givens
 * rotations (Gentleman 1973, "Least squares computations by Givens transformations without square
 * roots", J. Inst. Maths Applics 12; Golub &amp; Van Loan, Matrix Computations, section 5.1.8). The
 * augmented row (x_t, y_t) is rotated into (R, z) column by column; what is left of y_t after the
 * k rotations is that row's contribution to the residual sum of squares, which therefore grows
 * by its square. This is the orthogonal, backward-stable form of recursive least squares and
 * never forms X'X. Columns are first scaled to unit length over the whole sample (the residuals
 * do not change). The running sum equals the segment's RSS once its rows have full rank; callers
 * check that the shortest segment they use has full rank.
 *
 * <p>Stateless and thread-safe (each call works on its own arrays).
 */
final class SegmentSums {

    private SegmentSums() {
    }

    /** leading[m] = RSS of the fit to rows 0..m-1 (the first m rows), m = 0..n. */
    static double[] leading(Design design, double[] y) {
        double[][] rows = scaledRows(design);
        return accumulate(rows, y, 0, 1);
    }

    /** trailing[m] = RSS of the fit to rows m..n-1 (all rows from m on), m = 0..n. */
    static double[] trailing(Design design, double[] y) {
        double[][] rows = scaledRows(design);
        return accumulate(rows, y, y.length - 1, -1);
    }

    /** Adds rows start, start + step, ... and records the running RSS after each. */
    private static double[] accumulate(double[][] rows, double[] y, int start, int step) {
        int n = y.length;
        int k = rows[0].length;
        double[][] r = Matrices.zeros(k, k);
        double[] z = new double[k];
        double[] rss = new double[n + 1];
        double running = 0;
        for (int added = 1; added <= n; added++) {
            int i = start + (added - 1) * step;
            double leftover = rotateIn(r, z, rows[i].clone(), y[i]);
            running += leftover * leftover;
            rss[step > 0 ? added : n - added] = running;
        }
        return rss;
    }

    /**
     * Rotates the row (x, target) into (R, z); returns what is left of target, the part of the
     * new observation that the earlier rows' fit cannot explain. Overwrites x.
     */
    static double rotateIn(double[][] r, double[] z, double[] x, double target) {
        double remaining = target;
        for (int j = 0; j < x.length; j++) {
            if (x[j] == 0) {
                continue;
            }
            double radius = Math.hypot(r[j][j], x[j]);
            double c = r[j][j] / radius;
            double s = x[j] / radius;
            r[j][j] = radius;
            for (int l = j + 1; l < x.length; l++) {
                double upper = r[j][l];
                r[j][l] = c * upper + s * x[l];
                x[l] = c * x[l] - s * upper;
            }
            double upper = z[j];
            z[j] = c * upper + s * remaining;
            remaining = c * remaining - s * upper;
        }
        return remaining;
    }

    private static double[][] scaledRows(Design design) {
        double[][] rows = design.toRows();
        for (int j = 0; j < design.width(); j++) {
            double norm = 0;
            for (double[] row : rows) {
                norm = Math.hypot(norm, row[j]);
            }
            for (double[] row : rows) {
                row[j] = norm == 0 ? row[j] : row[j] / norm;
            }
        }
        return rows;
    }
}
