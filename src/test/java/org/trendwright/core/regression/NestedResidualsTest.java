package org.trendwright.core.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.core.InvalidSpecificationException;

/**
 * {@link LeastSquares#nestedResidualSumsOfSquares}: one unpivoted QR for every leading block of
 * columns, checked against separate full fits of each block, whose digits {@link NistStrdTest}
 * checks against NIST's certified values.
 */
class NestedResidualsTest {

    @ParameterizedTest
    @EnumSource(value = NistDataset.class, names = "FILIP", mode = EnumSource.Mode.EXCLUDE)
    void every_leading_block_of_a_nist_strd_design_matches_its_own_fit(NistDataset dataset) {
        // NIST StRD linear least-squares datasets (https://www.itl.nist.gov/div898/strd/lls/lls.shtml).
        // Filip is left out: at condition number 5e9 an unscaled, unrefined QR keeps only a few digits
        // of its RSS, which the refined fit is there for.
        Design design = dataset.design();
        double[] y = dataset.response();
        int[] widths = IntStream.rangeClosed(1, design.width()).toArray();
        double[] nested = LeastSquares.nestedResidualSumsOfSquares(design, y, widths);
        double scale = LeastSquares.sumOfSquares(y, 0);
        for (int m = 1; m <= design.width(); m++) {
            Design block = new Design(design.columns().subList(0, m), design.names().subList(0, m),
                    design.hasIntercept());
            double separate = LeastSquares.fit(block, y).residualSumOfSquares();
            // Householder QR is backward stable: RSS to about u cond(X)^2 relative, and to u ||y||^2
            // absolute where the fit is exact (Wampler1, Wampler2); Longley's cond^2 is about 1e16 unscaled,
            // but the QR is invariant to column scaling and its scaled cond is near 1e4.
            assertEquals(separate, nested[m - 1], 1e-7 * separate + 1e-13 * scale, dataset + " first " + m + " columns");
        }
    }

    @Test
    void an_empty_block_leaves_the_whole_sum_of_squares_and_a_redundant_column_changes_nothing() {
        // Common practice: regressing on nothing leaves sum y^2; a repeated column adds nothing.
        double[] x = {1, 2, 3, 4, 5};
        double[] y = {2.1, 3.9, 6.2, 7.8, 10.1};
        Design design = new Design(List.of(x, x.clone()), List.of("x", "x again"), false);
        double[] rss = LeastSquares.nestedResidualSumsOfSquares(design, y, new int[] {0, 1, 2});
        assertEquals(LeastSquares.sumOfSquares(y, 0), rss[0], 1e-13);
        assertEquals(rss[1], rss[2], 1e-13);
        Design one = new Design(List.of(x), List.of("x"), false);
        assertEquals(LeastSquares.fit(one, y).residualSumOfSquares(), rss[1], 1e-13);
    }

    @Test
    void a_redundant_column_between_independent_ones_changes_nothing_either() {
        // Common practice: the span of [x, 2x, z] is that of [x, z], so their least-squares fits agree.
        double[] x = {1, 2, 3, 4, 5, 6};
        double[] doubled = {2, 4, 6, 8, 10, 12};
        double[] z = {1, -1, 2, 0, 3, -2};
        double[] y = {2.1, 3.9, 6.2, 7.8, 10.1, 11.7};
        Design design = new Design(List.of(x, doubled, z), List.of("x", "2x", "z"), false);
        double[] rss = LeastSquares.nestedResidualSumsOfSquares(design, y, new int[] {1, 2, 3});
        Design withoutRedundant = new Design(List.of(x, z), List.of("x", "z"), false);
        assertEquals(rss[0], rss[1], 1e-13);
        assertEquals(LeastSquares.fit(withoutRedundant, y).residualSumOfSquares(), rss[2], 1e-13);
    }

    @Test
    void refuses_a_width_beyond_the_design() {
        Design design = new Design(List.of(new double[] {1, 2, 3}), List.of("x"), false);
        assertThrows(InvalidSpecificationException.class,
                () -> LeastSquares.nestedResidualSumsOfSquares(design, new double[] {1, 2, 4}, new int[] {2}));
    }
}
