package org.trendwright.core.gls;

import java.util.List;
import org.trendwright.core.Matrices;
import org.trendwright.core.regression.Coefficient;

/**
 * A regression y = X b + u with AR(1) errors u_t = rho u_{t-1} + e_t fitted by iterated feasible
 * GLS ({@link Ar1Gls}). Immutable and thread-safe: array accessors return copies.
 *
 * <p>The coefficients, their covariance, the SEE and the Durbin-Watson statistic all come from the
 * final transformed (quasi-differenced) regression, whose errors e_t are serially uncorrelated
 * when the model is right. The coefficients are on the scale of the original regressors (the
 * constant's coefficient is the intercept, not the intercept times 1 - rho). Their standard errors
 * treat rho as known; the extra uncertainty from estimating it is ignored, as is usual.
 *
 * @param method                   Cochrane-Orcutt or Prais-Winsten
 * @param rho                      the rho used in the final transformation, with its standard
 *                                 error from the regression of e_t on e_{t-1} (see {@link RhoEstimate})
 * @param iterations               number of transformed regressions fitted
 * @param converged                true when the next rho, from the final fit's residuals, differed
 *                                 from {@code rho} by less than the tolerance; false when the
 *                                 iteration cap stopped the search first
 * @param coefficients             b with classical standard errors, t and p-values and 95% intervals
 *                                 of the transformed regression (Student's t with
 *                                 {@code residualDegreesOfFreedom})
 * @param coefficientCovariance    Var(b) = s^2 (X*'X*)^-1 of the transformed regression
 * @param standardErrorOfEstimate  s = sqrt(RSS* / (n* - k)), an estimate of sd(e_t)
 * @param residualDegreesOfFreedom n* - k, with n* = n - 1 (Cochrane-Orcutt) or n (Prais-Winsten)
 * @param durbinWatson             the Durbin-Watson statistic of the transformed residuals (near 2
 *                                 when the AR(1) transformation removed the correlation)
 * @param structuralResiduals      u_t = y_t - x_t'b, t = 1..n, which still carry the AR(1) correlation
 * @param transformedResiduals     the residuals e_t of the transformed regression, n* of them
 * @param lastRegressors           x_n, the regressors of the last observation (for forecasting)
 */
public record Ar1GlsFit(Ar1Method method, RhoEstimate rho, int iterations, boolean converged,
                        List<Coefficient> coefficients, double[][] coefficientCovariance,
                        double standardErrorOfEstimate, int residualDegreesOfFreedom, double durbinWatson,
                        double[] structuralResiduals, double[] transformedResiduals, double[] lastRegressors) {

    public Ar1GlsFit {
        coefficients = List.copyOf(coefficients);
        coefficientCovariance = Matrices.copy(coefficientCovariance);
        structuralResiduals = structuralResiduals.clone();
        transformedResiduals = transformedResiduals.clone();
        lastRegressors = lastRegressors.clone();
    }

    @Override
    public double[][] coefficientCovariance() {
        return Matrices.copy(coefficientCovariance);
    }

    @Override
    public double[] structuralResiduals() {
        return structuralResiduals.clone();
    }

    @Override
    public double[] transformedResiduals() {
        return transformedResiduals.clone();
    }

    @Override
    public double[] lastRegressors() {
        return lastRegressors.clone();
    }

    /** Number of original observations n. */
    public int observations() {
        return structuralResiduals.length;
    }

    /** The coefficient estimates b as an array, in the design's column order. */
    public double[] estimates() {
        return coefficients.stream().mapToDouble(Coefficient::estimate).toArray();
    }

    /** The coefficient of the regressor with this name. */
    public Coefficient coefficient(String name) {
        return coefficients.stream().filter(c -> c.name().equals(name)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("No regressor named '" + name + "'."));
    }

    /** u_n = y_n - x_n'b, the last structural residual, which forecasts carry forward as rho^h u_n. */
    public double lastStructuralResidual() {
        return structuralResiduals[structuralResiduals.length - 1];
    }
}
