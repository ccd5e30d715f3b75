package org.trendwright.core.breaks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.regression.Design;

/**
 * The design-specific null distribution of sup F: its size on trend designs, where Andrews' (1993)
 * limit fails, its agreement with that limit where the limit holds, and its reproducibility.
 */
class SupFNullDistributionTest {

    /**
     * Seeded series y = 1 + 0.1 t + e, e iid N(0, 1), on a polynomial trend design: the share with a
     * design-specific p-value below 5% and 10% must be the level. The null is simulated with
     * R = 19,999 so that its own Monte Carlo error is small: the test's size given the simulated
     * draws is binomial-like with variance a(1 - a)/(R + 1) about a, and the count over S series
     * adds a(1 - a)/S; the tolerance is 3 sd of the sum (0.0096 at 5%, 0.0133 at 10% for
     * S = 6,000). With the strict rule p &lt; a the exact size is a - 1/(R + 1), within 0.0001 of a.
     * For comparison Andrews' asymptotic p-value must over-reject at 10% by more than 3 binomial sd
     * (we measured 12.2% to 15.2% on these designs, see SupFSizeMeasurement).
     */
    @ParameterizedTest(name = "degree {0}, n = {1}")
    @CsvSource({"1, 100", "1, 200", "2, 200"})
    void design_specific_p_values_reject_at_the_nominal_rate_on_trend_designs(int degree, int n) {
        Design design = polynomialTrend(n, degree);
        int replications = 19_999;
        SupFNullDistribution nullDistribution = SupFNullDistribution.forDesign(design, replications);
        SplittableRandom random = new SplittableRandom(20261204L + 1000L * degree + n);
        int series = 6000;
        int[] rejections = new int[3];
        for (int s = 0; s < series; s++) {
            BreakSearch search = SupFTest.test(design, BreakSeries.shiftedTrend(n, 0, 0, random), 0.05,
                    nullDistribution);
            rejections[0] += search.test().pValue() < 0.05 ? 1 : 0;
            rejections[1] += search.test().pValue() < 0.10 ? 1 : 0;
            rejections[2] += search.asymptoticPValue() < 0.10 ? 1 : 0;
        }
        for (int i = 0; i < 2; i++) {
            double level = i == 0 ? 0.05 : 0.10;
            double sd = Math.sqrt(level * (1 - level) * (1.0 / (replications + 1) + 1.0 / series));
            assertEquals(level, rejections[i] / (double) series, 3 * sd, "level " + level);
        }
        double asymptoticRate = rejections[2] / (double) series;
        assertTrue(asymptoticRate > 0.10 + 3 * Math.sqrt(0.09 / series), "asymptotic rate " + asymptoticRate);
    }

    /**
     * For a constant and an iid N(0, 1) regressor Andrews' (1993) limit holds, so at n = 1,000 the
     * simulated critical values must match the committed table (sup-wald-trim15.csv, which agrees
     * with Andrews' Table 1) after two finite-n corrections, both of known form: the search covers
     * a grid of spacing 1/n and so falls short of the continuous supremum by about c / sqrt(n)
     * (discrete-monitoring bias, Broadie, Glasserman &amp; Kou 1997, Math. Finance 7), with c taken
     * from the table's own suprema over grids of spacing 1/14,400 and 1/3,600 (c = 120 (q_1 - q_4));
     * and k F = (n - 2k)/n times the Wald form. Tolerance: 3 sd of the simulated quantile (binomial
     * sd sqrt(a(1 - a)/R) over the density, read from the table's tail slope) and of the table's
     * value, plus 0.05 for the grid correction's second-order error (the table's 2 q_4 - q_16 agrees
     * with its extrapolated value within 0.02).
     */
    @Test
    void critical_values_for_a_stationary_regressor_match_andrews_limit_at_n_1000() throws IOException {
        int n = 1000;
        Design design = BreakSeries.constantAndNoise(n, new SplittableRandom(20261205L));
        int replications = 19_999;
        SupFNullDistribution nullDistribution = SupFNullDistribution.forDesign(design, replications);
        List<double[]> table = tableRowsForTwoParameters();
        for (double level : new double[] {0.10, 0.05}) {
            double[] row = table.stream().filter(r -> r[0] == level).findFirst().orElseThrow();
            double grid = 120 * (row[3] - row[4]) / Math.sqrt(n);
            double expected = (n - 4.0) / n * (row[1] - grid);
            double density = (SupWaldDistribution.upperTail(2, row[1] - 0.25)
                    - SupWaldDistribution.upperTail(2, row[1] + 0.25)) / 0.5;
            double simulationSd = Math.sqrt(level * (1 - level) / replications) / density;
            double tolerance = 3 * Math.hypot(simulationSd, row[2]) + 0.05;
            assertEquals(expected, 2 * nullDistribution.criticalValue(level), tolerance, "level " + level);
        }
    }

    @Test
    void the_same_design_always_gives_the_same_p_value_whatever_its_column_names() {
        int n = 150;
        Design design = BreakSeries.trend(n);
        double[] y = BreakSeries.shiftedTrend(n, 90, 0.5, new SplittableRandom(21));
        BreakSearch first = SupFTest.test(design, y, 0.05);
        Design renamed = new Design(design.columns(), List.of("one", "time"), false);
        BreakSearch second = SupFTest.test(renamed, y.clone(), 0.05);
        assertEquals(first.test().pValue(), second.test().pValue());
        assertEquals(first.pValueStandardError(), second.pValueStandardError());
        assertEquals(SupFNullDistribution.seedFor(design), SupFNullDistribution.seedFor(renamed));
        assertNotEquals(SupFNullDistribution.seedFor(design), SupFNullDistribution.seedFor(BreakSeries.trend(n + 1)));
    }

    @Test
    void a_larger_number_of_replications_extends_the_draws_of_a_smaller_one() {
        Design design = BreakSeries.trend(80);
        double[] small = SupFNullDistribution.forDesign(design, 499).draws();
        List<Double> large = new ArrayList<>();
        for (double draw : SupFNullDistribution.forDesign(design, 1999).draws()) {
            large.add(draw);
        }
        for (double draw : small) {
            assertTrue(large.remove(draw), "draw " + draw + " missing from the larger simulation");
        }
    }

    @Test
    void p_value_is_the_rank_of_the_statistic_among_the_draws_and_the_critical_value_inverts_it() {
        SupFNullDistribution nullDistribution = SupFNullDistribution.forDesign(BreakSeries.trend(60));
        double[] draws = nullDistribution.draws();
        int r = draws.length;
        // Davison & Hinkley (1997), section 4.2.5: p = (1 + #{F* >= x}) / (R + 1).
        assertEquals(1.0, nullDistribution.pValue(0));
        assertEquals(1.0 / (r + 1), nullDistribution.pValue(Double.POSITIVE_INFINITY));
        assertEquals((1.0 + 1) / (r + 1), nullDistribution.pValue(draws[r - 1]));
        assertEquals(1.0 / (r + 1), nullDistribution.pValue(Math.nextUp(draws[r - 1])));
        for (double level : new double[] {0.01, 0.05, 0.10, 0.2371}) {
            double c = nullDistribution.criticalValue(level);
            assertTrue(nullDistribution.pValue(c) >= level, "at the critical value the test must not reject");
            assertTrue(nullDistribution.pValue(Math.nextUp(c)) < level, "just above it, it must");
        }
        // R = 1,999 at 5%: rejection allows at most 98 draws at or above sup F, so c is the 99th
        // largest, the 1,901st in increasing order.
        assertEquals(draws[1900], nullDistribution.criticalValue(0.05));
        assertTrue(Arrays.equals(draws, Arrays.stream(draws).sorted().toArray()));
    }

    @Test
    void refuses_too_few_replications_and_a_level_no_p_value_can_reach() {
        Design design = BreakSeries.trend(60);
        assertThrows(InvalidSpecificationException.class, () -> SupFNullDistribution.forDesign(design, 98));
        SupFNullDistribution nullDistribution = SupFNullDistribution.forDesign(design, 99);
        InvalidSpecificationException e = assertThrows(InvalidSpecificationException.class,
                () -> nullDistribution.criticalValue(0.01));
        assertTrue(e.getMessage().contains("can never reject"), e.getMessage());
        assertThrows(InvalidSpecificationException.class, () -> nullDistribution.pValue(Double.NaN));
    }

    @Test
    void default_replications_fall_from_1999_only_for_large_designs() {
        assertEquals(1999, SupFNullDistribution.defaultReplications(120, 2));
        assertEquals(1999, SupFNullDistribution.defaultReplications(1000, 13));
        // w = n (k + 20) + c k (k + 1)/2: 5,000 x 2 gives 120,502, so 1,999 w exceeds 2e8 and 999 w does not.
        assertEquals(999, SupFNullDistribution.defaultReplications(5000, 2));
        assertEquals(499, SupFNullDistribution.defaultReplications(5000, 13));
    }

    /** Rows (upper_tail, critical_value, mc_standard_error, sup_every_1, sup_every_4) for p = 2. */
    private static List<double[]> tableRowsForTwoParameters() throws IOException {
        List<double[]> rows = new ArrayList<>();
        try (InputStream in = SupWaldDistribution.class.getResourceAsStream("sup-wald-trim15.csv")) {
            BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                if (line.startsWith("2,")) {
                    String[] cells = line.split(",");
                    rows.add(new double[] {Double.parseDouble(cells[1]), Double.parseDouble(cells[2]),
                        Double.parseDouble(cells[3]), Double.parseDouble(cells[4]), Double.parseDouble(cells[5])});
                }
            }
        }
        return rows;
    }

    /** Columns 1, t, ..., t^degree for t = 1..n. */
    static Design polynomialTrend(int n, int degree) {
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int power = 0; power <= degree; power++) {
            double[] column = new double[n];
            for (int t = 0; t < n; t++) {
                column[t] = Math.pow(t + 1, power);
            }
            columns.add(column);
            names.add("t^" + power);
        }
        return new Design(columns, names, true);
    }
}
