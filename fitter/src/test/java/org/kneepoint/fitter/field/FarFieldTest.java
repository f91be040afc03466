package org.kneepoint.fitter.field;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.RingShape;

/**
 * Far fields against the multipole terms written out by hand, and near the switch against the closed forms.
 * Axisymmetric magnets (cylinder, ring): Φ = (1/4π)·Σ q_l·P_l(cos θ)/r^(l+1) with q_l = ∫σ·r'^l·P_l(cos θ') dA
 * over the charged faces (Legendre expansion of 1/|r − r'|, J. D. Jackson, Classical Electrodynamics, 3rd ed.,
 * 1999, §3.3 and §4.1, from memory), so Br = (Br/4π)·Σ (l + 1)·Q_l·P_l/r^(l+2), Bθ = (Br/4π)·Σ Q_l·sin θ·P_l'/r^(l+2)
 * with Q_l = q_l/M. For a cylinder of radius a, half-length b: Q_1 = 2π·a²·b (the dipole M·V) and
 * Q_3 = 4π·(a²·b³/2 − 3·a⁴·b/8) (the octupole; r'³P_3 = z³ − (3/2)·z·ρ², integrated over the two discs, here).
 * Block: the dipole plus the quadrupole of the volume, ψ₂ = (1/8π)·(3·Σ I_jj·x_j² − r²·Σ I_jj)/r⁵ with
 * I_jj = V·h_j²/3, differentiated by hand (B = Br·∇∂_zψ).
 */
class FarFieldTest {

    private static final double BR = 1.3;

    private static void assertClose(double[] expected, FieldVector actual, double relative, String where) {
        double size = Math.sqrt(expected[0] * expected[0] + expected[1] * expected[1] + expected[2] * expected[2]);
        double error = Math.sqrt(Math.pow(actual.x() - expected[0], 2) + Math.pow(actual.y() - expected[1], 2)
                + Math.pow(actual.z() - expected[2], 2));
        assertTrue(error <= relative * size, where + ": relative error " + error / size);
    }

    /** Dipole + octupole of an axisymmetric magnet with geometric moments q1, q3 at (x, y, z). */
    private static double[] axisymmetric(double q1, double q3, double x, double y, double z) {
        double rho = Math.hypot(x, y);
        double r = Math.sqrt(rho * rho + z * z);
        double c = z / r;
        double s = rho / r;
        double p3 = (5 * c * c * c - 3 * c) / 2;
        double dp3 = (15 * c * c - 3) / 2;
        double scale = BR / (4 * Math.PI);
        double br = scale * (2 * q1 * c / Math.pow(r, 3) + 4 * q3 * p3 / Math.pow(r, 5));
        double bt = scale * (q1 * s / Math.pow(r, 3) + q3 * s * dp3 / Math.pow(r, 5));
        double bRho = br * s + bt * c;
        double bz = br * c - bt * s;
        return new double[] {rho == 0 ? 0 : bRho * x / rho, rho == 0 ? 0 : bRho * y / rho, bz};
    }

    private static double octupole(double a, double b) {
        return 4 * Math.PI * (a * a * b * b * b / 2 - 3 * a * a * a * a * b / 8);
    }

    /** Dipole + volume quadrupole of a block with half-edges h at (x, y, z). */
    private static double[] block(double[] h, double x, double y, double z) {
        double volume = 8 * h[0] * h[1] * h[2];
        double[] inertia = {volume * h[0] * h[0] / 3, volume * h[1] * h[1] / 3, volume * h[2] * h[2] / 3};
        double[] p = {x, y, z};
        double r2 = x * x + y * y + z * z;
        double r = Math.sqrt(r2);
        double trace = inertia[0] + inertia[1] + inertia[2];
        double sum = inertia[0] * x * x + inertia[1] * y * y + inertia[2] * z * z;
        double[] b = new double[3];
        for (int i = 0; i < 3; i++) {
            double delta = i == 2 ? 1 : 0;
            double dipole = volume / (4 * Math.PI) * (3 * z * p[i] / Math.pow(r, 5) - delta / Math.pow(r, 3));
            double g = (6 * inertia[2] + 3 * trace) * (delta / Math.pow(r, 5) - 5 * z * p[i] / Math.pow(r, 7))
                    - 15 * (2 * inertia[i] * p[i] * z / Math.pow(r, 7) + sum * delta / Math.pow(r, 7)
                    - 7 * sum * z * p[i] / Math.pow(r, 9));
            b[i] = BR * (dipole + g / (8 * Math.PI));
        }
        return b;
    }

    /** Unit directions: the axis, the mid-plane, an oblique one, and the block's diagonal. */
    private static final double[][] DIRECTIONS = {{0, 0, 1}, {1, 0, 0}, {0.5, 0, Math.sqrt(3) / 2},
        {1 / Math.sqrt(3), 1 / Math.sqrt(3), 1 / Math.sqrt(3)}, {-0.3, 0.8, -Math.sqrt(1 - 0.73)}};

    @ParameterizedTest
    @ValueSource(doubles = {1e3, 1e5, 1e7})
    void cylinder_far_field_is_the_dipole_plus_octupole_to_a_billionth(double sizes) {
        CylinderShape shape = new CylinderShape(0.010, 0.004);
        MagnetField field = new CylinderField(shape, BR);
        double a = 0.005;
        double b = 0.002;
        for (double[] u : DIRECTIONS) {
            double d = sizes * 0.010;
            double[] expected = axisymmetric(2 * Math.PI * a * a * b, octupole(a, b), d * u[0], d * u[1], d * u[2]);
            assertClose(expected, field.fluxDensity(d * u[0], d * u[1], d * u[2]), 1e-9, sizes + " sizes along " + u[0]
                    + "," + u[1] + "," + u[2]);
        }
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e3, 1e5, 1e7})
    void ring_far_field_is_the_dipole_plus_octupole_to_a_billionth(double sizes) {
        MagnetField field = new RingField(new RingShape(0.020, 0.012, 0.005), BR);
        double b = 0.0025;
        double q1 = 2 * Math.PI * (0.01 * 0.01 - 0.006 * 0.006) * b;
        double q3 = octupole(0.01, b) - octupole(0.006, b);
        for (double[] u : DIRECTIONS) {
            double d = sizes * 0.020;
            assertClose(axisymmetric(q1, q3, d * u[0], d * u[1], d * u[2]), field.fluxDensity(d * u[0], d * u[1], d * u[2]),
                    1e-9, sizes + " sizes");
        }
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e3, 1e5, 1e7})
    void block_far_field_is_the_dipole_plus_quadrupole_to_a_billionth_also_along_the_diagonal(double sizes) {
        MagnetField field = new BlockField(new BlockShape(0.020, 0.010, 0.005), BR);
        double[] h = {0.010, 0.005, 0.0025};
        for (double[] u : DIRECTIONS) {
            double d = sizes * 0.020;
            assertClose(block(h, d * u[0], d * u[1], d * u[2]), field.fluxDensity(d * u[0], d * u[1], d * u[2]), 1e-9,
                    sizes + " sizes along " + u[0] + "," + u[1] + "," + u[2]);
        }
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e5, 1e7})
    void a_cube_seen_along_its_diagonal_far_away_has_the_dipole_field_with_its_sign(double sizes) {
        // the bug: the closed form's face terms cancelled and came out 35 % off with the wrong sign;
        // a cube's volume quadrupole is isotropic and adds nothing, so the dipole alone is exact to (R/r)⁴
        MagnetField field = new BlockField(new BlockShape(0.010, 0.010, 0.010), BR);
        double d = sizes * 0.010 / Math.sqrt(3);
        double[] expected = block(new double[] {0.005, 0.005, 0.005}, d, d, d);
        FieldVector b = field.fluxDensity(d, d, d);
        // along the diagonal the dipole field 3(m·u)u − m is (1, 1, 0)·m/√3…: Bx = By > 0 and Bz = 0
        assertTrue(b.x() > 0 && b.y() > 0 && Math.abs(b.z()) < 1e-9 * b.magnitude(), "B along the diagonal: " + b);
        assertClose(expected, b, 1e-9, "diagonal");
    }

    // 20 enclosing radii is more than 10 sizes (largest dimension) of each of the three magnets
    @ParameterizedTest
    @ValueSource(doubles = {25.000001, 20, 10, 5, 4})
    void from_four_enclosing_radii_to_the_switch_the_expansion_matches_the_closed_forms(double radii) {
        double[] target = new double[3];
        for (double[] u : DIRECTIONS) {
            // cylinder D 10 mm, L 4 mm: enclosing radius √(5² + 2²) mm
            double enclosing = Math.hypot(0.005, 0.002);
            double d = radii * enclosing;
            double[] exact = new double[3];
            CylinderField.accumulate(0.005, 0.002, BR / Math.PI, d * u[0], d * u[1], d * u[2], exact, 0);
            MultipoleExpansion.fluxDensityInto(BR, enclosing, VolumeMoments.cylinder(0.005, 0.002, enclosing), d * u[0],
                    d * u[1], d * u[2], target, 0);
            assertClose(exact, new FieldVector(target[0], target[1], target[2]), 1e-9, "cylinder at " + radii);
            // ring OD 20, ID 12, L 5 mm
            double ringEnclosing = Math.hypot(0.010, 0.0025);
            double e = radii * ringEnclosing;
            double[] ring = new double[3];
            CylinderField.accumulate(0.010, 0.0025, BR / Math.PI, e * u[0], e * u[1], e * u[2], ring, 0);
            CylinderField.accumulate(0.006, 0.0025, -BR / Math.PI, e * u[0], e * u[1], e * u[2], ring, 0);
            MultipoleExpansion.fluxDensityInto(BR, ringEnclosing, VolumeMoments.ring(0.010, 0.006, 0.0025, ringEnclosing),
                    e * u[0], e * u[1], e * u[2], target, 0);
            assertClose(ring, new FieldVector(target[0], target[1], target[2]), 1e-9, "ring at " + radii);
            // block 20 × 10 × 5 mm
            double blockEnclosing = Math.sqrt(0.01 * 0.01 + 0.005 * 0.005 + 0.0025 * 0.0025);
            double f = radii * blockEnclosing;
            double[] closed = new double[3];
            BlockField.closedFormInto(0.01, 0.005, 0.0025, BR, f * u[0], f * u[1], f * u[2], closed, 0);
            MultipoleExpansion.fluxDensityInto(BR, blockEnclosing, VolumeMoments.block(0.01, 0.005, 0.0025, blockEnclosing),
                    f * u[0], f * u[1], f * u[2], target, 0);
            assertClose(closed, new FieldVector(target[0], target[1], target[2]), 1e-9, "block at " + radii);
        }
    }
}
