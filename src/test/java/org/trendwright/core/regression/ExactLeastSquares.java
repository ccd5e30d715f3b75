package org.trendwright.core.regression;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * Least squares computed in 120-digit decimal arithmetic, as an independent yardstick: the exact
 * solution for the data as stored in double precision. Every double is converted to BigDecimal
 * without rounding, X'X and X'y are formed exactly, and the normal equations are solved by
 * Gauss-Jordan elimination at 120 significant digits, which leaves far more than 16 correct
 * digits for any design with cond(X'X) below 1e100. No pivoting is needed: X'X is positive
 * definite for a full-rank X, so every pivot is positive.
 *
 * <p>Slow (milliseconds for the NIST designs) and for tests and reports only.
 */
final class ExactLeastSquares {

    private static final MathContext DIGITS = new MathContext(120);

    /**
     * The exact quantities NIST certifies.
     *
     * @param coefficients   b = (X'X)^-1 X'y
     * @param standardErrors s sqrt([(X'X)^-1]_jj)
     * @param residualSd     s = sqrt(RSS / (n - k))
     * @param rSquared       1 - RSS/TSS, TSS centred with an intercept and uncentred without
     */
    record Solution(double[] coefficients, double[] standardErrors, double residualSd, double rSquared) {
    }

    private ExactLeastSquares() {
    }

    static Solution fit(Design design, double[] y) {
        int n = y.length;
        int k = design.width();
        BigDecimal[][] system = normalEquationsWithIdentity(design, y);
        eliminate(system);
        BigDecimal[] b = new BigDecimal[k];
        for (int j = 0; j < k; j++) {
            b[j] = system[j][k];
        }
        BigDecimal rss = BigDecimal.ZERO;
        for (int i = 0; i < n; i++) {
            BigDecimal residual = new BigDecimal(y[i]);
            for (int j = 0; j < k; j++) {
                residual = residual.subtract(new BigDecimal(design.get(i, j)).multiply(b[j]));
            }
            rss = rss.add(residual.multiply(residual), DIGITS);
        }
        BigDecimal variance = rss.divide(BigDecimal.valueOf(n - k), DIGITS);
        double[] coefficients = new double[k];
        double[] standardErrors = new double[k];
        for (int j = 0; j < k; j++) {
            coefficients[j] = b[j].doubleValue();
            standardErrors[j] = variance.multiply(system[j][k + 1 + j]).sqrt(DIGITS).doubleValue();
        }
        BigDecimal rSquared = BigDecimal.ONE.subtract(rss.divide(totalSumOfSquares(design, y), DIGITS));
        return new Solution(coefficients, standardErrors, variance.sqrt(DIGITS).doubleValue(), rSquared.doubleValue());
    }

    /** The k x (2k + 1) array [X'X | X'y | I], formed exactly. */
    private static BigDecimal[][] normalEquationsWithIdentity(Design design, double[] y) {
        int k = design.width();
        BigDecimal[][] system = new BigDecimal[k][2 * k + 1];
        for (int p = 0; p < k; p++) {
            for (int q = 0; q < k; q++) {
                system[p][q] = crossProduct(design.column(p), design.column(q));
                system[p][k + 1 + q] = p == q ? BigDecimal.ONE : BigDecimal.ZERO;
            }
            system[p][k] = crossProduct(design.column(p), y);
        }
        return system;
    }

    private static BigDecimal crossProduct(double[] u, double[] v) {
        BigDecimal sum = BigDecimal.ZERO;
        for (int i = 0; i < u.length; i++) {
            sum = sum.add(new BigDecimal(u[i]).multiply(new BigDecimal(v[i])));
        }
        return sum;
    }

    /** Gauss-Jordan elimination: afterwards the left block is diagonal, each row divided by it. */
    private static void eliminate(BigDecimal[][] system) {
        int k = system.length;
        for (int c = 0; c < k; c++) {
            BigDecimal pivot = system[c][c];
            for (int q = c; q < system[c].length; q++) {
                system[c][q] = system[c][q].divide(pivot, DIGITS);
            }
            for (int r = 0; r < k; r++) {
                if (r != c) {
                    BigDecimal factor = system[r][c];
                    for (int q = c; q < system[r].length; q++) {
                        system[r][q] = system[r][q].subtract(factor.multiply(system[c][q]), DIGITS);
                    }
                }
            }
        }
    }

    private static BigDecimal totalSumOfSquares(Design design, double[] y) {
        BigDecimal centre = BigDecimal.ZERO;
        if (design.hasIntercept()) {
            for (double v : y) {
                centre = centre.add(new BigDecimal(v));
            }
            centre = centre.divide(BigDecimal.valueOf(y.length), DIGITS);
        }
        BigDecimal sum = BigDecimal.ZERO;
        for (double v : y) {
            BigDecimal d = new BigDecimal(v).subtract(centre);
            sum = sum.add(d.multiply(d), DIGITS);
        }
        return sum;
    }
}
