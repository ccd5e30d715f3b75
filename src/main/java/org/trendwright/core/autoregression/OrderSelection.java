package org.trendwright.core.autoregression;

import java.util.ArrayList;
import java.util.List;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;

/**
 * Lag-count selection by an information criterion on a common estimation sample (see
 * {@link LagSelection}; Ng & Perron 2005, Oxford Bulletin of Economics and Statistics 67).
 *
 * <p>The candidates are nested: candidate p uses the first m_p columns of the largest design. One
 * Householder QR of that design, X = Q R, therefore yields every candidate's residual sum of
 * squares: with c = Q'y the regression on the first m columns leaves RSS_m = Σ_{j ≥ m} c_j²
 * (Golub & Van Loan 1996, Matrix Computations, 3rd ed., section 5.3.5;
 * {@link LeastSquares#nestedResidualSumsOfSquares}). That replaces pMax + 1 separate fits by one
 * decomposition; the chosen candidate is then
 * fitted in full by {@link org.trendwright.core.regression.LeastSquares}. The criteria follow the
 * conventions of {@link org.trendwright.core.regression.OlsFit}: with n rows and k coefficients,
 * ln L = −n/2 (ln 2π + ln(RSS/n) + 1), AIC = −2 ln L + 2(k + 1), BIC = −2 ln L + ln(n)(k + 1).
 * An exact fit (RSS = 0) has criteria of −∞; a column that adds nothing to the ones before it
 * leaves RSS unchanged and is simply penalised.
 *
 * <p>Stateless and thread-safe.
 */
public final class OrderSelection {

    private OrderSelection() {
    }

    /**
     * The criteria of the candidates p = 0..widths.length−1, candidate p regressing y on the first
     * widths[p] columns of {@code largest}.
     */
    public static List<CandidateOrder> compareNested(Design largest, double[] y, int[] widths) {
        double[] rss = LeastSquares.nestedResidualSumsOfSquares(largest, y, widths);
        List<CandidateOrder> candidates = new ArrayList<>(widths.length);
        for (int p = 0; p < widths.length; p++) {
            candidates.add(CandidateOrder.fromResidualSumOfSquares(p, largest.rows(), widths[p], rss[p]));
        }
        return candidates;
    }

    /** The order with the smallest criterion value; ties go to the smaller order. */
    public static int choose(List<CandidateOrder> candidates, LagSelection selection) {
        CandidateOrder best = candidates.get(0);
        for (CandidateOrder candidate : candidates) {
            if (candidate.criterion(selection) < best.criterion(selection)) {
                best = candidate;
            }
        }
        return best.order();
    }
}
