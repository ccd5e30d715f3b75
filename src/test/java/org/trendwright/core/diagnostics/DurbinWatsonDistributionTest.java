package org.trendwright.core.diagnostics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.special.Beta;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;

/** The exact null distribution of d: its eigenvalues and its distribution function. */
class DurbinWatsonDistributionTest {

    /**
     * Both eigenvalue methods are backward stable, so each eigenvalue is off by a modest multiple
     * of eps ||A|| = 4 eps = 9e-16; 1e-12 leaves three orders of magnitude for the dense
     * reference's own error (the fast method agrees to about 5e-15 in practice).
     */
    private static final double EIGENVALUE_AGREEMENT = 1e-12;
    /** The distribution function is accurate to about 1e-12 absolute (CharacteristicFunctionInversion). */
    private static final double PROBABILITY_ACCURACY = 1e-11;

    @Test
    void fast_eigenvalues_agree_with_a_dense_eigendecomposition_at_n_60() {
        // Reference: Commons Math EigenDecomposition of Z'AZ, Z an orthonormal basis of the residual space
        for (Design design : List.of(trend(60, 1), trend(60, 2), trend(60, 3), trendAndNoise(60, 7),
                trendWithoutConstant(60), trend(61, 2), quarterlyDummiesAndTrend(60))) {
            double[] fast = DurbinWatsonDistribution.forDesign(design).eigenvalues();
            double[] dense = denseEigenvalues(design);
            assertEquals(dense.length, fast.length, design.toString());
            for (int i = 0; i < dense.length; i++) {
                assertEquals(dense[i], fast[i], EIGENVALUE_AGREEMENT, design + ", eigenvalue " + i);
            }
        }
    }

    @Test
    void fast_eigenvalues_agree_with_a_dense_eigendecomposition_for_a_larger_general_design() {
        // A regressor without symmetry makes every secular stage carry the next direction along.
        Design design = trendAndNoise(160, 11).withColumns(List.of(square(trend(160, 1).column(1))), List.of("t2"));
        double[] fast = DurbinWatsonDistribution.forDesign(design).eigenvalues();
        double[] dense = denseEigenvalues(design);
        for (int i = 0; i < dense.length; i++) {
            assertEquals(dense[i], fast[i], EIGENVALUE_AGREEMENT, "eigenvalue " + i);
        }
    }

    @Test
    void mean_is_the_trace_of_ma_over_the_residual_degrees_of_freedom() {
        // Durbin & Watson (1950), Biometrika 37: E d = tr(MA) / (n - k)
        Design design = trendAndNoise(40, 3);
        RealMatrix x = new Array2DRowRealMatrix(design.toRows());
        RealMatrix hat = x.multiply(new QRDecomposition(x.transpose().multiply(x)).getSolver().getInverse())
                .multiply(x.transpose());
        RealMatrix a = durbinWatsonMatrix(40);
        double trace = a.getTrace() - hat.multiply(a).getTrace();
        assertEquals(trace / (40 - 3), DurbinWatsonDistribution.forDesign(design).mean(), 1e-12);
    }

    @ParameterizedTest(name = "n = {0}, constant + t, {1} replications")
    @CsvSource({"12, 8000, 101", "40, 8000, 202", "150, 4000, 303"})
    void exact_p_value_matches_a_seeded_monte_carlo_for_a_trend_design(int n, int replications, long seed) {
        // Seeded simulation under the null: y iid N(0, 1), fit constant + t, compute d. The empirical
        // P(d <= d0) has standard error sqrt(p(1-p)/R); each check allows 4 of them, so a correct exact
        // value fails one of the 4 x 3 checks with probability about 12 x 6e-5 (and the seeds are fixed).
        Design design = trend(n, 1);
        DurbinWatsonDistribution exact = DurbinWatsonDistribution.forDesign(design);
        double[] simulated = simulatedStatistics(design, replications, new Random(seed));
        for (double d0 : new double[] {1.2, 1.6, 2.0, 2.4}) {
            double p = exact.probabilityAtMost(d0);
            double empirical = Arrays.stream(simulated).filter(d -> d <= d0).count() / (double) replications;
            double standardError = Math.sqrt(p * (1 - p) / replications);
            assertEquals(p, empirical, 4 * standardError, "P(d <= " + d0 + ")");
            assertEquals(1, p + exact.probabilityAtLeast(d0), PROBABILITY_ACCURACY, "continuous: the tails add to 1");
        }
    }

    @Test
    void two_eigenvalues_give_the_arcsine_law() {
        // d = nu1 + (nu2 - nu1) B with B = z2^2/(z1^2 + z2^2) ~ Beta(1/2, 1/2) (common practice):
        // P(d <= x) = (2/pi) asin(sqrt((x - nu1)/(nu2 - nu1))), written with atan2 so that it stays
        // accurate next to nu2 (the last x is within one ulp of it)
        DurbinWatsonDistribution distribution = new DurbinWatsonDistribution(new double[] {0.5, 3.0});
        for (double x = 0.6; x < 3.0; x += 0.3) {
            double expected = 2 / Math.PI * Math.atan2(Math.sqrt(x - 0.5), Math.sqrt(3.0 - x));
            assertEquals(expected, distribution.probabilityAtMost(x), PROBABILITY_ACCURACY, "x = " + x);
        }
    }

    @ParameterizedTest(name = "{0} eigenvalues at 0.7 and {1} at 2.9")
    @CsvSource({"3, 5", "1, 1", "12, 15", "100, 150", "2000, 3000"})
    void two_repeated_eigenvalues_give_a_beta_law(int lowCount, int highCount) {
        // d = a + (b - a) W, W = chi2_q / (chi2_p + chi2_q) ~ Beta(q/2, p/2) (common practice), so
        // P(d <= x) = I_{(x-a)/(b-a)}(q/2, p/2), the regularized incomplete beta function
        double[] eigenvalues = new double[lowCount + highCount];
        Arrays.fill(eigenvalues, 0, lowCount, 0.7);
        Arrays.fill(eigenvalues, lowCount, eigenvalues.length, 2.9);
        DurbinWatsonDistribution distribution = new DurbinWatsonDistribution(eigenvalues);
        for (double x = 0.8; x < 2.9; x += 0.2) {
            double expected = Beta.regularizedBeta((x - 0.7) / 2.2, highCount / 2.0, lowCount / 2.0, 1e-15, 100_000);
            assertEquals(expected, distribution.probabilityAtMost(x), PROBABILITY_ACCURACY, "x = " + x);
        }
    }

    @Test
    void quantile_inverts_the_distribution_function() {
        DurbinWatsonDistribution distribution = DurbinWatsonDistribution.forDesign(trend(30, 2));
        for (double p : new double[] {0.01, 0.05, 0.5, 0.95}) {
            assertEquals(p, distribution.probabilityAtMost(distribution.quantile(p)), 1e-9, "p = " + p);
        }
    }

    @Test
    void is_zero_below_the_smallest_and_one_above_the_largest_eigenvalue() {
        DurbinWatsonDistribution distribution = DurbinWatsonDistribution.forDesign(trend(20, 1));
        double[] nu = distribution.eigenvalues();
        assertEquals(0, distribution.probabilityAtMost(nu[0] * 0.999), 0);
        assertEquals(1, distribution.probabilityAtMost(nu[nu.length - 1] * 1.0001), 0);
    }

    @Test
    void refuses_a_design_with_fewer_than_four_residual_degrees_of_freedom() {
        assertThrows(InsufficientDataException.class, () -> DurbinWatsonDistribution.forDesign(trend(5, 1)));
    }

    private static double[] simulatedStatistics(Design design, int replications, Random random) {
        double[] statistics = new double[replications];
        for (int r = 0; r < replications; r++) {
            double[] y = new double[design.rows()];
            for (int t = 0; t < y.length; t++) {
                y[t] = random.nextGaussian();
            }
            statistics[r] = DurbinWatson.statistic(LeastSquares.fit(design, y).residuals());
        }
        return statistics;
    }

    /** Eigenvalues of Z'AZ with Z the last n - k columns of the full Q of X = QR. */
    static double[] denseEigenvalues(Design design) {
        int n = design.rows();
        int k = design.width();
        RealMatrix q = new QRDecomposition(new Array2DRowRealMatrix(design.toRows())).getQ();
        RealMatrix z = q.getSubMatrix(0, n - 1, k, n - 1);
        RealMatrix restricted = z.transpose().multiply(durbinWatsonMatrix(n)).multiply(z);
        RealMatrix symmetric = restricted.add(restricted.transpose()).scalarMultiply(0.5);
        double[] eigenvalues = new EigenDecomposition(symmetric).getRealEigenvalues();
        Arrays.sort(eigenvalues);
        return eigenvalues;
    }

    /** A = tridiag(-1; 1, 2, ..., 2, 1; -1), so that e'Ae = sum (e_t - e_{t-1})^2. */
    static RealMatrix durbinWatsonMatrix(int n) {
        RealMatrix a = new Array2DRowRealMatrix(n, n);
        for (int i = 0; i < n; i++) {
            a.setEntry(i, i, i == 0 || i == n - 1 ? 1 : 2);
            if (i > 0) {
                a.setEntry(i, i - 1, -1);
                a.setEntry(i - 1, i, -1);
            }
        }
        return a;
    }

    /** constant + t + ... + t^degree, t = 1..n (raw powers: n is small enough for them). */
    static Design trend(int n, int degree) {
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        double[] constant = new double[n];
        Arrays.fill(constant, 1);
        columns.add(constant);
        names.add("constant");
        for (int power = 1; power <= degree; power++) {
            double[] column = new double[n];
            for (int t = 0; t < n; t++) {
                column[t] = Math.pow(t + 1, power);
            }
            columns.add(column);
            names.add(power == 1 ? "t" : "t" + power);
        }
        return new Design(columns, names, true);
    }

    private static Design trendAndNoise(int n, long seed) {
        Random random = new Random(seed);
        double[] noise = new double[n];
        for (int t = 0; t < n; t++) {
            noise[t] = random.nextGaussian();
        }
        return trend(n, 1).withColumns(List.of(noise), List.of("x"));
    }

    private static Design trendWithoutConstant(int n) {
        return new Design(List.of(trend(n, 1).column(1)), List.of("t"), false);
    }

    /** Four quarterly dummies (which add up to the constant) and a trend, no explicit constant. */
    private static Design quarterlyDummiesAndTrend(int n) {
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int quarter = 0; quarter < 4; quarter++) {
            double[] dummy = new double[n];
            for (int t = quarter; t < n; t += 4) {
                dummy[t] = 1;
            }
            columns.add(dummy);
            names.add("q" + (quarter + 1));
        }
        columns.add(trend(n, 1).column(1));
        names.add("t");
        return new Design(columns, names, false);
    }

    private static double[] square(double[] v) {
        return Arrays.stream(v).map(x -> x * x).toArray();
    }
}
