package org.trendwright.core.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.quicktheories.QuickTheory;
import org.quicktheories.core.Gen;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.RankDeficientDesignException;
import org.trendwright.core.regression.RandomRegression.Problem;

/**
 * Invariants of least squares that hold for every full-rank design (common practice; see e.g.
 * Björck 1996, "Numerical Methods for Least Squares Problems", SIAM, ch. 1), checked on seeded
 * random problems ({@link RandomRegression}: condition numbers up to about 2e5, residuals from a
 * thousandth to a thousand times the signal). QuickTheories draws the seeds and sizes from a fixed
 * seed, so every run checks the same examples.
 *
 * <p>Tolerances. The refined solution is the exact least-squares solution of the stored data to
 * within a few units of roundoff u = 2^-53 = 1.1e-16 in the norm that weights each coefficient by
 * its column's length, whatever the conditioning (Björck 1967, BIT 7); over these examples the
 * largest deviation seen is below 3 u. The tolerance 1e-14 (90 u) leaves room for that constant
 * and stays far below the error of an unrefined QR solution on the large-residual examples,
 * which grows with cond^2 u ||r|| / ||X b||.
 */
class LeastSquaresProperties {

    private static final double TOLERANCE = 1e-14;

    private static QuickTheory theory(int examples) {
        return qt().withFixedSeed(20_261_202L).withExamples(examples);
    }

    private static final Gen<Long> SEEDS = longs().all();
    private static final Gen<Integer> WIDTHS = integers().between(1, 6);
    private static final Gen<Integer> SPARE_ROWS = integers().between(1, 60);

    @Test
    void residuals_are_orthogonal_to_every_regressor() {
        theory(300).forAll(SEEDS, WIDTHS, SPARE_ROWS).checkAssert((seed, k, spare) -> {
            Problem problem = RandomRegression.generate(seed, k, k + spare);
            OlsFit fit = LeastSquares.fit(problem.design(), problem.y());
            double yNorm = norm(problem.y());
            for (int j = 0; j < k; j++) {
                double[] column = problem.design().column(j);
                // X'e = 0 for the exact residual; a residual correct to u ||y|| keeps |x_j'e| near
                // u ||x_j|| ||y||. The check's own inner product is exact (BigDecimal).
                double product = exactDot(column, fit.residuals());
                assertTrue(Math.abs(product) <= TOLERANCE * norm(column) * yNorm,
                        "x_" + j + "'e = " + product + " in " + problem.design());
            }
        });
    }

    @Test
    void an_exact_polynomial_is_recovered_exactly() {
        theory(200).forAll(SEEDS, integers().between(0, 5), SPARE_ROWS).checkAssert((seed, degree, spare) -> {
            SplittableRandom random = new SplittableRandom(seed);
            int n = degree + 1 + spare;
            int offset = random.nextInt(-20, 21);
            long[] numerators = new long[degree + 1];
            for (int p = 0; p <= degree; p++) {
                numerators[p] = (random.nextBoolean() ? 1 : -1) * random.nextLong(1, 1001);
            }
            // y = sum_p (m_p / 1024) t^p with integer t and m_p: exact in double (below 2^53).
            List<double[]> columns = new ArrayList<>();
            List<String> names = new ArrayList<>();
            double[] y = new double[n];
            for (int p = 0; p <= degree; p++) {
                columns.add(new double[n]);
                names.add("t^" + p);
            }
            for (int i = 0; i < n; i++) {
                long t = i + offset;
                long power = 1;
                long scaledValue = 0;
                for (int p = 0; p <= degree; p++) {
                    columns.get(p)[i] = power;
                    scaledValue += numerators[p] * power;
                    power *= t;
                }
                y[i] = Math.scalb((double) scaledValue, -10);
            }
            OlsFit fit = LeastSquares.fit(new Design(columns, names, true), y);
            for (int p = 0; p <= degree; p++) {
                double expected = Math.scalb((double) numerators[p], -10);
                // The data fit exactly, so the solution is exact; 1e-12 relative allows for
                // rounding amplified by the conditioning (cond up to ~1e8 for degree 5).
                assertEquals(expected, fit.estimates()[p], 1e-12 * Math.abs(expected), "coefficient of t^" + p);
            }
            assertTrue(fit.residualSumOfSquares() <= 1e-24 * fit.totalSumOfSquares() || fit.totalSumOfSquares() == 0,
                    "RSS " + fit.residualSumOfSquares() + " for an exact fit");
        });
    }

    @Test
    void row_order_does_not_change_the_fit() {
        theory(300).forAll(SEEDS, WIDTHS, SPARE_ROWS).checkAssert((seed, k, spare) -> {
            Problem problem = RandomRegression.generate(seed, k, k + spare);
            int[] order = shuffled(k + spare, new SplittableRandom(~seed));
            List<double[]> columns = new ArrayList<>();
            for (int j = 0; j < k; j++) {
                columns.add(permuted(problem.design().column(j), order));
            }
            Design shuffledDesign = new Design(columns, problem.design().names(), problem.design().hasIntercept());
            OlsFit original = LeastSquares.fit(problem.design(), problem.y());
            OlsFit shuffled = LeastSquares.fit(shuffledDesign, permuted(problem.y(), order));
            assertSameCoefficients(problem.design(), original.estimates(), shuffled.estimates(), 1.0);
            assertSameStandardErrors(original, shuffled, 1.0);
        });
    }

    @Test
    void rescaling_the_response_rescales_coefficients_and_standard_errors() {
        theory(300).forAll(SEEDS, WIDTHS, SPARE_ROWS).checkAssert((seed, k, spare) -> {
            Problem problem = RandomRegression.generate(seed, k, k + spare);
            // y is rounded to 24 significant bits and c has at most 20, so c y is exact: the
            // rescaled problem is exactly c times the original and any difference is the method's.
            double[] y = problem.y();
            SplittableRandom random = new SplittableRandom(seed);
            double c = (random.nextBoolean() ? 1 : -1) * Math.scalb(1.0 + 2 * random.nextInt(1 << 19), random.nextInt(-40, 1));
            double[] scaledY = new double[y.length];
            for (int i = 0; i < y.length; i++) {
                y[i] = (float) y[i];
                scaledY[i] = c * y[i];
            }
            OlsFit original = LeastSquares.fit(problem.design(), y);
            OlsFit rescaled = LeastSquares.fit(problem.design(), scaledY);
            double[] expected = original.estimates();
            for (int j = 0; j < k; j++) {
                expected[j] *= c;
            }
            assertSameCoefficients(problem.design(), expected, rescaled.estimates(), Math.abs(c));
            assertSameStandardErrors(rescaled, original, Math.abs(c));
            assertEquals(original.rSquared(), rescaled.rSquared(), TOLERANCE, "R^2 is scale-free");
        });
    }

    @Test
    void a_duplicated_or_dependent_regressor_is_refused_by_name() {
        theory(300).forAll(SEEDS, integers().between(1, 5), SPARE_ROWS).checkAssert((seed, k, spare) -> {
            Problem problem = RandomRegression.generate(seed, k, k + 1 + spare);
            SplittableRandom random = new SplittableRandom(~seed);
            List<double[]> columns = new ArrayList<>(problem.design().columns());
            List<String> names = new ArrayList<>(problem.design().names());
            int last = random.nextInt(k);
            double[] dependent = columns.get(last).clone();
            boolean duplicate = random.nextBoolean();
            for (int j = 0; j < last && !duplicate; j++) {
                double weight = random.nextBoolean() ? 0 : random.nextDouble(-2, 2);
                for (int i = 0; i < dependent.length; i++) {
                    dependent[i] += weight * columns.get(j)[i];
                }
            }
            // Inserted anywhere after the columns it is made of, it is the first regressor that
            // depends on the ones before it, and the one the message must name.
            int position = random.nextInt(last + 1, k + 1);
            columns.add(position, dependent);
            names.add(position, "dependent");
            Design design = new Design(columns, names, problem.design().hasIntercept());
            RankDeficientDesignException refusal = assertThrows(RankDeficientDesignException.class,
                    () -> LeastSquares.fit(design, problem.y()));
            assertTrue(refusal.getMessage().startsWith("Regressor 'dependent' "), refusal.getMessage());
        });
    }

    @Test
    void too_few_rows_are_refused_as_insufficient_data() {
        theory(100).forAll(SEEDS, WIDTHS, integers().between(0, 5)).checkAssert((seed, k, missing) -> {
            int n = Math.max(1, k - missing);
            SplittableRandom random = new SplittableRandom(seed);
            List<double[]> columns = new ArrayList<>();
            List<String> names = new ArrayList<>();
            for (int j = 0; j < k; j++) {
                columns.add(RandomRegression.gaussian(random, n));
                names.add("z" + j);
            }
            double[] y = RandomRegression.gaussian(random, n);
            InsufficientDataException refusal = assertThrows(InsufficientDataException.class,
                    () -> LeastSquares.fit(new Design(columns, names, false), y));
            assertTrue(refusal.getMessage().contains("needs at least " + (k + 1)), refusal.getMessage());
        });
    }

    @Test
    void agrees_with_exact_arithmetic_on_the_stored_data() {
        theory(50).forAll(SEEDS, WIDTHS, SPARE_ROWS).checkAssert((seed, k, spare) -> {
            Problem problem = RandomRegression.generate(seed, k, k + spare);
            OlsFit fit = LeastSquares.fit(problem.design(), problem.y());
            ExactLeastSquares.Solution exact = ExactLeastSquares.fit(problem.design(), problem.y());
            assertSameCoefficients(problem.design(), exact.coefficients(), fit.estimates(), 1.0);
            for (int j = 0; j < k; j++) {
                double se = exact.standardErrors()[j];
                assertEquals(se, fit.coefficients().get(j).standardError(), TOLERANCE * se, "se of " + j);
            }
            assertEquals(exact.residualSd(), fit.standardErrorOfEstimate(), TOLERANCE * exact.residualSd());
            // R^2 lies in [0, 1]; its error is absolute (relative to 1), as R^2 = 0 exactly shows.
            assertEquals(exact.rSquared(), fit.rSquared(), TOLERANCE, "R^2");
        });
    }

    /** ||D (actual - expected)|| <= TOLERANCE c ||D expected||, D the column lengths, c the scale. */
    private static void assertSameCoefficients(Design design, double[] expected, double[] actual, double c) {
        double difference = 0;
        double size = 0;
        for (int j = 0; j < expected.length; j++) {
            double length = norm(design.column(j));
            difference = Math.hypot(difference, length * (actual[j] - expected[j]));
            size = Math.hypot(size, length * expected[j]);
        }
        assertTrue(difference <= TOLERANCE * size, "coefficients differ by " + difference / size
                + " relative (scale " + c + ") in " + design);
    }

    /** se_j(first) = c se_j(second) to TOLERANCE relative. */
    private static void assertSameStandardErrors(OlsFit first, OlsFit second, double c) {
        for (int j = 0; j < first.coefficients().size(); j++) {
            double expected = c * second.coefficients().get(j).standardError();
            assertEquals(expected, first.coefficients().get(j).standardError(), TOLERANCE * expected,
                    "standard error " + j);
        }
    }

    private static int[] shuffled(int n, SplittableRandom random) {
        int[] order = new int[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        for (int i = n - 1; i > 0; i--) {
            int j = random.nextInt(i + 1);
            int swap = order[i];
            order[i] = order[j];
            order[j] = swap;
        }
        return order;
    }

    private static double[] permuted(double[] values, int[] order) {
        double[] result = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            result[i] = values[order[i]];
        }
        return result;
    }

    private static double exactDot(double[] u, double[] v) {
        BigDecimal sum = BigDecimal.ZERO;
        for (int i = 0; i < u.length; i++) {
            sum = sum.add(new BigDecimal(u[i]).multiply(new BigDecimal(v[i])));
        }
        return sum.doubleValue();
    }

    private static double norm(double[] v) {
        double sum = 0;
        for (double x : v) {
            sum += x * x;
        }
        return Math.sqrt(sum);
    }
}
