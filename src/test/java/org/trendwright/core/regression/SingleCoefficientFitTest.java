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
 * lighter path must not change a bit of them.
 */
class SingleCoefficientFitTest {

    @ParameterizedTest
    @EnumSource(NistDataset.class)
    void equals_the_full_fit_bit_for_bit_for_every_coefficient_of_every_nist_strd_linear_dataset(NistDataset dataset) {
        // NIST StRD linear least-squares datasets (https://www.itl.nist.gov/div898/strd/lls/lls.shtml)
        Design design = dataset.design();
        double[] y = dataset.response();
        OlsFit fit = LeastSquares.fit(design, y);
        for (Coefficient expected : fit.coefficients()) {
            SingleCoefficientFit single = LeastSquares.singleCoefficient(design, y, expected.name());
            assertEquals(expected.estimate(), single.estimate(), 0.0, expected.name());
            assertEquals(expected.standardError(), single.standardError(), 0.0, expected.name());
            assertEquals(expected.tStatistic(), single.tStatistic(), 0.0, expected.name());
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
