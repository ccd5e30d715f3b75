package org.trendwright.core.trend;

/**
 * A prediction of a log-scale model mapped back to the original scale in the three usual ways.
 * With m the prediction of ln y, s^2 the residual variance on the log scale and e_i the log-scale
 * residuals:
 * <ul>
 *   <li>{@code median} = e^m, the median of y if the log-scale errors are symmetric;</li>
 *   <li>{@code lognormalMean} = e^(m + s^2/2), the mean of y if they are normal (the lognormal
 *       correction);</li>
 *   <li>{@code smearingMean} = e^m (1/n) sum e^(e_i), Duan's (1983) smearing estimate of the
 *       mean, which needs no normality ("Smearing estimate: a nonparametric retransformation
 *       method", JASA 78, 605-610).</li>
 * </ul>
 */
public record BackTransformed(double median, double lognormalMean, double smearingMean) {

    /**
     * The three back-transformations of a log-scale prediction m, given the log-scale residual
     * variance s^2 and the smearing factor (1/n) sum e^(e_i).
     */
    public static BackTransformed of(double m, double logVariance, double smearingFactor) {
        double median = Math.exp(m);
        return new BackTransformed(median, Math.exp(m + logVariance / 2), median * smearingFactor);
    }

    /** Duan's (1983) smearing factor (1/n) sum e^(e_i) of log-scale residuals. */
    public static double smearingFactor(double[] logResiduals) {
        double sum = 0;
        for (double e : logResiduals) {
            sum += Math.exp(e);
        }
        return sum / logResiduals.length;
    }
}
