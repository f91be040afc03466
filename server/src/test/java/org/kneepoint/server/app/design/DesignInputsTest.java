package org.kneepoint.server.app.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.DutyStep;
import org.kneepoint.fitter.loadline.FieldConvention;
import org.kneepoint.fitter.select.RankingOrder;
import org.kneepoint.server.app.InputLimits;

/** The design inputs every front end reads the same way: duty steps, a point, the field's convention, the order. */
class DesignInputsTest {

    @Test
    void duty_steps_read_temperature_field_and_convention_in_si() {
        List<DutyStep> steps = DutySteps.parse("20C:0, 150C:300kA/m, 120C:200kA/m:external, 20C:0");
        assertEquals(4, steps.size());
        assertEquals(293.15, steps.get(0).temperature(), 1e-9);
        assertEquals(0.0, steps.get(0).field().field());
        assertEquals(423.15, steps.get(1).temperature(), 1e-9);
        assertEquals(3e5, steps.get(1).field().field(), 1e-6);
        assertEquals(FieldConvention.OPPOSING, steps.get(1).field().convention());
        assertEquals(FieldConvention.EXTERNAL, steps.get(2).field().convention());
    }

    @Test
    void a_bad_duty_step_is_named_by_its_number() {
        assertTrue(assertThrows(BadInputException.class, () -> DutySteps.parse("")).getMessage().startsWith("steps: give at least one step"));
        assertTrue(assertThrows(BadInputException.class, () -> DutySteps.parse("20C:0, 150C"))
                .getMessage().startsWith("step 2 must be"));
        assertTrue(assertThrows(BadInputException.class, () -> DutySteps.parse("20C:0:sideways"))
                .getMessage().contains("step 1"));
    }

    @Test
    void a_point_takes_its_unit_from_the_last_coordinate_for_bare_numbers() {
        Position point = Position.parse("2,0,3mm");
        assertEquals(0.002, point.x(), 1e-12);
        assertEquals(0.0, point.y());
        assertEquals(0.003, point.z(), 1e-12);
        Position mixed = Position.parse("1cm, 2mm, 0.5 mm");
        assertEquals(0.01, mixed.x(), 1e-12);
        assertEquals(0.002, mixed.y(), 1e-12);
        assertEquals(List.of(0.01, 0.002, 0.0005), java.util.Arrays.stream(mixed.toArray()).boxed().toList().stream()
                .map(value -> Math.round(value * 1e7) / 1e7).toList());
    }

    @Test
    void a_point_without_a_unit_or_with_two_coordinates_says_what_was_expected() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> Position.parse("1,2,3")).getMessage().endsWith("(no unit)"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> Position.parse("1,2mm")).getMessage()
                .startsWith("expected a point x,y,z"));
    }

    @Test
    void the_field_is_opposing_or_external_never_both() {
        assertEquals(AppliedField.NONE, FieldChoice.of(null, null, "--opposing-field", "--external-field"));
        assertEquals(FieldConvention.EXTERNAL, FieldChoice.of(null, 1e5, "--opposing-field", "--external-field").convention());
        BadInputException error = assertThrows(BadInputException.class, () -> FieldChoice.of(1e5, 1e5, "opposingField", "externalField"));
        assertTrue(error.getMessage().contains("opposingField") && error.getMessage().contains("externalField"), error.getMessage());
    }

    @Test
    void the_order_of_a_selection_is_one_of_five_words() {
        assertEquals(RankingOrder.PRICE, SelectionSort.of("price"));
        assertEquals(RankingOrder.KNEE_MARGIN, SelectionSort.of("margin"));
        for (RankingOrder order : RankingOrder.values()) {
            assertTrue(SelectionSort.describe(order).contains("first"), order.name());
        }
        assertTrue(assertThrows(BadInputException.class, () -> SelectionSort.of("colour")).getMessage().endsWith("got 'colour'"));
    }

    @Test
    void temperatures_and_lengths_are_held_to_the_same_limits_by_every_front_end() {
        assertTrue(InputLimits.temperatureProblem(293.15, "20C").isEmpty());
        assertTrue(InputLimits.temperatureProblem(InputLimits.MAX_TEMPERATURE_K + 1, "5000C").isPresent());
        assertTrue(InputLimits.lengthProblem(0.01, "10mm").isEmpty());
        assertTrue(InputLimits.lengthProblem(InputLimits.MAX_LENGTH_M * 2, "200m").isPresent());
        assertTrue(InputLimits.lengthProblem(-0.01, "-10mm").isPresent());
    }
}
