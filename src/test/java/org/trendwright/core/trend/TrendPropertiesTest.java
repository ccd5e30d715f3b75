package org.trendwright.core.trend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.lists;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.trendwright.core.Observations;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * Invariances every least-squares trend must have (common practice: they follow from the normal
 * equations), checked on generated series with a fixed seed.
 */
class TrendPropertiesTest {

    private static final long SEED = 20261202L;

    @Test
    void rescaling_y_rescales_every_coefficient_and_standard_error() {
        qt().withFixedSeed(SEED).withExamples(200)
                .forAll(lists().of(doubles().between(-1e4, 1e4)).ofSizeBetween(6, 60),
                        doubles().between(1e-3, 1e3))
                .checkAssert((values, factor) -> {
                    double[] y = toArray(values);
                    double[] scaled = y.clone();
                    for (int i = 0; i < scaled.length; i++) {
                        scaled[i] *= factor;
                    }
                    TrendFit original = Trends.fit(Observations.consecutive(y, 4, 2), TrendSpec.quadratic());
                    TrendFit rescaled = Trends.fit(Observations.consecutive(scaled, 4, 2), TrendSpec.quadratic());
                    for (int j = 0; j < 3; j++) {
                        assertClose(factor * original.ols().coefficients().get(j).estimate(),
                                rescaled.ols().coefficients().get(j).estimate(), scale(y) * factor);
                        assertClose(factor * original.ols().coefficients().get(j).standardError(),
                                rescaled.ols().coefficients().get(j).standardError(), scale(y) * factor);
                    }
                });
    }

    @Test
    void shifting_the_time_origin_leaves_the_slope_unchanged() {
        qt().withFixedSeed(SEED).withExamples(200)
                .forAll(lists().of(doubles().between(-1e3, 1e3)).ofSizeBetween(4, 80), integers().between(-500, 500))
                .checkAssert((values, shift) -> {
                    double[] y = toArray(values);
                    OlsFit fromOne = LeastSquares.fit(lineDesign(y.length, 0), y);
                    OlsFit shifted = LeastSquares.fit(lineDesign(y.length, shift), y);
                    assertClose(fromOne.coefficient("t").estimate(), shifted.coefficient("t").estimate(), scale(y));
                    assertClose(fromOne.coefficient("t").standardError(), shifted.coefficient("t").standardError(),
                            scale(y));
                });
    }

    private static Design lineDesign(int n, int shift) {
        double[] ones = new double[n];
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            ones[i] = 1;
            t[i] = i + 1 + shift;
        }
        return new Design(List.of(ones, t), List.of("constant", "t"), true);
    }

    /** The size of the data, for an absolute tolerance of round-off relative to it. */
    private static double scale(double[] y) {
        double max = 1;
        for (double v : y) {
            max = Math.max(max, Math.abs(v));
        }
        return max;
    }

    /** Round-off tolerance: 1e-9 of the data's size (the designs here have condition < 1e5). */
    private static void assertClose(double expected, double actual, double size) {
        assertEquals(expected, actual, 1e-9 * size);
    }

    private static double[] toArray(List<Double> values) {
        return values.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
