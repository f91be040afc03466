package org.kneepoint.server.app.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.Function;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.field.MagnetField;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.MagnetOnSteelPlate;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.SpheroidShape;
import org.kneepoint.server.app.JsonKeys;

/**
 * The design documents without a library: permeance, the field at a point, and a check of a typed-in grade, each
 * with the keys it writes.
 */
class DesignDocumentsTest {

    private static final GradeChoice.InputNames NAMES = new GradeChoice.InputNames("grade", "", "br, muRec, hcj, knee, alpha, beta",
            "br, muRec and hcj", "alpha and beta");
    private static final Function<String, GradeModel> NO_LIBRARY = name -> {
        throw new AssertionError("a typed-in grade needs no library, asked for " + name);
    };

    @Test
    void a_sphere_has_a_third_for_every_factor_and_pc_two() {
        PermeanceDocument sphere = PermeanceDocument.of(new SpheroidShape(0.01, 0.01).demagnetizingFactors());
        assertEquals(1.0 / 3, sphere.demagnetizingFactor().magnetometric(), 1e-9, "sphere: N = 1/3 exactly (Osborn 1945, Phys. Rev. 67)");
        assertEquals(1.0 / 3, sphere.demagnetizingFactor().fluxmetric(), 1e-9);
        assertEquals(2.0, sphere.permeanceCoefficient().center(), 1e-9, "Pc = (1 − N)/N = 2");
        assertEquals(List.of("demagnetizingFactor", "permeanceCoefficient"), JsonKeys.of(sphere));
        assertEquals(List.of("magnetometric", "fluxmetric", "center"), JsonKeys.of(sphere.demagnetizingFactor()));
    }

    @Test
    void on_steel_a_flat_magnet_sees_its_image_and_a_spheroid_is_refused_naming_the_option() {
        CylinderShape disc = new CylinderShape(0.01, 0.005);
        assertSame(disc, PermeanceDocument.seen(disc, false, "--on-steel"));
        MagnetShape onSteel = PermeanceDocument.seen(disc, true, "--on-steel");
        assertTrue(onSteel instanceof MagnetOnSteelPlate);
        assertTrue(onSteel.demagnetizingFactors().magnetometric() < disc.demagnetizingFactors().magnetometric(),
                "the image doubles the length, so N falls");
        BadInputException error = assertThrows(BadInputException.class,
                () -> PermeanceDocument.seen(new SpheroidShape(0.01, 0.01), true, "onSteel"));
        assertTrue(error.getMessage().startsWith("onSteel needs a magnet with a flat pole face"), error.getMessage());
    }

    @Test
    void the_field_on_the_axis_of_a_block_points_along_the_magnetization_and_has_no_reason_key() {
        MagnetField field = MagnetField.of(new BlockShape(0.01, 0.01, 0.005), 1.3);
        FieldDocument document = FieldDocument.at(field, new Position(0, 0, 0.006));
        assertEquals(List.of("at", "b"), JsonKeys.of(document));
        assertEquals(List.of(0.0, 0.0, 0.006), document.at());
        assertEquals(0.0, document.b().get(0), 1e-9);
        assertTrue(document.b().get(2) > 0 && document.b().get(2) < 1.3, document.toString());
    }

    @Test
    void at_a_rim_the_field_is_null_with_its_reason() {
        MagnetField field = MagnetField.of(new CylinderShape(0.01, 0.005), 1.3);
        FieldDocument rim = FieldDocument.at(field, new Position(0.005, 0, 0.0025));
        assertNull(rim.b());
        assertNotNull(rim.reason());
        assertEquals(List.of("at", "b", "reason"), JsonKeys.of(rim));
    }

    @Test
    void a_check_of_a_typed_in_grade_runs_without_a_library_and_writes_every_key() {
        TypedGrade typed = new TypedGrade(1.3, 1.05, 1.6e6, 1.45e6, -0.0012, -0.006, null);
        LoadLineSpec loadLine = new LoadLineSpec(2.0, null, null, null, null, null, null, false, "magnetometric");
        CheckRun run = DesignChecks.check(new CheckRequest(new GradeChoice(null, typed, NAMES), loadLine, 273.15 + 120, AppliedField.NONE,
                0.02), NO_LIBRARY);
        CheckDocument document = run.document();
        assertEquals(2.0, document.pc(), 1e-12);
        assertNull(document.localCheck(), "a load line given by its Pc has no shape to check locally");
        assertTrue(document.operatingPoint().b() > 0);
        assertTrue(document.reversibleLossPercent() < 0, "Br falls when hot (α < 0)");
        assertEquals(List.of("pc", "operatingPoint", "reversibleLossPercent", "irreversibleLossPercent", "kneeMarginH",
                "maxWorkingTemperatureK", "extrapolated", "cautions", "kneeField", "kneeMarginTemperatureK", "maxWorkingTemperatureStop",
                "lossLimitPercent", "localCheck", "fieldConvention", "opposingFieldH", "externalFieldH", "demagnetizingFactor",
                "minWorkingTemperatureK", "minWorkingTemperatureStop", "operatingPointExtrapolated", "lossExtrapolated",
                "minWorkingTemperatureExtrapolated", "maxWorkingTemperatureExtrapolated", "beyondMeasuredField", "verdict"), JsonKeys.of(document));
        assertFalse(document.cautions().isEmpty(), "a result that feeds a safety decision carries its cautions");
    }

    @Test
    void a_check_of_a_block_adds_the_local_check_of_its_volume() {
        TypedGrade typed = new TypedGrade(1.3, 1.05, 1.6e6, 1.45e6, -0.0012, -0.006, null);
        LoadLineSpec block = new LoadLineSpec(null, null, null, null, 0.02, 0.02, 0.003, false, "magnetometric");
        CheckDocument document = DesignChecks.check(new CheckRequest(new GradeChoice(null, typed, NAMES), block, 293.15,
                AppliedField.opposing(2e5), 0.02), NO_LIBRARY).document();
        assertNotNull(document.localCheck());
        assertEquals(List.of("volumeBelowKneePercent", "resolution", "cells", "averageDemagnetizingField", "lowestField", "x", "y", "z",
                "region"), JsonKeys.of(document.localCheck()));
        assertEquals("opposing", document.fieldConvention());
        assertNull(document.externalFieldH());
    }

    @Test
    void a_typed_in_grade_without_temperature_coefficients_is_refused_away_from_its_reference() {
        TypedGrade flat = new TypedGrade(1.3, 1.05, 1.6e6, null, null, null, null);
        LoadLineSpec loadLine = new LoadLineSpec(2.0, null, null, null, null, null, null, false, "magnetometric");
        BadInputException error = assertThrows(BadInputException.class, () -> DesignChecks.check(new CheckRequest(
                new GradeChoice(null, flat, NAMES), loadLine, 273.15 + 120, AppliedField.NONE, 0.02), NO_LIBRARY));
        assertTrue(error.getMessage().contains("needs alpha and beta"), error.getMessage());
    }

    @Test
    void a_load_line_is_pc_or_one_shape_and_names_what_is_wrong() {
        assertEquals(2.0, new LoadLineSpec(2.0, null, null, null, null, null, null, false, "magnetometric").permeanceCoefficient());
        assertTrue(assertThrows(BadInputException.class, () -> new LoadLineSpec(2.0, 0.01, 0.005, null, null, null, null, false,
                "magnetometric").permeanceCoefficient()).getMessage().contains("exactly one of them"));
        assertTrue(assertThrows(BadInputException.class, () -> new LoadLineSpec(null, 0.01, null, null, null, null, null, false,
                "magnetometric").permeanceCoefficient()).getMessage().contains("needs both a diameter and a length"));
        assertTrue(assertThrows(BadInputException.class, () -> new LoadLineSpec(-1.0, null, null, null, null, null, null, false,
                "magnetometric").permeanceCoefficient()).getMessage().contains("must be positive"));
        assertTrue(assertThrows(BadInputException.class, () -> new LoadLineSpec(null, 0.01, 0.005, null, null, null, null, false,
                "sideways").permeanceCoefficient()).getMessage().contains("got 'sideways'"));
        double free = new LoadLineSpec(null, 0.01, 0.005, null, null, null, null, false, "magnetometric").permeanceCoefficient();
        double onSteel = new LoadLineSpec(null, 0.01, 0.005, null, null, null, null, true, "magnetometric").permeanceCoefficient();
        assertTrue(onSteel > free, "on steel the magnet is twice as long: a higher Pc");
        String ring = new LoadLineSpec(null, 0.01, 0.005, 0.004, null, null, null, true, "fluxmetric").describe();
        assertTrue(ring.startsWith("ring D = ") && ring.endsWith(" on a steel plate (fluxmetric factor)"), ring);
    }
}
