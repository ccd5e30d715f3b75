package org.trendwright.core.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * {@link LeastSquares#sumsOfSquares} reports the very sums of squares of {@link LeastSquares#fit},
 * which {@link NistStrdTest} checks against NIST's certified values; the lighter path must not
 * change a bit of them.
 */
class SumsOfSquaresTest {

    @ParameterizedTest
    @EnumSource(NistDataset.class)
    void equals_the_full_fit_bit_for_bit_on_every_nist_strd_linear_dataset(NistDataset dataset) {
        // NIST StRD linear least-squares datasets (https://www.itl.nist.gov/div898/strd/lls/lls.shtml)
        assertSameSums(dataset.design(), dataset.response());
    }

    @Test
    void equals_the_full_fit_for_a_seeded_regression_without_intercept() {
        Random random = new Random(2026_12_02L);
        double[] x = new double[50];
        double[] z = new double[50];
        double[] y = new double[50];
        for (int i = 0; i < 50; i++) {
            x[i] = random.nextGaussian();
            z[i] = random.nextDouble();
            y[i] = 2 * x[i] - z[i] + random.nextGaussian();
        }
        assertSameSums(new Design(List.of(x, z), List.of("x", "z"), false), y);
    }

    private static void assertSameSums(Design design, double[] y) {
        OlsFit fit = LeastSquares.fit(design, y);
        SumsOfSquares sums = LeastSquares.sumsOfSquares(design, y);
        assertEquals(fit.residualSumOfSquares(), sums.residual(), 0.0);
        assertEquals(fit.totalSumOfSquares(), sums.total(), 0.0);
        assertEquals(fit.rSquared(), sums.rSquared(), 0.0);
    }
}
