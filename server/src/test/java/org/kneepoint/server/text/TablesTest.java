package org.kneepoint.server.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.Function;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.field.MagnetField;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.SpheroidShape;
import org.kneepoint.server.app.design.CheckRequest;
import org.kneepoint.server.app.design.CheckRun;
import org.kneepoint.server.app.design.DesignChecks;
import org.kneepoint.server.app.design.GradeChoice;
import org.kneepoint.server.app.design.GradeModel;
import org.kneepoint.server.app.design.LoadLineSpec;
import org.kneepoint.server.app.design.TypedGrade;
import org.kneepoint.server.app.grades.CurveDocument;

/** The readable tables print what their records hold, with units, and never a control character from stored text. */
class TablesTest {

    private static final Function<String, GradeModel> NO_LIBRARY = name -> {
        throw new AssertionError("no library");
    };

    private static CurveDocument curve(String source, Double hcb, boolean modeled, boolean extrapolated) {
        return new CurveDocument(source, modeled, extrapolated, "intrinsic", 40, 293.15, 1.31, hcb, 1.0e6, 3.3e5, -5.0e5, 0.66, 9.5e5,
                0.95, 1.05, new CurveDocument.RecoilWindow(-4.0e5, 0, 12));
    }

    @Test
    void a_characterization_table_names_each_value_with_its_unit() {
        String table = CharacterizationView.table(curve("DEMO NdFeB 42/100", 9.6e5, false, false));
        assertTrue(table.startsWith("DEMO NdFeB 42/100: intrinsic curve, 40 points, 20"), table);
        assertTrue(table.contains("Br") && table.contains("1.31 T"), table);
        assertTrue(table.contains("HcJ") && table.contains("1000 kA/m"), table);
        assertTrue(table.contains("12 points)"), table);
        assertFalse(table.contains("EXTRAPOLATED"));
    }

    @Test
    void a_value_not_reached_and_an_extrapolated_model_curve_say_so() {
        String table = CharacterizationView.table(curve("DEMO NdFeB 42/100", null, true, true));
        assertTrue(table.contains("modeled intrinsic curve"), table);
        assertTrue(table.contains("EXTRAPOLATED beyond the measured temperatures"), table);
        assertTrue(table.contains("not reached"), table);
    }

    @Test
    void stored_text_with_control_characters_is_printed_escaped() {
        String table = CharacterizationView.table(curve("bad\u001b[2Jname", 9.6e5, false, false));
        assertFalse(table.contains("\u001b"), table);
        assertTrue(table.startsWith("bad\\u001b[2Jname"), table);
        assertEquals("", PlainText.printable(null));
        assertEquals("Grade α\\u0007", PlainText.printable("Grade α\u0007"));
    }

    @Test
    void the_permeance_table_has_a_row_per_factor_with_its_pc() {
        String table = PermeanceView.table("spheroid D = 10 mm, L = 10 mm", new SpheroidShape(0.01, 0.01).demagnetizingFactors());
        assertTrue(table.startsWith("spheroid D = 10 mm, L = 10 mm\n"), table);
        assertEquals(3, table.lines().filter(line -> line.contains("0.33333")).count(), table);
        assertTrue(table.contains("Operating points use Nm"), table);
    }

    @Test
    void the_field_table_says_inside_or_outside_and_why_a_rim_has_no_value() {
        MagnetField field = MagnetField.of(new CylinderShape(0.01, 0.005), 1.3);
        String outside = FieldView.table("cylinder", new double[] {0, 0, 0.006}, field.sample(0, 0, 0.006), false);
        assertTrue(outside.contains("outside the magnet") && outside.contains("|B| = "), outside);
        String rim = FieldView.table("cylinder", new double[] {0.005, 0, 0.0025}, field.sample(0.005, 0, 0.0025), false);
        assertTrue(rim.contains("not defined:"), rim);
    }

    @Test
    void the_check_table_shows_the_operating_point_the_limits_and_the_cautions() {
        TypedGrade typed = new TypedGrade(1.3, 1.05, 1.6e6, 1.45e6, -0.0012, -0.006, null);
        CheckRun run = DesignChecks.check(new CheckRequest(new GradeChoice(null, typed, new GradeChoice.InputNames("GRADE", "", "--br",
                "--br, --mu-rec and --hcj", "--alpha and --beta")), new LoadLineSpec(2.0, null, null, null, null, null, null, false,
                "magnetometric"), 273.15 + 80, AppliedField.NONE, 0.02), NO_LIBRARY);
        String table = CheckView.table(run);
        for (String row : List.of("operating point", "knee (J = 0.9 Br)", "margin to the knee", "irreversible loss", "max working temp.")) {
            assertTrue(table.contains(row), row + " in\n" + table);
        }
        assertTrue(table.startsWith("Design check at 80"), table);
        assertTrue(table.toLowerCase(java.util.Locale.ROOT).contains("confirm"), "the caution to confirm by measurement: " + table);
    }
}
