package org.trendwright.core.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The Householder QR with column pivoting, X P = Q R, on seeded random matrices with columns of
 * unit-order length but different conditioning. Householder QR is backward stable: the computed
 * factors reproduce every column of X to within a small multiple of n u ||x_j||, and the computed
 * Q is orthogonal to within a small multiple of n u (Higham 2002, "Accuracy and Stability of
 * Numerical Algorithms", 2nd ed., SIAM, section 19.3). The tolerances below, 10 n u, allow that.
 */
class PivotedQrTest {

    private static final double U = 0x1p-53;

    @Test
    void q_times_r_reproduces_the_pivoted_columns() {
        qt().withFixedSeed(7L).withExamples(200).forAll(longs().all(), integers().between(1, 8), integers().between(0, 40))
                .checkAssert((seed, k, spare) -> {
                    double[][] x = randomColumns(seed, k, k + spare);
                    PivotedQr qr = PivotedQr.factor(x);
                    int n = x[0].length;
                    for (int s = 0; s < k; s++) {
                        double[] column = new double[n];
                        for (int i = 0; i <= s; i++) {
                            column[i] = qr.r(i, s);
                        }
                        qr.applyQ(column);
                        double[] original = x[qr.pivot(s)];
                        double error = 0;
                        for (int i = 0; i < n; i++) {
                            error = Math.hypot(error, column[i] - original[i]);
                        }
                        assertTrue(error <= 10 * n * U * norm(original), "column " + s + " off by " + error);
                    }
                });
    }

    @Test
    void q_is_orthogonal() {
        qt().withFixedSeed(8L).withExamples(200).forAll(longs().all(), integers().between(1, 8), integers().between(0, 40))
                .checkAssert((seed, k, spare) -> {
                    double[][] x = randomColumns(seed, k, k + spare);
                    PivotedQr qr = PivotedQr.factor(x);
                    double[] v = randomColumns(~seed, 1, x[0].length)[0];
                    double[] w = v.clone();
                    qr.applyQTranspose(w);
                    assertEquals(norm(v), norm(w), 10 * v.length * U * norm(v), "Q' keeps lengths");
                    qr.applyQ(w);
                    for (int i = 0; i < v.length; i++) {
                        assertEquals(v[i], w[i], 10 * v.length * U * norm(v), "Q Q' = I");
                    }
                });
    }

    @Test
    void pivoting_orders_the_diagonal_of_the_unit_scaled_r_decreasingly() {
        // Businger & Golub (1965): each step takes the column with the most left unexplained.
        qt().withFixedSeed(9L).withExamples(200).forAll(longs().all(), integers().between(2, 8), integers().between(0, 40))
                .checkAssert((seed, k, spare) -> {
                    double[][] x = randomColumns(seed, k, k + spare);
                    PivotedQr qr = PivotedQr.factor(x);
                    for (int s = 1; s < k; s++) {
                        double before = Math.abs(qr.r(s - 1, s - 1)) / norm(x[qr.pivot(s - 1)]);
                        double here = Math.abs(qr.r(s, s)) / norm(x[qr.pivot(s)]);
                        assertTrue(here <= before * (1 + 10 * U), "step " + s + ": " + here + " after " + before);
                    }
                });
    }

    @Test
    void triangular_solves_invert_r_and_its_transpose() {
        double[][] x = randomColumns(11L, 4, 9);
        PivotedQr qr = PivotedQr.factor(x);
        double[] d = {1, -2, 3, 0.5};
        double[] z = qr.solveR(d);
        double[] h = qr.solveRTranspose(d);
        for (int i = 0; i < 4; i++) {
            double rz = 0;
            double rth = 0;
            for (int j = 0; j < 4; j++) {
                rz += qr.r(i, j) * z[j];
                rth += qr.r(j, i) * h[j];
            }
            // Residuals of triangular solves are of order u ||R|| ||z|| (Higham 2002, section 8.1).
            assertEquals(d[i], rz, 1e-13, "R z = d");
            assertEquals(d[i], rth, 1e-13, "R' h = d");
        }
    }

    /** k columns of length n, each Gaussian with a random mean and scaled to unit length. */
    static double[][] randomColumns(long seed, int k, int n) {
        SplittableRandom random = new SplittableRandom(seed);
        double[][] x = new double[k][];
        for (int j = 0; j < k; j++) {
            x[j] = RandomRegression.gaussian(random, n);
            double length = norm(x[j]);
            for (int i = 0; i < n; i++) {
                x[j][i] /= length;
            }
        }
        return x;
    }

    static double norm(double[] v) {
        double sum = 0;
        for (double value : v) {
            sum += value * value;
        }
        return Math.sqrt(sum);
    }
}
