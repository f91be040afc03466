package org.kneepoint.fitter.shape;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class PrismDemagnetizationTest {

    private static final double[][] HALF_EDGES = {{1, 1, 1}, {1, 2, 3}, {0.5, 0.5, 5}, {5, 5, 0.5}, {1, 50, 0.5}, {0.5, 0.5, 50},
        {50, 50, 0.5}, {3, 0.7, 1.1}};

    @Test
    void cube_has_one_third_by_symmetry() {
        // symmetry and the sum rule Nx + Ny + Nz = 1 (docs/references.md §2a); the centre value is 1/3 because each of the six
        // faces subtends 4π/6 from the centre
        assertEquals(1.0 / 3, PrismDemagnetization.magnetometric(1, 1, 1), 1e-14);
        assertEquals(1.0 / 3, PrismDemagnetization.centrePoint(2, 2, 2), 1e-15);
    }

    @Test
    void cyclic_sum_of_aharoni_factors_is_one() {
        // sum rule Dx + Dy + Dz = 1, with Dx = Dz(b, c, a), Dy = Dz(c, a, b) (Aharoni 1998, docs/references.md §2a)
        for (double[] e : HALF_EDGES) {
            double sum = PrismDemagnetization.magnetometric(e[0], e[1], e[2]) + PrismDemagnetization.magnetometric(e[1], e[2], e[0])
                    + PrismDemagnetization.magnetometric(e[2], e[0], e[1]);
            assertEquals(1.0, sum, 1e-12);
        }
    }

    @Test
    void aharoni_agrees_with_the_beleggia_de_graef_millev_closed_form() {
        // M. Beleggia, M. De Graef, Y. T. Millev, J. Phys. D 39, 891 (2006), Nxx for edges 1 × ly × lz (docs/references.md §2a)
        for (double[] e : HALF_EDGES) {
            double expected = beleggiaAlongUnitEdge(e[0] / e[2], e[1] / e[2]);
            // both forms cancel for edge ratios of 100, where they agree to about 1e-10 relative
            assertEquals(expected, PrismDemagnetization.magnetometric(e[0], e[1], e[2]), 1e-9 * expected);
        }
    }

    @Test
    void fluxmetric_matches_quadrature_of_the_face_solid_angle_over_the_mid_plane() {
        // Nf = mean over the mid-plane of the solid angle of the two faces / (4π) each (definition, Chen, Brug, Goldfarb
        // 1991); rectangle solid angle Σ ±atan(uv/(h·r)) (docs/references.md §4a); Hipparchus adaptive Gauss–Legendre
        double[][] cases = {{1, 1, 1}, {1, 2, 3}, {0.5, 0.5, 5}, {5, 5, 0.5}, {3, 0.7, 1.1}, {0.5, 0.5, 50}, {50, 50, 0.5}, {50, 0.5, 5}};
        for (double[] e : cases) {
            double a = e[0];
            double b = e[1];
            double h = e[2];
            double integral = BesselQuadrature.integrate(x -> BesselQuadrature.integrate(y -> rectangleSolidAngle(a, b, x, y, h), 0, b),
                    0, a);
            double expected = integral / (a * b) / (2 * Math.PI);
            // edge ratios of 100 cost the closed form digits to cancellation: 1e-8 there (BlockShape), 1e-10 elsewhere
            double tolerance = Math.max(a, h) / Math.min(a, h) >= 100 ? 1e-8 : 1e-10;
            assertEquals(expected, PrismDemagnetization.fluxmetric(a, b, h), tolerance * expected, "half edges " + a + ", " + b + ", " + h);
        }
    }

    @Test
    void thin_plate_approaches_one_and_long_bar_approaches_zero() {
        // limits of Aharoni (1998) and of the solid angles: wide thin plate → 1, long bar along M → 0
        assertEquals(1.0, PrismDemagnetization.magnetometric(50, 50, 0.5), 4e-2);
        assertEquals(1.0, PrismDemagnetization.fluxmetric(50, 50, 0.5), 4e-2);
        assertEquals(0.0, PrismDemagnetization.magnetometric(0.5, 0.5, 50), 1e-2);
        assertEquals(0.0, PrismDemagnetization.fluxmetric(0.5, 0.5, 50), 1e-3);
    }

    private static double rectangleSolidAngle(double a, double b, double x, double y, double h) {
        double sum = 0;
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < 2; j++) {
                double u = x - (i == 0 ? -a : a);
                double v = y - (j == 0 ? -b : b);
                double sign = (i + j) % 2 == 0 ? 1 : -1;
                sum += sign * Math.atan(u * v / (h * Math.sqrt(u * u + v * v + h * h)));
            }
        }
        return sum;
    }

    private static double beleggiaAlongUnitEdge(double ly, double lz) {
        double ly2 = ly * ly;
        double lz2 = lz * lz;
        double lambda = Math.sqrt(1 + ly2 + lz2);
        double sy = Math.sqrt(1 + ly2);
        double sz = Math.sqrt(1 + lz2);
        double syz = Math.sqrt(ly2 + lz2);
        double sum = -2 + ly2 * ly + lz2 * lz + (2 - ly2) * sy + (2 - lz2) * sz - syz * syz * syz + lambda * (ly2 + lz2 - 2)
                - 3 * ly * Math.log(ly + sy) - 3 * lz * Math.log(lz + sz) + 6 * ly * lz * Math.atan(ly * lz / lambda)
                - 3 * ly * lz * (ly * Math.log(ly) + lz * Math.log(lz)) + 3 * ly * (lz2 - 1) * Math.log(sz / (ly + lambda))
                + 3 * lz * (ly2 - 1) * Math.log(sy / (lz + lambda)) + 3 * ly * lz2 * Math.log(ly + syz) + 3 * lz * ly2 * Math.log(lz + syz);
        return sum / (3 * Math.PI * ly * lz);
    }
}
