package org.trendwright.core.diagnostics;

import org.apache.commons.math3.special.Beta;
import org.apache.commons.math3.special.Gamma;

/**
 * Upper-tail probabilities of the reference distributions the residual tests use, computed
 * directly from the regularized incomplete gamma and beta functions: 1 - cdf would round to 0 far
 * out in the tail, where a p-value of 1e-20 still says something.
 *
 * <p>Stateless and thread-safe.
 */
final class UpperTails {

    private UpperTails() {
    }

    /** P(X > x) for X ~ chi-square(df): Q(df/2, x/2), the regularized upper incomplete gamma function. */
    static double chiSquare(double x, int df) {
        if (Double.isInfinite(x)) {
            return 0;
        }
        return Gamma.regularizedGammaQ(df / 2.0, x / 2.0);
    }

    /** P(F > f) for F ~ F(d1, d2): I_{d2/(d2 + d1 f)}(d2/2, d1/2), the regularized incomplete beta function. */
    static double f(double f, int d1, int d2) {
        if (Double.isInfinite(f)) {
            return 0;
        }
        return Beta.regularizedBeta(d2 / (d2 + d1 * f), d2 / 2.0, d1 / 2.0);
    }
}
