package org.trendwright.core.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.core.Matrices;
import org.trendwright.testing.ReferenceData;

/**
 * {@link NormalEquations} on the NIST StRD linear least-squares datasets
 * (https://www.itl.nist.gov/div898/strd/lls/lls.shtml), copied under
 * src/test/resources/reference/nist-strd: where it answers, NIST's certified coefficients to the
 * normal equations' error bound; where the design is ill conditioned, no answer.
 */
class NormalEquationsTest {

    /**
     * c u cond^2 for cond(X D) up to a few hundred (Higham 2002, Accuracy and Stability of Numerical
     * Algorithms, 2nd ed., section 20.4), u = 1.1e-16.
     */
    private static final double NORMAL_EQUATIONS_BOUND = 1e-10;

    /**
     * The datasets whose unit-scaled columns pass the pivot test: a straight line (Norris), a
     * quadratic (Pontius) and a single regressor without intercept (NoInt1, NoInt2). The others are
     * polynomials of degree 5 and 10 in x and Longley's nearly collinear x1..x6; their cond(X D)
     * lies far above 100.
     */
    private static final Set<NistDataset> WELL_CONDITIONED = Set.of(NistDataset.NORRIS, NistDataset.PONTIUS,
            NistDataset.NOINT1, NistDataset.NOINT2);

    @ParameterizedTest
    @EnumSource(NistDataset.class)
    void answers_the_well_conditioned_datasets_to_the_bound_and_declines_the_others(NistDataset dataset) {
        Design design = dataset.design();
        double[] y = dataset.response();
        int k = design.width();
        double[][] gram = Matrices.zeros(k, k);
        double[] moment = new double[k];
        double[] row = new double[k];
        for (int i = 0; i < y.length; i++) {
            for (int j = 0; j < k; j++) {
                row[j] = design.get(i, j);
            }
            NormalEquations.addRow(row, y[i], gram, moment);
        }
        Optional<double[]> b = NormalEquations.solve(gram, moment);
        assertEquals(WELL_CONDITIONED.contains(dataset), b.isPresent(), dataset.title);
        if (b.isPresent()) {
            double[] certified = certifiedCoefficients(dataset);
            for (int j = 0; j < k; j++) {
                assertEquals(certified[j], b.get()[j], NORMAL_EQUATIONS_BOUND * Math.abs(certified[j]),
                        dataset.title + " b" + (j + 1));
            }
        }
    }

    private static double[] certifiedCoefficients(NistDataset dataset) {
        double[] certified = ReferenceData.rows("nist-strd/" + dataset.title + ".certified.csv").stream()
                .filter(row -> row[0].startsWith("coef_B"))
                .mapToDouble(row -> Double.parseDouble(row[1]))
                .toArray();
        assertTrue(certified.length > 0, dataset.title);
        return certified;
    }
}
