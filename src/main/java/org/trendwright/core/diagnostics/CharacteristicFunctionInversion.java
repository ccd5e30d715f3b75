package org.trendwright.core.diagnostics;

/**
 * P(Q &lt; 0) for a quadratic form Q = sum_i c_i z_i^2 in independent standard normal z_i, by
 * numerical inversion of its characteristic function.
 *
 * <p><b>Formula</b> (Imhof 1961, "Computing the distribution of quadratic forms in normal
 * variables", Biometrika 48, 419-426; Gil-Pelaez 1951, Biometrika 38). With
 * phi(t) = E exp(itQ) = prod_i (1 - 2itc_i)^(-1/2),
 * <pre>
 *   P(Q &lt; 0) = 1/2 - (1/pi) int_0^inf Im phi(t) / t dt,
 *   Im phi(t) = prod_i (1 + 4t^2 c_i^2)^(-1/4) sin( (1/2) sum_i atan(2 t c_i) ).
 * </pre>
 *
 * <p><b>Truncation</b> (both schemes). |phi(t)|/t decreases, and log(1 + 4c^2t^2) is convex in
 * log t, so |phi(t)| &lt;= |phi(T)| (T/t)^(W(T)/2) for t &gt;= T with
 * W(T) = sum_i 4T^2c_i^2 / (1 + 4T^2c_i^2); hence (1/pi) int_T^inf |phi(t)|/t dt &lt;=
 * (2/pi) |phi(T)| / W(T), and the integration stops once this is at most
 * {@link #TRUNCATION_ERROR}. Near 0, |Im phi(t)| &lt;= t sum |c_i|, which bounds the part left out
 * below the first point of the log-scale scheme in the same way.
 *
 * <p><b>Many weights: trapezoidal sum of Davies</b> (1973, "Numerical inversion of a
 * characteristic function", Biometrika 60, 415-417; 1980, algorithm AS 155, Applied Statistics
 * 29, 323-333). The integral is replaced by the sum at t_k = (k + 1/2) Delta:
 * P~ = 1/2 - (1/pi) sum_k Im phi(t_k) / (k + 1/2). As (1/pi) sum_k sin((k + 1/2)a)/(k + 1/2) is the
 * square wave equal to sign(a)/2 for |a| &lt; 2 pi, the infinite sum is exact whenever
 * |Q| &lt; L = 2 pi / Delta, so its <b>discretisation (aliasing) error is at most P(|Q| &gt; L)</b>. L
 * is chosen so that the Chernoff bounds P(Q &gt; L) &lt;= exp(-sL) prod (1 - 2sc_i)^(-1/2) at
 * s = 1/(4 max c_i), and the mirror bound for -Q, are each at most {@link #ALIASING_ERROR}/2.
 * With many weights Q is nearly normal, phi decays like a Gaussian and a few dozen terms suffice;
 * with few weights phi decays only like t^(-m/2), and the number of terms would explode.
 *
 * <p><b>Few weights (at most {@link #LOG_SCALE_LIMIT}): trapezoidal rule in s = log t.</b>
 * P(Q &lt; 0) = 1/2 - (1/pi) int_{-inf}^{inf} Im phi(e^s) ds. The integrand is analytic in the strip
 * |Im s| &lt; pi/2 whatever the weights (phi's branch points are at t = +-i/(2c_i)), and it decays
 * exponentially at both ends, so the trapezoidal rule converges geometrically in 1/h (Trefethen
 * &amp; Weideman 2014, "The exponentially convergent trapezoidal rule", SIAM Review 56, 385-458).
 * The step is halved from 1/2 until two successive values agree to {@link #STEP_AGREEMENT}: an
 * a-posteriori estimate, not a bound. With few weights sin(...) changes sign at most m/2 times,
 * so a few hundred points suffice, also when the threshold lies next to an eigenvalue (a weight
 * near 0), where Pan's (1968) finite-range integral converges slowly.
 *
 * <p><b>Rounding.</b> phi is a product of m complex factors, each rounded once, so it carries a
 * relative error of about m ulps; with the bounds above the absolute error of the probability
 * is about 1e-12 at m = 5000 and smaller for fewer weights (a probability below that is not
 * resolved: the accuracy is absolute, not relative).
 *
 * <p>phi is evaluated without a transcendental function per factor: the factors 1 - 2itc_i are
 * multiplied as complex numbers, the exponent is rescaled to avoid overflow, and the argument is
 * unwrapped by counting crossings of the negative real axis (each factor turns the product by
 * less than pi/2, so a sign change of the imaginary part with a negative real part is such a
 * crossing).
 *
 * <p>Stateless and thread-safe.
 */
final class CharacteristicFunctionInversion {

    /** Bound on the discretisation (aliasing) error of the Davies sum. */
    static final double ALIASING_ERROR = 1e-14;
    /** Bound on the error from truncating the integral (both schemes). */
    static final double TRUNCATION_ERROR = 1e-14;
    /** Step halving on the log scale stops when two successive values differ by at most this. */
    static final double STEP_AGREEMENT = 1e-14;
    /**
     * Up to this many weights the log-scale rule is used. Beyond, the Davies sum needs fewer
     * points (its count falls as phi decays faster), while the log-scale rule would need more as
     * the phase (1/2) sum atan(2tc_i) winds faster.
     */
    static final int LOG_SCALE_LIMIT = 20;

    /** A safety stop for the Davies sum; for more than LOG_SCALE_LIMIT weights it ends after far fewer terms. */
    private static final int MAX_TERMS = 10_000_000;
    private static final double FIRST_STEP = 0.5;
    private static final int MAX_HALVINGS = 14;
    private static final double RESCALE_ABOVE = 0x1p500;
    private static final int RESCALE_EXPONENT = 500;

    private CharacteristicFunctionInversion() {
    }

    /** P(sum c_i z_i^2 &lt; 0) for non-zero weights of both signs. Absolute error about 1e-12. */
    static double probabilityNegative(double[] c) {
        double p = c.length <= LOG_SCALE_LIMIT ? logScaleTrapezoid(c) : daviesSum(c);
        return Math.min(1, Math.max(0, p));
    }

    /** The Davies sum with the step from {@link #aliasingPeriod} and the truncation bound as stop. */
    static double daviesSum(double[] c) {
        double delta = 2 * Math.PI / aliasingPeriod(c);
        double sum = 0;
        // W(T) <= m, so the truncation bound cannot hold before |phi| <= (pi/2) m ERROR: W is computed only then.
        double earlyCheck = TRUNCATION_ERROR * c.length * Math.PI / 2;
        for (int k = 0; k < MAX_TERMS; k++) {
            double t = (k + 0.5) * delta;
            double[] phi = modulusAndImaginaryPart(c, t);
            sum += phi[1] / (k + 0.5);
            if (phi[0] <= earlyCheck && truncationBound(c, t, phi[0]) <= TRUNCATION_ERROR) {
                break;
            }
        }
        return 0.5 - sum / Math.PI;
    }

    /**
     * L such that P(Q &gt; L) and P(Q &lt; -L) are each at most ALIASING_ERROR/2, by the Chernoff
     * bound at s = 1/(4 c_max): log P(Q &gt; L) &lt;= -L/(4 c_max) - (1/2) sum log(1 - c_i/(2 c_max)).
     */
    static double aliasingPeriod(double[] c) {
        double largest = 0;
        double smallest = 0;
        for (double ci : c) {
            largest = Math.max(largest, ci);
            smallest = Math.min(smallest, ci);
        }
        double logTarget = Math.log(2 / ALIASING_ERROR);
        double upper = 4 * largest * (logTarget + chernoffExponent(c, largest));
        double lower = -4 * smallest * (logTarget + chernoffExponent(c, smallest));
        return Math.max(upper, lower);
    }

    /** -(1/2) sum log(1 - c_i/(2e)), the log of E exp(sQ) at s = 1/(4e) (e = c_max, or c_min for -Q). */
    private static double chernoffExponent(double[] c, double extreme) {
        double sum = 0;
        for (double ci : c) {
            sum += Math.log1p(-ci / (2 * extreme));
        }
        return -0.5 * sum;
    }

    /**
     * The trapezoidal rule in s = log t on [s_lo, s_hi], with s_lo from |Im phi(t)| &lt;= t sum |c_i|
     * and s_hi from the truncation bound, halving the step until two values agree.
     */
    static double logScaleTrapezoid(double[] c) {
        double absoluteSum = 0;
        for (double ci : c) {
            absoluteSum += Math.abs(ci);
        }
        double low = Math.log(Math.PI * TRUNCATION_ERROR / absoluteSum);
        double step = FIRST_STEP;
        int intervals = (int) Math.ceil((upperLogLimit(c, low) - low) / step);
        double sum = imaginaryPartsOnGrid(c, low, step, intervals + 1);
        double previous = 0.5 - step * sum / Math.PI;
        for (int halving = 0; halving < MAX_HALVINGS; halving++) {
            sum += imaginaryPartsOnGrid(c, low + step / 2, step, intervals);
            step /= 2;
            intervals *= 2;
            double current = 0.5 - step * sum / Math.PI;
            if (Math.abs(current - previous) <= STEP_AGREEMENT) {
                return current;
            }
            previous = current;
        }
        return previous;
    }

    /** The first s = low + 1, low + 2, ... at which the truncation bound for t &gt;= e^s holds. */
    private static double upperLogLimit(double[] c, double low) {
        double high = low;
        while (truncationBound(c, Math.exp(high), modulusAndImaginaryPart(c, Math.exp(high))[0]) > TRUNCATION_ERROR) {
            high += 1;
        }
        return high;
    }

    /** sum_{k < points} Im phi(exp(first + k step)). */
    private static double imaginaryPartsOnGrid(double[] c, double first, double step, int points) {
        double sum = 0;
        for (int k = 0; k < points; k++) {
            sum += modulusAndImaginaryPart(c, Math.exp(first + k * step))[1];
        }
        return sum;
    }

    /** (2/pi) |phi(T)| / W(T): the bound on (1/pi) int_T^inf |phi(t)|/t dt of the class comment. */
    private static double truncationBound(double[] c, double t, double modulus) {
        double decay = 0;
        for (double ci : c) {
            double a = 4 * t * t * ci * ci;
            decay += a / (1 + a);
        }
        return 2 / Math.PI * modulus / decay;
    }

    /** {|phi(t)|, Im phi(t)} from the complex product prod (1 - 2itc_i), unwrapped as in the class comment. */
    static double[] modulusAndImaginaryPart(double[] c, double t) {
        double re = 1;
        double im = 0;
        int exponent = 0;
        int winding = 0;
        for (double ci : c) {
            double b = -2 * t * ci;
            double nextRe = re - im * b;
            double nextIm = im + re * b;
            if ((nextIm < 0) != (im < 0) && nextRe < 0) {
                winding += nextIm < 0 ? 1 : -1;
            }
            re = nextRe;
            im = nextIm;
            if (Math.abs(re) + Math.abs(im) > RESCALE_ABOVE) {
                re = Math.scalb(re, -RESCALE_EXPONENT);
                im = Math.scalb(im, -RESCALE_EXPONENT);
                exponent += RESCALE_EXPONENT;
            }
        }
        double argument = Math.atan2(im, re) + 2 * Math.PI * winding;
        double logModulus = 0.5 * Math.log(re * re + im * im) + exponent * Math.log(2);
        double modulus = Math.exp(-0.5 * logModulus);
        return new double[] {modulus, -modulus * Math.sin(0.5 * argument)};
    }
}
