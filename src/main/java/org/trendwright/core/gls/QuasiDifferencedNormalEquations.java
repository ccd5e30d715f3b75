package org.trendwright.core.gls;

import java.util.Optional;
import org.trendwright.core.Matrices;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.NormalEquations;

/**
 * The coefficients b(rho) of the quasi-differenced regression y* = X* b + e by its normal
 * equations, X*'X* b = X*'y* ({@link NormalEquations}, with its accuracy and its refusal of a
 * design that is not clearly well conditioned), for the steps of the feasible-GLS iteration
 * ({@link Ar1Gls#estimate}) that only steer rho towards its fixed point.
 *
 * <p>The cross products are accumulated while each row is transformed (x*_t = x_t - rho x_{t-1},
 * and for Prais-Winsten x*_1 = sqrt(1 - rho^2) x_1, as {@link Ar1Gls#transform}), so no transformed
 * design is built: n k(k + 3)/2 multiply-adds instead of the Householder QR's 2 n k^2 and its
 * copies. Stateless.
 */
final class QuasiDifferencedNormalEquations {

    private QuasiDifferencedNormalEquations() {
    }

    /** b(rho), or empty where {@link NormalEquations#solve} declines. */
    static Optional<double[]> coefficients(Design design, double[] y, double rho, Ar1Method method) {
        int k = design.width();
        double[][] gram = Matrices.zeros(k, k);
        double[] moment = new double[k];
        double[] row = new double[k];
        if (method == Ar1Method.PRAIS_WINSTEN) {
            double firstWeight = Math.sqrt(1 - rho * rho);
            for (int j = 0; j < k; j++) {
                row[j] = firstWeight * design.get(0, j);
            }
            NormalEquations.addRow(row, firstWeight * y[0], gram, moment);
        }
        for (int t = 1; t < y.length; t++) {
            for (int j = 0; j < k; j++) {
                row[j] = design.get(t, j) - rho * design.get(t - 1, j);
            }
            NormalEquations.addRow(row, y[t] - rho * y[t - 1], gram, moment);
        }
        return NormalEquations.solve(gram, moment);
    }
}
