package org.trendwright.core.robust;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.Matrices;
import org.trendwright.core.StudentT;
import org.trendwright.core.regression.Coefficient;
import org.trendwright.core.regression.OlsFit;

/**
 * Newey-West heteroskedasticity- and autocorrelation-consistent (HAC) standard errors for least
 * squares (Newey & West 1987, "A simple, positive semi-definite, heteroskedasticity and
 * autocorrelation consistent covariance matrix", Econometrica 55).
 *
 * <p>With residuals e_t, regressor rows x_t and scores u_t = e_t x_t, the long-run covariance of the
 * scores is estimated with Bartlett weights w_l = 1 - l/(L + 1):
 * <pre>
 *   S = sum_t u_t u_t' + sum_{l=1..L} w_l sum_{t=l+1..n} (u_t u_{t-l}' + u_{t-l} u_t')
 *   V = (X'X)^-1 S (X'X)^-1
 * </pre>
 * The declining weights make S positive semi-definite, which equal weights do not guarantee. With
 * L = 0 the estimator is White's (1980, Econometrica 48) heteroskedasticity-consistent one.
 *
 * <p>No small-sample scaling: V is used as published, without the factor n/(n - k) some programs
 * apply, so L = 0 reproduces White's estimator exactly. Like all kernel HAC estimators it is biased
 * downward in samples of ordinary size when the errors are strongly autocorrelated (Andrews 1991,
 * Econometrica 59); the t reference distribution with n - k degrees of freedom is a modest
 * concession to that.
 *
 * <p>The automatic lag is L = floor(4 (n/100)^(2/9)), the rule of thumb of Newey & West (1994,
 * "Automatic lag selection in covariance matrix estimation", Review of Economic Studies 61).
 *
 * <p>An exact fit (all residuals 0) gives standard errors 0 and t statistics of +-Infinity (NaN for
 * an estimate that is itself 0), as {@link OlsFit} reports them. The rows of the fit must be
 * consecutive periods in time order; the caller refuses series with gaps.
 *
 * <p>Stateless and thread-safe.
 */
public final class NeweyWest {

    private NeweyWest() {
    }

    /** The automatic lag floor(4 (n/100)^(2/9)) (Newey & West 1994); 1 for n = 2..4, 4 for n = 200. */
    public static int automaticLag(int n) {
        return (int) Math.floor(4 * Math.pow(n / 100.0, 2.0 / 9.0));
    }

    /** HAC inference with the automatic lag {@link #automaticLag(int)}. */
    public static HacInference standardErrors(OlsFit fit) {
        int n = fit.observations();
        int lag = automaticLag(n);
        return compute(fit, lag, "automatic: floor(4 (n/100)^(2/9)) = " + lag + " for n = " + n
                + " (Newey & West 1994)");
    }

    /**
     * HAC inference with a truncation lag L chosen by the caller.
     *
     * @throws InvalidSpecificationException when L < 0 or L >= n (there is no pair of residuals
     *                                       L periods apart)
     */
    public static HacInference standardErrors(OlsFit fit, int lag) {
        return compute(fit, lag, lag + " (set by the caller)");
    }

    private static HacInference compute(OlsFit fit, int lag, String rule) {
        int n = fit.observations();
        if (lag < 0 || lag >= n) {
            throw new InvalidSpecificationException("The Newey-West lag must lie in 0.." + (n - 1) + " for " + n
                    + " observations, got " + lag + "; omit it to use the automatic lag " + automaticLag(n) + ".");
        }
        double[][] covariance = sandwich(fit.xtxInverse(), longRunCovariance(scores(fit), lag));
        int df = fit.residualDegreesOfFreedom();
        return new HacInference(coefficients(fit, covariance, df), covariance, lag, rule, df);
    }

    /** u_t = e_t x_t, one row per observation. */
    static double[][] scores(OlsFit fit) {
        double[][] rows = fit.design().toRows();
        double[] e = fit.residuals();
        for (int t = 0; t < rows.length; t++) {
            for (int j = 0; j < rows[t].length; j++) {
                rows[t][j] *= e[t];
            }
        }
        return rows;
    }

    /** S = Gamma_0 + sum_{l=1..L} w_l (Gamma_l + Gamma_l'), Gamma_l = sum_t u_t u_{t-l}'. */
    static double[][] longRunCovariance(double[][] u, int lag) {
        double[][] s = crossProducts(u, 0);
        for (int l = 1; l <= lag; l++) {
            double weight = 1 - l / (lag + 1.0);
            double[][] gamma = crossProducts(u, l);
            for (int i = 0; i < s.length; i++) {
                for (int j = 0; j < s.length; j++) {
                    s[i][j] += weight * (gamma[i][j] + gamma[j][i]);
                }
            }
        }
        return s;
    }

    /** Gamma_l = sum_{t=l+1..n} u_t u_{t-l}'. */
    private static double[][] crossProducts(double[][] u, int l) {
        int k = u[0].length;
        double[][] gamma = Matrices.zeros(k, k);
        for (int t = l; t < u.length; t++) {
            for (int i = 0; i < k; i++) {
                for (int j = 0; j < k; j++) {
                    gamma[i][j] += u[t][i] * u[t - l][j];
                }
            }
        }
        return gamma;
    }

    /** A S A for symmetric A and S, symmetrised so rounding cannot make V asymmetric. */
    static double[][] sandwich(double[][] a, double[][] s) {
        double[][] v = product(product(a, s), a);
        for (int i = 0; i < v.length; i++) {
            for (int j = 0; j < i; j++) {
                double mean = (v[i][j] + v[j][i]) / 2;
                v[i][j] = mean;
                v[j][i] = mean;
            }
        }
        return v;
    }

    private static double[][] product(double[][] a, double[][] b) {
        int k = a.length;
        double[][] c = Matrices.zeros(k, k);
        for (int i = 0; i < k; i++) {
            for (int m = 0; m < k; m++) {
                for (int j = 0; j < k; j++) {
                    c[i][j] += a[i][m] * b[m][j];
                }
            }
        }
        return c;
    }

    private static List<Coefficient> coefficients(OlsFit fit, double[][] covariance, int df) {
        TDistribution t = new TDistribution(null, df);
        double critical = StudentT.quantile(df, 0.975);
        List<Coefficient> result = new ArrayList<>(covariance.length);
        for (int j = 0; j < covariance.length; j++) {
            Coefficient ols = fit.coefficients().get(j);
            double b = ols.estimate();
            // V is positive semi-definite, so a diagonal element below 0 can only be rounding of a 0.
            double se = Math.sqrt(Math.max(0, covariance[j][j]));
            double tStat = b / se;
            double p = Double.isNaN(tStat) ? Double.NaN : 2 * t.cumulativeProbability(-Math.abs(tStat));
            result.add(new Coefficient(ols.name(), b, se, tStat, p, b - critical * se, b + critical * se));
        }
        return result;
    }
}
