package org.kneepoint.fitter.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.RingShape;
import org.kneepoint.fitter.units.MagneticConstant;

class CylinderFieldTest {

    private static final double BR = 1.3;
    private final CylinderShape cylinder = new CylinderShape(1.0, 0.8);
    private final CylinderField field = new CylinderField(cylinder, BR);

    @ParameterizedTest
    @CsvSource({"0.41", "0.6", "1.5", "7.0", "-2.0", "0.0", "0.2", "-0.39"})
    void on_axis_field_follows_the_solid_angle_formula(double z) {
        // B(z) = (Br/2)·[(z + L/2)/√(R² + (z + L/2)²) − (z − L/2)/√(R² + (z − L/2)²)] (docs/references.md §4a, standard);
        // the same expression for B holds inside, where B = μ0·(H + M)
        double r = 0.5;
        double half = 0.4;
        double expected = BR / 2 * ((z + half) / Math.hypot(r, z + half) - (z - half) / Math.hypot(r, z - half));
        FieldVector b = field.fluxDensity(0, 0, z);
        assertEquals(expected, b.z(), 1e-14);
        assertEquals(0, b.x(), 0);
        assertEquals(0, b.y(), 0);
    }

    @ParameterizedTest
    @CsvSource({"0.2, 0.1, 0.7", "0.8, -0.3, 0.1", "0.1, 0.2, -0.15", "0.0, 0.3, 0.6", "1.3, 0.9, -1.1", "0.3, 0.0, 0.0"})
    void field_agrees_with_numerical_integration_over_the_charged_faces(double x, double y, double z) {
        // direct quadrature of the face charges ±M (Coulomb's law for magnetic charge), Hipparchus integrator
        double[] expected = FaceChargeQuadrature.coaxial(0.5, 0, 0.4, BR, x, y, z);
        FieldAssertions.assertClose(expected, field.fluxDensity(x, y, z), 1e-6, "(" + x + ", " + y + ", " + z + ")");
    }

    @Test
    void far_field_is_the_dipole_of_moment_m_times_v() {
        // point dipole μ0·m = Br·V (Griffiths, Introduction to Electrodynamics, Eq. 5.89); the next multipole of this
        // symmetric magnet falls off as (size/r)², so at r = 100 sizes the deviation is below 1e-3
        double[][] points = {{0, 0, 100}, {100, 0, 0}, {40, 50, 70}, {-60, 30, -80}};
        for (double[] p : points) {
            double[] expected = FieldAssertions.dipole(BR * cylinder.volume(), p[0], p[1], p[2]);
            FieldAssertions.assertClose(expected, field.fluxDensity(p[0], p[1], p[2]), 1e-3, "far point");
        }
    }

    @Test
    void internal_field_at_the_centre_is_minus_n0_times_m() {
        // H = B/μ0 − M; at the centre −H/M = N0 = 1 − γ/√(γ² + 1) (solid angle of the end discs)
        double m = BR / MagneticConstant.MU0;
        FieldVector h = field.fieldStrength(0, 0, 0);
        assertEquals(-cylinder.demagnetizingFactors().centrePoint() * m, h.z(), 1e-12 * m);
        assertTrue(field.isInside(0, 0, 0));
        assertEquals(field.fluxDensity(0.7, 0, 0.1).z() / MagneticConstant.MU0, field.fieldStrength(0.7, 0, 0.1).z(), 1e-9);
    }

    @Test
    void normal_b_is_continuous_through_a_pole_face_and_h_jumps_by_m() {
        // boundary conditions of magnetostatics: B·n continuous, H·n jumps by M·n across the face
        double justInside = 0.4 - 1e-9;
        double justOutside = 0.4 + 1e-9;
        assertEquals(field.fluxDensity(0.2, 0.1, justInside).z(), field.fluxDensity(0.2, 0.1, justOutside).z(), 1e-7);
        double m = BR / MagneticConstant.MU0;
        assertEquals(m, field.fieldStrength(0.2, 0.1, justOutside).z() - field.fieldStrength(0.2, 0.1, justInside).z(), 1e-6 * m);
    }

    @Test
    void ring_field_agrees_with_numerical_integration_over_the_annular_faces() {
        // direct quadrature of the annulus charges ±M, as above
        RingField ring = new RingField(new RingShape(1.0, 0.4, 0.6), BR);
        double[][] points = {{0, 0, 0}, {0.35, 0.1, 0.05}, {0.1, 0.05, 0.5}, {0.9, -0.4, 0.2}};
        for (double[] p : points) {
            double[] expected = FaceChargeQuadrature.coaxial(0.5, 0.2, 0.3, BR, p[0], p[1], p[2]);
            FieldAssertions.assertClose(expected, ring.fluxDensity(p[0], p[1], p[2]), 1e-6, "ring point");
        }
        assertTrue(ring.isInside(0.35, 0.1, 0.05));
        assertTrue(!ring.isInside(0, 0, 0));
    }

    @Test
    void mid_plane_average_of_the_field_gives_the_closed_form_fluxmetric_factor() {
        // Nf = 1 − ⟨Bz⟩/Br over the mid-plane disc (definition, Chen, Brug, Goldfarb 1991) from the Derby–Olbert field,
        // against the closed form derived in CylinderDemagnetization; Hipparchus Gauss–Legendre
        double average = new IterativeLegendreGaussIntegrator(16, 1e-12, 1e-15).integrate(Integer.MAX_VALUE,
                rho -> 2 * rho * field.fluxDensity(rho, 0, 0).z(), 0, 0.5) / (0.25 * BR);
        assertEquals(1 - average, cylinder.demagnetizingFactors().fluxmetric(), 1e-10);
    }

    @Test
    void bad_remanence_is_rejected() {
        BadInputException error = assertThrows(BadInputException.class, () -> new CylinderField(cylinder, -1.2));
        assertTrue(error.getMessage().contains("remanence must be a positive finite flux density in tesla, got -1.2"));
    }
}
