package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.MagnetOnSteelPlate;
import org.kneepoint.fitter.shape.SpheroidShape;

class LocalKneeCheckTest {

    private final LinearTemperatureLaw law = Grades.neodymiumLaw();

    @Test
    void sphere_has_a_uniform_field_of_minus_one_third_m() {
        // uniformly magnetized sphere: H = −M/3 inside (Griffiths, Introduction to Electrodynamics, §6.1, the magnetized sphere)
        LinearRecoilKnee curve = law.at(293.15);
        LoadLine line = new LoadLine(2.0, 0.0);
        LocalKneeResult result = LocalKneeCheck.of(SpheroidShape.sphere(0.01), curve, line, 16);
        double m = line.on(curve).j() / MU0;
        assertEquals(-m / 3, result.averageDemagnetizingField(), 1e-9 * m);
        assertEquals(line.on(curve).h(), result.worstField(), 1e-9 * m);
        assertEquals(0.0, result.fractionBelowKnee(), 0.0);
        assertEquals(MagnetRegion.UNIFORM, result.worstRegion());
    }

    @Test
    void sphere_is_all_below_the_knee_exactly_when_its_single_operating_point_is() {
        LinearRecoilKnee curve = law.at(423.15);
        for (double ha = 0; ha <= 4e5; ha += 2e4) {
            LoadLine line = new LoadLine(2.0, ha);
            boolean below = line.on(curve).h() < curve.kneeField().orElseThrow();
            assertEquals(below ? 1.0 : 0.0, LocalKneeCheck.of(SpheroidShape.sphere(0.01), curve, line, 8).fractionBelowKnee(), 0.0);
        }
    }

    @Test
    void volume_average_of_the_local_field_is_the_magnetometric_one() {
        // Nm is the volume average of the demagnetizing field (Chen, Brug, Goldfarb, IEEE Trans. Magn. 27, 3601, 1991)
        CylinderShape cylinder = new CylinderShape(0.01, 0.01);
        double nm = cylinder.demagnetizingFactors().magnetometric();
        LinearRecoilKnee curve = law.at(293.15);
        LoadLine line = new LoadLine((1 - nm) / nm, 1e5);
        LocalKneeResult result = LocalKneeCheck.of(cylinder, curve, line, 40);
        double m = line.on(curve).j() / MU0;
        assertEquals(-nm * m, result.averageDemagnetizingField(), 0.005 * nm * m);
    }

    @Test
    void share_below_the_knee_grows_with_the_opposing_field_and_starts_at_the_pole_faces() {
        BlockShape block = new BlockShape(0.02, 0.02, 0.004);
        LinearRecoilKnee curve = law.at(393.15);
        double previous = 0.0;
        for (double ha = 0; ha <= 4e5; ha += 5e4) {
            LocalKneeResult result = LocalKneeCheck.of(block, curve, new LoadLine(0.3, ha), 20);
            assertTrue(result.fractionBelowKnee() >= previous, "Ha " + ha);
            previous = result.fractionBelowKnee();
        }
        assertTrue(previous > 0.0);
        LocalKneeResult result = LocalKneeCheck.of(block, curve, new LoadLine(0.3, 0), 20);
        assertTrue(result.worstRegion() == MagnetRegion.POLE_FACE || result.worstRegion() == MagnetRegion.CORE,
                result.worstRegion().toString());
    }

    @Test
    void magnet_on_steel_is_judged_in_its_real_half() {
        CylinderShape cylinder = new CylinderShape(0.01, 0.003);
        MagnetOnSteelPlate onSteel = new MagnetOnSteelPlate(cylinder);
        LocalKneeResult result = LocalKneeCheck.of(onSteel, law.at(293.15), new LoadLine(1.0, 0.0), 20);
        assertTrue(result.worstZ() > 0 && result.worstZ() < 0.003);
    }
}
