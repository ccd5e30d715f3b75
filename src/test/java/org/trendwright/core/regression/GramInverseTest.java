package org.trendwright.core.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * {@link GramInverse#refinedColumn} refines one column of (X'X)^-1 with the residual formed as
 * X'(X z) instead of from X'X; it must agree with that column of {@link GramInverse#refined} to the
 * refined inverse's accuracy, about cond(X)^2 u^2 relative (3e-13 on Filip), on the designs whose
 * standard errors NIST certifies.
 */
class GramInverseTest {

    @ParameterizedTest
    @EnumSource(NistDataset.class)
    void one_refined_column_agrees_with_the_refined_inverse_on_every_nist_strd_linear_dataset(NistDataset dataset) {
        // NIST StRD linear least-squares datasets (https://www.itl.nist.gov/div898/strd/lls/lls.shtml)
        double[][] x = ScaledDesign.of(dataset.design()).columns();
        PivotedQr qr = PivotedQr.factor(x);
        double[][] whole = GramInverse.refined(x, qr);
        for (int j = 0; j < x.length; j++) {
            double[] column = GramInverse.refinedColumn(x, qr, j);
            double largest = 0;
            for (double[] row : whole) {
                largest = Math.max(largest, Math.abs(row[j]));
            }
            for (int i = 0; i < x.length; i++) {
                assertEquals(whole[i][j], column[i], 1e-12 * largest, "entry (" + i + ", " + j + ")");
            }
        }
    }
}
