package org.kneepoint.fitter.field;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.RingShape;
import org.kneepoint.fitter.shape.SpheroidShape;

class SingularPointTest {

    private static void assertFinite(FieldSample sample) {
        assertFalse(sample.isSingular(), sample.singularity());
        FieldVector b = sample.fluxDensity();
        assertTrue(Double.isFinite(b.x()) && Double.isFinite(b.y()) && Double.isFinite(b.z()), b.toString());
    }

    @Test
    void a_point_on_a_cylinders_rim_has_no_field_but_a_reason() {
        MagnetField field = new CylinderField(new CylinderShape(0.010, 0.004), 1.3);
        // the bug: the closed form gave NaN here and the JSON output printed the string "NaN"
        FieldSample rim = field.sample(0.005, 0, 0.002);
        assertTrue(rim.isSingular());
        assertNull(rim.fluxDensity());
        assertTrue(rim.singularity().contains("rim"), rim.singularity());
        // the same rim reached through a unit conversion that rounds (5 mm = 0.005 m up to one ulp)
        assertTrue(field.sample(0.005 * (1 + 1e-15), 0, -0.002).isSingular());
        assertFinite(field.sample(0.005 * (1 + 1e-6), 0, 0.002));
        assertFinite(field.sample(0.0051, 0, 0.002));
    }

    @Test
    void a_rings_inner_and_outer_rims_are_singular_and_its_bore_is_not() {
        MagnetField field = new RingField(new RingShape(0.020, 0.012, 0.005), 1.3);
        assertTrue(field.sample(0, 0.006, 0.0025).singularity().contains("inner rim"));
        assertTrue(field.sample(0.010, 0, -0.0025).singularity().contains("outer rim"));
        assertFinite(field.sample(0, 0, 0.0025));
    }

    @Test
    void a_blocks_corner_and_pole_face_edges_are_singular_and_its_side_edges_are_not() {
        MagnetField field = new BlockField(new BlockShape(0.020, 0.010, 0.005), 1.3);
        assertTrue(field.sample(0.010, -0.005, 0.0025).singularity().contains("corner"));
        assertTrue(field.sample(0.003, 0.005, -0.0025).singularity().contains("edge"));
        assertTrue(field.sample(-0.010, 0.001, 0.0025).singularity().contains("edge"));
        // an edge parallel to the magnetization carries no charge: the field there is finite
        assertFinite(field.sample(0.010, 0.005, 0));
    }

    @Test
    void a_spheroid_has_no_singular_point() {
        MagnetField field = new SpheroidField(new SpheroidShape(0.01, 0.02), 1.3);
        assertFinite(field.sample(0.005, 0, 0));
    }

    @Test
    void a_sample_holds_either_a_field_or_a_reason() {
        assertThrows(IllegalArgumentException.class, () -> new FieldSample(null, null));
        assertThrows(IllegalArgumentException.class, () -> new FieldSample(new FieldVector(0, 0, 0), "both"));
    }
}
