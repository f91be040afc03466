package org.kneepoint.fitter.field;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.kneepoint.fitter.shape.SpheroidShape;
import org.kneepoint.fitter.units.MagneticConstant;

class SpheroidFieldTest {

    private static final double BR = 1.2;

    @Test
    void sphere_has_uniform_internal_field_of_two_thirds_and_a_pure_dipole_outside() {
        // uniformly magnetized sphere: B = (2/3)·μ0·M inside, exact dipole of moment M·V outside
        // (D. J. Griffiths, Introduction to Electrodynamics, Ex. 6.1 and Eq. 5.89), computed through the spheroid code
        SpheroidShape sphere = SpheroidShape.sphere(0.02);
        SpheroidField field = new SpheroidField(sphere, BR);
        FieldVector inside = field.fluxDensity(0.003, -0.002, 0.005);
        assertEquals(2.0 / 3 * BR, inside.z(), 1e-15);
        assertEquals(0, inside.x(), 0);
        assertEquals(-BR / MagneticConstant.MU0 / 3, field.fieldStrength(0, 0, 0).z(), 1e-9);
        double[][] points = {{0, 0, 0.0101}, {0.012, 0, 0}, {0.01, 0.02, -0.015}, {-0.3, 0.2, 0.1}};
        for (double[] p : points) {
            double[] expected = FieldAssertions.dipole(BR * sphere.volume(), p[0], p[1], p[2]);
            FieldAssertions.assertClose(expected, field.fluxDensity(p[0], p[1], p[2]), 1e-13, "outside the sphere");
        }
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.05, 0.4, 0.995, 1.005, 2.5, 20.0})
    void boundary_conditions_hold_on_the_surface(double ratio) {
        // magnetostatics: B·n continuous and H tangential continuous across the surface (Griffiths §6.3.3)
        SpheroidShape shape = new SpheroidShape(2.0, 2.0 * ratio);
        SpheroidField field = new SpheroidField(shape, BR);
        double angle = 0.7;
        double a = 1.0;
        double c = ratio;
        double x = a * Math.sin(angle);
        double z = c * Math.cos(angle);
        double nx = x / (a * a);
        double nz = z / (c * c);
        double norm = Math.hypot(nx, nz);
        nx /= norm;
        nz /= norm;
        double step = 1e-9;
        FieldVector in = field.fluxDensity(x - step * nx, 0, z - step * nz);
        FieldVector out = field.fluxDensity(x + step * nx, 0, z + step * nz);
        assertEquals(in.x() * nx + in.z() * nz, out.x() * nx + out.z() * nz, 1e-6 * BR);
        double tangentIn = in.x() * nz - (in.z() - BR) * nx;
        double tangentOut = out.x() * nz - out.z() * nx;
        assertEquals(tangentIn, tangentOut, 1e-6 * BR);
    }

    @Test
    void far_field_of_a_prolate_spheroid_is_the_dipole_of_moment_m_times_v() {
        // point dipole μ0·m = Br·V (Griffiths, Eq. 5.89), deviation of order (size/r)²
        SpheroidShape shape = new SpheroidShape(1.0, 3.0);
        SpheroidField field = new SpheroidField(shape, BR);
        double[] expected = FieldAssertions.dipole(BR * shape.volume(), 60, 20, 300);
        FieldAssertions.assertClose(expected, field.fluxDensity(60, 20, 300), 1e-4, "far point");
    }
}
