package org.trendwright.core.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * {@link LeastSquares#singleCoefficient} reports one coefficient, its standard error and the RSS of
 * {@link LeastSquares#fit}, which {@link NistStrdTest} checks against NIST's certified values; the
 * lighter path must not change a bit of the estimate and RSS, and its standard error may differ only
 * by the rounding of the refined (X'X)^-1.
 */
class SingleCoefficientFitTest {

    @ParameterizedTest
    @EnumSource(NistDataset.class)
    void agrees_with_the_full_fit_for_every_coefficient_of_every_nist_strd_linear_dataset(NistDataset dataset) {
        // NIST StRD linear least-squares datasets (https://www.itl.nist.gov/div898/strd/lls/lls.shtml)
        Design design = dataset.design();
        double[] y = dataset.response();
        OlsFit fit = LeastSquares.fit(design, y);
        for (Coefficient expected : fit.coefficients()) {
            SingleCoefficientFit single = LeastSquares.singleCoefficient(design, y, expected.name());
            assertEquals(expected.estimate(), single.estimate(), 0.0, expected.name());
            // Bit for bit where (X'X)^-1 is used unrefined; where it is refined (Filip, 2.7e-13 apart),
            // to the refined inverse's accuracy, about cond(X)^2 u^2 = 3e-13 relative (GramInverse).
            assertEquals(expected.standardError(), single.standardError(), 1e-12 * expected.standardError(),
                    expected.name());
            assertEquals(expected.tStatistic(), single.tStatistic(), 1e-12 * Math.abs(expected.tStatistic()),
                    expected.name());
            assertEquals(fit.residualSumOfSquares(), single.residualSumOfSquares(), 0.0);
            assertEquals(fit.observations(), single.observations());
        }
    }

    @Test
    void names_the_regressor_it_cannot_find() {
        Design design = new Design(List.of(new double[] {1, 2, 3}), List.of("x"), false);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LeastSquares.singleCoefficient(design, new double[] {1, 2, 4}, "z"));
        assertEquals("No regressor named 'z'.", e.getMessage());
    }
}
