package org.trendwright.core.breaks;

import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.Matrices;
import org.trendwright.core.RankDeficientDesignException;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;

/**
 * What the sup-F statistic needs from the design alone, computed once so that sup F for any
 * series y on that design costs O(n k) plus O(k^2) per candidate break row.
 *
 * <p>Let Q (n x k) be an orthonormal basis of the columns of X and e = y - Q Q'y the pooled
 * residuals, RSS_p = e'e. For a break after m rows let Q_1, e_1 be the first m rows and Q_2, e_2
 * the others, A_i = Q_i'Q_i. Each segment's fit to y and to e leaves the same residuals (they
 * differ by X b, which the segment's fit absorbs), so the Chow gain is
 * <pre>
 *   g(m) = RSS_p - RSS_1 - RSS_2 = e_1'Q_1 A_1^-1 Q_1'e_1 + e_2'Q_2 A_2^-1 Q_2'e_2.
 * </pre>
 * Since Q'e = 0, Q_2'e_2 = -s_m with s_m = sum over the first m rows of q_t e_t, hence
 * <pre>
 *   g(m) = s_m' (A_1^-1 + A_2^-1) s_m = || U_m s_m ||^2,   U_m'U_m = A_1^-1 + A_2^-1,
 * </pre>
 * which, as A_1 + A_2 = I, is s_m' (A_1 (I - A_1))^-1 s_m: the partial sum of the residual-weighted
 * regressors standardised by its variance, as in Andrews (1993, Econometrica 61). U_m (upper
 * triangular) depends on X only. It is found without forming a Gram matrix: Givens rotations of the
 * rows of Q, forward and backward ({@link SegmentSums#rotateIn}), give R_1(m) and R_2(m) with
 * R_i'R_i = A_i; the k rows of R_1^-T and the k rows of R_2^-T rotated into one triangle give U_m,
 * because the sum of the outer products of those 2k rows is R_1^-1 R_1^-T + R_2^-1 R_2^-T.
 * With the pooled RSS fixed, F(m) = (g/k) / ((RSS_p - g)/(n - 2k)) increases with g, so only the
 * largest gain is turned into F.
 *
 * <p>Q comes from modified Gram-Schmidt applied twice ("twice is enough": Giraud, Langou &amp;
 * Rozloznik 2005, "The loss of orthogonality in the Gram-Schmidt orthogonalization process",
 * Comput. Math. Appl. 50; from memory), orthonormal to rounding for any numerically full-rank X.
 *
 * <p>Immutable after construction and thread-safe: {@link #supF} works on its own arrays.
 */
final class ChowGainFactors {

    /**
     * A segment whose Givens factor (of orthonormal rows) has a diagonal element at or below this
     * counts as rank deficient: the gain's weights grow like its inverse, so such a segment would
     * cost about 8 of the 16 digits of F.
     */
    static final double SEGMENT_RANK_TOLERANCE = 1e-8;

    private final int rows;
    private final int width;
    private final int first;
    private final int last;
    /** q_t for t = 0..n-1, row after row (q_t at [t k, t k + k)). */
    private final double[] basis;
    /** U_m for m = first..last, each packed by rows as its k(k+1)/2 upper-triangular entries. */
    private final double[] weights;

    private ChowGainFactors(int rows, int width, double[] basis, double[] weights) {
        this.rows = rows;
        this.width = width;
        this.first = BreakCandidates.first(rows);
        this.last = BreakCandidates.last(rows);
        this.basis = basis;
        this.weights = weights;
    }

    /**
     * The factors for the candidate rows of {@link BreakCandidates}.
     *
     * @throws org.trendwright.core.InsufficientDataException when 15% of the rows are k or fewer
     * @throws InvalidSpecificationException when a regressor value is not finite
     * @throws RankDeficientDesignException when the regressors are linearly dependent over the
     *         whole sample (relative tolerance {@link LeastSquares#RANK_TOLERANCE}) or within the
     *         shortest first or last segment ({@link #SEGMENT_RANK_TOLERANCE})
     */
    static ChowGainFactors of(Design design) {
        int n = design.rows();
        int k = design.width();
        BreakCandidates.checkSize(n, k);
        checkFinite(design);
        double[] basis = orthonormalBasis(design);
        double[][] leading = leadingInverseRows(design, basis);
        return new ChowGainFactors(n, k, basis, withTrailing(design, basis, leading));
    }

    private static void checkFinite(Design design) {
        for (int j = 0; j < design.width(); j++) {
            for (int i = 0; i < design.rows(); i++) {
                if (!Double.isFinite(design.get(i, j))) {
                    throw new InvalidSpecificationException("Regressor '" + design.names().get(j) + "' row " + (i + 1)
                            + " is " + design.get(i, j) + "; a break search needs finite regressors.");
                }
            }
        }
    }

    /** sup over the candidate rows of the Chow F statistic of y (length n, finite). */
    double supF(double[] y) {
        int k = width;
        double[] coefficients = new double[k];
        for (int t = 0, o = 0; t < rows; t++, o += k) {
            for (int j = 0; j < k; j++) {
                coefficients[j] += basis[o + j] * y[t];
            }
        }
        double[] partial = new double[k];
        int packed = k * (k + 1) / 2;
        double rss = 0;
        double largestGain = 0;
        for (int t = 0, o = 0; t < rows; t++, o += k) {
            double e = y[t];
            for (int j = 0; j < k; j++) {
                e -= basis[o + j] * coefficients[j];
            }
            rss += e * e;
            if (t < last) {
                for (int j = 0; j < k; j++) {
                    partial[j] += basis[o + j] * e;
                }
                if (t + 1 >= first) {
                    largestGain = Math.max(largestGain, gain(partial, (t + 1 - first) * packed));
                }
            }
        }
        return ChowTest.fStatistic(rss, rss - largestGain, k, rows);
    }

    /** || U_m s ||^2 with U_m packed from {@code offset}. */
    private double gain(double[] partial, int offset) {
        double total = 0;
        int w = offset;
        for (int i = 0; i < width; i++) {
            double dot = 0;
            for (int j = i; j < width; j++) {
                dot += weights[w++] * partial[j];
            }
            total += dot * dot;
        }
        return total;
    }

    /** Modified Gram-Schmidt, each column orthogonalised twice; row-major n x k result. */
    private static double[] orthonormalBasis(Design design) {
        int n = design.rows();
        int k = design.width();
        double[][] q = new double[k][];
        for (int j = 0; j < k; j++) {
            double[] v = design.column(j);
            double original = scaleToUnitLength(v);
            for (int pass = 0; pass < 2; pass++) {
                for (int i = 0; i < j; i++) {
                    subtractProjection(v, q[i]);
                }
            }
            if (original == 0 || !(scaleToUnitLength(v) > LeastSquares.RANK_TOLERANCE)) {
                throw new RankDeficientDesignException("Regressor '" + design.names().get(j) + "' is a linear"
                        + " combination of the ones before it, so the break search cannot separate their"
                        + " coefficients; drop it.");
            }
            q[j] = v;
        }
        double[] rowMajor = new double[n * k];
        for (int t = 0; t < n; t++) {
            for (int j = 0; j < k; j++) {
                rowMajor[t * k + j] = q[j][t];
            }
        }
        return rowMajor;
    }

    /**
     * Divides v by its length and returns the length, computed after scaling by the largest |v_i|
     * so that the squares cannot overflow; 0 for a zero vector, which is left as it is.
     */
    private static double scaleToUnitLength(double[] v) {
        double largest = 0;
        for (double value : v) {
            largest = Math.max(largest, Math.abs(value));
        }
        if (largest == 0) {
            return 0;
        }
        double squares = 0;
        for (double value : v) {
            squares += (value / largest) * (value / largest);
        }
        double length = largest * Math.sqrt(squares);
        for (int i = 0; i < v.length; i++) {
            v[i] /= length;
        }
        return length;
    }

    private static void subtractProjection(double[] v, double[] unit) {
        double dot = 0;
        for (int i = 0; i < v.length; i++) {
            dot += unit[i] * v[i];
        }
        for (int i = 0; i < v.length; i++) {
            v[i] -= dot * unit[i];
        }
    }

    /** For m = first..last, the rows of R_1(m)^-T (row j at [j k, j k + k)). */
    private static double[][] leadingInverseRows(Design design, double[] basis) {
        int n = design.rows();
        int k = design.width();
        int first = BreakCandidates.first(n);
        int last = BreakCandidates.last(n);
        double[][] r = Matrices.zeros(k, k);
        double[][] inverses = new double[last - first + 1][];
        for (int m = 1; m <= last; m++) {
            SegmentSums.rotateIn(r, new double[k], basisRow(basis, m - 1, k), 0);
            if (m == first) {
                checkSegmentRank(design, r, "first " + first);
            }
            if (m >= first) {
                inverses[m - first] = inverseTransposeRows(r);
            }
        }
        return inverses;
    }

    /** Adds rows n-1, n-2, ... into R_2 and packs U_m for every candidate m. */
    private static double[] withTrailing(Design design, double[] basis, double[][] leading) {
        int n = design.rows();
        int k = design.width();
        int first = BreakCandidates.first(n);
        int last = BreakCandidates.last(n);
        int packed = k * (k + 1) / 2;
        double[] weights = new double[(last - first + 1) * packed];
        double[][] r = Matrices.zeros(k, k);
        for (int m = n - 1; m >= first; m--) {
            SegmentSums.rotateIn(r, new double[k], basisRow(basis, m, k), 0);
            if (m == last) {
                checkSegmentRank(design, r, "last " + (n - last));
            }
            if (m <= last) {
                double[][] u = triangleOf(leading[m - first], inverseTransposeRows(r), k);
                int w = (m - first) * packed;
                for (int i = 0; i < k; i++) {
                    for (int j = i; j < k; j++) {
                        weights[w++] = u[i][j];
                    }
                }
            }
        }
        return weights;
    }

    /** U upper triangular with U'U = A'A + B'B, by rotating the rows of A and B into it. */
    private static double[][] triangleOf(double[] a, double[] b, int k) {
        double[][] u = Matrices.zeros(k, k);
        double[] unused = new double[k];
        for (double[] rows : new double[][] {a, b}) {
            for (int j = 0; j < k; j++) {
                double[] row = new double[k];
                System.arraycopy(rows, j * k, row, 0, k);
                SegmentSums.rotateIn(u, unused, row, 0);
            }
        }
        return u;
    }

    /** The rows of R^-T for upper-triangular R, i.e. the columns of R^-1, by back substitution. */
    private static double[] inverseTransposeRows(double[][] r) {
        int k = r.length;
        double[] rows = new double[k * k];
        for (int j = 0; j < k; j++) {
            rows[j * k + j] = 1 / r[j][j];
            for (int i = j - 1; i >= 0; i--) {
                double sum = 0;
                for (int l = i + 1; l <= j; l++) {
                    sum += r[i][l] * rows[j * k + l];
                }
                rows[j * k + i] = -sum / r[i][i];
            }
        }
        return rows;
    }

    /**
     * R's diagonal element j is the length of what column j adds, within the segment, to the
     * columns before it (the orthonormal basis keeps the columns' order), so a tiny one names the
     * regressor that is a combination of the earlier ones there.
     */
    private static void checkSegmentRank(Design design, double[][] r, String segment) {
        for (int j = 0; j < r.length; j++) {
            if (!(r[j][j] > SEGMENT_RANK_TOLERANCE)) {
                throw new RankDeficientDesignException("In the " + segment + " rows (the shortest segment the"
                        + " break search fits), regressor '" + design.names().get(j) + "' is a linear combination"
                        + " of the ones before it, so that segment cannot be fitted on its own; drop the regressor"
                        + " or use a longer series.");
            }
        }
    }

    private static double[] basisRow(double[] basis, int t, int k) {
        double[] row = new double[k];
        System.arraycopy(basis, t * k, row, 0, k);
        return row;
    }
}
