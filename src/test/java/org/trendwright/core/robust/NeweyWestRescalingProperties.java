package org.trendwright.core.robust;

import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.booleans;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;
import org.trendwright.core.diagnostics.SimulatedTrend;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * Equivariance of the Newey-West standard errors to the units of y (common practice: V is
 * quadratic in the residuals, so y -> c y gives SE -> |c| SE and leaves every t statistic's size
 * unchanged). Scale factors span 1e-3..1e3 of either sign, lags 0..10.
 *
 * <p>Tolerance 1e-9 relative: V is a fixed linear map of the residual cross-products, which rescale
 * exactly up to rounding (~1e-14).
 */
class NeweyWestRescalingProperties {

    private static final int N = 80;

    @Test
    void rescaling_y_scales_the_hac_standard_errors_by_the_same_factor() {
        qt().withFixedSeed(1987L).withExamples(60)
                .forAll(longs().all(), doubles().between(-3, 3), booleans().all(), integers().between(0, 10))
                .check((seed, log10, negative, lag) -> {
                    double c = (negative ? -1 : 1) * Math.pow(10, log10);
                    double[] y = SimulatedTrend.response(SimulatedTrend.autoregressive(new Well19937c(seed), N, 0.6));
                    double[] scaled = new double[N];
                    for (int i = 0; i < N; i++) {
                        scaled[i] = c * y[i];
                    }
                    double[] original = NeweyWest.standardErrors(fit(y), lag).standardErrors();
                    double[] rescaled = NeweyWest.standardErrors(fit(scaled), lag).standardErrors();
                    for (int j = 0; j < original.length; j++) {
                        double expected = Math.abs(c) * original[j];
                        if (Math.abs(rescaled[j] - expected) > 1e-9 * expected) {
                            return false;
                        }
                    }
                    return true;
                });
    }

    private static OlsFit fit(double[] y) {
        return LeastSquares.fit(SimulatedTrend.design(N), y);
    }
}
