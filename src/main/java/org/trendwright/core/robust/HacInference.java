package org.trendwright.core.robust;

import java.util.List;
import org.trendwright.core.Matrices;
import org.trendwright.core.regression.Coefficient;

/**
 * Least-squares coefficients with heteroskedasticity- and autocorrelation-consistent (HAC)
 * standard errors, t statistics, two-sided p-values (Student's t with n - k degrees of freedom) and
 * 95% confidence intervals.
 *
 * <p>Immutable and thread-safe: the covariance matrix is copied in and out.
 *
 * @param coefficients             the OLS estimates with their HAC inference, in the design's column order
 * @param covariance               the k x k HAC covariance matrix V of the estimates
 * @param lag                      L, the truncation lag of the Bartlett kernel
 * @param lagRule                  how L was chosen, in words
 * @param residualDegreesOfFreedom n - k, the degrees of freedom of the t reference distribution
 */
public record HacInference(List<Coefficient> coefficients, double[][] covariance, int lag, String lagRule,
                           int residualDegreesOfFreedom) {

    public HacInference {
        coefficients = List.copyOf(coefficients);
        covariance = Matrices.copy(covariance);
    }

    @Override
    public double[][] covariance() {
        return Matrices.copy(covariance);
    }

    /** The coefficient of the regressor with this name. */
    public Coefficient coefficient(String name) {
        return coefficients.stream().filter(c -> c.name().equals(name)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("No regressor named '" + name + "'."));
    }

    /** The HAC standard errors as an array, in the design's column order. */
    public double[] standardErrors() {
        return coefficients.stream().mapToDouble(Coefficient::standardError).toArray();
    }
}
