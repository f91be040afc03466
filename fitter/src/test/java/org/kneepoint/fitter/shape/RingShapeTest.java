package org.kneepoint.fitter.shape;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.fitter.error.BadInputException;

class RingShapeTest {

    @ParameterizedTest
    @CsvSource({"1.0, 0.5, 1.0", "1.0, 0.2, 0.3", "1.0, 0.8, 2.0", "1.0, 0.95, 0.5", "1.0, 0.99, 1.0", "1.0, 0.5, 6.0", "1.0, 0.3, 0.05"})
    void superposed_factors_match_averages_of_the_derby_olbert_field(double outer, double inner, double length) {
        // Nm = 1 − ⟨Bz⟩/Br over the ring volume and Nf = 1 − ⟨Bz⟩/Br over the mid-plane annulus (definitions, Chen,
        // Brug, Goldfarb 1991), with Bz of outer minus inner cylinder from Derby & Olbert (Am. J. Phys. 78, 229, 2010)
        // and a graded Gauss–Legendre quadrature (Hipparchus); the two routes share only the cylinder face terms
        double a = outer / 2;
        double c = inner / 2;
        double b = length / 2;
        DemagnetizingFactors factors = new RingShape(outer, inner, length).demagnetizingFactors();
        double area = Math.PI * (a * a - c * c);
        double midPlane = GradedQuadrature.integrate(rho -> 2 * Math.PI * rho * bzOverBr(a, c, b, rho, 0), c, a) / area;
        assertEquals(1 - midPlane, factors.fluxmetric(), 1e-9);
        double volume = 2 * GradedQuadrature.integrate(z -> GradedQuadrature.integrate(
                rho -> 2 * Math.PI * rho * bzOverBr(a, c, b, rho, z), c, a), 0, b) / (area * 2 * b);
        assertEquals(1 - volume, factors.magnetometric(), 1e-7);
        assertEquals(1 - bzOverBr(a, c, b, (a + c) / 2, 0), factors.centrePoint(), 1e-15);
    }

    @ParameterizedTest
    @CsvSource({"0.3", "1.0", "3.0"})
    void ring_with_a_tiny_bore_approaches_the_solid_cylinder(double length) {
        // limit c → 0 of the superposition: the inner cylinder and the mutual term vanish like c²
        DemagnetizingFactors ring = new RingShape(1.0, 4e-3, length).demagnetizingFactors();
        DemagnetizingFactors cylinder = new CylinderShape(1.0, length).demagnetizingFactors();
        assertEquals(cylinder.magnetometric(), ring.magnetometric(), 1e-4);
        assertEquals(cylinder.fluxmetric(), ring.fluxmetric(), 1e-4);
    }

    @ParameterizedTest
    @CsvSource({"0.5", "0.9", "0.99"})
    void thin_walled_ring_has_a_smaller_factor_than_the_solid_cylinder(double boreRatio) {
        // a thin shell magnetized along its axis has less demagnetization than the solid cylinder of the same length
        // (field of the narrow end annuli spreads outwards); common practice, stated here as a sanity check
        assertTrue(new RingShape(1.0, boreRatio, 1.0).demagnetizingFactors().magnetometric()
                < new CylinderShape(1.0, 1.0).demagnetizingFactors().magnetometric());
    }

    private static double bzOverBr(double a, double c, double b, double rho, double z) {
        return (DerbyOlbertTerms.axial(a, rho, z + b) - DerbyOlbertTerms.axial(a, rho, z - b)
                - DerbyOlbertTerms.axial(c, rho, z + b) + DerbyOlbertTerms.axial(c, rho, z - b)) / Math.PI;
    }

    @ParameterizedTest
    @CsvSource({"0.010, 0.0099", "0.020, 0.0198", "0.003, 0.00297", "0.1, 0.0001"})
    void a_ring_typed_at_the_documented_bore_limit_is_accepted_despite_rounding(double outer, double inner) {
        // the bug: OD 10 mm, ID 9.9 mm gives 0.9900000000000001 and was refused as above 0.99
        RingShape ring = new RingShape(outer, inner, 0.005);
        assertTrue(ring.volume() > 0);
    }

    @Test
    void a_ring_past_the_bore_limit_is_still_refused() {
        assertThrows(BadInputException.class,
                () -> new RingShape(0.010, 0.00991, 0.005));
    }
}
