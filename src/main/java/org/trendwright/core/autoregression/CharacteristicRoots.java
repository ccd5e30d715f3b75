package org.trendwright.core.autoregression;

import java.util.Locale;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.trendwright.core.Matrices;

/**
 * Stationarity of an autoregression y_t = b0 + φ1 y_{t−1} + ... + φm y_{t−m} + e_t from the roots
 * of its characteristic polynomial 1 − φ1 z − ... − φm z^m. The process is stationary when every
 * root lies outside the unit circle (Box & Jenkins 1970, Time Series Analysis: Forecasting and
 * Control, Holden-Day, section 3.2). The roots are the reciprocals of the eigenvalues of the
 * companion matrix
 * <pre>
 *   | φ1 φ2 ... φm |
 *   | 1  0  ... 0  |
 *   | ...          |
 *   | 0  ... 1  0  |
 * </pre>
 * so the condition reads: every eigenvalue has modulus below 1. The eigenvalues come from
 * Commons Math's {@link EigenDecomposition} (Hessenberg reduction and the real Schur form), which
 * handles complex pairs.
 *
 * <p>Stateless and thread-safe.
 */
public final class CharacteristicRoots {

    /**
     * A modulus within this distance below 1 counts as a unit root: a double root at 1 (as in
     * φ = (2, −1)) comes out of the eigenvalue solver only to about √ε ≈ 1e-8 accuracy, so an
     * exact unit root must not pass as stationary through rounding.
     */
    public static final double UNIT_CIRCLE_TOLERANCE = 1e-6;

    private CharacteristicRoots() {
    }

    /**
     * The largest modulus of the companion-matrix eigenvalues for the coefficients φ1..φm (index
     * 0 holds φ1; zeros stand for lags left out of a subset model). 0 when m = 0.
     */
    public static double largestModulus(double[] phi) {
        int m = phi.length;
        if (m == 0) {
            return 0;
        }
        if (m == 1) {
            return Math.abs(phi[0]);
        }
        double[][] companion = Matrices.zeros(m, m);
        companion[0] = phi.clone();
        for (int i = 1; i < m; i++) {
            companion[i][i - 1] = 1;
        }
        EigenDecomposition eigen = new EigenDecomposition(new Array2DRowRealMatrix(companion, false));
        double[] real = eigen.getRealEigenvalues();
        double[] imaginary = eigen.getImagEigenvalues();
        double largest = 0;
        for (int i = 0; i < m; i++) {
            largest = Math.max(largest, Math.hypot(real[i], imaginary[i]));
        }
        return largest;
    }

    /**
     * Stationarity of the fitted model and, when stationary, its mean-reverting level
     * μ = b0 / (1 − Σφ_i), the value E[y_t] solves in y = b0 + Σφ_i y. For a model on first
     * differences μ is the mean change per period (the drift of the levels).
     */
    public static Stationarity assess(double constant, double[] phi, boolean differenced) {
        double modulus = largestModulus(phi);
        boolean stationary = modulus < 1 - UNIT_CIRCLE_TOLERANCE;
        double sum = 0;
        for (double p : phi) {
            sum += p;
        }
        double level = stationary ? constant / (1 - sum) : Double.NaN;
        return new Stationarity(modulus, stationary, level, statement(modulus, stationary, level, differenced));
    }

    private static String statement(double modulus, boolean stationary, double level, boolean differenced) {
        String roots = String.format(Locale.ROOT, "largest companion-matrix eigenvalue modulus %.4f", modulus);
        if (stationary && !differenced) {
            return String.format(Locale.ROOT, "Stationary: every root of the AR polynomial lies outside the unit circle"
                    + " (%s < 1), so the series reverts to the mean-reverting level b0/(1 - sum of b_i) = %.6g.",
                    roots, level);
        }
        if (stationary) {
            return String.format(Locale.ROOT, "Stationary in the first differences (%s < 1): the mean-reverting level"
                    + " refers to the differences, a mean change of %.6g per period; the levels themselves drift and"
                    + " do not revert to any level.", roots, level);
        }
        String where = differenced ? "Not stationary even in the first differences" : "Not stationary";
        return where + ": a root of the AR polynomial lies on or inside the unit circle (" + roots
                + " >= 1), so there is no mean-reverting level and forecast intervals widen without bound; "
                + (differenced ? "consider a lower order or check the series for breaks."
                               : "test for a unit root and consider modelling the first differences.");
    }
}
