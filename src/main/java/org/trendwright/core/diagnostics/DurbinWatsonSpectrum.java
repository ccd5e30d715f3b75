package org.trendwright.core.diagnostics;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;
import org.trendwright.core.Matrices;
import org.trendwright.core.RankDeficientDesignException;
import org.trendwright.core.regression.Design;

/**
 * The eigenvalues nu_1..nu_{n-k} of M A M on the residual space (M = I - X(X'X)^-1 X', A the
 * Durbin-Watson matrix), which fix the null distribution of d for a design X: under iid normal
 * errors d = sum nu_i z_i^2 / sum z_i^2 (Durbin &amp; Watson 1950, Biometrika 37, 409-428).
 *
 * <p><b>Method.</b> A = tridiag(-1; 1, 2, ..., 2, 1; -1) has the eigenvalues
 * lambda_j = 2 (1 - cos(pi j / n)) = 4 sin^2(pi j / (2n)), j = 0..n-1, with the DCT-II vectors
 * v_j(t) = s_j cos(pi j (2t + 1) / (2n)), t = 0..n-1 (s_0 = sqrt(1/n), s_j = sqrt(2/n)) as
 * eigenvectors. In that basis A is diagonal, so the residual space is the complement of the
 * rotated columns V'X, and the nu_i are the eigenvalues of diag(lambda) restricted to that
 * complement, found by {@link SecularEigenvalues}. A constant column is A's eigenvector for
 * lambda_0 = 0: its rotation is exactly sqrt(n) c e_0, so removing it just drops lambda_0.
 *
 * <p>Cost: the rotation is O(n^2 k) with a table of cos(pi m / (2n)), m = 0..4n-1, indexed by
 * j (2t + 1) mod 4n, so each entry is one table look-up and one multiply-add; the secular
 * stages are O(n^2) per regressor. A dense eigen-decomposition would be O(n^3).
 *
 * <p>{@link #forDesign} remembers the spectra of recently used designs (see {@link #REMEMBERED_DESIGNS});
 * {@link #of} always computes. Thread-safe.
 *
 * @param eigenvalues   nu_1 &lt;= ... &lt;= nu_{n-k}
 * @param spansConstant true when the constant vector lies in the column space of X (an explicit
 *                      constant column, or regressors that add up to one, such as a full set of
 *                      seasonal dummies); the dL/dU bounds need this
 */
record DurbinWatsonSpectrum(double[] eigenvalues, boolean spansConstant) {

    /** Squared length of the constant's projection onto span(X) above which the constant counts as spanned. */
    private static final double SPANNED = 1 - 1e-10;

    DurbinWatsonSpectrum {
        eigenvalues = eigenvalues.clone();
    }

    @Override
    public double[] eigenvalues() {
        return eigenvalues.clone();
    }

    /**
     * The spectrum is a pure function of the design (the regressors, never the response), and a
     * service meets the same few designs again and again: every 120-quarter linear trend has the
     * same columns, and the linear and log-linear trend of one series share theirs. So the
     * {@value #REMEMBERED_DESIGNS} most recently used designs with at most
     * {@value #REMEMBERED_VALUES} remembered numbers in all (the key's n k plus the n - k
     * eigenvalues; about 8 MB) are kept. Keyed by the design itself (value equality over every
     * column and name), so a hash collision cannot return another design's spectrum. Synchronized;
     * a miss computes outside the lock, and two threads may both compute one design once, with
     * identical results.
     */
    static final int REMEMBERED_DESIGNS = 64;
    static final long REMEMBERED_VALUES = 1_000_000;

    private static final Map<Design, DurbinWatsonSpectrum> REMEMBERED = new LinkedHashMap<>(16, 0.75f, true);
    private static long rememberedValues;

    /** {@link #of}, remembered per design as described at {@link #REMEMBERED_DESIGNS}. */
    static DurbinWatsonSpectrum forDesign(Design design) {
        synchronized (REMEMBERED) {
            DurbinWatsonSpectrum remembered = REMEMBERED.get(design);
            if (remembered != null) {
                return remembered;
            }
        }
        DurbinWatsonSpectrum computed = of(design);
        remember(design, computed);
        return computed;
    }

    private static void remember(Design design, DurbinWatsonSpectrum spectrum) {
        long size = valuesHeld(design, spectrum);
        if (size > REMEMBERED_VALUES) {
            return;
        }
        synchronized (REMEMBERED) {
            DurbinWatsonSpectrum previous = REMEMBERED.put(design, spectrum);
            rememberedValues += size - (previous == null ? 0 : size);
            var eldest = REMEMBERED.entrySet().iterator();
            while (REMEMBERED.size() > REMEMBERED_DESIGNS || rememberedValues > REMEMBERED_VALUES) {
                Map.Entry<Design, DurbinWatsonSpectrum> entry = eldest.next();
                rememberedValues -= valuesHeld(entry.getKey(), entry.getValue());
                eldest.remove();
            }
        }
    }

    private static long valuesHeld(Design design, DurbinWatsonSpectrum spectrum) {
        return (long) design.rows() * design.width() + spectrum.eigenvalues.length;
    }

    /** How many designs are remembered now (for tests of the bound). */
    static int rememberedDesigns() {
        synchronized (REMEMBERED) {
            return REMEMBERED.size();
        }
    }

    /** The spectrum for a full-rank design with n &gt; k, computed afresh. */
    static DurbinWatsonSpectrum of(Design design) {
        int n = design.rows();
        int constant = constantColumn(design);
        double[][] rotated = orthonormal(rotatedColumns(design, constant), namesInOrder(design, constant));
        double constantShare = 0;
        for (double[] column : rotated) {
            constantShare += column[0] * column[0];
        }
        return new DurbinWatsonSpectrum(SecularEigenvalues.restricted(eigenvaluesOfA(n), rotated),
                constantShare >= SPANNED);
    }

    /** lambda_j = 4 sin^2(pi j / (2n)), j = 0..n-1, ascending; the product form avoids cancellation in 1 - cos. */
    static double[] eigenvaluesOfA(int n) {
        double[] lambda = new double[n];
        for (int j = 0; j < n; j++) {
            double s = Math.sin(Math.PI * j / (2.0 * n));
            lambda[j] = 4 * s * s;
        }
        return lambda;
    }

    /**
     * V'x for every column, the constant column (index {@code constant}, or -1) placed first and
     * rotated exactly; the other columns are scaled to a largest entry of 1 first (the span is
     * unchanged, and squares cannot overflow).
     */
    private static double[][] rotatedColumns(Design design, int constant) {
        int n = design.rows();
        int k = design.width();
        double[][] columns = new double[k][];
        double[][] others = new double[k - (constant >= 0 ? 1 : 0)][];
        int next = 0;
        for (int c = 0; c < k; c++) {
            if (c != constant) {
                others[next++] = scaledToUnitMaximum(design.column(c));
            }
        }
        double[][] rotatedOthers = cosineTransform(others, n);
        int offset = 0;
        if (constant >= 0) {
            columns[0] = new double[n];
            columns[0][0] = Math.sqrt(n) * design.get(0, constant);
            offset = 1;
        }
        System.arraycopy(rotatedOthers, 0, columns, offset, rotatedOthers.length);
        return columns;
    }

    private static double[] scaledToUnitMaximum(double[] x) {
        double largest = 0;
        for (double v : x) {
            largest = Math.max(largest, Math.abs(v));
        }
        for (int i = 0; i < x.length && largest > 0; i++) {
            x[i] /= largest;
        }
        return x;
    }

    /** The regressor names in the order {@link #rotatedColumns} uses. */
    private static String[] namesInOrder(Design design, int constant) {
        String[] names = new String[design.width()];
        int next = 0;
        if (constant >= 0) {
            names[next++] = design.names().get(constant);
        }
        for (int c = 0; c < design.width(); c++) {
            if (c != constant) {
                names[next++] = design.names().get(c);
            }
        }
        return names;
    }

    /** Index of a column whose entries are all equal and non-zero, or -1. */
    private static int constantColumn(Design design) {
        for (int c = 0; c < design.width(); c++) {
            double first = design.get(0, c);
            boolean constant = first != 0;
            for (int i = 1; i < design.rows() && constant; i++) {
                constant = design.get(i, c) == first;
            }
            if (constant) {
                return c;
            }
        }
        return -1;
    }

    /**
     * w_j = s_j sum_t x_t cos(pi j (2t + 1) / (2n)) for each column x, by table look-up. The
     * cosine at t and at n-1-t differ by the factor (-1)^j, so the sum runs over the first half
     * of t on x_t + x_{n-1-t} (even j) or x_t - x_{n-1-t} (odd j), halving the work.
     */
    static double[][] cosineTransform(double[][] columns, int n) {
        double[] cosine = cosineTable(n);
        int k = columns.length;
        int half = (n + 1) / 2;
        double[][][] folded = folded(columns, n, half);
        double[][] out = Matrices.zeros(k, n);
        double[] sums = new double[k];
        for (int j = 0; j < n; j++) {
            double[][] parts = folded[j % 2];
            int step = 2 * j;
            int m = j;
            Arrays.fill(sums, 0);
            for (int t = 0; t < half; t++) {
                double cos = cosine[m];
                for (int c = 0; c < k; c++) {
                    sums[c] += parts[c][t] * cos;
                }
                m += step;
                if (m >= 4 * n) {
                    m -= 4 * n;
                }
            }
            double scale = Math.sqrt((j == 0 ? 1.0 : 2.0) / n);
            for (int c = 0; c < k; c++) {
                out[c][j] = scale * sums[c];
            }
        }
        return out;
    }

    /** cos(pi m / (2n)) for m = 0..4n-1: one full period, so j (2t + 1) mod 4n indexes every cosine needed. */
    private static double[] cosineTable(int n) {
        double[] cosine = new double[4 * n];
        for (int m = 0; m < cosine.length; m++) {
            cosine[m] = Math.cos(Math.PI * m / (2.0 * n));
        }
        return cosine;
    }

    /**
     * {even, odd} parts over t &lt; half: x_t + x_{n-1-t} and x_t - x_{n-1-t}; for odd n the middle
     * element appears once, with cos(pi j / 2) = 0 for odd j taking care of the odd part.
     */
    private static double[][][] folded(double[][] columns, int n, int half) {
        double[][][] parts = {Matrices.zeros(columns.length, half), Matrices.zeros(columns.length, half)};
        for (int c = 0; c < columns.length; c++) {
            for (int t = 0; t < half; t++) {
                int mirror = n - 1 - t;
                double x = columns[c][t];
                double y = mirror == t ? 0 : columns[c][mirror];
                parts[0][c][t] = x + y;
                parts[1][c][t] = x - y;
            }
        }
        return parts;
    }

    /**
     * Orthonormal columns spanning the same space, by classical Gram-Schmidt applied twice
     * ("twice is enough": Giraud, Langou &amp; Rozloznik 2005, Numer. Math. 101, 87-100).
     */
    private static double[][] orthonormal(double[][] columns, String[] names) {
        double[][] q = new double[columns.length][];
        for (int c = 0; c < columns.length; c++) {
            double[] v = columns[c].clone();
            double original = norm(v);
            for (int pass = 0; pass < 2; pass++) {
                for (int p = 0; p < c; p++) {
                    double dot = dot(q[p], v);
                    for (int i = 0; i < v.length; i++) {
                        v[i] -= dot * q[p][i];
                    }
                }
            }
            double length = norm(v);
            if (!(length > 1e-12 * original)) {
                throw new RankDeficientDesignException("Regressor '" + names[c] + "' is numerically a combination"
                        + " of the others, so the Durbin-Watson null distribution is not defined; drop it.");
            }
            for (int i = 0; i < v.length; i++) {
                v[i] /= length;
            }
            q[c] = v;
        }
        return q;
    }

    private static double dot(double[] a, double[] b) {
        double sum = 0;
        for (int i = 0; i < a.length; i++) {
            sum += a[i] * b[i];
        }
        return sum;
    }

    private static double norm(double[] v) {
        return Math.sqrt(dot(v, v));
    }
}
