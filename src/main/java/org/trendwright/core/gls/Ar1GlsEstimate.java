package org.trendwright.core.gls;

/**
 * The point estimates of iterated feasible GLS for AR(1) errors ({@link Ar1Gls#estimate}): the
 * same rho, iterations and coefficients as {@link Ar1Gls#fit} reaches, without the inference of
 * the final transformed regression (no covariance, standard errors or Durbin-Watson). Enough for
 * point forecasts, yhat_{n+h} = x_{n+h}'b + rho^h u_n (see {@link Ar1GlsForecast}). Immutable and
 * thread-safe: array accessors return copies.
 *
 * @param method               Cochrane-Orcutt or Prais-Winsten
 * @param rho                  the rho used in the final transformation
 * @param iterations           number of transformed regressions fitted
 * @param converged            as {@link Ar1GlsFit#converged()}
 * @param coefficients         b, in the design's column order
 * @param structuralResiduals  u_t = y_t - x_t'b, t = 1..n
 * @param transformedResiduals the residuals e_t of the final transformed regression
 */
public record Ar1GlsEstimate(Ar1Method method, RhoEstimate rho, int iterations, boolean converged,
                             double[] coefficients, double[] structuralResiduals, double[] transformedResiduals) {

    public Ar1GlsEstimate {
        coefficients = coefficients.clone();
        structuralResiduals = structuralResiduals.clone();
        transformedResiduals = transformedResiduals.clone();
    }

    @Override
    public double[] coefficients() {
        return coefficients.clone();
    }

    @Override
    public double[] structuralResiduals() {
        return structuralResiduals.clone();
    }

    @Override
    public double[] transformedResiduals() {
        return transformedResiduals.clone();
    }

    /** Number of original observations n. */
    public int observations() {
        return structuralResiduals.length;
    }

    /**
     * The point forecasts x'b + rho^h u_n of the periods {@code futureTimes} (h = t - n) with
     * regressors {@code futureRows}, summed as {@link Ar1GlsForecast} sums them.
     */
    public double[] pointForecasts(double[][] futureRows, int[] futureTimes) {
        double lastResidual = structuralResiduals[structuralResiduals.length - 1];
        double[] values = new double[futureRows.length];
        for (int i = 0; i < futureRows.length; i++) {
            double value = Math.pow(rho.value(), futureTimes[i] - observations()) * lastResidual;
            for (int j = 0; j < coefficients.length; j++) {
                value += futureRows[i][j] * coefficients[j];
            }
            values[i] = value;
        }
        return values;
    }
}
