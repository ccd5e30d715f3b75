package org.trendwright.core.diagnostics;

/**
 * The roots of the secular equation f(mu) = sum_i w_i^2 / (q_i - mu) = 0 for poles
 * q_1 &lt; ... &lt; q_t: one root mu_j in each gap (q_j, q_{j+1}), stored as mu_j = q[origin_j] + tau_j
 * relative to the nearer pole so that mu_j - q_origin keeps full relative accuracy.
 *
 * <p>Iteration: at the current mu, f is split into psi (poles up to q_j) and phi (poles from
 * q_{j+1}); each half is modelled by a constant plus one pole term matching its value and
 * derivative, and the model's root is the next iterate (the "middle way" of R.-C. Li 1994, "Solving secular equations
 * stably and efficiently", LAPACK Working Note 89, as in LAPACK's dlaed4; Bunch, Nielsen &amp; Sorensen 1978, Numer. Math. 31, 31-48). A bracket kept by
 * the sign of f (f increases between poles) safeguards each step with bisection. The iteration
 * stops when |f| is within rounding of its terms, 8 ulps of sum |w_i^2 / (q_i - mu)|, or tau stops
 * changing; 3 to 5 evaluations of f per root are typical.
 *
 * <p>Immutable (the arrays are not exposed outside this package) and thread-safe.
 *
 * @param origin index of the pole each root is measured from
 * @param tau    offset of each root from its origin pole
 */
record SecularRoots(int[] origin, double[] tau) {

    private static final double EPS = Math.ulp(1.0);
    private static final int MAX_ITERATIONS = 200;

    int count() {
        return tau.length;
    }

    double value(int j, double[] q) {
        return q[origin[j]] + tau[j];
    }

    /** mu_j - y, accurate when y is the origin pole. */
    double minus(int j, double[] q, double y) {
        return tau[j] + (q[origin[j]] - y);
    }

    static SecularRoots solve(double[] q, double[] w) {
        int count = q.length - 1;
        int[] origin = new int[count];
        double[] tau = new double[count];
        double[] weight = new double[q.length];
        for (int i = 0; i < q.length; i++) {
            weight[i] = w[i] * w[i];
        }
        for (int j = 0; j < count; j++) {
            double half = (q[j + 1] - q[j]) / 2;
            double[] sums = sums(q, weight, j, j, half);
            // f(midpoint) >= 0: the root lies in the lower half, measure it from q_j; else from q_{j+1}.
            origin[j] = sums[0] + sums[2] >= 0 ? j : j + 1;
            tau[j] = root(q, weight, j, origin[j], sums);
        }
        return new SecularRoots(origin, tau);
    }

    /**
     * {psi, psi', phi, phi'} at mu = q_origin + tau: the sums of weight_i / (q_i - mu) and of
     * weight_i / (q_i - mu)^2 over i &lt;= j (psi) and i &gt; j (phi), with q_i - mu computed as
     * (q_i - q_origin) - tau.
     */
    private static double[] sums(double[] q, double[] weight, int j, int origin, double tau) {
        double pole = q[origin];
        double psi = 0;
        double dpsi = 0;
        double phi = 0;
        double dphi = 0;
        for (int i = 0; i <= j; i++) {
            double inverse = 1 / ((q[i] - pole) - tau);
            double term = weight[i] * inverse;
            psi += term;
            dpsi += term * inverse;
        }
        for (int i = j + 1; i < q.length; i++) {
            double inverse = 1 / ((q[i] - pole) - tau);
            double term = weight[i] * inverse;
            phi += term;
            dphi += term * inverse;
        }
        return new double[] {psi, dpsi, phi, dphi};
    }

    /**
     * tau with sum weight_i / ((q_i - q_origin) - tau) = 0 in gap j, by the safeguarded
     * two-pole model iteration of the class comment, starting from the midpoint of the gap
     * (whose sums are given).
     */
    private static double root(double[] q, double[] weight, int j, int origin, double[] midpoint) {
        double half = (q[j + 1] - q[j]) / 2;
        boolean fromLower = origin == j;
        double lo = fromLower ? 0 : -half;
        double hi = fromLower ? half : 0;
        double tau = fromLower ? half : -half;
        double[] s = midpoint;
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            double f = s[0] + s[2];
            if (Math.abs(f) <= 8 * EPS * (s[2] - s[0])) {
                return tau;
            }
            if (f < 0) {
                lo = tau;
            } else {
                hi = tau;
            }
            double lower = (q[j] - q[origin]) - tau;
            double upper = (q[j + 1] - q[origin]) - tau;
            double next = tau + modelStep(lower, upper, f, s[1], s[3]);
            if (!(next > lo && next < hi)) {
                next = lo + (hi - lo) / 2;
            }
            if (Math.abs(next - tau) <= 2 * EPS * Math.abs(next)) {
                return next;
            }
            tau = next;
            s = sums(q, weight, j, origin, tau);
        }
        return tau;
    }

    /**
     * The step eta to the root of a + b/(lower - eta) + c/(upper - eta) fitted to f, f' of the
     * two halves: (a) eta^2 - B eta + C = 0 with B = (lower + upper) f - lower upper (psi' + phi'),
     * C = lower upper f, a = f - lower psi' - upper phi'. The root that tends to C/B as a -&gt; 0.
     */
    private static double modelStep(double lower, double upper, double f, double dpsi, double dphi) {
        double a = f - lower * dpsi - upper * dphi;
        double b = (lower + upper) * f - lower * upper * (dpsi + dphi);
        double c = lower * upper * f;
        if (a == 0) {
            return c / b;
        }
        double root = Math.sqrt(Math.abs(b * b - 4 * a * c));
        return b <= 0 ? (b - root) / (2 * a) : 2 * c / (b + root);
    }
}
