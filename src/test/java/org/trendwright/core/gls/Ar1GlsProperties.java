package org.trendwright.core.gls;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.trendwright.core.regression.Design;

/**
 * Invariances that feasible GLS must have (common practice for any regression estimator): the
 * error correlation does not depend on the units of y or on adding an exact combination of the
 * regressors to it, and the coefficients move with y as b -> c b + gamma.
 */
class Ar1GlsProperties {

    @Test
    void rescaling_y_and_adding_regressor_combinations_leave_rho_unchanged() {
        qt().withExamples(40).forAll(integers().between(1, 1_000_000), doubles().between(0.01, 1000),
                doubles().between(-50, 50)).checkAssert((seed, scale, shift) -> {
                    int n = 50;
                    double[] y = Ar1Series.trendPlus(Ar1Series.errors(new SplittableRandom(seed), n, 0.6, 1));
                    double[] moved = new double[n];
                    for (int t = 0; t < n; t++) {
                        moved[t] = scale * y[t] + shift + 0.25 * shift * (t + 1);
                    }
                    Design design = Ar1Series.trendDesign(n);
                    Ar1GlsFit base = Ar1Gls.praisWinsten(design, y);
                    Ar1GlsFit changed = Ar1Gls.praisWinsten(design, moved);
                    // Each iterate is the same up to rounding, so the same iteration count is expected
                    // and rho agrees to far below the 1e-8 stopping tolerance.
                    assertEquals(base.rho().value(), changed.rho().value(), 1e-9);
                    assertEquals(base.durbinWatson(), changed.durbinWatson(), 1e-8);
                    assertEquals(scale * base.estimates()[0] + shift, changed.estimates()[0],
                            1e-8 * (Math.abs(scale * base.estimates()[0]) + Math.abs(shift)));
                    assertEquals(scale * base.estimates()[1] + 0.25 * shift, changed.estimates()[1],
                            1e-8 * (Math.abs(scale * base.estimates()[1]) + Math.abs(shift)));
                });
    }
}
