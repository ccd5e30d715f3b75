package org.trendwright.core.diagnostics;

import java.util.Arrays;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.regression.Design;

/**
 * The exact null distribution of the Durbin-Watson statistic. Under iid normal errors, for a
 * regression on X (n x k), d = e'Ae / e'e = sum_i nu_i z_i^2 / sum_i z_i^2 with z_i iid N(0, 1) and
 * nu_1..nu_{n-k} the non-zero eigenvalues of M A M (M = I - X(X'X)^-1 X'), so
 * <pre>
 *   P(d &lt;= x) = P( sum_i (nu_i - x) z_i^2 &lt;= 0 )
 * </pre>
 * (Durbin &amp; Watson 1950, "Testing for serial correlation in least squares regression I",
 * Biometrika 37, 409-428). The probability is computed by inverting the characteristic function
 * (Imhof 1961, Biometrika 48, 419-426): by a trapezoidal rule on the log scale for at most 20
 * eigenvalues and by Davies' (1973, Biometrika 60, 415-417) trapezoidal sum with its aliasing
 * bound beyond, accurate to about 1e-12 absolute (see {@link CharacteristicFunctionInversion}).
 *
 * <p>The eigenvalues come either from a design ({@link #forDesign}, by the DCT rotation and
 * secular equations of {@link DurbinWatsonSpectrum}) or from Durbin &amp; Watson's (1950) bounding
 * statistics ({@link #lowerBounding}, {@link #upperBounding}).
 *
 * <p>Immutable and thread-safe; the eigenvalues are copied in and out.
 *
 * @param eigenvalues nu_1 &lt;= ... &lt;= nu_m, each in [0, 4] (sorted on construction)
 */
public record DurbinWatsonDistribution(double[] eigenvalues) {

    /** Absolute accuracy of {@link #quantile}. */
    public static final double QUANTILE_ACCURACY = 1e-10;

    public DurbinWatsonDistribution {
        if (eigenvalues.length == 0) {
            throw new InvalidSpecificationException("A Durbin-Watson distribution needs at least one eigenvalue.");
        }
        eigenvalues = eigenvalues.clone();
        for (double nu : eigenvalues) {
            if (!(nu >= 0 && nu <= 4)) {
                throw new InvalidSpecificationException("Eigenvalue " + nu + " of a Durbin-Watson matrix must lie in"
                        + " [0, 4].");
            }
        }
        Arrays.sort(eigenvalues);
    }

    /**
     * The exact null distribution of d for the residuals of a least-squares fit on this design,
     * computed afresh on every call ({@link DurbinWatson#test} uses the remembered spectra instead).
     *
     * @throws InsufficientDataException when n - k &lt; {@link DurbinWatson#MIN_RESIDUAL_DEGREES_OF_FREEDOM}
     */
    public static DurbinWatsonDistribution forDesign(Design design) {
        DurbinWatson.checkResidualDegreesOfFreedom(design.rows(), design.width());
        return new DurbinWatsonDistribution(DurbinWatsonSpectrum.of(design).eigenvalues());
    }

    /**
     * Durbin &amp; Watson's lower bounding statistic d_L for n observations and k' regressors
     * besides the constant: eigenvalues lambda_1..lambda_{n-k'-1} of A, lambda_j = 4 sin^2(pi j/(2n)).
     * For any design that includes the constant, nu_i &gt;= lambda_i (Cauchy interlacing, after the
     * constant has removed lambda_0 = 0), so d &gt;= d_L in distribution.
     */
    public static DurbinWatsonDistribution lowerBounding(int observations, int regressorsExcludingConstant) {
        DurbinWatsonBounds.checkArguments(observations, regressorsExcludingConstant);
        return new DurbinWatsonDistribution(Arrays.copyOfRange(DurbinWatsonSpectrum.eigenvaluesOfA(observations), 1,
                observations - regressorsExcludingConstant));
    }

    /**
     * The upper bounding statistic d_U: eigenvalues lambda_{k'+1}..lambda_{n-1}, since
     * nu_i &lt;= lambda_{i+k'} by the same interlacing.
     */
    public static DurbinWatsonDistribution upperBounding(int observations, int regressorsExcludingConstant) {
        DurbinWatsonBounds.checkArguments(observations, regressorsExcludingConstant);
        return new DurbinWatsonDistribution(Arrays.copyOfRange(DurbinWatsonSpectrum.eigenvaluesOfA(observations),
                regressorsExcludingConstant + 1, observations));
    }

    @Override
    public double[] eigenvalues() {
        return eigenvalues.clone();
    }

    /** n - k, the number of eigenvalues. */
    public int residualDegreesOfFreedom() {
        return eigenvalues.length;
    }

    /** E d = mean of the nu_i (d is a Dirichlet(1/2, ..., 1/2) mixture of them). */
    public double mean() {
        double sum = 0;
        for (double nu : eigenvalues) {
            sum += nu;
        }
        return sum / eigenvalues.length;
    }

    /** Var d = 2 sum (nu_i - mean)^2 / (m (m + 2)), m = n - k. */
    public double variance() {
        double mean = mean();
        double sum = 0;
        for (double nu : eigenvalues) {
            sum += (nu - mean) * (nu - mean);
        }
        int m = eigenvalues.length;
        return 2 * sum / (m * (m + 2.0));
    }

    /**
     * P(d &lt;= x), the exact p-value against positive serial correlation when x is the observed d.
     * 0 below the smallest eigenvalue and 1 at or above the largest.
     *
     * @throws InvalidSpecificationException when x is NaN or infinite
     */
    public double probabilityAtMost(double x) {
        checkFinite(x);
        double[] weights = new double[eigenvalues.length];
        for (int i = 0; i < weights.length; i++) {
            weights[i] = eigenvalues[i] - x;
        }
        return QuadraticFormProbability.atMostZero(weights);
    }

    /**
     * P(d &gt;= x), the exact p-value against negative serial correlation when x is the observed d.
     *
     * @throws InvalidSpecificationException when x is NaN or infinite
     */
    public double probabilityAtLeast(double x) {
        checkFinite(x);
        double[] weights = new double[eigenvalues.length];
        for (int i = 0; i < weights.length; i++) {
            weights[i] = x - eigenvalues[i];
        }
        return QuadraticFormProbability.atMostZero(weights);
    }

    /**
     * The x with P(d &lt;= x) = p, to {@link #QUANTILE_ACCURACY}, by Brent's method on [nu_1, nu_m]
     * (where the distribution function runs from 0 to 1), started at the normal approximation.
     * When all eigenvalues are equal, d is that constant and it is returned.
     *
     * @throws InvalidSpecificationException when the probability is outside (0, 1)
     */
    public double quantile(double probability) {
        if (!(probability > 0 && probability < 1)) {
            throw new InvalidSpecificationException("A quantile needs a probability strictly between 0 and 1, got "
                    + probability + ".");
        }
        double low = eigenvalues[0];
        double high = eigenvalues[eigenvalues.length - 1];
        if (low == high) {
            return low;
        }
        double guess = mean() + Math.sqrt(variance()) * new NormalDistribution().inverseCumulativeProbability(probability);
        double start = Math.min(high - 1e-3 * (high - low), Math.max(low + 1e-3 * (high - low), guess));
        return new BrentSolver(0, QUANTILE_ACCURACY)
                .solve(1000, x -> probabilityAtMost(x) - probability, low, high, start);
    }

    private static void checkFinite(double x) {
        if (!Double.isFinite(x)) {
            throw new InvalidSpecificationException("The Durbin-Watson distribution function needs a finite argument,"
                    + " got " + x + ".");
        }
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof DurbinWatsonDistribution d && Arrays.equals(eigenvalues, d.eigenvalues);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(eigenvalues);
    }

    @Override
    public String toString() {
        return "DurbinWatsonDistribution[n-k=" + eigenvalues.length + ", mean=" + mean() + "]";
    }
}
