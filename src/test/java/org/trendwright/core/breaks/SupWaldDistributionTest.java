package org.trendwright.core.breaks;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The simulated sup-Wald table (src/main/resources/org/trendwright/core/breaks/sup-wald-trim15.csv,
 * written by {@link SupWaldTableGenerator}) against Andrews' (1993) published critical values, a
 * fresh seeded simulation and the chi-square bound every row must respect.
 */
class SupWaldDistributionTest {

    private static final double[] LEVELS = {0.10, 0.05, 0.01};
    /** Replications behind the committed table. */
    private static final int TABLE_REPLICATIONS = 100_000;
    private static Map<String, double[]> table;

    @BeforeAll
    static void readTable() throws IOException {
        table = new HashMap<>();
        try (InputStream in = SupWaldDistribution.class.getResourceAsStream("sup-wald-trim15.csv")) {
            BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                if (!line.isEmpty() && Character.isDigit(line.charAt(0))) {
                    String[] cells = line.split(",");
                    double[] values = new double[cells.length - 2];
                    for (int i = 2; i < cells.length; i++) {
                        values[i - 2] = Double.parseDouble(cells[i]);
                    }
                    table.put(key(Integer.parseInt(cells[0]), Double.parseDouble(cells[1])), values);
                }
            }
        }
    }

    /**
     * From memory: Andrews (1993), Econometrica 61, Table 1, asymptotic critical values for pi0 = 0.15,
     * in the F form (the sup-Wald value divided by p) in which they are commonly reprinted, at the 10%,
     * 5% and 1% levels. Andrews simulated on a grid; our values on a grid of spacing 1/3600 (every 4th
     * point of the table's grid, column sup_every_4) are the comparable ones, and they match the
     * recalled values within the Monte Carlo error of both simulations. The tolerance is 3 sd of the
     * difference, taking Andrews' simulation as 10,000 replications (from memory), so its sd is
     * sqrt(10) times ours, plus the rounding of p times a two-decimal F value.
     */
    @ParameterizedTest(name = "p = {0}")
    @CsvSource({
        "1, 7.12, 8.68, 12.16",
        "2, 5.00, 5.86, 7.78",
        "3, 4.09, 4.71, 6.02",
        "4, 3.59, 4.09, 5.12",
        "5, 3.26, 3.66, 4.53",
        "6, 3.02, 3.37, 4.12",
        "7, 2.84, 3.15, 3.82",
        "8, 2.69, 2.98, 3.57",
        "9, 2.58, 2.84, 3.38",
        "10, 2.48, 2.71, 3.23",
    })
    void simulated_critical_values_match_andrews_table_from_memory(int p, double f10, double f5, double f1) {
        double[] recalled = {f10, f5, f1};
        for (int i = 0; i < LEVELS.length; i++) {
            double[] row = table.get(key(p, LEVELS[i]));
            double standardError = row[1];
            double tolerance = 3 * standardError * Math.sqrt(1 + TABLE_REPLICATIONS / 10_000.0) + p * 0.005;
            assertEquals(p * recalled[i], row[3], tolerance, "level " + LEVELS[i]);
            // Andrews' grid falls short of the continuous supremum, so the tabulated (extrapolated)
            // value must lie above the recalled one, by less than the grid shortfall allows (0.5).
            assertTrue(row[0] > p * recalled[i] - tolerance && row[0] < p * recalled[i] + 0.5,
                    "extrapolated " + row[0] + " against " + p * recalled[i]);
        }
    }

    @Test
    void a_fresh_seeded_simulation_reproduces_the_committed_table() {
        int replications = 10_000;
        double[][][] draws = SupWaldSimulation.draw(7, replications, 512, 10);
        for (int p = 1; p <= 10; p++) {
            double[] fine = SupWaldTableGenerator.sorted(draws[0][p - 1]);
            double[] medium = SupWaldTableGenerator.sorted(draws[1][p - 1]);
            for (double level : LEVELS) {
                double extrapolated = 2 * SupWaldTableGenerator.quantile(fine, level)
                        - SupWaldTableGenerator.quantile(medium, level);
                double[] row = table.get(key(p, level));
                // This simulation has 10 times fewer replications, so sd sqrt(10) times the table's
                // (plus the table's own); 4 sd, so 30 comparisons rarely fail by chance.
                double sd = row[1] * Math.sqrt(1 + TABLE_REPLICATIONS / (double) replications);
                assertEquals(row[0], extrapolated, 4 * sd, "p = " + p + ", level " + level);
            }
        }
    }

    @Test
    void the_simulation_is_reproducible_from_its_seed() {
        double[][][] first = SupWaldSimulation.draw(99, 1000, 64, 3);
        double[][][] second = SupWaldSimulation.draw(99, 1000, 64, 3);
        for (int t = 0; t < first.length; t++) {
            for (int p = 0; p < 3; p++) {
                assertArrayEquals(first[t][p], second[t][p]);
            }
        }
    }

    @Test
    void every_quantile_lies_above_the_pointwise_chi_square_quantile() {
        // At each fixed pi the statistic is chi-square with p degrees of freedom (Andrews 1993), so its
        // supremum is stochastically larger: every upper quantile exceeds chi-square's.
        for (int p = 1; p <= SupWaldDistribution.maxParameters(); p++) {
            ChiSquaredDistribution chiSquare = new ChiSquaredDistribution(null, p);
            for (double level : SupWaldTableGenerator.UPPER_TAILS) {
                double pointwise = chiSquare.inverseCumulativeProbability(1 - level);
                assertTrue(SupWaldDistribution.criticalValue(p, level) > pointwise, "p = " + p + ", level " + level);
            }
        }
    }

    @Test
    void upper_tail_and_critical_value_invert_each_other_and_decrease() {
        for (int p = 1; p <= SupWaldDistribution.maxParameters(); p++) {
            for (double level : new double[] {0.003, 0.01, 0.05, 0.07, 0.1, 0.33, 0.9}) {
                double c = SupWaldDistribution.criticalValue(p, level);
                // Both read the same log-linear segment of the table: exact up to rounding.
                assertEquals(level, SupWaldDistribution.upperTail(p, c), 1e-12 * level);
            }
            double previous = 1;
            for (double x = 0; x < 80; x += 0.5) {
                double tail = SupWaldDistribution.upperTail(p, x);
                assertTrue(tail <= previous && tail > 0, "p = " + p + ", x = " + x);
                previous = tail;
            }
        }
    }

    private static String key(int p, double level) {
        return p + "@" + level;
    }
}
