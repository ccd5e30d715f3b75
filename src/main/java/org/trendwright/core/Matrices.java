package org.trendwright.core;

/**
 * Allocation and copying of dense matrices stored as arrays of rows (or of columns), the form
 * every part of the core uses.
 *
 * <p>Why {@link #zeros} instead of {@code new double[rows][columns]}: HotSpot's optimising compiler
 * (C2, JDK 17) turns a two-dimensional array creation into a call into the VM
 * ({@code OptoRuntime::multianewarray2_C}) that allocates each row outside the thread-local
 * fast path, while {@code new double[columns]} in a loop is allocated inline. In a batch verdict,
 * whose least-squares fits create several small matrices each, that call took 8.5% of the CPU
 * (async-profiler samples of {@code SeriesVerdictCpuTime}, src/docs/benchmarks.md).
 * Stateless.
 */
public final class Matrices {

    private Matrices() {
    }

    /** A rows x columns matrix of zeros, allocated row by row. */
    public static double[][] zeros(int rows, int columns) {
        double[][] matrix = new double[rows][];
        for (int i = 0; i < rows; i++) {
            matrix[i] = new double[columns];
        }
        return matrix;
    }

    /** A deep copy: the same entries in new rows. */
    public static double[][] copy(double[][] matrix) {
        double[][] copy = new double[matrix.length][];
        for (int i = 0; i < matrix.length; i++) {
            copy[i] = matrix[i].clone();
        }
        return copy;
    }
}
