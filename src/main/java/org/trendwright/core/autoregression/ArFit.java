package org.trendwright.core.autoregression;

import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;
import org.trendwright.core.Observations;
import org.trendwright.core.regression.Coefficient;
import org.trendwright.core.regression.OlsFit;

/**
 * A fitted autoregression with a constant, estimated by conditional least squares (OLS on the
 * observations after the first max-lag ones). Immutable and thread-safe.
 *
 * @param series                   the series as given (levels)
 * @param spec                     what was asked for
 * @param order                    the order p used (fixed or chosen)
 * @param lags                     the lags in the model, ascending: 1..p plus the seasonal lag
 * @param regression               the least-squares fit: coefficients named "constant", "lag i";
 *                                 SEE, AIC, BIC, residuals
 * @param candidates               criterion values of every order tried on the common sample
 *                                 (one entry, the fit itself, for a fixed order)
 * @param residualAutocorrelations residual autocorrelations with standard error 1/√T
 * @param stationarity             the companion-root check and the mean-reverting level
 */
public record ArFit(Observations series, ArSpec spec, int order, int[] lags, OlsFit regression,
                    List<CandidateOrder> candidates, List<ResidualAutocorrelation> residualAutocorrelations,
                    Stationarity stationarity) {

    public ArFit {
        lags = lags.clone();
        candidates = List.copyOf(candidates);
        residualAutocorrelations = List.copyOf(residualAutocorrelations);
    }

    @Override
    public int[] lags() {
        return lags.clone();
    }

    /** True when the model describes the first differences. */
    public boolean differenced() {
        return spec.differenced();
    }

    /** The series the regression was fitted to: the levels, or their first differences. */
    public double[] workingSeries() {
        double[] values = series.values();
        return differenced() ? LagDesigns.differences(values) : values;
    }

    /** The coefficients: the constant first, then one per lag. */
    public List<Coefficient> coefficients() {
        return regression.coefficients();
    }

    /** The estimated constant b0. */
    public double constant() {
        return regression.coefficients().get(0).estimate();
    }

    /** φ1..φm by lag, m the largest lag, with 0 at the lags a subset model leaves out. */
    public double[] lagCoefficients() {
        return phiByLag(lags, regression);
    }

    /** φ by lag from a regression whose coefficients are the constant followed by the given lags. */
    static double[] phiByLag(int[] lags, OlsFit regression) {
        return phiByLag(lags, regression.estimates());
    }

    /** φ by lag from coefficients b0, then one per lag in the order given. */
    static double[] phiByLag(int[] lags, double[] coefficients) {
        double[] phi = new double[lags.length == 0 ? 0 : lags[lags.length - 1]];
        for (int j = 0; j < lags.length; j++) {
            phi[lags[j] - 1] = coefficients[j + 1];
        }
        return phi;
    }

    /** The standard error of estimate s = √(RSS / (T − k)), the one-step forecast error SD. */
    public double standardErrorOfEstimate() {
        return regression.standardErrorOfEstimate();
    }

    /** Akaike's criterion of the final fit (on its own sample). */
    public double aic() {
        return regression.aic();
    }

    /** Schwarz's criterion of the final fit (on its own sample). */
    public double bic() {
        return regression.bic();
    }

    /** T, the observations in the final regression. */
    public int observationsUsed() {
        return regression.observations();
    }

    /** The residual autocorrelations with |t| > 2: lags the model has not captured. */
    public List<ResidualAutocorrelation> flaggedLags() {
        return residualAutocorrelations.stream().filter(ResidualAutocorrelation::flagged).toList();
    }

    /** e.g. "AR(2) with constant on first differences, lags 1, 2, 4". */
    public String description() {
        String lagList = Arrays.stream(lags).mapToObj(Integer::toString).collect(Collectors.joining(", "));
        return "AR(" + order + ") with constant on " + (differenced() ? "first differences" : "levels")
                + (lags.length == 0 ? ", no lags" : ", lags " + lagList);
    }
}
