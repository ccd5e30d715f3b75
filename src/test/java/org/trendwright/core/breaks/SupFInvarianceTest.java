package org.trendwright.core.breaks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.trendwright.core.regression.Design;

/**
 * Every Chow F, hence sup F and its p-values, is unchanged when y becomes s y + c x_j for any
 * s &gt; 0, any column x_j of the design and any c: the segment and pooled residuals all scale by s
 * and the shift lies in every fit's column space (common practice; it is why the null
 * distribution of sup F depends on the design alone). Checked on generated series with a fixed
 * seed, on a linear trend with quarterly dummies.
 */
class SupFInvarianceTest {

    private static final long SEED = 20261206L;

    @Test
    void p_values_are_unchanged_by_rescaling_y_and_adding_a_multiple_of_a_column() {
        qt().withFixedSeed(SEED).withExamples(30)
                .forAll(integers().between(40, 120), longs().all(), doubles().between(1e-2, 1e2),
                        doubles().between(-100, 100))
                .checkAssert((n, seriesSeed, scale, multiple) -> {
                    Design design = quarterlyTrend(n);
                    int column = (int) Math.floorMod(seriesSeed, (long) design.width());
                    double[] y = BreakSeries.shiftedTrend(n, n / 2, 0.5, new SplittableRandom(seriesSeed));
                    double[] x = design.column(column);
                    double[] transformed = new double[n];
                    for (int t = 0; t < n; t++) {
                        transformed[t] = scale * y[t] + multiple * x[t];
                    }
                    BreakSearch original = SupFTest.test(design, y, 0.05);
                    BreakSearch moved = SupFTest.test(design, transformed, 0.05);
                    // Same design, same seed, same draws. sup F agrees to rounding: the Givens sums lose about
                    // eps max|y| / (s sigma) <= 1e-16 * 1.3e6 in each RSS, and F (a difference of RSS) some 20
                    // times more; measured at most 4.4e-9 relative at the extremes (s = 0.01, c = 100 on t),
                    // so 1e-7. A draw within that distance of sup F has probability below 1e-4 per example.
                    assertEquals(original.supF(), moved.supF(), 1e-7 * original.supF());
                    assertEquals(original.breakRow(), moved.breakRow());
                    assertEquals(original.test().pValue(), moved.test().pValue());
                    assertEquals(original.asymptoticPValue(), moved.asymptoticPValue(), 1e-7);
                });
    }

    /** Constant, t and dummies for quarters 2 to 4 (the first row in quarter 1). */
    private static Design quarterlyTrend(int n) {
        List<double[]> dummies = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int quarter = 1; quarter < 4; quarter++) {
            double[] dummy = new double[n];
            for (int t = quarter; t < n; t += 4) {
                dummy[t] = 1;
            }
            dummies.add(dummy);
            names.add("quarter " + (quarter + 1));
        }
        return BreakSeries.trend(n).withColumns(dummies, names);
    }
}
