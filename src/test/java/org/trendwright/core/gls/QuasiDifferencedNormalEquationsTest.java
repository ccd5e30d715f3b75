package org.trendwright.core.gls;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.NormalEquations;

/**
 * The normal-equations steps of the GLS iteration, from moments summed once, against the QR route
 * on the quasi-differenced data, over the stationary range of rho; and the moments of prefixes. {@link NormalEquations} itself is checked against NIST
 * StRD in NormalEquationsTest.
 */
class QuasiDifferencedNormalEquationsTest {

    /**
     * c u cond^2 for cond(X*) up to a few hundred (Higham 2002, Accuracy and Stability of Numerical
     * Algorithms, 2nd ed., section 20.4), u = 1.1e-16.
     */
    private static final double NORMAL_EQUATIONS_BOUND = 1e-10;

    @ParameterizedTest
    @EnumSource(Ar1Method.class)
    void match_the_qr_route_on_quarterly_trend_designs_over_the_stationary_range(Ar1Method method) {
        // Seeded simulation: linear trends with quarterly dummies and AR(1) errors, n = 20..200; the QR
        // route (LeastSquares.estimates on Ar1Gls.transform, checked against NIST StRD in
        // EstimatesTest) is the accurate answer, and the bound is the normal equations' (Higham 2002).
        SplittableRandom random = new SplittableRandom(2026_12_02L);
        // These designs stay well conditioned up to rho = 0.995, so every step must be answered (the
        // largest difference seen was 4.5e-12 of the largest coefficient, at rho = -0.9).
        for (int n = 20; n <= 200; n += 15) {
            Design design = quarterlyTrend(n);
            double[] y = Ar1Series.trendPlus(Ar1Series.errors(random, n, 0.8, 2.0));
            for (double rho : new double[] {-0.9, -0.3, 0, 0.5, 0.9, 0.97, 0.995}) {
                String where = "n = " + n + ", rho = " + rho;
                double[] quick = QuasiDifferencedNormalEquations.of(design, y).coefficients(rho, method)
                        .orElseThrow(() -> new AssertionError("declined at " + where));
                double[] accurate = LeastSquares.estimates(Ar1Gls.transform(design, rho, method),
                        Ar1Gls.transform(y, rho, method)).coefficients();
                double scale = Arrays.stream(accurate).map(Math::abs).max().orElseThrow();
                for (int j = 0; j < accurate.length; j++) {
                    assertEquals(accurate[j], quick[j], NORMAL_EQUATIONS_BOUND * scale,
                            where + ", " + design.names().get(j));
                }
            }
        }
    }

    @ParameterizedTest
    @EnumSource(Ar1Method.class)
    void the_moments_of_every_prefix_from_one_pass_are_those_of_the_prefix_alone(Ar1Method method) {
        // The same sums in the same order, so the same bits (common practice: floating-point addition
        // is deterministic for a fixed order of operands).
        SplittableRandom random = new SplittableRandom(2026_12_03L);
        int n = 80;
        Design design = quarterlyTrend(n);
        double[] y = Ar1Series.trendPlus(Ar1Series.errors(random, n, 0.6, 1.5));
        int[] ends = {72, 80, 40, 73, 79};
        List<QuasiDifferencedNormalEquations> prefixes = QuasiDifferencedNormalEquations.ofPrefixes(design, y, ends);
        for (int e = 0; e < ends.length; e++) {
            QuasiDifferencedNormalEquations alone = QuasiDifferencedNormalEquations.of(quarterlyTrend(ends[e]),
                    Arrays.copyOf(y, ends[e]));
            assertEquals(ends[e], prefixes.get(e).rows());
            for (double rho : new double[] {-0.5, 0, 0.7, 0.99}) {
                assertArrayEquals(alone.coefficients(rho, method).orElseThrow(),
                        prefixes.get(e).coefficients(rho, method).orElseThrow(), "end " + ends[e] + ", rho " + rho);
            }
        }
    }

    @Test
    void prefixes_longer_than_the_design_are_refused_and_no_ends_give_no_moments() {
        Design design = quarterlyTrend(20);
        double[] y = new double[20];
        IllegalArgumentException tooLong = assertThrows(IllegalArgumentException.class,
                () -> QuasiDifferencedNormalEquations.ofPrefixes(design, y, new int[] {10, 21}));
        assertTrue(tooLong.getMessage().contains("1 to 20 rows"), tooLong.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> QuasiDifferencedNormalEquations.ofPrefixes(design, new double[19], new int[] {10}));
        assertTrue(QuasiDifferencedNormalEquations.ofPrefixes(design, y, new int[0]).isEmpty());
    }

    private static Design quarterlyTrend(int n) {
        List<double[]> columns = new ArrayList<>();
        double[] constant = new double[n];
        double[] t = new double[n];
        Arrays.fill(constant, 1);
        for (int i = 0; i < n; i++) {
            t[i] = i + 1;
        }
        columns.add(constant);
        columns.add(t);
        for (int q = 1; q < 4; q++) {
            double[] dummy = new double[n];
            for (int i = q; i < n; i += 4) {
                dummy[i] = 1;
            }
            columns.add(dummy);
        }
        return new Design(columns, List.of("constant", "t", "Q2", "Q3", "Q4"), true);
    }
}
