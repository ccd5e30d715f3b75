package org.trendwright.core.diagnostics;

/**
 * P(Q &lt;= 0) for Q = sum_i c_i z_i^2 in independent standard normal z_i: the distribution function
 * behind the exact Durbin-Watson test, since P(d &lt;= x) = P(sum (nu_i - x) z_i^2 &lt;= 0) for
 * d = sum nu_i z_i^2 / sum z_i^2.
 *
 * <p>Zero weights are dropped (they add nothing to Q). With no negative weight Q &gt;= 0 and the
 * probability is 0 (Q = 0 has probability 0 unless every weight is 0, when it is 1); with no
 * positive weight it is 1. Otherwise the weights are scaled to max |c_i| = 1 (P is invariant)
 * and the probability comes from the inversion of the characteristic function
 * ({@link CharacteristicFunctionInversion}), accurate to about 1e-12 absolute.
 *
 * <p>Stateless and thread-safe.
 */
final class QuadraticFormProbability {

    private QuadraticFormProbability() {
    }

    /** P(sum c_i z_i^2 &lt;= 0). */
    static double atMostZero(double[] weights) {
        double largest = 0;
        int nonZero = 0;
        boolean negative = false;
        boolean positive = false;
        for (double c : weights) {
            if (c != 0) {
                nonZero++;
                largest = Math.max(largest, Math.abs(c));
                negative |= c < 0;
                positive |= c > 0;
            }
        }
        if (!negative) {
            return nonZero == 0 ? 1 : 0;
        }
        if (!positive) {
            return 1;
        }
        double[] scaled = new double[nonZero];
        int next = 0;
        for (double c : weights) {
            if (c != 0) {
                scaled[next++] = c / largest;
            }
        }
        return CharacteristicFunctionInversion.probabilityNegative(scaled);
    }
}
