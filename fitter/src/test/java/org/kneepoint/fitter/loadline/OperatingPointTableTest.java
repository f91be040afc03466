package org.kneepoint.fitter.loadline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

class OperatingPointTableTest {

    @Test
    void table_matches_the_point_by_point_solution() {
        SplittableRandom random = new SplittableRandom(23);
        List<LinearTemperatureLaw> grades = new ArrayList<>();
        for (int g = 0; g < 20; g++) {
            grades.add(new LinearTemperatureLaw(Grades.random(random), -0.001, -0.004, 293.15));
        }
        double[] temperatures = {253.15, 293.15, 353.15, 413.15};
        double[] pcs = {0.1, 0.5, 1, 3, 10};
        double[] table = new double[grades.size() * temperatures.length * pcs.length];
        OperatingPointTable.fieldsInto(grades, temperatures, pcs, 5e4, table);
        int index = 0;
        for (LinearTemperatureLaw law : grades) {
            for (double temperature : temperatures) {
                for (double pc : pcs) {
                    double expected = new LoadLine(pc, 5e4).on(law.at(temperature)).h();
                    assertEquals(expected, table[index++], 1e-12 * Math.abs(expected));
                }
            }
        }
    }

    @Test
    void temperature_outside_a_grade_range_is_refused() {
        assertThrows(BadInputException.class, () -> OperatingPointTable.fieldsInto(List.of(Grades.neodymiumLaw()),
                new double[] {500.0}, new double[] {1.0}, 0.0, new double[1]));
    }
}
