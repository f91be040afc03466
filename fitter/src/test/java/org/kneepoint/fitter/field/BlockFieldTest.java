package org.kneepoint.fitter.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.units.MagneticConstant;

class BlockFieldTest {

    private static final double BR = 1.1;
    private final BlockShape block = new BlockShape(1.0, 0.6, 0.4);
    private final BlockField field = new BlockField(block, BR);

    @ParameterizedTest
    @CsvSource({"0.0", "0.05", "0.3", "1.0", "12.0"})
    void on_axis_field_follows_the_solid_angle_of_a_rectangle(double distance) {
        // Bz = (Br/π)·[atan(ab/(z·√(a² + b² + z²))) − atan(ab/((z + L)·√(a² + b² + (z + L)²)))], z from the pole face
        // (docs/references.md §4a; Engel-Herbert & Hesjedal 2005)
        double a = 0.5;
        double b = 0.3;
        double length = 0.4;
        double z = distance;
        double expected = BR / Math.PI * (Math.atan(a * b / (z * Math.sqrt(a * a + b * b + z * z)))
                - Math.atan(a * b / ((z + length) * Math.sqrt(a * a + b * b + (z + length) * (z + length)))));
        FieldVector above = field.fluxDensity(0, 0, 0.2 + distance);
        assertEquals(expected, above.z(), 1e-14);
        assertEquals(0, above.x(), 1e-15);
        assertEquals(0, above.y(), 1e-15);
        assertEquals(expected, field.fluxDensity(0, 0, -0.2 - distance).z(), 1e-14);
    }

    @ParameterizedTest
    @CsvSource({"0.2, 0.1, 0.5", "0.7, -0.1, 0.05", "0.1, 0.1, -0.1", "0.0, 0.5, 0.0", "1.2, 0.9, -0.8", "-0.3, 0.05, 0.0"})
    void field_agrees_with_numerical_integration_over_the_charged_faces(double x, double y, double z) {
        // direct quadrature of the face charges ±M, Hipparchus integrator
        double[] expected = FaceChargeQuadrature.block(0.5, 0.3, 0.2, BR, x, y, z);
        FieldAssertions.assertClose(expected, field.fluxDensity(x, y, z), 1e-6, "(" + x + ", " + y + ", " + z + ")");
    }

    @Test
    void far_field_is_the_dipole_of_moment_m_times_v() {
        // point dipole μ0·m = Br·V (Griffiths, Eq. 5.89); deviation of order (size/r)² = 1e-4 at r = 100
        double[][] points = {{0, 0, 100}, {100, 0, 0}, {0, -100, 0}, {40, 50, 70}, {-60, 30, -80}};
        for (double[] p : points) {
            double[] expected = FieldAssertions.dipole(BR * block.volume(), p[0], p[1], p[2]);
            FieldAssertions.assertClose(expected, field.fluxDensity(p[0], p[1], p[2]), 1e-3, "far point");
        }
    }

    @Test
    void internal_field_at_the_centre_is_minus_n0_times_m() {
        // H = B/μ0 − M at the centre equals −N0·M, N0 from the solid angle of the pole faces (PrismDemagnetization)
        double m = BR / MagneticConstant.MU0;
        assertEquals(-block.demagnetizingFactors().centrePoint() * m, field.fieldStrength(0, 0, 0).z(), 1e-12 * m);
    }

    @Test
    void mid_plane_average_of_the_field_gives_the_closed_form_fluxmetric_factor() {
        // Nf = 1 − ⟨Bz⟩/Br over the mid-plane (definition, Chen, Brug, Goldfarb 1991) from the face-charge field, against
        // the closed form derived in PrismDemagnetization; Hipparchus Gauss–Legendre over a quarter of the section
        double integral = integrate(x -> integrate(y -> field.fluxDensity(x, y, 0).z(), 0, 0.3), 0, 0.5);
        assertEquals(1 - integral / (0.15 * BR), block.demagnetizingFactors().fluxmetric(), 1e-10);
    }

    @Test
    void cube_centre_sees_one_third_of_m() {
        // uniformly magnetized cube: by symmetry each face subtends 4π/6, so H = −M/3 at the centre
        BlockField cube = new BlockField(new BlockShape(0.01, 0.01, 0.01), BR);
        assertEquals(-BR / MagneticConstant.MU0 / 3, cube.fieldStrength(0, 0, 0).z(), 1e-9);
    }

    @Test
    void normal_b_is_continuous_through_both_pole_faces() {
        // boundary condition B·n continuous; the face planes themselves count as outside
        assertEquals(field.fluxDensity(0.1, 0.1, 0.2 - 1e-10).z(), field.fluxDensity(0.1, 0.1, 0.2).z(), 1e-8);
        assertEquals(field.fluxDensity(0.1, 0.1, -0.2 + 1e-10).z(), field.fluxDensity(0.1, 0.1, -0.2).z(), 1e-8);
        assertEquals(field.fluxDensity(0.1, 0.1, -0.2 - 1e-10).z(), field.fluxDensity(0.1, 0.1, -0.2).z(), 1e-8);
    }

    private static double integrate(java.util.function.DoubleUnaryOperator f, double lower, double upper) {
        return new IterativeLegendreGaussIntegrator(16, 1e-12, 1e-15).integrate(Integer.MAX_VALUE, f::applyAsDouble, lower, upper);
    }

    @Test
    void field_is_finite_on_the_lines_that_extend_the_edges() {
        // the extension of an edge lies outside the magnet, where the field is smooth
        FieldVector b = field.fluxDensity(0.5, 2.0, 0.2);
        assertTrue(Double.isFinite(b.x()) && Double.isFinite(b.y()) && Double.isFinite(b.z()), b.toString());
        FieldAssertions.assertClose(FaceChargeQuadrature.block(0.5, 0.3, 0.2, BR, 0.5 + 1e-9, 2.0, 0.2 + 1e-9), b, 1e-6, "edge line");
    }
}
