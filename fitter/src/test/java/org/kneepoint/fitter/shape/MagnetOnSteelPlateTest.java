package org.kneepoint.fitter.shape;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class MagnetOnSteelPlateTest {

    @Test
    void magnet_on_a_plate_has_the_factors_of_the_doubled_magnet() {
        // method of images for an infinitely permeable plate: the length along M doubles
        DemagnetizingFactors onPlate = new MagnetOnSteelPlate(new CylinderShape(0.02, 0.005)).demagnetizingFactors();
        assertEquals(new CylinderShape(0.02, 0.01).demagnetizingFactors(), onPlate);
        assertTrue(onPlate.magnetometric() < new CylinderShape(0.02, 0.005).demagnetizingFactors().magnetometric());
    }

    @Test
    void centre_of_the_real_magnet_sees_more_demagnetization_than_the_contact_face() {
        // on-axis field of a cylinder (docs/references.md §4a) for the doubled magnet (half-length L = 5 mm), at the real magnet's
        // centre z = L/2 versus the contact face z = 0, which is the centre-point value reported
        double radius = 0.01;
        double half = 0.005;
        double z = half / 2;
        double atCentre = 1 - 0.5 * ((z + half) / Math.hypot(radius, z + half) - (z - half) / Math.hypot(radius, z - half));
        double reported = new MagnetOnSteelPlate(new CylinderShape(2 * radius, half)).demagnetizingFactors().centrePoint();
        assertEquals(1 - half / Math.hypot(radius, half), reported, 1e-15);
        assertTrue(atCentre > reported);
    }
}
