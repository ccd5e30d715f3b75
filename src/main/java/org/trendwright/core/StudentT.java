package org.trendwright.core;

import java.util.concurrent.ConcurrentHashMap;
import org.apache.commons.math3.distribution.TDistribution;

/**
 * Quantiles of Student's t distribution, remembered per (degrees of freedom, probability).
 *
 * <p>Commons Math's {@code TDistribution.inverseCumulativeProbability} finds a quantile by a
 * bracketing root search on the distribution function (the regularised incomplete beta function),
 * 10 to 20 microseconds a call, while fits ask for the same few quantiles again and again: 0.975
 * for every coefficient's confidence interval, the prediction levels for every forecast step, at
 * the degrees of freedom of the series lengths in use. The values are exactly those Commons Math
 * computes; only the repetition is saved. At most {@value #MAX_REMEMBERED} pairs are kept, after
 * which each new pair is computed afresh. Thread-safe.
 */
public final class StudentT {

    /** The most (degrees of freedom, probability) pairs remembered. */
    static final int MAX_REMEMBERED = 4096;

    private static final ConcurrentHashMap<Key, Double> QUANTILES = new ConcurrentHashMap<>();

    private record Key(double degreesOfFreedom, double probability) {
    }

    private StudentT() {
    }

    /**
     * The p-quantile of t with the given degrees of freedom: the value q with P(T &lt;= q) = p.
     *
     * @throws org.apache.commons.math3.exception.MathIllegalArgumentException when the degrees of
     *         freedom are not positive or p is outside [0, 1], as Commons Math refuses them
     */
    public static double quantile(double degreesOfFreedom, double probability) {
        Key key = new Key(degreesOfFreedom, probability);
        Double known = QUANTILES.get(key);
        if (known != null) {
            return known;
        }
        double quantile = new TDistribution(null, degreesOfFreedom).inverseCumulativeProbability(probability);
        if (QUANTILES.size() < MAX_REMEMBERED) {
            QUANTILES.putIfAbsent(key, quantile);
        }
        return quantile;
    }
}
