package org.trendwright.core.regression;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.trendwright.core.InvalidSpecificationException;

/**
 * A regression design matrix X (n rows, k columns), kept column by column with a name for every
 * column. Immutable and thread-safe: columns are copied in and out.
 *
 * @param columns      the k regressors, each of length n
 * @param names        a name for each regressor, shown beside its coefficient
 * @param hasIntercept true when one column is the constant 1 (R-squared and F are then centred)
 */
public record Design(List<double[]> columns, List<String> names, boolean hasIntercept) {

    public Design {
        if (columns.size() != names.size()) {
            throw new InvalidSpecificationException(columns.size() + " columns but " + names.size() + " names.");
        }
        if (columns.isEmpty()) {
            throw new InvalidSpecificationException("A regression needs at least one regressor.");
        }
        int n = columns.get(0).length;
        List<double[]> copies = new ArrayList<>(columns.size());
        for (int j = 0; j < columns.size(); j++) {
            double[] column = columns.get(j);
            if (column.length != n) {
                throw new InvalidSpecificationException("Regressor '" + names.get(j) + "' has " + column.length
                        + " rows where the first has " + n + ".");
            }
            copies.add(column.clone());
        }
        columns = List.copyOf(copies);
        names = List.copyOf(names);
    }

    /** Number of observations (rows). */
    public int rows() {
        return columns.get(0).length;
    }

    /** Number of regressors (columns). */
    public int width() {
        return columns.size();
    }

    /** Element x[i][j]: observation i (0-based) of regressor j. */
    public double get(int i, int j) {
        return columns.get(j)[i];
    }

    /** A copy of column j. */
    public double[] column(int j) {
        return columns.get(j).clone();
    }

    @Override
    public List<double[]> columns() {
        return columns.stream().map(double[]::clone).toList();
    }

    /** The matrix as rows, x[i] = (x_i1, ..., x_ik). */
    public double[][] toRows() {
        int n = rows();
        int k = width();
        double[][] rows = new double[n][k];
        for (int j = 0; j < k; j++) {
            double[] column = columns.get(j);
            for (int i = 0; i < n; i++) {
                rows[i][j] = column[i];
            }
        }
        return rows;
    }

    /** The rows {@code from} (inclusive) to {@code to} (exclusive), for holdout and rolling fits. */
    public Design rowRange(int from, int to) {
        List<double[]> sliced = columns.stream().map(c -> Arrays.copyOfRange(c, from, to)).toList();
        return new Design(sliced, names, hasIntercept);
    }

    /** This design with extra regressors appended on the right (as auxiliary regressions need). */
    public Design withColumns(List<double[]> extra, List<String> extraNames) {
        List<double[]> all = new ArrayList<>(columns);
        all.addAll(extra);
        List<String> allNames = new ArrayList<>(names);
        allNames.addAll(extraNames);
        return new Design(all, allNames, hasIntercept);
    }

    @Override
    public boolean equals(Object other) {
        if (!(other instanceof Design d) || hasIntercept != d.hasIntercept || !names.equals(d.names)) {
            return false;
        }
        for (int j = 0; j < columns.size(); j++) {
            if (!Arrays.equals(columns.get(j), d.columns.get(j))) {
                return false;
            }
        }
        return true;
    }

    @Override
    public int hashCode() {
        int h = names.hashCode() * 31 + Boolean.hashCode(hasIntercept);
        for (double[] column : columns) {
            h = 31 * h + Arrays.hashCode(column);
        }
        return h;
    }

    @Override
    public String toString() {
        return "Design[n=" + rows() + ", regressors=" + names + "]";
    }
}
