package org.trendwright.core.regression;

/**
 * The Gaussian log-likelihood of a least-squares fit at the maximum-likelihood variance RSS/n, and
 * the information criteria built on it, written once for every fit and candidate that reports them:
 * <pre>
 *   ln L = −n/2 (ln 2π + ln(RSS/n) + 1)
 *   AIC  = −2 ln L + 2 p          (Akaike 1974, IEEE Trans. Automatic Control 19)
 *   BIC  = −2 ln L + ln(n) p      (Schwarz 1978, Annals of Statistics 6)
 * </pre>
 * with p the parameters counted, the error variance among them. Stateless and thread-safe.
 */
public final class GaussianLikelihood {

    private GaussianLikelihood() {
    }

    /** ln L of n residuals whose sum of squares is {@code rss}. */
    public static double logLikelihood(int n, double rss) {
        return -0.5 * n * (Math.log(2 * Math.PI) + Math.log(rss / n) + 1);
    }

    /** Akaike's criterion of a fit with this log-likelihood and this many parameters. */
    public static double aic(double logLikelihood, int parameters) {
        return -2 * logLikelihood + 2.0 * parameters;
    }

    /** Schwarz's criterion of a fit of n observations with this log-likelihood and this many parameters. */
    public static double bic(double logLikelihood, int n, int parameters) {
        return -2 * logLikelihood + Math.log(n) * parameters;
    }
}
