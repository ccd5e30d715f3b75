package org.trendwright.core.regression;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.Matrices;

/**
 * A regression design matrix X (n rows, k columns), kept column by column with a name for every
 * column. Immutable and thread-safe: columns handed in are copied, columns handed out are copies,
 * so the arrays inside are never seen outside and designs derived from one another may share them.
 * Designs built by {@link #generate} or derived ({@link #rowRange}, {@link #withColumns}) fill
 * arrays of their own and skip the copy, which matters to callers that build thousands of small
 * designs (rolling forecasts, GLS iterations).
 */
public final class Design {

    private final double[][] columns;
    private final List<String> names;
    private final boolean hasIntercept;

    /**
     * A design from the given columns, which are copied.
     *
     * @param columns      the k regressors, each of length n
     * @param names        a name for each regressor, shown beside its coefficient
     * @param hasIntercept true when one column is the constant 1 (R-squared and F are then centred)
     * @throws InvalidSpecificationException when there are no columns, the counts of columns and
     *                                       names differ, or the columns differ in length
     */
    public Design(List<double[]> columns, List<String> names, boolean hasIntercept) {
        this(copies(columns), names, hasIntercept);
    }

    /** Takes ownership of {@code owned}: no caller may keep a reference to its arrays. */
    private Design(double[][] owned, List<String> names, boolean hasIntercept) {
        if (owned.length != names.size()) {
            throw new InvalidSpecificationException(owned.length + " columns but " + names.size() + " names.");
        }
        if (owned.length == 0) {
            throw new InvalidSpecificationException("A regression needs at least one regressor.");
        }
        int n = owned[0].length;
        for (int j = 0; j < owned.length; j++) {
            if (owned[j].length != n) {
                throw new InvalidSpecificationException("Regressor '" + names.get(j) + "' has " + owned[j].length
                        + " rows where the first has " + n + ".");
            }
        }
        this.columns = owned;
        this.names = List.copyOf(names);
        this.hasIntercept = hasIntercept;
    }

    /**
     * Writes the values of regressor {@code column} (0-based), one per observation, into
     * {@code values}. The loop over the rows is the filler's own, so each kind of design compiles
     * to its own loop: a per-element callback shared by every kind of design would be a call the
     * JIT cannot inline once more than two kinds run.
     */
    @FunctionalInterface
    public interface ColumnFiller {
        void fill(int column, double[] values);
    }

    /**
     * A design of {@code rows} rows whose column j is written by {@code filler.fill(j, ...)} into an
     * array the design owns.
     *
     * @throws InvalidSpecificationException when there are no names (no columns)
     */
    public static Design generate(int rows, List<String> names, boolean hasIntercept, ColumnFiller filler) {
        double[][] filled = Matrices.zeros(names.size(), rows);
        for (int j = 0; j < filled.length; j++) {
            filler.fill(j, filled[j]);
        }
        return new Design(filled, names, hasIntercept);
    }

    private static double[][] copies(List<double[]> columns) {
        double[][] copies = new double[columns.size()][];
        for (int j = 0; j < copies.length; j++) {
            copies[j] = columns.get(j).clone();
        }
        return copies;
    }

    /** Number of observations (rows). */
    public int rows() {
        return columns[0].length;
    }

    /** Number of regressors (columns). */
    public int width() {
        return columns.length;
    }

    /** The regressors' names, in column order. */
    public List<String> names() {
        return names;
    }

    /** Whether one column is the constant 1. */
    public boolean hasIntercept() {
        return hasIntercept;
    }

    /** Element x[i][j]: observation i (0-based) of regressor j. */
    public double get(int i, int j) {
        return columns[j][i];
    }

    /** A copy of column j. */
    public double[] column(int j) {
        return columns[j].clone();
    }

    /** Copies of the columns. */
    public List<double[]> columns() {
        return Arrays.stream(columns).map(double[]::clone).toList();
    }

    /**
     * The design's own column arrays, for this package's factorisations, which copy what they
     * change: callers must neither modify these arrays nor hand them on.
     */
    double[][] sharedColumns() {
        return columns;
    }

    /** The matrix as rows, x[i] = (x_i1, ..., x_ik). */
    public double[][] toRows() {
        int n = rows();
        int k = width();
        double[][] rows = Matrices.zeros(n, k);
        for (int j = 0; j < k; j++) {
            double[] column = columns[j];
            for (int i = 0; i < n; i++) {
                rows[i][j] = column[i];
            }
        }
        return rows;
    }

    /** The rows {@code from} (inclusive) to {@code to} (exclusive), for holdout and rolling fits. */
    public Design rowRange(int from, int to) {
        double[][] sliced = new double[columns.length][];
        for (int j = 0; j < sliced.length; j++) {
            sliced[j] = Arrays.copyOfRange(columns[j], from, to);
        }
        return new Design(sliced, names, hasIntercept);
    }

    /**
     * This design with extra regressors (copied) appended on the right, as auxiliary regressions
     * need; the existing columns are shared, since no design changes or hands out its arrays.
     */
    public Design withColumns(List<double[]> extra, List<String> extraNames) {
        double[][] all = Arrays.copyOf(columns, columns.length + extra.size());
        for (int j = 0; j < extra.size(); j++) {
            all[columns.length + j] = extra.get(j).clone();
        }
        List<String> allNames = new ArrayList<>(names);
        allNames.addAll(extraNames);
        return new Design(all, allNames, hasIntercept);
    }

    @Override
    public boolean equals(Object other) {
        if (!(other instanceof Design d) || hasIntercept != d.hasIntercept || !names.equals(d.names)) {
            return false;
        }
        return Arrays.deepEquals(columns, d.columns);
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
