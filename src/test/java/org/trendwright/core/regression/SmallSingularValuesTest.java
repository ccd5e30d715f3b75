package org.trendwright.core.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The one-sided Jacobi singular values against published condition numbers and against Commons
 * Math's {@code SingularValueDecomposition} (Golub-Kahan bidiagonalisation and QR), an independent
 * general-purpose implementation.
 */
class SmallSingularValuesTest {

    @ParameterizedTest
    @CsvSource({"3, 524.0567775860627", "4, 15513.738738929", "5, 476607.25024259", "6, 14951058.641"})
    void hilbert_condition_numbers(int n, double published) {
        // 2-norm condition numbers of the n x n Hilbert matrix (from memory, as tabulated in numerical
        // analysis texts; Commons Math's SVD gives the same to 12 digits). Storing 1/(i + j + 1) in
        // double perturbs the matrix by u relative, which moves cond by about cond u: 10 cond u allowed,
        // plus 1e-10 for the digits given.
        double[][] hilbert = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                hilbert[i][j] = 1.0 / (i + j + 1);
            }
        }
        double relative = 10 * published * 0x1p-53 + 1e-10;
        assertEquals(published, SmallSingularValues.conditionNumber(hilbert), relative * published);
    }

    @Test
    void two_unit_columns_at_a_known_angle() {
        // Unit columns with u'v = c have singular values sqrt(1 + c) and sqrt(1 - c) (common
        // practice); c = 0.6 gives sqrt(1.6) and sqrt(0.4), cond 2.
        double[][] a = {{1, 0.6}, {0, 0.8}};
        double[] sigma = SmallSingularValues.of(a);
        Arrays.sort(sigma);
        assertEquals(Math.sqrt(0.4), sigma[0], 1e-15);
        assertEquals(Math.sqrt(1.6), sigma[1], 1e-15);
        assertEquals(2, SmallSingularValues.conditionNumber(a), 1e-14);
    }

    @Test
    void every_singular_value_matches_commons_math_on_seeded_square_and_triangular_matrices() {
        SplittableRandom random = new SplittableRandom(20261202);
        for (int trial = 0; trial < 400; trial++) {
            int k = 1 + trial % 12;
            boolean triangular = trial % 2 == 0;
            double[][] a = new double[k][k];
            for (int i = 0; i < k; i++) {
                for (int j = triangular ? i : 0; j < k; j++) {
                    // Graded columns, as the R of a regression on columns of unequal weight has.
                    a[i][j] = random.nextGaussian() * Math.pow(10, -(j % 4));
                }
            }
            double[] expected = new SingularValueDecomposition(new Array2DRowRealMatrix(a)).getSingularValues();
            double[] actual = SmallSingularValues.of(a);
            Arrays.sort(expected);
            Arrays.sort(actual);
            for (int s = 0; s < k; s++) {
                // Both are backward stable: each value to a small multiple of u sigma_max.
                assertEquals(expected[s], actual[s], 1e-13 * expected[k - 1], "trial " + trial + ", value " + s);
            }
        }
    }

    @Test
    void a_singular_matrix_has_an_unbounded_condition_number() {
        // Rank 1: the second singular value is 0 in exact arithmetic, rounding level here.
        double[][] a = {{1, 2}, {2, 4}};
        assertTrue(SmallSingularValues.conditionNumber(a) > 1e15);
    }

    @Test
    void leaves_its_argument_unchanged() {
        double[][] a = {{2, 1}, {0, 3}};
        SmallSingularValues.of(a);
        assertEquals(2, a[0][0]);
        assertEquals(1, a[0][1]);
        assertEquals(3, a[1][1]);
    }
}
