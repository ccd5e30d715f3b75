package org.trendwright.core.diagnostics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * The remembered spectra of {@link DurbinWatsonSpectrum#forDesign}: a remembered spectrum is the
 * one computed afresh, bit for bit, for the design asked about and no other, and the memory stays
 * within its bound. The fresh computation is itself checked against Commons Math's dense
 * eigen-decomposition in {@link DurbinWatsonDistributionTest}.
 */
class DurbinWatsonSpectrumMemoryTest {

    @Test
    void a_remembered_spectrum_is_the_one_computed_afresh_for_that_design() {
        List<Design> designs = List.of(polynomial(120, 1), polynomial(120, 2), quarterly(120, 1), quarterly(120, 2),
                noise(120, 5), polynomial(121, 1));
        for (int round = 0; round < 2; round++) {
            for (Design design : designs) {
                DurbinWatsonSpectrum remembered = DurbinWatsonSpectrum.forDesign(design);
                DurbinWatsonSpectrum fresh = DurbinWatsonSpectrum.of(design);
                assertArrayEquals(fresh.eigenvalues(), remembered.eigenvalues(), design.toString());
                assertEquals(fresh.spansConstant(), remembered.spansConstant(), design.toString());
            }
        }
    }

    @Test
    void designs_of_the_same_shape_do_not_share_a_spectrum() {
        // Same n and k, different columns: the seasonal dummies start in a different quarter.
        Design first = quarterly(80, 1);
        Design second = quarterly(80, 2);
        DurbinWatsonSpectrum.forDesign(first);
        assertArrayEquals(DurbinWatsonSpectrum.of(second).eigenvalues(),
                DurbinWatsonSpectrum.forDesign(second).eigenvalues());
        assertTrue(!Arrays.equals(DurbinWatsonSpectrum.forDesign(first).eigenvalues(),
                DurbinWatsonSpectrum.forDesign(second).eigenvalues()));
    }

    @Test
    void the_test_gives_the_same_result_whether_or_not_the_spectrum_was_remembered() {
        Design design = polynomial(97, 2);
        double[] y = seededAr1(97, 0.4, 31);
        OlsFit fit = LeastSquares.fit(design, y);
        DurbinWatsonResult first = DurbinWatson.test(fit, 0.05);
        DurbinWatsonResult second = DurbinWatson.test(fit, 0.05);
        assertEquals(first, second);
        // The p-value from a fresh distribution (no memory involved) at the observed d.
        DurbinWatsonDistribution fresh = DurbinWatsonDistribution.forDesign(design);
        double d = DurbinWatson.statistic(fit.residuals());
        double pPositive = d <= fresh.mean() ? fresh.probabilityAtMost(d) : 1 - fresh.probabilityAtLeast(d);
        assertEquals(pPositive, second.pValuePositive(), 0.0);
    }

    @Test
    void remembers_at_most_the_configured_number_of_designs() {
        for (int n = 20; n < 20 + DurbinWatsonSpectrum.REMEMBERED_DESIGNS + 10; n++) {
            DurbinWatsonSpectrum.forDesign(polynomial(n, 1));
        }
        assertTrue(DurbinWatsonSpectrum.rememberedDesigns() <= DurbinWatsonSpectrum.REMEMBERED_DESIGNS);
    }

    private static Design polynomial(int n, int degree) {
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int p = 0; p <= degree; p++) {
            double[] column = new double[n];
            for (int t = 0; t < n; t++) {
                column[t] = Math.pow((t + 1.0) / n, p);
            }
            columns.add(column);
            names.add(p == 0 ? "constant" : "t^" + p);
        }
        return new Design(columns, names, true);
    }

    /** Constant, t and dummies for quarters 2..4, the series starting in quarter {@code firstQuarter}. */
    private static Design quarterly(int n, int firstQuarter) {
        Design trend = polynomial(n, 1);
        List<double[]> dummies = new ArrayList<>();
        for (int q = 2; q <= 4; q++) {
            double[] dummy = new double[n];
            for (int t = 0; t < n; t++) {
                dummy[t] = (firstQuarter - 1 + t) % 4 + 1 == q ? 1 : 0;
            }
            dummies.add(dummy);
        }
        return trend.withColumns(dummies, List.of("season 2", "season 3", "season 4"));
    }

    private static Design noise(int n, long seed) {
        Random random = new Random(seed);
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            x[t] = random.nextGaussian();
        }
        return polynomial(n, 1).withColumns(List.of(x), List.of("x"));
    }

    private static double[] seededAr1(int n, double rho, long seed) {
        Random random = new Random(seed);
        double[] y = new double[n];
        double u = 0;
        for (int t = 0; t < n; t++) {
            u = rho * u + random.nextGaussian();
            y[t] = 10 + 0.3 * t + u;
        }
        return y;
    }
}
