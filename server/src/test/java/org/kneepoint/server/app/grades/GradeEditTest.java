package org.kneepoint.server.app.grades;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.ConflictException;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.library.GradeDetails;
import org.kneepoint.fitter.library.StoredGrade;
import org.kneepoint.server.app.DemoLibraryFixture;

/** Edits of a grade's details: parsed and checked before anything is written, and refused when made from an old version. */
class GradeEditTest {

    private static final String GRADE = "DEMO SmCo 18/160";

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
    void an_edit_changes_only_the_fields_it_names_and_empty_text_clears_one() {
        GradeDetails current = new GradeDetails("Invented Works", 8300.0, "old notes", 100.0);
        GradeDetails changed = new GradeEdit(Map.of("density", "8.4 g/cm3", "notes", " "), "--%s").changed(current);
        assertEquals("Invented Works", changed.supplier());
        assertEquals(8400.0, changed.density(), 1e-9);
        assertNull(changed.notes());
        assertEquals(100.0, changed.price());
    }

    @Test
    void a_field_that_is_not_editable_is_refused_before_anything_is_read() {
        BadInputException error = assertThrows(BadInputException.class, () -> new GradeEdit(Map.of("family", "ferrite"), "--%s"));
        assertTrue(error.getMessage().contains("not an editable detail"), error.getMessage());
        assertTrue(error.location().orElseThrow().describe().contains("--family"), error.location().orElseThrow().describe());
    }

    @Test
    void a_price_or_density_out_of_range_is_refused_naming_the_field() {
        GradeDetails current = new GradeDetails(null, null, null, null);
        assertTrue(assertThrows(BadInputException.class, () -> new GradeEdit(Map.of("price", "-3"), "%s").changed(current))
                .getMessage().contains("expected a price per kilogram"));
        assertTrue(assertThrows(BadInputException.class, () -> new GradeEdit(Map.of("price", "12,5.3"), "%s").changed(current))
                .getMessage().contains("got '12,5.3'"));
        assertTrue(assertThrows(BadInputException.class, () -> new GradeEdit(Map.of("density", "0 kg/m3"), "%s").changed(current))
                .getMessage().contains("expected a density"));
        assertThrows(BadInputException.class, () -> new GradeEdit(Map.of("density", "7.5 T"), "%s").changed(current));
    }

    @Test
    void an_edit_from_the_current_version_is_stored_and_one_from_an_older_version_is_a_conflict() {
        StoredGrade before = demo.reader().storedGrade(GRADE).orElseThrow();
        StoredGrade after = new GradeEdit(Map.of("supplier", "Invented Magnet Works"), "--%s").applyTo(demo.library(), GRADE, before.version());
        assertEquals(before.version() + 1, after.version());
        assertEquals("Invented Magnet Works", demo.reader().storedGrade(GRADE).orElseThrow().grade().supplier());
        assertEquals(GradeDocument.details(after), GradeDocument.details(demo.reader().storedGrade(GRADE).orElseThrow()));
        assertThrows(ConflictException.class,
                () -> new GradeEdit(Map.of("supplier", "Someone Else"), "--%s").applyTo(demo.library(), GRADE, before.version()));
        assertEquals("Invented Magnet Works", demo.reader().storedGrade(GRADE).orElseThrow().grade().supplier());
    }

    @Test
    void an_edit_of_an_unknown_grade_is_not_found() {
        assertThrows(NotFoundException.class, () -> new GradeEdit(Map.of("notes", "x"), "--%s").applyTo(demo.library(), "no such grade", null));
    }
}
