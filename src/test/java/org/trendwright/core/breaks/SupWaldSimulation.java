package org.trendwright.core.breaks;

import java.util.SplittableRandom;
import java.util.stream.IntStream;

/**
 * Seeded simulation of Andrews' (1993, Econometrica 61, Theorem 3) limit of the sup-Wald
 * statistic for one structural change in p parameters with trimming pi0 = 0.15:
 *
 * <pre>
 *   sup_{pi in [0.15, 0.85]} Q_p(pi),   Q_p(pi) = || B_p(pi) - pi B_p(1) ||^2 / (pi (1 - pi)),
 * </pre>
 *
 * with B_p a p-dimensional standard Brownian motion. The p components are independent, so
 * Q_p(pi) = sum_{j <= p} Z_j(pi)^2 and one draw of {@link #MAX_PARAMETERS} components gives the
 * statistic for every p = 1..MAX_PARAMETERS at once (the draws for different p share paths, so
 * they are correlated across p but each p is correctly distributed).
 *
 * <p>Discretisation: B(0.15) ~ N(0, 0.15) is drawn exactly, then {@code steps} Gaussian increments
 * of variance 0.7/steps carry the path to B(0.85), and B(1) - B(0.85) ~ N(0, 0.15) is drawn exactly.
 * The supremum is taken over the grid points only, so it falls short of the continuous supremum by
 * roughly c sqrt(0.7/steps) (the discrete-monitoring bias of a Brownian maximum, Broadie,
 * Glasserman & Kou 1997, Math. Finance 7). To remove that leading term the supremum is also taken
 * on every 4th and every 16th grid point of the same paths: see {@link SupWaldTableGenerator}.
 *
 * <p>Reproducible: replications are cut into blocks of {@link #BLOCK}, block b draws from a
 * {@link SplittableRandom} seeded with the b-th long of a generator seeded with {@code seed}, so
 * the result does not depend on how many threads run the blocks.
 */
final class SupWaldSimulation {

    /** Parameters covered: Q_1 .. Q_20, as Andrews' Table 1 (p = 1..20). */
    static final int MAX_PARAMETERS = 20;
    /** Grid thinnings at which the supremum is also recorded (every grid point, 4th, 16th). */
    static final int[] THINNINGS = {1, 4, 16};
    static final double TRIM = 0.15;
    static final int BLOCK = 500;

    private SupWaldSimulation() {
    }

    /**
     * Draws {@code replications} suprema. Result [t][p - 1][r]: thinning THINNINGS[t], p
     * parameters, replication r. {@code steps} must be a positive multiple of 16.
     */
    static double[][][] draw(long seed, int replications, int steps, int maxParameters) {
        if (steps % 16 != 0 || steps <= 0 || replications % BLOCK != 0) {
            throw new IllegalArgumentException("steps must be a multiple of 16 and replications of " + BLOCK);
        }
        SplittableRandom master = new SplittableRandom(seed);
        long[] blockSeeds = new long[replications / BLOCK];
        for (int b = 0; b < blockSeeds.length; b++) {
            blockSeeds[b] = master.nextLong();
        }
        double[][][] result = new double[THINNINGS.length][maxParameters][replications];
        IntStream.range(0, blockSeeds.length).parallel().forEach(b -> {
            SplittableRandom random = new SplittableRandom(blockSeeds[b]);
            double[][] path = new double[maxParameters][steps + 1];
            for (int r = b * BLOCK; r < (b + 1) * BLOCK; r++) {
                double[] end = drawPaths(random, path, steps);
                recordSuprema(path, end, steps, result, r);
            }
        });
        return result;
    }

    /** Fills path[j][i] = B_j(0.15 + i 0.7/steps) and returns B(1). */
    private static double[] drawPaths(SplittableRandom random, double[][] path, int steps) {
        double increment = Math.sqrt((1 - 2 * TRIM) / steps);
        double tail = Math.sqrt(TRIM);
        double[] end = new double[path.length];
        for (int j = 0; j < path.length; j++) {
            double[] b = path[j];
            b[0] = tail * random.nextGaussian();
            for (int i = 1; i <= steps; i++) {
                b[i] = b[i - 1] + increment * random.nextGaussian();
            }
            end[j] = b[steps] + tail * random.nextGaussian();
        }
        return end;
    }

    private static void recordSuprema(double[][] path, double[] end, int steps, double[][][] result, int r) {
        int parameters = path.length;
        double[][] sup = new double[THINNINGS.length][parameters];
        double[] q = new double[parameters];
        for (int i = 0; i <= steps; i++) {
            double pi = TRIM + (1 - 2 * TRIM) * i / steps;
            double scale = 1 / (pi * (1 - pi));
            double sum = 0;
            for (int j = 0; j < parameters; j++) {
                double bridge = path[j][i] - pi * end[j];
                sum += bridge * bridge * scale;
                q[j] = sum;
            }
            for (int t = 0; t < THINNINGS.length; t++) {
                if (i % THINNINGS[t] == 0) {
                    raise(sup[t], q);
                }
            }
        }
        for (int t = 0; t < THINNINGS.length; t++) {
            for (int j = 0; j < parameters; j++) {
                result[t][j][r] = sup[t][j];
            }
        }
    }

    private static void raise(double[] sup, double[] q) {
        for (int j = 0; j < q.length; j++) {
            sup[j] = Math.max(sup[j], q[j]);
        }
    }
}
