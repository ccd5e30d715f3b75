package org.trendwright.core.diagnostics;

import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.booleans;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.longs;

import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * Invariance of the residual tests to the units of y (common practice: a test for correlation or
 * for changing variance must not depend on whether sales are counted in units or thousands).
 * Rescaling y by c scales the residuals by c, leaving every autocorrelation and every auxiliary R^2
 * unchanged. Scale factors span 1e-3..1e3 of either sign; the data are a trend with AR(1) errors.
 *
 * <p>Tolerance 1e-9 relative (floor 1e-9 absolute): the statistics are ratios of sums of squares
 * on a well-conditioned design, and rescaling changes them only by rounding, ~1e-14.
 */
class ResidualTestRescalingProperties {

    private static final int N = 60;

    private static double[] series(long seed) {
        return SimulatedTrend.response(SimulatedTrend.autoregressive(new Well19937c(seed), N, 0.4));
    }

    private static double[] scaled(double[] y, double c) {
        double[] scaled = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            scaled[i] = c * y[i];
        }
        return scaled;
    }

    private static OlsFit fit(double[] y) {
        return LeastSquares.fit(SimulatedTrend.design(N), y);
    }

    private static boolean close(double a, double b) {
        return Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a));
    }

    private static double factor(double log10, boolean negative) {
        return (negative ? -1 : 1) * Math.pow(10, log10);
    }

    @Test
    void rescaling_y_leaves_breusch_godfrey_unchanged() {
        qt().withFixedSeed(1978L).withExamples(60)
                .forAll(longs().all(), doubles().between(-3, 3), booleans().all())
                .check((seed, log10, negative) -> {
                    double[] y = series(seed);
                    BreuschGodfreyResult original = BreuschGodfrey.test(fit(y), 4, 0.05);
                    BreuschGodfreyResult rescaled = BreuschGodfrey.test(fit(scaled(y, factor(log10, negative))), 4, 0.05);
                    return close(original.lagrangeMultiplier().statistic(), rescaled.lagrangeMultiplier().statistic())
                            && close(original.fForm().statistic(), rescaled.fForm().statistic());
                });
    }

    @Test
    void rescaling_y_leaves_ljung_box_unchanged() {
        qt().withFixedSeed(1978L).withExamples(60)
                .forAll(longs().all(), doubles().between(-3, 3), booleans().all())
                .check((seed, log10, negative) -> {
                    double[] y = series(seed);
                    double original = LjungBox.test(fit(y).residuals(), 10, 0.05).statistic();
                    double rescaled = LjungBox.test(fit(scaled(y, factor(log10, negative))).residuals(), 10, 0.05)
                            .statistic();
                    return close(original, rescaled);
                });
    }

    @Test
    void rescaling_y_leaves_the_arch_test_unchanged() {
        qt().withFixedSeed(1982L).withExamples(60)
                .forAll(longs().all(), doubles().between(-3, 3), booleans().all())
                .check((seed, log10, negative) -> {
                    double[] y = series(seed);
                    double original = ArchTest.test(fit(y).residuals(), 2, 0.05).statistic();
                    double rescaled = ArchTest.test(fit(scaled(y, factor(log10, negative))).residuals(), 2, 0.05)
                            .statistic();
                    return close(original, rescaled);
                });
    }
}
