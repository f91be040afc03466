package org.kneepoint.server.app.grades;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.server.app.DemoLibraryFixture;
import org.kneepoint.server.app.JsonKeys;
import org.kneepoint.server.app.demo.DemoLibrary;

/** The grade use cases that read, over the demo library: the list, one grade, its curves at a temperature. */
class GradesTest {

    private static final String NDFEB = "DEMO NdFeB 42/100";

    @TempDir
    static Path folder;

    private static DemoLibraryFixture demo;

    @BeforeAll
    static void load() {
        demo = DemoLibraryFixture.in(folder);
    }

    @AfterAll
    static void close() {
        demo.close();
    }

    @Test
    void the_list_has_every_demo_grade_with_its_family_curves_and_price() {
        List<GradeRow> rows = Grades.list(demo.reader(), null);
        assertEquals(DemoLibrary.gradeNames().stream().sorted().toList(), rows.stream().map(GradeRow::name).sorted().toList());
        GradeRow ndfeb = rows.stream().filter(row -> row.name().equals(NDFEB)).findFirst().orElseThrow();
        assertEquals("sintered NdFeB", ndfeb.family());
        assertEquals(45.0, ndfeb.price());
        assertTrue(ndfeb.curves() >= 4, ndfeb.toString());
        assertEquals(293.15, ndfeb.temperaturesK().get(0), 1e-9);
    }

    @Test
    void the_list_of_one_family_has_only_that_family() {
        List<GradeRow> rows = Grades.list(demo.reader(), "sintered SmCo");
        assertEquals(2, rows.size(), rows.toString());
        assertTrue(rows.stream().allMatch(row -> row.family().equals("sintered SmCo")));
        assertEquals(List.of(), Grades.list(demo.reader(), "no such family"));
    }

    @Test
    void a_row_writes_the_keys_of_the_grade_list() {
        assertEquals(List.of("name", "family", "supplier", "temperaturesK", "curves", "price"),
                JsonKeys.of(Grades.list(demo.reader(), null).get(0)));
    }

    @Test
    void one_grade_has_its_details_version_and_stored_curves() {
        GradeDocument grade = Grades.detail(demo.reader(), NDFEB);
        assertEquals(NDFEB, grade.name());
        assertEquals(2, grade.version(), "the demo sets the price as an edit of version 1");
        assertFalse(grade.curves().isEmpty());
        GradeDocument.StoredCurve first = grade.curves().get(0);
        assertTrue(List.of("normal", "intrinsic", "loop").contains(first.kind()), first.kind());
        assertTrue(first.points() > 10);
        assertEquals(List.of("name", "family", "supplier", "density", "notes", "provenance", "price", "version", "curves"), JsonKeys.of(grade));
        assertEquals(List.of("temperatureK", "kind", "points", "source"), JsonKeys.of(first));
    }

    @Test
    void the_details_alone_leave_out_the_curves_key() {
        GradeDocument details = GradeDocument.details(demo.reader().storedGrade(NDFEB).orElseThrow());
        assertNull(details.curves());
        assertEquals(List.of("name", "family", "supplier", "density", "notes", "provenance", "price", "version"), JsonKeys.of(details));
    }

    @Test
    void an_unknown_grade_is_not_found_and_named() {
        NotFoundException error = assertThrows(NotFoundException.class, () -> Grades.detail(demo.reader(), "no such grade"));
        assertTrue(error.getMessage().contains("'no such grade'"), error.getMessage());
        assertThrows(NotFoundException.class, () -> Grades.curvesAt(demo.reader(), "no such grade", 293.15));
    }

    @Test
    void at_a_stored_temperature_the_stored_curves_are_characterized() {
        List<CurveDocument> curves = Grades.curvesAt(demo.reader(), NDFEB, 293.15);
        assertFalse(curves.isEmpty());
        for (CurveDocument curve : curves) {
            assertFalse(curve.modeled());
            assertFalse(curve.extrapolated());
            assertEquals(293.15, curve.temperatureK(), 1e-9);
            assertEquals(NDFEB, curve.source());
            assertTrue(curve.br() > 1.2 && curve.br() < 1.4, "demo Br 1.31 T: " + curve.br());
        }
    }

    @Test
    void between_the_stored_temperatures_the_model_curve_is_characterized_and_not_extrapolated() {
        List<CurveDocument> curves = Grades.curvesAt(demo.reader(), NDFEB, 273.15 + 70);
        assertEquals(1, curves.size());
        CurveDocument modeled = curves.get(0);
        assertTrue(modeled.modeled());
        assertFalse(modeled.extrapolated());
        assertEquals(273.15 + 70, modeled.temperatureK(), 1e-9);
        double br20 = Grades.curvesAt(demo.reader(), NDFEB, 293.15).get(0).br();
        assertTrue(modeled.br() < br20, "Br falls with temperature (α < 0)");
    }

    @Test
    void beyond_the_stored_temperatures_the_model_curve_is_flagged_extrapolated() {
        CurveDocument hot = Grades.curvesAt(demo.reader(), NDFEB, 273.15 + 140).get(0);
        assertTrue(hot.modeled());
        assertTrue(hot.extrapolated());
    }

    @Test
    void a_characterization_writes_its_keys_in_the_documented_order() {
        CurveDocument curve = Grades.curvesAt(demo.reader(), NDFEB, 293.15).get(0);
        assertEquals(List.of("source", "modeled", "extrapolated", "kind", "points", "temperatureK", "br", "hcb", "hcj", "bhMax", "hAtBhMax",
                "bAtBhMax", "hk", "squareness", "muRec", "recoilWindow"), JsonKeys.of(curve));
        assertEquals(List.of("from", "to", "points"), JsonKeys.of(curve.recoilWindow()));
    }

    @Test
    void a_curve_that_cannot_be_characterized_is_bad_input_named_by_its_source_and_temperature() {
        DemagnetizationCurve flat = DemagnetizationCurve.of(Quantity.J, new double[] {-2e5, -1e5, 0}, new double[] {-0.1, -0.05, -0.01}, 300.0);
        BadInputException error = assertThrows(BadInputException.class,
                () -> Grades.characterize(List.of(new GradeCurve("bent.csv", flat, "bent.csv", false, false))));
        assertTrue(error.getMessage().contains("bent.csv (curve at 300.0 K)"), error.getMessage());
    }

    @Test
    void materials_list_their_points_and_distinct_temperatures() {
        List<Materials.MaterialRow> materials = Materials.list(demo.reader());
        List<String> names = materials.stream().map(Materials.MaterialRow::name).toList();
        assertTrue(names.containsAll(List.of("DEMO copper-like metal", "DEMO paramagnetic salt")), names.toString());
        assertEquals(names.stream().distinct().toList(), names, "each material once");
        for (Materials.MaterialRow row : materials) {
            assertTrue(row.points() >= row.temperaturesK().size());
            assertEquals(row.temperaturesK().stream().distinct().toList(), row.temperaturesK());
        }
        Materials.MaterialDocument salt = Materials.detail(demo.reader(), "DEMO paramagnetic salt");
        assertEquals("molar", salt.points().get(0).form());
        assertNotNull(salt.points().get(0).molarMass());
        assertEquals(List.of("temperatureK", "chi", "form", "density", "molarMass", "source"), JsonKeys.of(salt.points().get(0)));
        NotFoundException error = assertThrows(NotFoundException.class, () -> Materials.detail(demo.reader(), "unobtainium"));
        assertTrue(error.getMessage().contains("'unobtainium'"));
    }
}
