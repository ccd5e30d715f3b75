package org.trendwright.core.breaks;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.Matrices;

/**
 * The asymptotic null distribution of the sup-Wald statistic for one structural change in p
 * parameters at an unknown date, trimming 15% at each end (Andrews 1993, "Tests for parameter
 * instability and structural change with unknown change point", Econometrica 61, Theorem 3):
 * <pre>
 *   sup_{pi in [0.15, 0.85]} || B_p(pi) - pi B_p(1) ||^2 / (pi (1 - pi)),   B_p a p-dimensional Brownian motion.
 * </pre>
 * It has no closed form. Its upper-tail quantiles for p = 1..20 at 23 tail probabilities from
 * 0.001 to 0.99 come from a seeded simulation (100,000 replications, grid of 10,080 steps, with
 * the grid's discretisation bias extrapolated away), stored in {@code sup-wald-trim15.csv} beside
 * this class; the generator, SupWaldTableGenerator, is committed under src/test/java. The Monte
 * Carlo standard error of each quantile is in the file: at most 0.7% of the value for tails of 1%
 * and more, at most 1.1% in the 0.1% to 0.5% tails. The grid-bias correction itself is at most
 * 0.26 (about 1 to 2% of the value); repeating it from coarser grids agrees within Monte Carlo error.
 * The tabulated values lie 0.1 to 0.4 above Andrews' printed ones (themselves simulated on a finite
 * grid), so these p-values are slightly more conservative than his table.
 *
 * <p>Between tabulated points the log tail probability is interpolated linearly in the statistic,
 * which follows the near-exponential tail of a supremum of chi-square variables. Beyond the 0.1%
 * point the last two points' slope is extended (an approximation, fine for decisions at any usual
 * level); below the 99% point the tail probability is interpolated linearly towards 1 at 0.
 *
 * <p>Thread-safe: the table is read once, when first needed.
 */
public final class SupWaldDistribution {

    private static final String RESOURCE = "sup-wald-trim15.csv";

    private SupWaldDistribution() {
    }

    /** The largest number of tested parameters the table covers. */
    public static int maxParameters() {
        return Table.INSTANCE.quantiles.length;
    }

    /**
     * P(W > statistic) for the sup-Wald limit W with p parameters; for a sup-F statistic pass
     * p times sup-F. Returns 1 for a statistic &lt;= 0.
     *
     * @throws InvalidSpecificationException when p is outside 1..{@link #maxParameters()} or the
     *         statistic is NaN
     */
    public static double upperTail(int parameters, double statistic) {
        double[] q = row(parameters);
        if (Double.isNaN(statistic)) {
            throw new InvalidSpecificationException("The sup-Wald statistic is NaN; no p-value can be given.");
        }
        double[] tails = Table.INSTANCE.tails;
        int last = q.length - 1;
        if (statistic <= q[0]) {
            return Math.max(tails[0], 1 - (1 - tails[0]) * Math.max(statistic, 0) / q[0]);
        }
        int i = 1;
        while (i < last && statistic > q[i]) {
            i++;
        }
        double slope = (Math.log(tails[i]) - Math.log(tails[i - 1])) / (q[i] - q[i - 1]);
        return Math.exp(Math.log(tails[i - 1]) + slope * (statistic - q[i - 1]));
    }

    /**
     * The critical value c with P(W > c) = level, interpolated as {@link #upperTail} does.
     *
     * @throws InvalidSpecificationException when p is outside the table or the level is outside
     *         the tabulated tail probabilities 0.001..0.99
     */
    public static double criticalValue(int parameters, double level) {
        double[] q = row(parameters);
        double[] tails = Table.INSTANCE.tails;
        if (!(level >= tails[tails.length - 1] && level <= tails[0])) {
            throw new InvalidSpecificationException("sup-Wald critical values are tabulated for levels "
                    + tails[tails.length - 1] + " to " + tails[0] + ", got " + level + ".");
        }
        int i = 1;
        while (i < q.length - 1 && tails[i] > level) {
            i++;
        }
        double fraction = (Math.log(level) - Math.log(tails[i - 1])) / (Math.log(tails[i]) - Math.log(tails[i - 1]));
        return q[i - 1] + fraction * (q[i] - q[i - 1]);
    }

    /** Refuses a number of parameters the table does not cover. */
    static void checkParameters(int parameters) {
        int covered = maxParameters();
        if (parameters < 1 || parameters > covered) {
            throw new InvalidSpecificationException("sup-F and sup-Wald p-values are tabulated for 1 to "
                    + covered + " tested parameters, got " + parameters + "; test fewer regressors for a break.");
        }
    }

    private static double[] row(int parameters) {
        checkParameters(parameters);
        return Table.INSTANCE.quantiles[parameters - 1];
    }

    /** The table, read on first use (the holder idiom makes that lazy and thread-safe). */
    private static final class Table {
        static final Table INSTANCE = read();

        /** Tail probabilities in decreasing order (0.99 first), so quantiles increase along a row. */
        final double[] tails;
        /** quantiles[p - 1][i] = the upper-tail-tails[i] quantile for p parameters. */
        final double[][] quantiles;

        private Table(double[] tails, double[][] quantiles) {
            this.tails = tails;
            this.quantiles = quantiles;
        }

        private static Table read() {
            List<double[]> rows = new ArrayList<>();
            try (InputStream in = SupWaldDistribution.class.getResourceAsStream(RESOURCE)) {
                if (in == null) {
                    throw new IllegalStateException("The sup-Wald table " + RESOURCE + " is missing from the"
                            + " build; it belongs in src/main/resources/org/trendwright/core/breaks.");
                }
                BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
                for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                    if (!line.isBlank() && Character.isDigit(line.charAt(0))) {
                        String[] cells = line.split(",");
                        rows.add(new double[] {Double.parseDouble(cells[0]), Double.parseDouble(cells[1]),
                            Double.parseDouble(cells[2])});
                    }
                }
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            return fromRows(rows);
        }

        /** Rows (p, tail, quantile) grouped by p, each group listed from the smallest tail up. */
        private static Table fromRows(List<double[]> rows) {
            int parameters = (int) rows.get(rows.size() - 1)[0];
            int perRow = rows.size() / parameters;
            double[] tails = new double[perRow];
            double[][] quantiles = Matrices.zeros(parameters, perRow);
            for (int r = 0; r < rows.size(); r++) {
                double[] row = rows.get(r);
                int i = perRow - 1 - r % perRow;
                tails[i] = row[1];
                quantiles[(int) row[0] - 1][i] = row[2];
            }
            return new Table(tails, quantiles);
        }
    }
}
