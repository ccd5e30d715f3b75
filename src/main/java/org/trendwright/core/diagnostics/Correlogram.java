package org.trendwright.core.diagnostics;

/**
 * The residual autocorrelations r_1..r_m with the white-noise yardsticks used to read them.
 *
 * <p>Immutable and thread-safe: arrays are copied in and out.
 *
 * @param observations     n, the number of residuals the autocorrelations were computed from
 * @param autocorrelations r_1..r_m; element {@code k - 1} holds lag k
 * @param standardError    1/sqrt(n), the large-sample standard error of every r_k under white noise
 * @param tStatistics      r_k sqrt(n), each autocorrelation divided by that standard error
 * @param bandHalfWidth    2/sqrt(n): autocorrelations outside +-this band are drawn as notable on charts
 */
public record Correlogram(int observations, double[] autocorrelations, double standardError,
                         double[] tStatistics, double bandHalfWidth) {

    public Correlogram {
        autocorrelations = autocorrelations.clone();
        tStatistics = tStatistics.clone();
    }

    @Override
    public double[] autocorrelations() {
        return autocorrelations.clone();
    }

    @Override
    public double[] tStatistics() {
        return tStatistics.clone();
    }

    /** The largest lag m computed. */
    public int maxLag() {
        return autocorrelations.length;
    }

    /** r_k for a lag k in 1..m. */
    public double at(int lag) {
        return autocorrelations[lag - 1];
    }

    /** True when |r_k| exceeds the 2/sqrt(n) band, i.e. it is about twice its white-noise standard error. */
    public boolean outsideBand(int lag) {
        return Math.abs(at(lag)) > bandHalfWidth;
    }
}
