package org.trendwright.core.diagnostics;

import java.util.List;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.TestResult;

/**
 * The Ljung-Box portmanteau test that the first h residual autocorrelations are jointly zero
 * (Ljung & Box 1978, "On a measure of lack of fit in time series models", Biometrika 65).
 *
 * <p>Q = n(n + 2) sum_{k=1..h} r_k^2 / (n - k), with r_k as in {@link ResidualAutocorrelations}.
 * The weights (n + 2)/(n - k) correct Box and Pierce's (1970) n sum r_k^2, whose chi-square
 * approximation is poor in samples of the usual size, because var(r_k) is (n - k)/(n(n + 2)) under
 * white noise rather than 1/n. Under the null Q is approximately chi-square with h - p degrees of
 * freedom, where p counts the AR and MA coefficients fitted to produce the residuals (0 for the
 * residuals of a trend regression).
 *
 * <p>Residuals must be in time order over consecutive periods; the caller refuses series with gaps.
 *
 * <p>Stateless and thread-safe.
 */
public final class LjungBox {

    private LjungBox() {
    }

    /**
     * Q = n(n + 2) sum_{k=1..h} r_k^2 / (n - k) for given autocorrelations r_1..r_h (element k - 1
     * holds lag k) of a series of length n. NaN when an autocorrelation is NaN.
     *
     * @throws InvalidSpecificationException when h >= n (the weight n - k would not be positive)
     */
    public static double statistic(double[] autocorrelations, int n) {
        if (autocorrelations.length >= n) {
            throw new InvalidSpecificationException("Ljung-Box with " + autocorrelations.length
                    + " lags needs more than that many observations, got n = " + n + ".");
        }
        double sum = 0;
        for (int k = 1; k <= autocorrelations.length; k++) {
            double r = autocorrelations[k - 1];
            sum += r * r / (n - k);
        }
        return n * (n + 2.0) * sum;
    }

    /**
     * The default number of lags h = min(2m, floor(n/5)) for seasonal data with m periods per year
     * and h = min(10, floor(n/5)) otherwise: enough lags to cover two seasonal cycles, but no more
     * than a fifth of the series, since the test loses power and its chi-square approximation
     * worsens when h is large relative to n (Hyndman & Athanasopoulos 2018, "Forecasting: Principles
     * and Practice", 2nd ed., section 3.3, advice given from memory).
     *
     * @throws InvalidSpecificationException when periodsPerYear < 1
     * @throws InsufficientDataException     when n < 5, so the rule would give no lag at all
     */
    public static int defaultLags(int n, int periodsPerYear) {
        if (periodsPerYear < 1) {
            throw new InvalidSpecificationException("periodsPerYear must be at least 1, got " + periodsPerYear + ".");
        }
        int lags = Math.min(periodsPerYear > 1 ? 2 * periodsPerYear : 10, n / 5);
        if (lags < 1) {
            throw new InsufficientDataException("The Ljung-Box default lag rule min(" + (periodsPerYear > 1
                    ? 2 * periodsPerYear : 10) + ", n/5) needs at least 5 residuals but got " + n
                    + "; supply a longer series.");
        }
        return lags;
    }

    /** The Ljung-Box test of regression residuals (no fitted ARMA parameters) over h lags. */
    public static LjungBoxResult test(double[] residuals, int lags, double level) {
        return test(residuals, lags, 0, level);
    }

    /**
     * The Ljung-Box test over h lags of residuals from a model with {@code fittedArmaParameters}
     * AR and MA coefficients; Q is referred to chi-square(h - fittedArmaParameters).
     *
     * @throws InvalidSpecificationException when h < 1, fittedArmaParameters < 0 or >= h (no
     *                                       degrees of freedom left), the level is outside (0, 1), a
     *                                       residual is not finite, or every residual is 0
     * @throws InsufficientDataException     when there are not more than h residuals
     */
    public static LjungBoxResult test(double[] residuals, int lags, int fittedArmaParameters, double level) {
        return run(residuals, lags, fittedArmaParameters, level, lags + " lags (set by the caller)");
    }

    /**
     * The Ljung-Box test with h from {@link #defaultLags(int, int)}.
     *
     * @throws InvalidSpecificationException as {@link #test(double[], int, int, double)}, and when the
     *                                       default h does not exceed fittedArmaParameters
     * @throws InsufficientDataException     when there are fewer than 5 residuals
     */
    public static LjungBoxResult testWithDefaultLags(double[] residuals, int periodsPerYear,
                                                     int fittedArmaParameters, double level) {
        int lags = defaultLags(residuals.length, periodsPerYear);
        String rule = lags + " lags by the rule min(" + (periodsPerYear > 1 ? "2 x " + periodsPerYear : "10")
                + ", n/5) (Hyndman & Athanasopoulos 2018)";
        return run(residuals, lags, fittedArmaParameters, level, rule);
    }

    private static LjungBoxResult run(double[] residuals, int lags, int fitted, double level, String rule) {
        TestResult.checkLevel(level);
        checkLags(lags, fitted);
        Correlogram correlogram = ResidualAutocorrelations.compute(residuals, lags);
        double q = statistic(correlogram.autocorrelations(), residuals.length);
        int df = lags - fitted;
        double p = UpperTails.chiSquare(q, df);
        TestResult result = new TestResult("Ljung-Box Q (" + lags + " lags)",
                "The first " + lags + " residual autocorrelations are all zero", q, "chi-square",
                List.of((double) df), p, level, TestResult.decide(p, level), reading(p < level, lags));
        return new LjungBoxResult(lags, rule, fitted, correlogram, result);
    }

    private static void checkLags(int lags, int fitted) {
        if (lags < 1) {
            throw new InvalidSpecificationException("Ljung-Box needs at least 1 lag, got " + lags + ".");
        }
        if (fitted < 0) {
            throw new InvalidSpecificationException("The number of fitted AR/MA parameters cannot be negative, got "
                    + fitted + "; pass 0 for regression residuals.");
        }
        if (fitted >= lags) {
            throw new InvalidSpecificationException("Ljung-Box over " + lags + " lags after fitting " + fitted
                    + " AR/MA parameters leaves no degrees of freedom; use at least " + (fitted + 1) + " lags.");
        }
    }

    private static String reading(boolean rejected, int lags) {
        return rejected
                ? "The residuals are autocorrelated within " + lags + " lags, so the model leaves a predictable"
                        + " pattern unused and its prediction intervals are unreliable; consider an AR model or"
                        + " seasonal terms."
                : "No autocorrelation shows up within " + lags + " lags: the residuals look like noise, as those"
                        + " of a well-specified model should.";
    }
}
