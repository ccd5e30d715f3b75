package org.trendwright.core.diagnostics;

import java.util.Arrays;
import org.trendwright.core.Matrices;
import org.trendwright.core.RankDeficientDesignException;

/**
 * The eigenvalues of a diagonal matrix D = diag(d_1 &lt;= ... &lt;= d_p) restricted to the orthogonal
 * complement of span(u_1..u_r) (orthonormal columns): the p - r non-trivial eigenvalues of
 * P D P, P = I - U U'. Cost O(p^2 r) plus O(p^2) per root-finding sweep; no dense p x p
 * decomposition.
 *
 * <p><b>Method.</b> The directions are removed one at a time. Restricting a diagonal matrix to
 * the complement of one unit vector z gives, for every eigenvalue mu that is not a pole,
 * z'(D - mu I)^(-1) z = 0, i.e. the secular equation
 * <pre>
 *   f(mu) = sum_i z_i^2 / (d_i - mu) = 0,
 * </pre>
 * (from (D - mu) v = c z with z'v = 0). f increases between consecutive poles, so each interval
 * (d_i, d_{i+1}) holds exactly one root, and the roots interlace the poles (Cauchy interlacing).
 * Poles whose z_i is negligible, or which nearly coincide with the next pole (after a Givens
 * rotation that moves the weight onto one of them), are eigenvalues as they stand ("deflation",
 * as in Bunch, Nielsen &amp; Sorensen 1978, "Rank-one modification of the symmetric eigenproblem",
 * Numer. Math. 31, 31-48; the dropped terms move an eigenvalue by at most 8 ulps of the largest
 * pole). The next direction is first expressed in the eigenbasis just found.
 *
 * <p><b>Root finder</b> ({@link SecularRoots}). Each root is found relative to its nearer pole
 * (origin shift: mu = d_o + tau, with d_i - mu computed as (d_i - d_o) - tau), so a root that lies
 * within rounding of a pole still has its distance to that pole to full relative accuracy; a
 * safeguarded two-pole model iteration converges in 3 to 5 evaluations of f.
 *
 * <p><b>Eigenvectors.</b> They are needed only to carry the remaining directions into the new
 * basis. As in Gu &amp; Eisenstat (1994, SIAM J. Matrix Anal. Appl. 15, 1266-1276) the weights
 * are first recomputed from the computed roots by Loewner's formula
 * z_i^2 = prod_j (mu_j - d_i) / prod_{l != i} (d_l - d_i), so that the vectors
 * v_j = (z_i / (d_i - mu_j))_i are orthogonal to working accuracy even when roots crowd a pole.
 *
 * <p>Stateless and thread-safe.
 */
final class SecularEigenvalues {

    private static final double EPS = Math.ulp(1.0);
    /** Deflation threshold: relative size of a weight, or of a gap between poles. */
    private static final double DEFLATION = 8 * EPS;

    private SecularEigenvalues() {
    }

    /**
     * The p - r eigenvalues, ascending, of diag(poles) restricted to the complement of the given
     * orthonormal columns (each of length p).
     *
     * @throws RankDeficientDesignException when a column is numerically zero
     */
    static double[] restricted(double[] poles, double[][] columns) {
        double[] current = poles.clone();
        double[][] rest = new double[columns.length][];
        for (int c = 0; c < columns.length; c++) {
            rest[c] = columns[c].clone();
        }
        while (rest.length > 0) {
            Stage next = removeDirection(current, rest[0], Arrays.copyOfRange(rest, 1, rest.length));
            current = next.poles;
            rest = next.rest;
        }
        return current;
    }

    /** The spectrum after one direction is removed, and the remaining directions in its eigenbasis. */
    private record Stage(double[] poles, double[][] rest) {
    }

    private static Stage removeDirection(double[] poles, double[] direction, double[][] rest) {
        double[] z = unit(direction);
        boolean[] kept = new boolean[z.length];
        for (int i = 0; i < z.length; i++) {
            kept[i] = Math.abs(z[i]) > DEFLATION;
        }
        mergeClosePoles(poles, z, rest, kept);
        int[] index = indicesOf(kept);
        double[] q = new double[index.length];
        double[] w = new double[index.length];
        for (int a = 0; a < index.length; a++) {
            q[a] = poles[index[a]];
            w[a] = z[index[a]];
        }
        SecularRoots roots = SecularRoots.solve(q, w);
        double[][] keptRest = restricted(rest, index);
        double[][] rootCoordinates = hasWeight(keptRest, rest)
                ? coordinatesOnRoots(q, roots, loewnerWeights(q, w, roots), keptRest)
                : Matrices.zeros(rest.length, roots.count());
        return merge(poles, kept, roots, q, rest, rootCoordinates);
    }

    private static double[] unit(double[] v) {
        double scale = 0;
        for (double x : v) {
            scale = Math.max(scale, Math.abs(x));
        }
        double sum = 0;
        for (double x : v) {
            sum += (x / scale) * (x / scale);
        }
        double norm = scale * Math.sqrt(sum);
        if (!(norm > 0)) {
            throw new RankDeficientDesignException("A regressor is numerically a combination of the others, so the"
                    + " Durbin-Watson null distribution is not defined; drop the redundant regressor.");
        }
        double[] u = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            u[i] = v[i] / norm;
        }
        return u;
    }

    /**
     * Two kept poles closer than DEFLATION times the largest pole act as one: a Givens rotation
     * moves the weight of the lower onto the upper, and the lower is deflated.
     */
    private static void mergeClosePoles(double[] poles, double[] z, double[][] rest, boolean[] kept) {
        double gapTolerance = DEFLATION * Math.max(Math.abs(poles[0]), Math.abs(poles[poles.length - 1]));
        int previous = -1;
        for (int i = 0; i < poles.length; i++) {
            if (!kept[i]) {
                continue;
            }
            if (previous >= 0 && poles[i] - poles[previous] <= gapTolerance) {
                double r = Math.hypot(z[previous], z[i]);
                double cos = z[i] / r;
                double sin = z[previous] / r;
                z[i] = r;
                z[previous] = 0;
                kept[previous] = false;
                for (double[] y : rest) {
                    double low = y[previous];
                    y[previous] = cos * low - sin * y[i];
                    y[i] = sin * low + cos * y[i];
                }
            }
            previous = i;
        }
    }

    private static int[] indicesOf(boolean[] flags) {
        int count = 0;
        for (boolean f : flags) {
            count += f ? 1 : 0;
        }
        if (count == 0) {
            throw new RankDeficientDesignException("A regressor is numerically a combination of the others, so the"
                    + " Durbin-Watson null distribution is not defined; drop the redundant regressor.");
        }
        int[] index = new int[count];
        int next = 0;
        for (int i = 0; i < flags.length; i++) {
            if (flags[i]) {
                index[next++] = i;
            }
        }
        return index;
    }

    private static double[][] restricted(double[][] rest, int[] index) {
        double[][] out = Matrices.zeros(rest.length, index.length);
        for (int c = 0; c < rest.length; c++) {
            for (int a = 0; a < index.length; a++) {
                out[c][a] = rest[c][index[a]];
            }
        }
        return out;
    }

    /**
     * False when every remaining direction has (relative) length at most DEFLATION on the kept
     * poles: its coordinates on the new eigenvectors are then at most that, and would be deflated
     * in the next stage anyway, so they are set to 0 without computing the eigenvectors.
     */
    private static boolean hasWeight(double[][] keptRest, double[][] rest) {
        for (int c = 0; c < rest.length; c++) {
            if (norm(keptRest[c]) > DEFLATION * norm(rest[c])) {
                return true;
            }
        }
        return false;
    }

    private static double norm(double[] v) {
        double sum = 0;
        for (double x : v) {
            sum += x * x;
        }
        return Math.sqrt(sum);
    }

    /**
     * Loewner's formula with each pole paired with a neighbouring root, so every factor lies in
     * (0, 1]: z_i^2 = prod_{l &lt; i} (mu_l - q_i)/(q_l - q_i) prod_{l &gt; i} (mu_{l-1} - q_i)/(q_l - q_i).
     * The sign of z_i is kept.
     */
    private static double[] loewnerWeights(double[] q, double[] w, SecularRoots roots) {
        double[] weights = new double[q.length];
        for (int i = 0; i < q.length; i++) {
            double product = 1;
            for (int l = 0; l < i; l++) {
                product *= roots.minus(l, q, q[i]) / (q[l] - q[i]);
            }
            for (int l = i + 1; l < q.length; l++) {
                product *= roots.minus(l - 1, q, q[i]) / (q[l] - q[i]);
            }
            weights[i] = Math.copySign(Math.sqrt(product), w[i]);
        }
        return weights;
    }

    /** Coordinates of each remaining direction on the unit eigenvectors v_j ~ (z_i / (q_i - mu_j))_i. */
    private static double[][] coordinatesOnRoots(double[] q, SecularRoots roots, double[] weights, double[][] rest) {
        int count = roots.count();
        double[][] coordinates = Matrices.zeros(rest.length, count);
        double[] dots = new double[rest.length];
        for (int j = 0; j < count; j++) {
            double normSquared = 0;
            Arrays.fill(dots, 0);
            for (int i = 0; i < q.length; i++) {
                double v = weights[i] / -roots.minus(j, q, q[i]);
                normSquared += v * v;
                for (int c = 0; c < rest.length; c++) {
                    dots[c] += v * rest[c][i];
                }
            }
            double norm = Math.sqrt(normSquared);
            for (int c = 0; c < rest.length; c++) {
                coordinates[c][j] = dots[c] / norm;
            }
        }
        return coordinates;
    }

    /** Deflated poles and roots merged in ascending order, with the remaining directions alongside. */
    private static Stage merge(double[] poles, boolean[] kept, SecularRoots roots, double[] q, double[][] rest,
                               double[][] rootCoordinates) {
        int size = poles.length - 1;
        double[] merged = new double[size];
        double[][] mergedRest = Matrices.zeros(rest.length, size);
        int pole = nextDeflated(kept, 0);
        int root = 0;
        for (int out = 0; out < size; out++) {
            boolean takePole = root >= roots.count()
                    || (pole < poles.length && poles[pole] <= roots.value(root, q));
            if (takePole) {
                merged[out] = poles[pole];
                for (int c = 0; c < rest.length; c++) {
                    mergedRest[c][out] = rest[c][pole];
                }
                pole = nextDeflated(kept, pole + 1);
            } else {
                merged[out] = roots.value(root, q);
                for (int c = 0; c < rest.length; c++) {
                    mergedRest[c][out] = rootCoordinates[c][root];
                }
                root++;
            }
        }
        return new Stage(merged, mergedRest);
    }

    private static int nextDeflated(boolean[] kept, int from) {
        int i = from;
        while (i < kept.length && kept[i]) {
            i++;
        }
        return i;
    }
}
