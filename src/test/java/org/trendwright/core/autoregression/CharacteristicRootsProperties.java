package org.trendwright.core.autoregression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import org.junit.jupiter.api.Test;

/**
 * The companion-matrix roots against closed forms: for AR(2) the companion eigenvalues solve
 * λ² − φ1 λ − φ2 = 0, and the stationary region is the triangle φ1 + φ2 < 1, φ2 − φ1 < 1,
 * |φ2| < 1 (Box & Jenkins 1970, Time Series Analysis, section 3.2.4).
 */
class CharacteristicRootsProperties {

    @Test
    void largest_modulus_of_an_ar2_equals_that_of_the_quadratic_formula_roots() {
        // Eigenvalues near a double root are accurate to about sqrt(machine epsilon) times their size
        // (a defective pair), so 1e-6 on coefficients up to 2 in size.
        qt().withFixedSeed(20).withExamples(2000).forAll(doubles().between(-2, 2), doubles().between(-2, 2))
                .checkAssert((phi1, phi2) -> assertEquals(quadraticLargestModulus(phi1, phi2),
                        CharacteristicRoots.largestModulus(new double[] {phi1, phi2}), 1e-6));
    }

    @Test
    void stationary_exactly_inside_the_ar2_triangle_away_from_its_edges() {
        qt().withFixedSeed(21).withExamples(2000).forAll(doubles().between(-2, 2), doubles().between(-1.2, 1.2))
                .assuming((phi1, phi2) -> distanceToTriangleEdges(phi1, phi2) > 1e-3)
                .checkAssert((phi1, phi2) -> assertEquals(phi1 + phi2 < 1 && phi2 - phi1 < 1 && Math.abs(phi2) < 1,
                        CharacteristicRoots.assess(0, new double[] {phi1, phi2}, false).stationary()));
    }

    @Test
    void an_exact_double_unit_root_is_not_passed_as_stationary() {
        // (1 - B)^2: phi = (2, -1); the solver returns moduli a few ulps below 1.
        assertFalse(CharacteristicRoots.assess(0, new double[] {2, -1}, false).stationary());
        assertFalse(CharacteristicRoots.assess(0, new double[] {1}, false).stationary());
    }

    private static double quadraticLargestModulus(double phi1, double phi2) {
        double discriminant = phi1 * phi1 + 4 * phi2;
        if (discriminant < 0) {
            return Math.sqrt(-phi2);
        }
        double root = Math.sqrt(discriminant);
        return Math.max(Math.abs((phi1 + root) / 2), Math.abs((phi1 - root) / 2));
    }

    private static double distanceToTriangleEdges(double phi1, double phi2) {
        return Math.min(Math.min(Math.abs(phi1 + phi2 - 1), Math.abs(phi2 - phi1 - 1)), Math.abs(Math.abs(phi2) - 1));
    }
}
