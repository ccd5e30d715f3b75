package org.trendwright.core.unitroot;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.stream.IntStream;
import org.trendwright.core.Decision;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.Observations;
import org.trendwright.core.TestResult;
import org.trendwright.core.autoregression.CandidateOrder;
import org.trendwright.core.autoregression.LagDesigns;
import org.trendwright.core.autoregression.LagSelection;
import org.trendwright.core.autoregression.OrderSelection;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.SingleCoefficientFit;

/**
 * The augmented Dickey-Fuller test of a unit root (Dickey & Fuller 1979, "Distribution of the
 * estimators for autoregressive time series with a unit root", JASA 74; Said & Dickey 1984,
 * "Testing for unit roots in autoregressive-moving average models of unknown order",
 * Biometrika 71).
 *
 * <p>The test regression, by OLS over t = p+2..n:
 * <pre>
 *   Δy_t = [α] + [β t] + γ y_{t−1} + Σ_{i=1..p} δ_i Δy_{t−i} + e_t
 * </pre>
 * with the deterministic terms of {@link DeterministicTerms}. Under the null of a unit root γ = 0;
 * the alternative is γ < 0 (a stationary series around zero, a mean or a trend). The statistic
 * tau = γ̂ / se(γ̂) does not follow Student's t under the null; its left-tail p-value comes from
 * the simulated tables of {@link DickeyFullerDistribution} at T, the regression's observations. Only
 * γ̂ and se(γ̂) of the test regression are computed ({@link LeastSquares#singleCoefficient}): γ̂ as
 * the full fit gives it, se(γ̂) to within the rounding of its refined (X'X)^-1.
 * The lagged differences soak up short-run correlation so that e_t is close to white noise; they
 * do not change the limiting distribution of tau (Said & Dickey 1984), though in small samples
 * the p-value is then approximate.
 *
 * <p>The number of lagged differences p is fixed or chosen by AIC or BIC among 0..pMax on a
 * common sample (the first pMax + 1 observations dropped for every candidate; see
 * {@link LagSelection}); by default pMax = ⌊12 (n/100)^{1/4}⌋ (Schwert 1989, "Tests for unit roots:
 * a Monte Carlo investigation", J. Business & Economic Statistics 7), lowered when needed so that
 * T stays at or above the tables' smallest sample size.
 *
 * <p>Stateless and thread-safe.
 */
public final class AugmentedDickeyFuller {

    private static final String LEVEL_LAG = "level lag 1";

    private AugmentedDickeyFuller() {
    }

    /**
     * Runs the test.
     *
     * @throws org.trendwright.core.InvalidSpecificationException when the series has a gap (the
     *         message names the first missing period)
     * @throws InsufficientDataException when the test regression with the largest p would have
     *         fewer than {@link DickeyFullerDistribution#smallestObservations()} observations or no
     *         residual degree of freedom
     * @throws org.trendwright.core.RankDeficientDesignException for a series whose level or changes
     *         are constant (tau is then undefined)
     * @throws org.trendwright.core.InvalidSpecificationException when the test regression fits
     *         exactly, so that se(γ̂) = 0 and tau is infinite or NaN
     */
    public static AdfResult test(Observations series, AdfSpec spec) {
        LagDesigns.requireConsecutive(series, "The augmented Dickey-Fuller test");
        double[] y = series.values();
        double[] d = LagDesigns.differences(y);
        int maximumLags = spec.lags() == AdfSpec.SCHWERT_MAXIMUM ? schwertMaximum(y.length) : spec.lags();
        checkLength(y.length, maximumLags, spec.terms());
        int lags = maximumLags;
        List<CandidateOrder> candidates = List.of();
        if (spec.selection() != LagSelection.FIXED) {
            int[] widths = IntStream.rangeClosed(0, maximumLags).map(p -> spec.terms().count() + 1 + p).toArray();
            candidates = OrderSelection.compareNested(design(y, d, maximumLags, maximumLags, spec.terms()),
                    LagDesigns.lagged(d, 0, maximumLags), widths);
            lags = OrderSelection.choose(candidates, spec.selection());
        }
        Design chosen = design(y, d, lags, lags, spec.terms());
        SingleCoefficientFit levelLag = LeastSquares.singleCoefficient(chosen, LagDesigns.lagged(d, 0, lags),
                LEVEL_LAG);
        if (spec.selection() == LagSelection.FIXED) {
            candidates = List.of(CandidateOrder.fromResidualSumOfSquares(lags, levelLag.observations(),
                    chosen.width(), levelLag.residualSumOfSquares()));
        }
        return result(spec, lags, maximumLags, candidates, levelLag);
    }

    /**
     * Schwert's (1989) rule ⌊12 (n/100)^{1/4}⌋ for the largest number of lagged differences,
     * lowered so that the test regression keeps at least the tables' smallest T observations
     * (never below 0).
     */
    public static int schwertMaximum(int n) {
        int schwert = (int) Math.floor(12 * Math.pow(n / 100.0, 0.25));
        return Math.max(0, Math.min(schwert, n - 1 - DickeyFullerDistribution.smallestObservations()));
    }

    private static AdfResult result(AdfSpec spec, int lags, int maximumLags, List<CandidateOrder> candidates,
                                    SingleCoefficientFit levelLag) {
        double gamma = levelLag.estimate();
        double tau = levelLag.tStatistic();
        int observations = levelLag.observations();
        double pValue = DickeyFullerDistribution.pValue(spec.terms(), observations, tau);
        CriticalValues critical = DickeyFullerDistribution.criticalValues(spec.terms(), observations);
        TestResult test = new TestResult("Augmented Dickey-Fuller (" + spec.terms().label() + ", " + lags
                + " lagged differences)", "the series has a unit root (only its first differences are stationary)",
                tau, "Dickey-Fuller (simulated tables)", List.of(), pValue, spec.level(),
                TestResult.decide(pValue, spec.level()), reading(spec, tau, pValue));
        return new AdfResult(spec, lags, maximumLags, candidates, observations, gamma, tau, critical, test);
    }

    /**
     * The regressors of Δy_t: the deterministic terms, y_{t−1} and Δy_{t−1..t−p}, over the rows whose
     * differences Δy index from {@code start} on (0-based in d), so that every p ≤ start shares them.
     * Row i has Δy at d[start + i] = y[start + i + 1] − y[start + i], so its time index counted from 1
     * is start + i + 2, its level lag y[start + i] and its lag-l difference d[start + i − l].
     */
    private static Design design(double[] y, double[] d, int p, int start, DeterministicTerms terms) {
        int deterministic = terms.count();
        List<String> names = new ArrayList<>(deterministic + 1 + p);
        if (terms != DeterministicTerms.NO_CONSTANT) {
            names.add("constant");
        }
        if (terms == DeterministicTerms.CONSTANT_AND_TREND) {
            names.add("trend");
        }
        names.add(LEVEL_LAG);
        for (int i = 1; i <= p; i++) {
            names.add("difference lag " + i);
        }
        return Design.generate(d.length - start, names, terms != DeterministicTerms.NO_CONSTANT, (j, values) -> {
            if (j == 0 && deterministic > 0) {
                Arrays.fill(values, 1);
            } else if (j == 1 && deterministic > 1) {
                Arrays.setAll(values, i -> start + i + 2);
            } else if (j == deterministic) {
                System.arraycopy(y, start, values, 0, values.length);
            } else {
                System.arraycopy(d, start - (j - deterministic), values, 0, values.length);
            }
        });
    }

    private static void checkLength(int n, int maximumLags, DeterministicTerms terms) {
        int smallest = DickeyFullerDistribution.smallestObservations();
        int coefficients = terms.count() + 1 + maximumLags;
        int needed = Math.max(smallest, coefficients + 1) + maximumLags + 1;
        if (n < needed) {
            throw InsufficientDataException.forModel("The augmented Dickey-Fuller test with " + terms.label() + " and "
                    + maximumLags + " lagged differences (p-value tables start at T = " + smallest + ")", needed, n);
        }
    }

    private static String reading(AdfSpec spec, double tau, double pValue) {
        String level = BigDecimal.valueOf(spec.level()).movePointRight(2).stripTrailingZeros().toPlainString();
        // Below the table's smallest probability the p-value is an extrapolation; say only that it is tiny.
        String p = pValue < 0.0005 ? "p < 0.0005" : String.format(Locale.ROOT, "p = %.4f", pValue);
        String evidence = String.format(Locale.ROOT, " at the %s%% level (tau = %.3f, %s)", level, tau, p);
        if (TestResult.decide(pValue, spec.level()) == Decision.DO_NOT_REJECT) {
            return "A unit root cannot be rejected" + evidence + ": shocks to the series look permanent, so a trend"
                    + " line fitted to its levels may be spurious (Granger & Newbold 1974) and its intervals too"
                    + " narrow; model the period-to-period differences instead.";
        }
        return "The unit root is rejected" + evidence + ": the series is stationary around " + switch (spec.terms()) {
            case NO_CONSTANT -> "zero";
            case CONSTANT -> "its mean, so shocks fade and forecasts revert to that mean";
            case CONSTANT_AND_TREND -> "its linear trend, so shocks fade and a trend model on the levels (with"
                    + " autocorrelated errors where needed) suits it";
        } + ".";
    }
}
