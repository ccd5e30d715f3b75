package org.trendwright.core.breaks;

import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.TestResult;
import org.trendwright.core.regression.Design;

/**
 * The null distribution of the sup-F statistic ({@link SupFTest}) for one particular design,
 * simulated with that design's own regressors held fixed.
 *
 * <p>Under the null of no break with independent N(0, sigma^2) errors, y = X b + sigma z with
 * z ~ N(0, I). Every Chow F, and so sup F, is unchanged when y is replaced by (y - X c) / s for
 * any c and any s &gt; 0 (the residual sums of squares all shift by the same projection and scale by
 * 1/s^2), so sup F has the same distribution as for y* = z: given X it depends on nothing unknown.
 * Simulating z through the same design and the same candidate rows therefore gives its exact
 * finite-sample distribution up to Monte Carlo error: the fixed-regressor simulation (Hansen
 * 2000, "Testing for structural change in conditional models", J. Econometrics 97, who uses it to
 * get tests that stay valid when the regressors' distribution changes; from memory). It accounts for
 * what Andrews' (1993) limit leaves out: a trend's uneven accumulation of t^2, the finite number of
 * candidate rows, and the F form's finite-sample degrees of freedom.
 *
 * <p>From R simulated values F*_1..F*_R the p-value of an observed sup F is
 * <pre>
 *   p = (1 + #{ r : F*_r &gt;= sup F }) / (R + 1)
 * </pre>
 * (Davison &amp; Hinkley 1997, Bootstrap Methods and their Application, Cambridge University Press,
 * section 4.2.5): the rank of the observed value among the R + 1 values, so that the test rejecting
 * when p &lt;= alpha has size exactly alpha when alpha (R + 1) is an integer and the seed is drawn
 * at random (alpha - 1/(R + 1) under the strict rule p &lt; alpha of
 * {@link TestResult#decide}, which the core uses). Its Monte Carlo standard
 * error is sqrt(p (1 - p) / R).
 *
 * <p>Reproducible and cacheable: the seed is a hash of n, k and the bits of every regressor value
 * ({@link #seedFor}), and the normals come from {@link NormalStream}, so the same design gives the
 * same draws, hence the same p-value, on every run and platform. The names of the columns, and any
 * change to y, do not enter the seed. Reordering the columns or rounding a value changes the seed
 * and so moves the p-value by Monte Carlo noise (within a few standard errors).
 *
 * <p>Cost: O(n k^3) once for the design's factors ({@link ChowGainFactors}), then per replication
 * n normal draws, 3 n k multiply-adds and k (k + 1) / 2 for each of the 0.7 n candidate rows.
 * The number of replications is {@link #DEFAULT_REPLICATIONS} unless the design is large; see
 * {@link #defaultReplications}.
 *
 * <p>Immutable and thread-safe; the draws are copied in and out.
 *
 * @param seed  the seed the draws came from ({@link #seedFor} of the design)
 * @param draws the simulated values of sup F, in increasing order (sorted on construction)
 */
public record SupFNullDistribution(long seed, double[] draws) {

    /** Replications for a design of ordinary size: 1,999, so 0.05 (R + 1) and 0.01 (R + 1) are integers. */
    public static final int DEFAULT_REPLICATIONS = 1999;
    /** The fewest replications {@link #defaultReplications} chooses, for the largest designs. */
    public static final int FEWEST_DEFAULT_REPLICATIONS = 499;
    /** The work (multiply-adds, see {@link #defaultReplications}) one default simulation may take: 2e8. */
    public static final long WORK_BUDGET = 200_000_000L;
    /**
     * The fewest replications accepted: 99, the smallest usual choice. (With the strict rule
     * p &lt; alpha a 5% test needs R &gt;= 20 to reject at all; 99 keeps the p-value's standard
     * error near 0.05 at 0.022.)
     */
    public static final int MIN_REPLICATIONS = 99;

    public SupFNullDistribution {
        if (draws.length < MIN_REPLICATIONS) {
            throw new InvalidSpecificationException("A simulated sup-F distribution needs at least "
                    + MIN_REPLICATIONS + " draws, got " + draws.length + "; 1,999 is the usual choice.");
        }
        draws = draws.clone();
        for (double draw : draws) {
            if (!(draw >= 0)) {
                throw new InvalidSpecificationException("A simulated sup-F value must be a non-negative number,"
                        + " got " + draw + ".");
            }
        }
        Arrays.sort(draws);
    }

    /**
     * Simulates the null distribution of sup F for this design with the default number of
     * replications ({@link #defaultReplications}).
     *
     * @throws org.trendwright.core.InsufficientDataException when 15% of the rows are k or fewer
     * @throws InvalidSpecificationException when a regressor value is not finite
     * @throws org.trendwright.core.RankDeficientDesignException when the regressors are dependent
     *         over all rows or within the shortest first or last segment
     */
    public static SupFNullDistribution forDesign(Design design) {
        SupFNullDistribution remembered = REMEMBERED.get(design);
        if (remembered != null) {
            return remembered;
        }
        SupFNullDistribution simulated = forDesign(design, defaultReplications(design.rows(), design.width()));
        REMEMBERED.put(design, simulated);
        return simulated;
    }

    /**
     * The simulation is a pure function of the design (its seed comes from the design), and a
     * service meets the same few designs again and again (every 48-quarter linear trend has the
     * same regressors), so the {@value #REMEMBERED_DESIGNS} most recently used are kept. Keyed by
     * the design itself (value equality), so a hash collision cannot return another design's law.
     * Synchronized; a miss simulates outside the lock, and two threads may both simulate the same
     * design once, with identical results.
     */
    private static final int REMEMBERED_DESIGNS = 64;

    private static final Map<Design, SupFNullDistribution> REMEMBERED = Collections.synchronizedMap(
            new LinkedHashMap<>(16, 0.75f, true) {
                private static final long serialVersionUID = 1L;

                @Override
                protected boolean removeEldestEntry(Map.Entry<Design, SupFNullDistribution> eldest) {
                    return size() > REMEMBERED_DESIGNS;
                }
            });

    /**
     * Simulates {@code replications} values of sup F with y* = z ~ N(0, I) on this design, seeded
     * by {@link #seedFor}. The first R draws do not depend on R, so a larger R extends a smaller one.
     *
     * @throws InvalidSpecificationException when replications &lt; {@link #MIN_REPLICATIONS} or a
     *         regressor value is not finite
     * @throws org.trendwright.core.InsufficientDataException when 15% of the rows are k or fewer
     * @throws org.trendwright.core.RankDeficientDesignException as {@link #forDesign(Design)}
     */
    public static SupFNullDistribution forDesign(Design design, int replications) {
        if (replications < MIN_REPLICATIONS) {
            throw new InvalidSpecificationException("A simulated sup-F distribution needs at least "
                    + MIN_REPLICATIONS + " replications, got " + replications + "; 1,999 is the usual choice.");
        }
        ChowGainFactors factors = ChowGainFactors.of(design);
        long seed = seedFor(design);
        NormalStream normals = new NormalStream(seed);
        double[] z = new double[design.rows()];
        double[] draws = new double[replications];
        for (int r = 0; r < replications; r++) {
            normals.fill(z);
            draws[r] = factors.supF(z);
        }
        return new SupFNullDistribution(seed, draws);
    }

    /**
     * The seed for a design: SplitMix64's mixing function folded over n, k and the bits of every
     * value column by column (-0.0 read as 0.0). Column names do not enter.
     */
    public static long seedFor(Design design) {
        long hash = NormalStream.mix(design.rows() * 0x100000001L + design.width());
        for (int j = 0; j < design.width(); j++) {
            for (double value : design.column(j)) {
                hash = NormalStream.mix(hash ^ Double.doubleToLongBits(value + 0.0));
            }
        }
        return hash;
    }

    /** The number of simulated values R. */
    public int replications() {
        return draws.length;
    }

    @Override
    public double[] draws() {
        return draws.clone();
    }

    /** True when these draws were simulated for a design with the same values (same seed). */
    public boolean simulatedFor(Design design) {
        return seed == seedFor(design);
    }

    /**
     * p = (1 + #{F*_r &gt;= supF}) / (R + 1), in [1/(R + 1), 1].
     *
     * @throws InvalidSpecificationException when supF is NaN
     */
    public double pValue(double supF) {
        if (Double.isNaN(supF)) {
            throw new InvalidSpecificationException("The sup-F statistic is NaN; no p-value can be given.");
        }
        return (1.0 + atLeast(supF)) / (draws.length + 1);
    }

    /** The Monte Carlo standard error of {@link #pValue}: sqrt(p (1 - p) / R), binomial. */
    public double pValueStandardError(double supF) {
        double p = pValue(supF);
        return Math.sqrt(p * (1 - p) / draws.length);
    }

    /**
     * The critical value c of the test that rejects when {@link #pValue} &lt; level (the rule of
     * {@link TestResult#decide}): it rejects exactly when sup F &gt; c. With J
     * the largest count for which (1 + J) / (R + 1) &lt; level, c is the (J + 1)-th largest draw;
     * for R = 1,999 and level 0.05, J = 98 and c is the 1,901st of the 1,999 sorted draws.
     *
     * @throws InvalidSpecificationException when the level is not inside (0, 1) or is at most
     *         1 / (R + 1), so that no observed value could be rejected
     */
    public double criticalValue(double level) {
        TestResult.checkLevel(level);
        int r = draws.length;
        int allowed = (int) Math.ceil(level * (r + 1)) - 2;
        while (allowed + 1 < r && (2.0 + allowed) / (r + 1) < level) {
            allowed++;
        }
        while (allowed >= 0 && (1.0 + allowed) / (r + 1) >= level) {
            allowed--;
        }
        if (allowed < 0) {
            throw new InvalidSpecificationException("With " + r + " replications the smallest p-value is 1/"
                    + (r + 1) + ", so a test at level " + level + " can never reject; simulate more replications.");
        }
        return draws[r - 1 - allowed];
    }

    /** #{F*_r &gt;= value}, by binary search for the first draw not below it. */
    private int atLeast(double value) {
        int low = 0;
        int high = draws.length;
        while (low < high) {
            int middle = (low + high) >>> 1;
            if (draws[middle] < value) {
                low = middle + 1;
            } else {
                high = middle;
            }
        }
        return draws.length - low;
    }

    /**
     * R for a design of n rows and k columns: {@link #DEFAULT_REPLICATIONS} (1,999) while
     * R w &lt;= {@link #WORK_BUDGET}, else 999 if that fits, else {@link #FEWEST_DEFAULT_REPLICATIONS}
     * (499). Here w = n (k + 20) + c k (k + 1) / 2 is the work of one replication in units of a
     * multiply-add: k (k + 1) / 2 for each of the c candidate rows, and k + 20 for each row's normal
     * draw, projection and partial sums (a round fit to the measured 25 ns per row at k = 2 against
     * 0.5 to 1.3 ns per multiply-add). Within the budget a request takes at most a few tenths of a
     * second on one core (src/docs/benchmarks.md); 1,999 replications cover every design up to
     * n = 1,000 with a linear trend and 11 monthly dummies (k = 13). For R = 1,999, 999 and 499
     * the 1%, 5% and 10% tests keep their exact size, since alpha (R + 1) is an integer. Below 499 the
     * p-value's standard error near 0.05 would exceed 0.01, so R is not reduced further and the
     * cost then grows linearly in n. There is no fallback to the asymptotic table: for trend
     * designs it is wrong at every n we measured, and more so as n grows (see {@link SupFTest}).
     */
    public static int defaultReplications(int rows, int width) {
        long candidates = Math.max(0, BreakCandidates.last(rows) - BreakCandidates.first(rows) + 1);
        long work = (long) rows * (width + 20) + candidates * width * (width + 1) / 2;
        for (int replications : new int[] {DEFAULT_REPLICATIONS, 999}) {
            if (replications * work <= WORK_BUDGET) {
                return replications;
            }
        }
        return FEWEST_DEFAULT_REPLICATIONS;
    }
}
