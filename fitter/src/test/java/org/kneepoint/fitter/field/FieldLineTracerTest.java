package org.kneepoint.fitter.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.SpheroidShape;

class FieldLineTracerTest {

    private static final FieldGrid BOUNDS = new FieldGrid(-0.04, 0.04, 2, -0.04, 0.04, 2, 0.0);

    @Test
    void a_line_from_the_north_face_of_a_cylinder_runs_around_it_into_the_south_half() {
        MagnetField field = MagnetField.of(new CylinderShape(0.01, 0.01), 1.3);
        FieldLine line = new FieldLineTracer(field, BOUNDS, 1e-4, 5000).trace(0.004, 0.005, true);
        assertEquals(FieldLine.Ending.MAGNET, line.ending());
        List<FieldLine.Point> points = line.points();
        FieldLine.Point last = points.get(points.size() - 1);
        assertTrue(last.z() < 0.0, "enters through the south half, at z = " + last.z());
        assertTrue(points.stream().anyMatch(point -> point.x() > 0.005), "passes outside the side");
        assertTrue(points.get(1).z() > 0.005, "leaves the north face outward");
    }

    @Test
    void a_line_around_a_sphere_closes_symmetrically_about_the_equator() {
        MagnetField field = MagnetField.of(new SpheroidShape(0.01, 0.01), 1.2);
        FieldLine line = new FieldLineTracer(field, BOUNDS, 5e-5, 10000).trace(0.003, 0.004, true);
        assertEquals(FieldLine.Ending.MAGNET, line.ending());
        FieldLine.Point last = line.points().get(line.points().size() - 1);
        assertEquals(0.003, last.x(), 1e-4);
        assertEquals(-0.004, last.z(), 1e-4);
    }

    @Test
    void the_traced_direction_is_parallel_to_b_at_every_point() {
        MagnetField field = MagnetField.of(new CylinderShape(0.01, 0.006), 1.3);
        FieldLineTracer tracer = new FieldLineTracer(field, BOUNDS, 2e-4, 2000);
        for (FieldLine.Point point : tracer.trace(0.002, 0.003, true).points()) {
            FieldVector b = field.fluxDensity(point.x(), 0.0, point.z());
            double[] direction = tracer.direction(point.x(), point.z());
            double size = Math.hypot(b.x(), b.z());
            assertEquals(0.0, (direction[0] * b.z() - direction[1] * b.x()) / size, 1e-9);
            assertEquals(1.0, (direction[0] * b.x() + direction[1] * b.z()) / size, 1e-9);
        }
    }

    @Test
    void a_line_followed_against_the_field_leaves_the_south_face_downward_and_bad_settings_are_refused() {
        MagnetField field = MagnetField.of(new CylinderShape(0.01, 0.01), 1.3);
        FieldLine line = new FieldLineTracer(field, BOUNDS, 1e-4, 3).trace(0.0, -0.005, false);
        assertEquals(FieldLine.Ending.STEPS, line.ending());
        assertEquals(4, line.points().size());
        assertTrue(line.points().get(3).z() < -0.005);
        assertThrows(BadInputException.class, () -> new FieldLineTracer(field, BOUNDS, 0.0, 10));
        assertThrows(BadInputException.class, () -> new FieldLineTracer(field, BOUNDS, 1e-4, FieldLineTracer.MAX_STEPS + 1));
    }
}
