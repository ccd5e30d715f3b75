package org.trendwright.core.selection;

import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.trendwright.core.Decision;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.TestResult;

/**
 * The Diebold-Mariano test of equal forecast accuracy (Diebold & Mariano 1995, "Comparing
 * predictive accuracy", Journal of Business & Economic Statistics 13, 253-263) under squared-error
 * loss, with the small-sample correction of Harvey, Leybourne & Newbold (1997, International
 * Journal of Forecasting 13, 281-291).
 *
 * <p>With loss differentials d_t = e1_t^2 - e2_t^2 of two models' h-step errors over T periods,
 * mean d, and autocovariances g_k of d: DM = mean d / sqrt((g_0 + 2 sum_{k=1..h-1} g_k) / T).
 * The corrected statistic DM* = DM sqrt((T + 1 - 2h + h(h-1)/T) / T) is referred to Student's t
 * with T - 1 degrees of freedom, two-sided. When the long-run variance estimate is not positive
 * (the truncated sum can be negative) only g_0 is used, as Diebold & Mariano suggest.
 *
 * <p>Stateless and thread-safe.
 */
public final class DieboldMariano {

    private DieboldMariano() {
    }

    /**
     * Tests whether two models' forecast errors, aligned period by period, are equally accurate.
     *
     * @param first   errors (actual - forecast) of the first model
     * @param second  errors of the second model over the same periods
     * @param horizon the forecast horizon h of the errors (1 for one-step errors)
     * @param level   significance level
     */
    public static TestResult test(String firstName, double[] first, String secondName, double[] second,
                                  int horizon, double level) {
        int n = first.length;
        if (second.length != n) {
            throw new InvalidSpecificationException("The two error series must cover the same periods; got "
                    + n + " and " + second.length + " errors.");
        }
        if (n < 3) {
            throw InsufficientDataException.forModel("The Diebold-Mariano test", 3, n);
        }
        double[] d = new double[n];
        for (int t = 0; t < n; t++) {
            d[t] = first[t] * first[t] - second[t] * second[t];
        }
        double mean = mean(d);
        double variance = longRunVariance(d, mean, horizon) / n;
        double dm = variance > 0 ? mean / Math.sqrt(variance) : 0;
        double corrected = dm * Math.sqrt((n + 1 - 2.0 * horizon + horizon * (horizon - 1.0) / n) / n);
        double p = 2 * new TDistribution(null, n - 1).cumulativeProbability(-Math.abs(corrected));
        Decision decision = TestResult.decide(p, level);
        return new TestResult("Diebold-Mariano (squared error, Harvey-Leybourne-Newbold correction)",
                firstName + " and " + secondName + " forecast equally well", corrected, "t",
                List.of((double) (n - 1)), p, level, decision, reading(firstName, secondName, mean, decision));
    }

    private static double longRunVariance(double[] d, double mean, int horizon) {
        double sum = autocovariance(d, mean, 0);
        for (int k = 1; k < horizon && k < d.length; k++) {
            sum += 2 * autocovariance(d, mean, k);
        }
        return sum > 0 ? sum : autocovariance(d, mean, 0);
    }

    private static double autocovariance(double[] d, double mean, int lag) {
        double sum = 0;
        for (int t = lag; t < d.length; t++) {
            sum += (d[t] - mean) * (d[t - lag] - mean);
        }
        return sum / d.length;
    }

    private static double mean(double[] values) {
        double sum = 0;
        for (double v : values) {
            sum += v;
        }
        return sum / values.length;
    }

    private static String reading(String firstName, String secondName, double meanDifferential, Decision decision) {
        if (decision == Decision.DO_NOT_REJECT) {
            return "The holdout errors of " + firstName + " and " + secondName + " are not significantly different:"
                    + " either would have forecast about as well, so prefer the simpler or better-diagnosed one.";
        }
        String better = meanDifferential < 0 ? firstName : secondName;
        return better + " forecast the holdout periods significantly more accurately.";
    }
}
