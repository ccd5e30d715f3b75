package org.trendwright.core.breaks;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;

/**
 * Writes the simulated table of Andrews' (1993) sup-Wald limit that {@link SupWaldDistribution}
 * reads: src/main/resources/org/trendwright/core/breaks/sup-wald-trim15.csv.
 *
 * <p>Run from the worktree after {@code mvn -o -q test-compile}:
 * <pre>
 *   java -cp target/test-classes:target/classes org.trendwright.core.breaks.SupWaldTableGenerator \
 *       20250601 100000 10080 src/main/resources/org/trendwright/core/breaks/sup-wald-trim15.csv
 * </pre>
 * (seed, replications, grid steps on [0.15, 0.85], output file). 10080 steps on [0.15, 0.85] make
 * every 4th point a grid of spacing 1/3600 on [0, 1]. It uses only the JDK, so the
 * table is reproducible on any Java 17 or later whose {@code SplittableRandom.nextGaussian} is the
 * JDK 17 algorithm.
 *
 * <p>For each p and upper-tail probability a, with q_s the empirical (1 - a) quantile of the
 * supremum over every s-th grid point, the tabulated value is the Richardson extrapolation
 * 2 q_1 - q_4, which removes the discretisation bias that shrinks like sqrt(grid spacing): the
 * spacing of every 4th point is 4 times larger, so its bias is twice as large. q_1, q_4 and q_16
 * are written beside it, so the extrapolation can be checked (2 q_4 - q_16 should agree). The Monte
 * Carlo standard error is the spread of the extrapolated quantile over 10 batches of the
 * replications divided by sqrt(10) (batch means).
 */
final class SupWaldTableGenerator {

    /** Upper-tail probabilities at which quantiles are tabulated. */
    static final double[] UPPER_TAILS = {0.001, 0.0025, 0.005, 0.01, 0.025, 0.05, 0.075, 0.10, 0.125, 0.15,
        0.20, 0.25, 0.30, 0.35, 0.40, 0.45, 0.50, 0.60, 0.70, 0.80, 0.90, 0.95, 0.99};
    private static final int BATCHES = 10;

    private SupWaldTableGenerator() {
    }

    public static void main(String[] args) throws IOException {
        long seed = Long.parseLong(args[0]);
        int replications = Integer.parseInt(args[1]);
        int steps = Integer.parseInt(args[2]);
        double[][][] draws = SupWaldSimulation.draw(seed, replications, steps, SupWaldSimulation.MAX_PARAMETERS);
        try (PrintStream out = new PrintStream(Files.newOutputStream(Path.of(args[3])), false,
                StandardCharsets.UTF_8)) {
            writeHeader(out, seed, replications, steps);
            for (int p = 1; p <= SupWaldSimulation.MAX_PARAMETERS; p++) {
                writeRows(out, p, draws);
            }
        }
    }

    private static void writeHeader(PrintStream out, long seed, int replications, int steps) {
        out.println("# Upper-tail quantiles of sup_{pi in [0.15,0.85]} ||B(pi) - pi B(1)||^2 / (pi(1 - pi)),");
        out.println("# B a p-dimensional standard Brownian motion: the asymptotic null distribution of the");
        out.println("# sup-Wald statistic for one break in p parameters, trimming 15% (Andrews 1993, Econometrica 61).");
        out.println("# Simulated by org.trendwright.core.breaks.SupWaldTableGenerator (src/test/java), JDK "
                + System.getProperty("java.version") + ": seed " + seed
                + ", " + replications + " replications, " + steps + " grid steps on [0.15, 0.85].");
        out.println("# sup_every_s = quantile of the supremum over every s-th grid point; critical_value =");
        out.println("# 2 sup_every_1 - sup_every_4, extrapolating the grid bias (proportional to sqrt(spacing)) away;");
        out.println("# mc_standard_error of critical_value from 10 batches (batch means).");
        out.println("parameters,upper_tail,critical_value,mc_standard_error,sup_every_1,sup_every_4,sup_every_16");
    }

    private static void writeRows(PrintStream out, int p, double[][][] draws) {
        double[] fine = sorted(draws[0][p - 1]);
        double[] medium = sorted(draws[1][p - 1]);
        double[] coarse = sorted(draws[2][p - 1]);
        for (double a : UPPER_TAILS) {
            double q1 = quantile(fine, a);
            double q4 = quantile(medium, a);
            double q16 = quantile(coarse, a);
            out.println(String.format(Locale.ROOT, "%d,%s,%.4f,%.4f,%.4f,%.4f,%.4f", p, a, 2 * q1 - q4,
                    batchStandardError(draws[0][p - 1], draws[1][p - 1], a), q1, q4, q16));
        }
    }

    private static double batchStandardError(double[] fine, double[] medium, double a) {
        int size = fine.length / BATCHES;
        double[] estimates = new double[BATCHES];
        for (int b = 0; b < BATCHES; b++) {
            double[] f = sorted(Arrays.copyOfRange(fine, b * size, (b + 1) * size));
            double[] m = sorted(Arrays.copyOfRange(medium, b * size, (b + 1) * size));
            estimates[b] = 2 * quantile(f, a) - quantile(m, a);
        }
        double mean = Arrays.stream(estimates).average().orElseThrow();
        double squares = Arrays.stream(estimates).map(e -> (e - mean) * (e - mean)).sum();
        return Math.sqrt(squares / (BATCHES - 1) / BATCHES);
    }

    static double[] sorted(double[] values) {
        double[] copy = values.clone();
        Arrays.sort(copy);
        return copy;
    }

    /** The (1 - a) quantile of sorted values, interpolating linearly between order statistics. */
    static double quantile(double[] sorted, double a) {
        double position = (1 - a) * (sorted.length - 1);
        int below = (int) Math.floor(position);
        int above = Math.min(below + 1, sorted.length - 1);
        return sorted[below] + (position - below) * (sorted[above] - sorted[below]);
    }
}
