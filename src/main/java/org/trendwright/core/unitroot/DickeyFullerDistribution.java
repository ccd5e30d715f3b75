package org.trendwright.core.unitroot;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;

/**
 * The finite-sample null distribution of the Dickey-Fuller tau statistic (Dickey & Fuller 1979,
 * JASA 74), read from tables simulated by this project: the resource
 * dickey-fuller-tau-quantiles.csv beside this class, written by the seeded generator
 * {@code DickeyFullerTableGenerator} under src/test/java (one million Gaussian random walks per
 * sample size, T = 20 to 1000 observations in the test regression; command and seed in its
 * Javadoc and in the file's header).
 *
 * <p>Interpolation, stated once:
 * <ul>
 *   <li><b>In the sample size</b> the quantiles are interpolated linearly in 1/T between the two
 *       tabulated sizes around T, since quantiles of tau are smooth functions of 1/T
 *       (q(T) ≈ q∞ + β1/T + β2/T², MacKinnon 1996, J. Applied Econometrics 11, and 2010, Queen's
 *       Economics Department WP 1227). Above T = 1000 they are extrapolated along the line
 *       through T = 500 and T = 1000 (towards 1/T = 0); the extrapolated column is made
 *       non-decreasing in p again. Against MacKinnon's (2010) response surface for the constant
 *       case the result agrees within the Monte-Carlo error of the tables (tested).</li>
 *   <li><b>In the statistic</b> the p-value is interpolated linearly on the probit scale: between
 *       two tabulated quantiles q_i ≤ tau < q_{i+1}, Φ⁻¹(p) is linear in tau (MacKinnon 1996 fits
 *       Φ⁻¹(p) as a smooth function of tau for the same reason: it is nearly linear). Where tests
 *       are decided (p from 0.005 to 0.10) even every other tabulated point suffices to predict the
 *       one left out within the Monte-Carlo error of the quantiles, 0.002 to 0.006 in tau (tested),
 *       so with all points the interpolation adds less than the tables' own noise; around the median
 *       the curvature error is about 0.001. Outside the table the
 *       line through the outermost quantile and the one three grid points inward is extended; such
 *       p-values (below 0.0005 or above 0.9995) only say "far out in the tail".</li>
 * </ul>
 *
 * <p>Stateless and thread-safe; the tables are read once, on first use.
 */
public final class DickeyFullerDistribution {

    /** Index distance of the second point of the tail extrapolation line. */
    private static final int TAIL_SPAN = 3;
    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);

    private DickeyFullerDistribution() {
    }

    /** The smallest number of test-regression observations the tables cover. */
    public static int smallestObservations() {
        return DickeyFullerTables.get().smallestSize();
    }

    /**
     * The p-value P(tau_T ≤ tau) of the left-tailed unit-root test, interpolated as described in
     * the class comment. Never NaN for a finite tau.
     *
     * @param observations T, the observations in the test regression
     * @throws InsufficientDataException when T is below {@link #smallestObservations()}
     * @throws InvalidSpecificationException when tau is not finite
     */
    public static double pValue(DeterministicTerms terms, int observations, double tau) {
        if (!Double.isFinite(tau)) {
            throw new InvalidSpecificationException("The Dickey-Fuller statistic is " + tau
                    + "; a p-value needs a finite statistic (is the series constant?).");
        }
        DickeyFullerTables tables = DickeyFullerTables.get();
        double[] q = tables.quantiles(terms, checked(tables, observations));
        double[] z = tables.probits();
        int last = q.length - 1;
        int i = largestIndexAtOrBelow(q, tau);
        if (i < 0) {
            return STANDARD_NORMAL.cumulativeProbability(line(q[TAIL_SPAN], z[TAIL_SPAN], q[0], z[0], tau));
        }
        if (i == last) {
            return STANDARD_NORMAL.cumulativeProbability(
                    line(q[last - TAIL_SPAN], z[last - TAIL_SPAN], q[last], z[last], tau));
        }
        return STANDARD_NORMAL.cumulativeProbability(line(q[i], z[i], q[i + 1], z[i + 1], tau));
    }

    /**
     * The p-quantile of tau for T observations in the test regression, interpolated in 1/T and,
     * between tabulated probabilities, linearly in Φ⁻¹(p).
     *
     * @throws InvalidSpecificationException when p lies outside the tabulated 0.0005..0.9995
     * @throws InsufficientDataException when T is below {@link #smallestObservations()}
     */
    public static double quantile(DeterministicTerms terms, int observations, double probability) {
        DickeyFullerTables tables = DickeyFullerTables.get();
        double[] q = tables.quantiles(terms, checked(tables, observations));
        return interpolateInProbability(tables, q, probability);
    }

    /**
     * The Monte-Carlo standard error of {@link #quantile}: the tabulated standard errors of the two
     * sample sizes combined with the 1/T interpolation weights w and 1 − w as
     * sqrt(w² se₁² + (1 − w)² se₂²) (the sizes were simulated from independent streams).
     * Interpolation error in T is not included.
     */
    public static double quantileStandardError(DeterministicTerms terms, int observations, double probability) {
        DickeyFullerTables tables = DickeyFullerTables.get();
        double[] se = tables.standardErrors(terms, checked(tables, observations));
        return interpolateInProbability(tables, se, probability);
    }

    /** The 1%, 5% and 10% critical values of tau for T observations in the test regression. */
    public static CriticalValues criticalValues(DeterministicTerms terms, int observations) {
        return new CriticalValues(observations, quantile(terms, observations, 0.01),
                quantile(terms, observations, 0.05), quantile(terms, observations, 0.10));
    }

    private static int checked(DickeyFullerTables tables, int observations) {
        if (observations < tables.smallestSize()) {
            throw new InsufficientDataException("The Dickey-Fuller tables start at " + tables.smallestSize()
                    + " observations in the test regression, but this one has " + observations
                    + "; use a longer series or fewer lagged differences.");
        }
        return observations;
    }

    private static double interpolateInProbability(DickeyFullerTables tables, double[] values, double probability) {
        double[] p = tables.probabilities();
        if (!(probability >= p[0] && probability <= p[p.length - 1])) {
            throw new InvalidSpecificationException("Dickey-Fuller quantiles are tabulated for probabilities from "
                    + p[0] + " to " + p[p.length - 1] + ", not " + probability + ".");
        }
        double[] z = tables.probits();
        int i = Math.min(largestIndexAtOrBelow(p, probability), p.length - 2);
        double target = STANDARD_NORMAL.inverseCumulativeProbability(probability);
        return line(z[i], values[i], z[i + 1], values[i + 1], target);
    }

    /** The largest index i with sorted[i] ≤ x, or −1 when x lies below every entry. */
    private static int largestIndexAtOrBelow(double[] sorted, double x) {
        int low = -1;
        int high = sorted.length - 1;
        while (low < high) {
            int middle = (low + high + 1) >>> 1;
            if (sorted[middle] <= x) {
                low = middle;
            } else {
                high = middle - 1;
            }
        }
        return low;
    }

    /** The ordinate at x of the line through (x0, y0) and (x1, y1). */
    private static double line(double x0, double y0, double x1, double y1, double x) {
        return y0 + (x - x0) * (y1 - y0) / (x1 - x0);
    }
}
