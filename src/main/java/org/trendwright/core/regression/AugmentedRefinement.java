package org.trendwright.core.regression;

/**
 * Least squares with iterative refinement of the augmented system
 * <pre>
 *   [ I   X ] [ r ]   [ y ]
 *   [ X'  0 ] [ b ] = [ 0 ],
 * </pre>
 * whose solution is the least-squares coefficient vector b together with its residual
 * r = y - X b (the second block row is the normal equations X'r = 0). Björck (1967), "Iterative
 * refinement of linear least squares solutions I", BIT 7, 257-278; with Householder QR, Björck
 * &amp; Golub (1967), "Iterative refinement of linear least squares solutions by Householder
 * transformation", BIT 7, 322-337.
 *
 * <p>Each step computes the augmented residuals f = y - r - X b and g = -X'r in double-double
 * arithmetic ({@link CompensatedDot}) and solves the same system for the correction with the QR
 * factors X P = Q R, Q = [Q1 Q2]: with h = R^-T P'g and d = Q'f = [d1; d2],
 * <pre>
 *   db = P R^-1 (d1 - h),   dr = Q [h; d2].
 * </pre>
 * (Check: X'dr = P R'h = g, and dr + X db = Q1 h + Q2 d2 + Q1 (d1 - h) = Q f = f.) Starting from
 * r = 0, b = 0 the first step is the plain QR solution. Refining b alone (re-solving for the
 * residual of b) leaves an error of order cond(X)^2 u ||r|| / ||X b||, which dominates when the
 * residuals are large, as in NIST's Wampler4 and Wampler5; refining r and b together removes it,
 * and the iteration converges at the rate of about cond(X) u per step to the solution of the
 * data as stored, correct to about working precision, as long as cond(X) u is well below 1.
 *
 * <p>Steps stop when the error left in b, estimated as the last correction times the observed
 * rate of convergence (the ratio of the last two corrections), is at most u ||b|| (nothing left
 * to gain); when a correction is no smaller than the one before (the iteration has reached the
 * accuracy of its residuals, or diverges because X is too ill-conditioned; that correction is not
 * applied); or after {@link #MAX_REFINEMENTS} refinements.
 *
 * <p>Stateless and thread-safe.
 */
final class AugmentedRefinement {

    /** At most this many corrections after the first solution. */
    static final int MAX_REFINEMENTS = 5;

    private static final double UNIT_ROUNDOFF = 0x1p-53;

    private AugmentedRefinement() {
    }

    /**
     * The refined solution of the augmented system (an internal carrier: the arrays are handed
     * over, not copied).
     *
     * @param coefficients b, in the original column order
     * @param residuals    r = y - X b for the exact least-squares b, correct to about u ||r|| plus
     *                     terms of order u^2 ||y||
     */
    record Solution(double[] coefficients, double[] residuals) {
    }

    /**
     * The least-squares solution for y on the columns x (original column order), refined as
     * described above; qr must be the factorisation of exactly these columns.
     */
    static Solution solve(double[][] x, PivotedQr qr, double[] y) {
        return solve(x, qr, y, MAX_REFINEMENTS);
    }

    /**
     * The plain Householder solution (the first step above, without corrections): b = P R^-1 Q1'y and
     * r = Q2 Q2'y, accurate to about c u (cond(X) + cond(X)^2 ||r|| / (||X|| ||b||)) relative
     * (Higham 2002, Accuracy and Stability of Numerical Algorithms, 2nd ed., Theorem 20.3).
     */
    static Solution plain(double[][] x, PivotedQr qr, double[] y) {
        return solve(x, qr, y, 0);
    }

    private static Solution solve(double[][] x, PivotedQr qr, double[] y, int refinements) {
        double[] b = new double[x.length];
        double[] r = new double[y.length];
        double previous = Double.POSITIVE_INFINITY;
        for (int step = 0; step <= refinements; step++) {
            double[] db = new double[b.length];
            // From r = 0, b = 0 the augmented residuals are f = y and g = 0 exactly.
            double[] dr = step == 0 ? y.clone() : augmentedResidualF(x, y, r, b);
            correct(qr, step == 0 ? new double[b.length] : augmentedResidualG(x, r), dr, db);
            double size = norm(db);
            if (size >= previous) {
                break;
            }
            addTo(b, db);
            addTo(r, dr);
            // The error left in b is about the next correction, this one times the rate of
            // convergence, estimated by the ratio of this correction to the one before.
            double remaining = step == 0 ? size : size * (size / previous);
            if (remaining <= UNIT_ROUNDOFF * norm(b)) {
                break;
            }
            previous = size;
        }
        return new Solution(b, r);
    }

    /** f = y - r - X b, each entry in double-double arithmetic, then rounded. */
    private static double[] augmentedResidualF(double[][] x, double[] y, double[] r, double[] b) {
        double[] f = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            CompensatedDot sum = new CompensatedDot().add(y[i]).add(-r[i]);
            for (int j = 0; j < b.length; j++) {
                sum.addProduct(-x[j][i], b[j]);
            }
            f[i] = sum.value();
        }
        return f;
    }

    /** g = -X'r, each entry in double-double arithmetic, then rounded. */
    private static double[] augmentedResidualG(double[][] x, double[] r) {
        double[] g = new double[x.length];
        for (int j = 0; j < x.length; j++) {
            CompensatedDot sum = new CompensatedDot();
            double[] column = x[j];
            for (int i = 0; i < r.length; i++) {
                sum.addProduct(-column[i], r[i]);
            }
            g[j] = sum.value();
        }
        return g;
    }

    /**
     * Solves the augmented system for the right-hand side [f; g]: on entry fr holds f, on exit
     * the residual correction dr; db receives the coefficient correction.
     */
    private static void correct(PivotedQr qr, double[] g, double[] fr, double[] db) {
        int k = qr.width();
        double[] pivotedG = new double[k];
        for (int s = 0; s < k; s++) {
            pivotedG[s] = g[qr.pivot(s)];
        }
        double[] h = qr.solveRTranspose(pivotedG);
        qr.applyQTranspose(fr);
        double[] d1MinusH = new double[k];
        for (int s = 0; s < k; s++) {
            d1MinusH[s] = fr[s] - h[s];
            fr[s] = h[s];
        }
        double[] pivotedDb = qr.solveR(d1MinusH);
        for (int s = 0; s < k; s++) {
            db[qr.pivot(s)] = pivotedDb[s];
        }
        qr.applyQ(fr);
    }

    private static void addTo(double[] target, double[] correction) {
        for (int i = 0; i < target.length; i++) {
            target[i] += correction[i];
        }
    }

    private static double norm(double[] v) {
        double sum = 0;
        for (double value : v) {
            sum += value * value;
        }
        return Math.sqrt(sum);
    }
}
