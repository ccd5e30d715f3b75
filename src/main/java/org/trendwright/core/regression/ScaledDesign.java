package org.trendwright.core.regression;

import java.util.Arrays;
import org.trendwright.core.Matrices;
import org.trendwright.core.RankDeficientDesignException;

/**
 * A design whose columns are divided by powers of two near their lengths: column j by
 * s_j = 2^floor(log2 ||x_j||), leaving lengths in [1, 2). Dividing by a power of two changes no
 * significant bit, so the scaled design Xs = X S^-1 has exactly the least-squares solution
 * bs = S b, and b and (X'X)^-1 = S^-1 (Xs'Xs)^-1 S^-1 are recovered exactly; the refinement's
 * residuals are those of the data themselves, not of a rounded copy. (Exact unless a value falls
 * below the normal range, 2^-1022 times its column's length, where it may lose low-order bits.)
 *
 * <p>Also the home of the rank check, which works on the columns scaled to unit length.
 *
 * <p>The scaling multiplies by 2^-e rather than calling {@code Math.scalb} per element: an exponent
 * e of a double lies in [-1023, 1023], so 2^-e is itself a double (2^-1023 a subnormal one), and
 * {@code Math.scalb} is specified to round as the single multiplication by it does, so both give the
 * same bits.
 *
 * <p>Immutable after construction; the arrays are not exposed beyond this package.
 */
final class ScaledDesign {

    private final Design design;
    private final double[][] columns;
    /** Lengths of the scaled columns, in [1, 2). */
    private final double[] lengths;
    private final double[] scales;

    private ScaledDesign(Design design, double[][] columns, double[] lengths, double[] scales) {
        this.design = design;
        this.columns = columns;
        this.lengths = lengths;
        this.scales = scales;
    }

    /**
     * Scales the design's columns.
     *
     * @throws RankDeficientDesignException when a column is zero in every row, naming it
     */
    static ScaledDesign of(Design design) {
        int k = design.width();
        double[][] source = design.sharedColumns();
        double[][] columns = Matrices.zeros(k, design.rows());
        double[] lengths = new double[k];
        double[] scales = new double[k];
        for (int j = 0; j < k; j++) {
            double length = norm(source[j]);
            if (length == 0) {
                throw new RankDeficientDesignException("Regressor '" + design.names().get(j)
                        + "' is zero in every row, so its coefficient cannot be estimated; drop it from the model.");
            }
            int exponent = Math.getExponent(length);
            scales[j] = Math.scalb(1.0, exponent);
            double inverseScale = Math.scalb(1.0, -exponent);
            lengths[j] = length * inverseScale;
            for (int i = 0; i < columns[j].length; i++) {
                columns[j][i] = source[j][i] * inverseScale;
            }
        }
        return new ScaledDesign(design, columns, lengths, scales);
    }

    /** The scaled columns Xs (shared, not copied: callers in this package only read them). */
    double[][] columns() {
        return columns;
    }

    /** b = S^-1 bs. */
    double[] unscaled(double[] scaledB) {
        double[] b = new double[scaledB.length];
        for (int j = 0; j < b.length; j++) {
            b[j] = scaledB[j] / scales[j];
        }
        return b;
    }

    /** (X'X)^-1 = S^-1 (Xs'Xs)^-1 S^-1, overwriting the argument. */
    double[][] unscaledInverse(double[][] scaledInverse) {
        for (int i = 0; i < scales.length; i++) {
            for (int j = 0; j < scales.length; j++) {
                scaledInverse[i][j] = unscaledInverseEntry(scaledInverse[i][j], i, j);
            }
        }
        return scaledInverse;
    }

    /** Entry (i, j) of (X'X)^-1 from that of the scaled columns (exact: the scales are powers of two). */
    double unscaledInverseEntry(double scaledEntry, int i, int j) {
        return scaledEntry / scales[i] / scales[j];
    }

    /** sum_j ||x_j|| |b_j|, which the scaled lengths and coefficients give exactly as well. */
    double fitMagnitude(double[] scaledB) {
        double magnitude = 0;
        for (int j = 0; j < lengths.length; j++) {
            magnitude += lengths[j] * Math.abs(scaledB[j]);
        }
        return magnitude;
    }

    /** R of the columns scaled to unit length: column s of qr's R divided by its column's length. */
    double[][] unitLengthR(PivotedQr qr) {
        int k = qr.width();
        double[][] unitR = Matrices.zeros(k, k);
        for (int i = 0; i < k; i++) {
            for (int j = i; j < k; j++) {
                unitR[i][j] = qr.r(i, j) / lengths[qr.pivot(j)];
            }
        }
        return unitR;
    }

    /**
     * Refuses a rank-deficient design, naming the first regressor (in the design's order) that is
     * numerically a linear combination of the ones before it. The pivoted factorisation decides
     * whether the design is deficient (a diagonal element of unitR at most
     * {@link LeastSquares#RANK_TOLERANCE} times the first); the leading blocks of columns,
     * factorised in turn, say where. That second search runs only on the way to the exception.
     *
     * @throws RankDeficientDesignException when the design is rank deficient
     */
    void checkRank(double[][] unitR) {
        if (!isRankDeficient(unitR)) {
            return;
        }
        int dependent = columns.length - 1;
        for (int j = 1; j < columns.length - 1; j++) {
            PivotedQr leading = PivotedQr.factor(Arrays.copyOf(columns, j + 1));
            if (isRankDeficient(unitLengthR(leading))) {
                dependent = j;
                break;
            }
        }
        throw new RankDeficientDesignException("Regressor '" + design.names().get(dependent)
                + "' is (numerically) a linear combination of the regressors before it, so the coefficients"
                + " are not unique; drop it or one of the regressors it depends on.");
    }

    private static boolean isRankDeficient(double[][] unitR) {
        double first = Math.abs(unitR[0][0]);
        for (int i = 1; i < unitR.length; i++) {
            if (Math.abs(unitR[i][i]) <= LeastSquares.RANK_TOLERANCE * first) {
                return true;
            }
        }
        return false;
    }

    /** ||x||, the squares taken after an exact power-of-two scaling so that none overflows. */
    private static double norm(double[] x) {
        double largest = 0;
        for (double v : x) {
            largest = Math.max(largest, Math.abs(v));
        }
        if (largest == 0) {
            return 0;
        }
        int exponent = Math.getExponent(largest);
        double inverseScale = Math.scalb(1.0, -exponent);
        double sum = 0;
        for (double v : x) {
            double scaled = v * inverseScale;
            sum += scaled * scaled;
        }
        return Math.scalb(Math.sqrt(sum), exponent);
    }
}
