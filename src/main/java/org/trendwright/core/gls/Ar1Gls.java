package org.trendwright.core.gls;

import java.util.function.Supplier;
import org.trendwright.core.InsufficientDataException;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.diagnostics.DurbinWatson;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * Iterated feasible GLS for a regression y = X b + u whose errors follow a stationary AR(1),
 * u_t = rho u_{t-1} + e_t with |rho| < 1 and e_t white noise.
 *
 * <p>Lagging the model once and subtracting rho times it removes the correlation:
 * y_t - rho y_{t-1} = (x_t - rho x_{t-1})'b + e_t. Since rho is unknown, iterate (Cochrane &amp;
 * Orcutt 1949, "Application of least squares regression to relationships containing
 * auto-correlated error terms", JASA 44):
 * <ol>
 *   <li>fit OLS and take its residuals u;</li>
 *   <li>estimate rho by regressing u_t on u_{t-1} without a constant ({@link RhoEstimate});</li>
 *   <li>quasi-difference: y*_t = y_t - rho y_{t-1}, x*_t = x_t - rho x_{t-1} for t = 2..n (the
 *       constant column becomes 1 - rho, so b stays on the original regressors' scale);
 *       Prais &amp; Winsten (1954, Cowles Commission Discussion Paper 383) also keep t = 1 as
 *       y*_1 = sqrt(1 - rho^2) y_1, x*_1 = sqrt(1 - rho^2) x_1;</li>
 *   <li>fit OLS to the transformed data, recompute u = y - X b on the original data, and go back
 *       to step 2 until rho changes by less than the tolerance or the iteration cap is reached.</li>
 * </ol>
 *
 * <p>After every second such step the next rho is extrapolated from the last three by Aitken's
 * delta-squared formula (Steffensen's method, see {@link #aitken}); convergence is still judged by a
 * plain step, |rho_next - rho| &lt; tolerance, so the end point is the same fixed point.
 * The reported rho is the one the final regression used, with its standard error against that
 * regression's predecessor's residuals ({@link RhoEstimate}).
 *
 * <p>The iteration is a fixed-point search; it usually converges in a handful of steps, but it can
 * stall or (rarely) settle on a local solution, so the result reports honestly whether it
 * converged.
 *
 * <p>Rows must be consecutive periods in time order with no gaps; the caller guarantees that.
 * When the transformed regression fits exactly, the standard errors are 0 and the Durbin-Watson
 * statistic is NaN (0/0); every other failure is an exception listed on {@link #fit}.
 * Stateless and thread-safe.
 */
public final class Ar1Gls {

    /** Stop when successive rho estimates differ by less than this. */
    public static final double DEFAULT_TOLERANCE = 1e-8;
    /** The most transformed regressions fitted before giving up on convergence. */
    public static final int DEFAULT_MAX_ITERATIONS = 100;
    /** Residuals below this fraction of the data's size are read as an exact fit. */
    private static final double EXACT_FIT = 1e-12;

    private Ar1Gls() {
    }

    /** Iterated Cochrane-Orcutt with the default tolerance and iteration cap. */
    public static Ar1GlsFit cochraneOrcutt(Design design, double[] y) {
        return fit(design, y, Ar1Method.COCHRANE_ORCUTT, DEFAULT_TOLERANCE, DEFAULT_MAX_ITERATIONS);
    }

    /** Iterated Prais-Winsten with the default tolerance and iteration cap. */
    public static Ar1GlsFit praisWinsten(Design design, double[] y) {
        return fit(design, y, Ar1Method.PRAIS_WINSTEN, DEFAULT_TOLERANCE, DEFAULT_MAX_ITERATIONS);
    }

    /**
     * Fits y = X b + u with AR(1) errors by the iteration described in the class comment.
     *
     * @throws InsufficientDataException     when n &lt; k + 2 or n &lt; 3 (after the first row is lost
     *                                       to the quasi-difference, a transformed regression and the
     *                                       rho regression each need a residual degree of freedom)
     * @throws InvalidSpecificationException when a rho estimate is not inside (-1, 1) or is
     *                                       undefined because the regression fits exactly; when
     *                                       the tolerance is not positive or the cap is below 1;
     *                                       when y has the wrong length or a non-finite value
     * @throws org.trendwright.core.RankDeficientDesignException when the (transformed) regressors
     *                                       are linearly dependent
     */
    public static Ar1GlsFit fit(Design design, double[] y, Ar1Method method, double tolerance, int maxIterations) {
        Ar1GlsEstimate estimate = estimate(design, y, method, tolerance, maxIterations);
        double rho = estimate.rho().value();
        OlsFit transformed = LeastSquares.fit(transform(design, rho, method), transform(y, rho, method));
        return result(estimate, transformed, design);
    }

    /**
     * The iteration of {@link #fit} without the inference of its final transformed regression, for
     * callers that need point forecasts only. The steps that only steer rho towards its fixed point
     * solve the transformed regression by its normal equations, from moments summed once
     * ({@link QuasiDifferencedNormalEquations}: no transformed design is built, and a design that is
     * not clearly well conditioned is left to QR); the step that ends the iteration, converged or at
     * the cap, is always solved by {@link LeastSquares#estimates}, and convergence is judged on that
     * step. Should it disagree with the quick steps (rho moving by the tolerance or more), the
     * iteration goes on by QR alone. So the returned b and residuals are those of the QR route at the
     * returned rho, which {@link #fit} then refits with full inference; the quick steps can move rho
     * and the iteration count only as far as rounding can (about u cond(X*)^2 in each b).
     *
     * @throws InsufficientDataException     as {@link #fit}
     * @throws InvalidSpecificationException as {@link #fit}
     * @throws org.trendwright.core.RankDeficientDesignException as {@link #fit}
     */
    public static Ar1GlsEstimate estimate(Design design, double[] y, Ar1Method method, double tolerance,
                                          int maxIterations) {
        return iterate(design, y, () -> QuasiDifferencedNormalEquations.of(design, y), method, tolerance,
                maxIterations);
    }

    /**
     * As {@link #estimate(Design, double[], Ar1Method, double, int)} with the moments of these rows
     * already summed (one of {@link QuasiDifferencedNormalEquations#ofPrefixes}), so that the fits to
     * the prefixes of one design share one pass; the result is bit for bit the other method's.
     *
     * @throws IllegalArgumentException when the moments were summed over another number of rows or
     *                                  regressors
     */
    public static Ar1GlsEstimate estimate(Design design, double[] y, QuasiDifferencedNormalEquations moments,
                                          Ar1Method method, double tolerance, int maxIterations) {
        if (moments.rows() != design.rows() || moments.width() != design.width()) {
            throw new IllegalArgumentException("The moments cover " + moments.rows() + " rows of " + moments.width()
                    + " regressors, the design " + design.rows() + " of " + design.width() + ".");
        }
        return iterate(design, y, () -> moments, method, tolerance, maxIterations);
    }

    private static Ar1GlsEstimate iterate(Design design, double[] y, Supplier<QuasiDifferencedNormalEquations> moments,
                                          Ar1Method method, double tolerance, int maxIterations) {
        checkOptions(tolerance, maxIterations);
        checkSize(design, method);
        LeastSquares.Estimates ols = LeastSquares.estimates(design, y);
        checkNoise(ols, y);
        QuasiDifferencedNormalEquations equations = moments.get();
        RhoEstimate rho = stationary(RhoEstimate.fromResiduals(ols.residuals()), 0);
        double anchor = Double.NaN;
        boolean steering = true;
        for (int iteration = 1; ; iteration++) {
            Step step = steering ? quickStep(equations, design, y, rho.value(), method) : null;
            if (step == null || Math.abs(step.next().value() - rho.value()) < tolerance || iteration == maxIterations) {
                LeastSquares.Estimates transformed = LeastSquares.estimates(transform(design, rho.value(), method),
                        transform(y, rho.value(), method));
                double[] b = transformed.coefficients();
                step = Step.from(design, y, b);
                boolean converged = Math.abs(step.next().value() - rho.value()) < tolerance;
                if (converged || iteration == maxIterations) {
                    return new Ar1GlsEstimate(method, rho, iteration, converged, b, step.structural(),
                            transformed.residuals());
                }
                steering = false;
            }
            double extrapolated = aitken(anchor, rho.value(), stationary(step.next(), iteration).value());
            if (Double.isNaN(extrapolated)) {
                anchor = rho.value();
                rho = step.next();
            } else {
                anchor = Double.NaN;
                rho = RhoEstimate.withValue(extrapolated, step.structural());
            }
        }
    }

    /**
     * A normal-equations step at {@code rho}, or null where the normal equations decline or the next
     * rho is undefined or outside (-1, 1): the QR step then decides, so that only it ever refuses a
     * series.
     */
    private static Step quickStep(QuasiDifferencedNormalEquations equations, Design design, double[] y, double rho,
                                  Ar1Method method) {
        return equations.coefficients(rho, method)
                .map(b -> Step.from(design, y, b))
                .filter(step -> Math.abs(step.next().value()) < 1)
                .orElse(null);
    }

    /** One step of the iteration: the structural residuals y - X b of the step's b, and the next rho from them. */
    private record Step(double[] structural, RhoEstimate next) {

        static Step from(Design design, double[] y, double[] b) {
            double[] structural = structuralResiduals(design, y, b);
            return new Step(structural, RhoEstimate.fromResiduals(structural));
        }
    }

    /**
     * Aitken's delta-squared extrapolation of the fixed point from three successive iterates
     * x0, x1 = g(x0), x2 = g(x1): x0 - (x1 - x0)^2 / (x2 - 2 x1 + x0) (Aitken 1926, "On Bernoulli's
     * numerical solution of algebraic equations", Proc. R. Soc. Edinburgh 46, 289-305). Taking it
     * after every second plain step is Steffensen's method (Steffensen 1933, "Remarks on
     * iteration", Skand. Aktuarietidskr. 16, 64-72), which converges quadratically near a fixed
     * point where the plain iteration converges only linearly; on quarterly random walks it halves
     * the regressions needed. NaN when there is no x0 yet (x0 is NaN), when the denominator is 0, or
     * when the extrapolation leaves (-1, 1); the caller then takes the plain step x2.
     */
    static double aitken(double x0, double x1, double x2) {
        double denominator = x2 - 2 * x1 + x0;
        double extrapolated = x0 - (x1 - x0) * (x1 - x0) / denominator;
        return Math.abs(extrapolated) < 1 ? extrapolated : Double.NaN;
    }

    private static void checkOptions(double tolerance, int maxIterations) {
        if (!(tolerance > 0) || maxIterations < 1) {
            throw new InvalidSpecificationException("The GLS iteration needs a positive tolerance and at least one"
                    + " iteration, got tolerance " + tolerance + " and cap " + maxIterations + "; the defaults are "
                    + DEFAULT_TOLERANCE + " and " + DEFAULT_MAX_ITERATIONS + ".");
        }
    }

    private static void checkSize(Design design, Ar1Method method) {
        int needed = Math.max(3, design.width() + 2);
        if (design.rows() < needed) {
            throw InsufficientDataException.forModel(method.label() + " GLS on " + design.width() + " regressors",
                    needed, design.rows());
        }
    }

    /**
     * Refuses a regression that fits exactly: its residuals are rounding noise (RSS at most
     * EXACT_FIT^2 times sum y^2, i.e. residuals about 1e-12 of the data), whose correlation means
     * nothing.
     */
    private static void checkNoise(LeastSquares.Estimates ols, double[] y) {
        double squares = 0;
        for (double v : y) {
            squares += v * v;
        }
        if (ols.residualSumOfSquares() <= EXACT_FIT * EXACT_FIT * squares) {
            throw new InvalidSpecificationException("The regression fits the data exactly (the residuals are"
                    + " rounding noise), so there is no error autocorrelation to estimate; use the OLS fit.");
        }
    }

    /** Refuses a rho that is undefined or outside (-1, 1); {@code step} 0 means from the OLS residuals. */
    private static RhoEstimate stationary(RhoEstimate rho, int step) {
        String source = step == 0 ? "the OLS residuals" : "the residuals of GLS iteration " + step;
        if (Double.isNaN(rho.value())) {
            throw new InvalidSpecificationException("The error autocorrelation cannot be estimated from " + source
                    + ": all but the last residual are 0, so there is no error left to model; use OLS.");
        }
        if (Math.abs(rho.value()) >= 1) {
            throw new InvalidSpecificationException("The error autocorrelation estimated from " + source + " is "
                    + rho.value() + ", not inside (-1, 1): the errors look non-stationary (a random walk or"
                    + " worse), and quasi-differencing cannot fix that; model the period-to-period differences"
                    + " of the series instead.");
        }
        return rho;
    }

    /** The quasi-differenced design; no longer "with intercept", since the constant becomes 1 - rho. */
    static Design transform(Design design, double rho, Ar1Method method) {
        if (method == Ar1Method.PRAIS_WINSTEN) {
            double firstWeight = Math.sqrt(1 - rho * rho);
            return Design.generate(design.rows(), design.names(), false, (j, values) -> {
                values[0] = firstWeight * design.get(0, j);
                for (int i = 1; i < values.length; i++) {
                    values[i] = design.get(i, j) - rho * design.get(i - 1, j);
                }
            });
        }
        return Design.generate(design.rows() - 1, design.names(), false, (j, values) -> {
            for (int i = 0; i < values.length; i++) {
                values[i] = design.get(i + 1, j) - rho * design.get(i, j);
            }
        });
    }

    /** v*_t = v_t - rho v_{t-1}, t = 2..n, preceded for Prais-Winsten by v*_1 = sqrt(1 - rho^2) v_1. */
    static double[] transform(double[] v, double rho, Ar1Method method) {
        int offset = method == Ar1Method.PRAIS_WINSTEN ? 1 : 0;
        double[] out = new double[method.transformedRows(v.length)];
        if (offset == 1) {
            out[0] = Math.sqrt(1 - rho * rho) * v[0];
        }
        for (int t = 1; t < v.length; t++) {
            out[t - 1 + offset] = v[t] - rho * v[t - 1];
        }
        return out;
    }

    private static double[] structuralResiduals(Design design, double[] y, double[] b) {
        double[] u = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            double fitted = 0;
            for (int j = 0; j < b.length; j++) {
                fitted = Math.fma(design.get(i, j), b[j], fitted);
            }
            u[i] = y[i] - fitted;
        }
        return u;
    }

    private static Ar1GlsFit result(Ar1GlsEstimate estimate, OlsFit transformed, Design design) {
        double[][] covariance = transformed.xtxInverse();
        double variance = transformed.residualVariance();
        for (double[] row : covariance) {
            for (int j = 0; j < row.length; j++) {
                row[j] *= variance;
            }
        }
        double[] last = new double[design.width()];
        for (int j = 0; j < last.length; j++) {
            last[j] = design.get(design.rows() - 1, j);
        }
        return new Ar1GlsFit(estimate.method(), estimate.rho(), estimate.iterations(), estimate.converged(),
                transformed.coefficients(), covariance, transformed.standardErrorOfEstimate(),
                transformed.residualDegreesOfFreedom(), DurbinWatson.statistic(transformed.residuals()),
                estimate.structuralResiduals(), transformed.residuals(), last);
    }
}
