package org.trendwright.core.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Double-double accumulation (Dot2 of Ogita, Rump &amp; Oishi 2005, SIAM J. Sci. Comput. 26). */
class CompensatedDotTest {

    private static final double U = 0x1p-53;

    @Test
    void keeps_a_small_term_that_plain_summation_loses() {
        // 1e16 + 1 rounds back to 1e16 in double (the spacing there is 2), so plain summation
        // gives 0 (common practice).
        assertEquals(0.0, 1e16 + 1 - 1e16);
        assertEquals(1.0, new CompensatedDot().add(1e16).add(1).add(-1e16).value());
    }

    @Test
    void recovers_the_rounding_error_of_a_product() {
        // (1 + 2^-30)(1 - 2^-30) - 1 = -2^-60 exactly; the double product rounds to 1.
        double a = 1 + 0x1p-30;
        double b = 1 - 0x1p-30;
        assertEquals(0.0, a * b - 1);
        assertEquals(-0x1p-60, new CompensatedDot().addProduct(a, b).add(-1).value());
    }

    @Test
    void ill_conditioned_dot_products_meet_the_published_error_bound() {
        // Ogita, Rump & Oishi (2005), error bound of Dot2: |res - x'y| <= u |x'y| + gamma_n^2 |x|'|y|,
        // gamma_n = n u / (1 - n u). The dot products are built to cancel: each pair of terms
        // nearly annuls the one before, leaving a sum up to 1e30 times smaller than its terms.
        qt().withFixedSeed(5L).withExamples(300).forAll(longs().all(), integers().between(1, 50))
                .checkAssert((seed, pairs) -> {
                    SplittableRandom random = new SplittableRandom(seed);
                    int n = 2 * pairs;
                    double[] x = new double[n];
                    double[] y = new double[n];
                    for (int i = 0; i < n; i += 2) {
                        x[i] = Math.scalb(random.nextDouble(-1, 1), random.nextInt(-50, 51));
                        y[i] = Math.scalb(random.nextDouble(-1, 1), random.nextInt(-50, 51));
                        x[i + 1] = -x[i] * (1 + Math.scalb(random.nextDouble(-1, 1), -random.nextInt(0, 100)));
                        y[i + 1] = y[i];
                    }
                    CompensatedDot dot = new CompensatedDot();
                    BigDecimal exact = BigDecimal.ZERO;
                    double magnitude = 0;
                    for (int i = 0; i < n; i++) {
                        dot.addProduct(x[i], y[i]);
                        exact = exact.add(new BigDecimal(x[i]).multiply(new BigDecimal(y[i])));
                        magnitude += Math.abs(x[i] * y[i]);
                    }
                    double gamma = n * U / (1 - n * U);
                    double bound = U * Math.abs(exact.doubleValue()) + gamma * gamma * magnitude * (1 + 1e-12);
                    double error = new BigDecimal(dot.value()).subtract(exact).abs().round(MathContext.DECIMAL64)
                            .doubleValue();
                    assertTrue(error <= bound, "error " + error + " above bound " + bound);
                });
    }

    @Test
    void value_and_low_part_carry_the_sum_to_twice_the_working_precision() {
        // 1 + 2^-60 is not a double; the pair (1, 2^-60) holds it exactly.
        CompensatedDot sum = new CompensatedDot().add(1).add(0x1p-60);
        assertEquals(1.0, sum.value());
        assertEquals(0x1p-60, sum.lowPart());
    }
}
