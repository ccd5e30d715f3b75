package org.trendwright.core.gls;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.NormalEquations;

/**
 * The normal-equations steps of the GLS iteration against the QR route on the quasi-differenced
 * data, over the stationary range of rho. {@link NormalEquations} itself is checked against NIST
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
                double[] quick = QuasiDifferencedNormalEquations.coefficients(design, y, rho, method)
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
