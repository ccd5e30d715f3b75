package org.trendwright.core.gls;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.testing.ReferenceData;

/**
 * The normal-equations steps of the GLS iteration: where they answer, within the normal equations'
 * error bound of the least-squares solution; where the design is ill conditioned, no answer.
 */
class QuasiDifferencedNormalEquationsTest {

    /**
     * c u cond^2 for cond(X*) up to a few hundred (Higham 2002, Accuracy and Stability of Numerical
     * Algorithms, 2nd ed., section 20.4), u = 1.1e-16.
     */
    private static final double NORMAL_EQUATIONS_BOUND = 1e-10;

    @ParameterizedTest
    @ValueSource(strings = {"Norris", "NoInt1", "NoInt2"})
    void at_rho_zero_give_nist_certified_coefficients_on_well_conditioned_datasets(String dataset) {
        // NIST StRD linear least squares (https://www.itl.nist.gov/div898/strd/lls/lls.shtml), copied
        // under src/test/resources/reference/nist-strd: at rho = 0 the Prais-Winsten quasi-difference
        // is the identity, so b(0) is the ordinary least-squares solution NIST certifies.
        Design design = nistLinear(dataset);
        double[] b = QuasiDifferencedNormalEquations.coefficients(design, nistResponse(dataset), 0,
                Ar1Method.PRAIS_WINSTEN).orElseThrow();
        double[] certified = certifiedCoefficients(dataset);
        for (int j = 0; j < b.length; j++) {
            assertEquals(certified[j], b[j], NORMAL_EQUATIONS_BOUND * Math.abs(certified[j]), dataset + " b" + j);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"Longley", "Wampler4", "Filip"})
    void decline_the_ill_conditioned_nist_datasets(String dataset) {
        // NIST rates these "higher" difficulty: cond(X) of the unit-scaled columns is far above 100
        // (Longley's x1..x6 are nearly collinear; Wampler4 and Filip are degree 5 and 10
        // polynomials), where the normal equations lose too many digits (Higham 2002, section 20.4).
        Design design = "Longley".equals(dataset) ? longley() : polynomial(dataset, "Filip".equals(dataset) ? 10 : 5);
        assertTrue(QuasiDifferencedNormalEquations.coefficients(design, nistResponse(dataset), 0,
                Ar1Method.PRAIS_WINSTEN).isEmpty(), dataset);
    }

    @ParameterizedTest
    @EnumSource(Ar1Method.class)
    void match_the_qr_route_on_quarterly_trend_designs_over_the_stationary_range(Ar1Method method) {
        // Seeded simulation: linear trends with quarterly dummies and AR(1) errors, n = 20..200; the QR
        // route (LeastSquares.estimates on Ar1Gls.transform, checked against NIST StRD in
        // EstimatesTest) is the accurate answer, and the bound is the normal equations' (Higham 2002).
        SplittableRandom random = new SplittableRandom(2026_12_02L);
        int answered = 0;
        for (int n = 20; n <= 200; n += 15) {
            Design design = quarterlyTrend(n);
            double[] y = Ar1Series.trendPlus(Ar1Series.errors(random, n, 0.8, 2.0));
            for (double rho : new double[] {-0.9, -0.3, 0, 0.5, 0.9, 0.97, 0.995}) {
                Optional<double[]> quick = QuasiDifferencedNormalEquations.coefficients(design, y, rho, method);
                if (quick.isEmpty()) {
                    continue;
                }
                answered++;
                double[] accurate = LeastSquares.estimates(Ar1Gls.transform(design, rho, method),
                        Ar1Gls.transform(y, rho, method)).coefficients();
                double scale = Arrays.stream(accurate).map(Math::abs).max().orElseThrow();
                for (int j = 0; j < accurate.length; j++) {
                    assertEquals(accurate[j], quick.get()[j], NORMAL_EQUATIONS_BOUND * scale,
                            "n = " + n + ", rho = " + rho + ", " + design.names().get(j));
                }
            }
        }
        // These designs stay well conditioned up to rho = 0.995, so every step is answered (the largest
        // difference seen was 4.5e-12 of the largest coefficient, at rho = -0.9).
        assertEquals(13 * 7, answered);
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

    private static double[] nistResponse(String dataset) {
        return ReferenceData.column("nist-strd/" + dataset + ".csv", 0);
    }

    /** NIST's model for Norris (y = b0 + b1 x) and the NoInt sets (y = b1 x). */
    private static Design nistLinear(String dataset) {
        return dataset.startsWith("NoInt") ? new Design(List.of(x(dataset)), List.of("x"), false)
                : polynomial(dataset, 1);
    }

    private static Design polynomial(String dataset, int degree) {
        double[] x = x(dataset);
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int power = 0; power <= degree; power++) {
            double[] column = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                column[i] = StrictMath.pow(x[i], power);
            }
            columns.add(column);
            names.add("x^" + power);
        }
        return new Design(columns, names, true);
    }

    private static Design longley() {
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        double[] constant = new double[nistResponse("Longley").length];
        Arrays.fill(constant, 1);
        columns.add(constant);
        names.add("constant");
        for (int j = 1; j <= 6; j++) {
            columns.add(ReferenceData.column("nist-strd/Longley.csv", j));
            names.add("x" + j);
        }
        return new Design(columns, names, true);
    }

    private static double[] x(String dataset) {
        return ReferenceData.column("nist-strd/" + dataset + ".csv", 1);
    }

    private static double[] certifiedCoefficients(String dataset) {
        return ReferenceData.rows("nist-strd/" + dataset + ".certified.csv").stream()
                .filter(row -> row[0].startsWith("coef_B"))
                .mapToDouble(row -> Double.parseDouble(row[1]))
                .toArray();
    }
}
