package org.trendwright.core.gls;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.trendwright.core.Matrices;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.NormalEquations;

/**
 * The normal equations X*'X* b = X*'y* of the quasi-differenced regression y* = X* b + e at any
 * rho, for the steps of the feasible-GLS iteration ({@link Ar1Gls#estimate}) that only steer rho
 * towards its fixed point; solved by {@link NormalEquations}, with its accuracy and its refusal of
 * a design that is not clearly well conditioned.
 *
 * <p>With sigma = 1 - rho, a transformed row t >= 2 is x*_t = x_t - rho x_{t-1} = Δx_t + sigma x_{t-1}
 * (Δx_t = x_t - x_{t-1}), and likewise y*_t = Δy_t + sigma y_{t-1}. So
 * <pre>
 *   X*'X* = D + sigma C + sigma^2 R,   X*'y* = d + sigma c + sigma^2 r,
 *   D = sum Δx_t Δx_t',  C = sum (Δx_t x_{t-1}' + x_{t-1} Δx_t'),  R = sum x_{t-1} x_{t-1}',
 *   d = sum Δx_t Δy_t,   c = sum (Δx_t y_{t-1} + x_{t-1} Δy_t),    r = sum x_{t-1} y_{t-1}
 * </pre>
 * over t = 2..n, plus (1 - rho^2) x_1 x_1' and (1 - rho^2) x_1 y_1 for Prais-Winsten's first row
 * (as {@link Ar1Gls#transform}). The moments are summed once, in about 2 n k(k + 3) multiply-adds
 * (the per-step accumulation they replace took n k(k + 3)/2 at every rho), and each step then
 * costs O(k^3) whatever n. Written around sigma rather than rho, the terms do not cancel as rho
 * nears 1: for the constant column, X*'X* is (n - 1) sigma^2, which the sums give as sigma^2 R
 * directly, where x_t x_t' - 2 rho x_t x_{t-1}' + rho^2 x_{t-1} x_{t-1}' would subtract terms of
 * order n. The moments of every prefix of a design come
 * from one pass ({@link #ofPrefixes}), bit for bit those {@link #of} gives on the prefix, which lets
 * a model comparison steer the GLS fits at all its training ends from one pass. Immutable.
 */
public final class QuasiDifferencedNormalEquations {

    private final int rows;
    private final double[][] differences;
    private final double[][] cross;
    private final double[][] lagged;
    private final double[] differenceMoment;
    private final double[] crossMoment;
    private final double[] laggedMoment;
    private final double[] firstRow;
    private final double firstResponse;

    private QuasiDifferencedNormalEquations(int rows, Sums sums, double[] firstRow, double firstResponse) {
        this.rows = rows;
        this.differences = Matrices.copy(sums.differences);
        this.cross = Matrices.copy(sums.cross);
        this.lagged = Matrices.copy(sums.lagged);
        this.differenceMoment = sums.differenceMoment.clone();
        this.crossMoment = sums.crossMoment.clone();
        this.laggedMoment = sums.laggedMoment.clone();
        this.firstRow = firstRow;
        this.firstResponse = firstResponse;
    }

    /** The moments of the whole design and response. */
    static QuasiDifferencedNormalEquations of(Design design, double[] y) {
        return ofPrefixes(design, y, new int[] {design.rows()}).get(0);
    }

    /**
     * The moments of the first {@code ends[i]} rows of the design and response, for each i, in one
     * pass.
     *
     * @throws IllegalArgumentException when y's length differs from the design's rows or an end is
     *                                  not between 1 and the number of rows
     */
    public static List<QuasiDifferencedNormalEquations> ofPrefixes(Design design, double[] y, int[] ends) {
        if (y.length != design.rows()) {
            throw new IllegalArgumentException("The design has " + design.rows() + " rows but y has " + y.length
                    + " values.");
        }
        if (ends.length == 0) {
            return List.of();
        }
        int longest = Arrays.stream(ends).max().orElse(0);
        if (Arrays.stream(ends).anyMatch(end -> end < 1) || longest > design.rows()) {
            throw new IllegalArgumentException("Every prefix needs 1 to " + design.rows() + " rows, got "
                    + Arrays.toString(ends) + ".");
        }
        int k = design.width();
        double[] first = row(design, 0, new double[k]);
        Sums sums = new Sums(k);
        double[] previous = first.clone();
        double[] current = new double[k];
        double[] change = new double[k];
        QuasiDifferencedNormalEquations[] byEnd = new QuasiDifferencedNormalEquations[ends.length];
        snapshot(byEnd, ends, 1, sums, first, y[0]);
        for (int t = 1; t < longest; t++) {
            row(design, t, current);
            for (int j = 0; j < k; j++) {
                change[j] = current[j] - previous[j];
            }
            sums.add(change, previous, y[t] - y[t - 1], y[t - 1]);
            snapshot(byEnd, ends, t + 1, sums, first, y[0]);
            double[] swap = previous;
            previous = current;
            current = swap;
        }
        return List.of(byEnd);
    }

    /** How many rows the moments were summed over. */
    public int rows() {
        return rows;
    }

    /** How many regressors. */
    public int width() {
        return firstRow.length;
    }

    /** b(rho), or empty where {@link NormalEquations#solve} declines. */
    Optional<double[]> coefficients(double rho, Ar1Method method) {
        int k = width();
        double sigma = 1 - rho;
        double sigma2 = sigma * sigma;
        double firstWeight = method == Ar1Method.PRAIS_WINSTEN ? 1 - rho * rho : 0;
        double[][] gram = Matrices.zeros(k, k);
        double[] moment = new double[k];
        for (int i = 0; i < k; i++) {
            double firstI = firstWeight * firstRow[i];
            moment[i] = Math.fma(firstI, firstResponse,
                    Math.fma(sigma2, laggedMoment[i], Math.fma(sigma, crossMoment[i], differenceMoment[i])));
            for (int j = i; j < k; j++) {
                gram[i][j] = Math.fma(firstI, firstRow[j],
                        Math.fma(sigma2, lagged[i][j], Math.fma(sigma, cross[i][j], differences[i][j])));
            }
        }
        return NormalEquations.solve(gram, moment);
    }

    /** Keeps the sums so far for every prefix that ends after {@code rows} rows. */
    private static void snapshot(QuasiDifferencedNormalEquations[] byEnd, int[] ends, int rows, Sums sums,
                                 double[] first, double firstResponse) {
        for (int e = 0; e < ends.length; e++) {
            if (ends[e] == rows) {
                byEnd[e] = new QuasiDifferencedNormalEquations(rows, sums, first, firstResponse);
            }
        }
    }

    private static double[] row(Design design, int t, double[] into) {
        for (int j = 0; j < into.length; j++) {
            into[j] = design.get(t, j);
        }
        return into;
    }

    /** The running sums behind the moments; upper triangles only. */
    private static final class Sums {
        final double[][] differences;
        final double[][] cross;
        final double[][] lagged;
        final double[] differenceMoment;
        final double[] crossMoment;
        final double[] laggedMoment;

        Sums(int k) {
            differences = Matrices.zeros(k, k);
            cross = Matrices.zeros(k, k);
            lagged = Matrices.zeros(k, k);
            differenceMoment = new double[k];
            crossMoment = new double[k];
            laggedMoment = new double[k];
        }

        /** Adds row t: Δx_t, x_{t-1}, Δy_t and y_{t-1}. */
        void add(double[] change, double[] previous, double responseChange, double previousResponse) {
            for (int i = 0; i < change.length; i++) {
                double di = change[i];
                double pi = previous[i];
                differenceMoment[i] = Math.fma(di, responseChange, differenceMoment[i]);
                crossMoment[i] = Math.fma(pi, responseChange, Math.fma(di, previousResponse, crossMoment[i]));
                laggedMoment[i] = Math.fma(pi, previousResponse, laggedMoment[i]);
                for (int j = i; j < change.length; j++) {
                    differences[i][j] = Math.fma(di, change[j], differences[i][j]);
                    cross[i][j] = Math.fma(pi, change[j], Math.fma(di, previous[j], cross[i][j]));
                    lagged[i][j] = Math.fma(pi, previous[j], lagged[i][j]);
                }
            }
        }
    }
}
