package org.kneepoint.fitter.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.MagneticCircuit;
import org.kneepoint.fitter.shape.RingShape;

class FieldMapTest {

    @Test
    void map_holds_the_pointwise_field_at_every_grid_point() {
        MagnetField field = MagnetField.of(new RingShape(0.02, 0.008, 0.01), 1.2);
        FieldGrid grid = new FieldGrid(-0.03, 0.03, 7, -0.02, 0.025, 5, 0.001);
        FieldMap map = FieldMap.of(field, grid);
        for (int row = 0; row < grid.rows(); row++) {
            for (int column = 0; column < grid.columns(); column++) {
                assertEquals(field.fluxDensity(grid.x(column), 0.001, grid.z(row)), map.fluxDensity(column, row));
                assertEquals(map.fluxDensity(column, row).z(), map.bz(column, row));
            }
        }
        assertEquals(0.03, grid.x(6), 1e-18);
        assertEquals(-0.02, grid.z(0), 0);
    }

    @Test
    void bad_grids_and_shapes_without_a_field_are_rejected_with_a_clear_message() {
        BadInputException range = assertThrows(BadInputException.class, () -> new FieldGrid(0.01, -0.01, 5, 0, 1, 5, 0));
        assertTrue(range.getMessage().startsWith("grid x range must be finite with max greater than min"), range.getMessage());
        assertThrows(BadInputException.class, () -> new FieldGrid(0, 1, 1, 0, 1, 5, 0));
        assertThrows(BadInputException.class, () -> MagnetField.of(new MagneticCircuit(0.01, 1e-4, 1e-3, 1e-4, 1.2, 1.1), 1.0));
        assertThrows(IndexOutOfBoundsException.class,
                () -> FieldMap.of(MagnetField.of(new CylinderShape(0.01, 0.01), 1.0), new FieldGrid(0, 1, 2, 0, 1, 2, 0)).bx(2, 0));
    }
}
