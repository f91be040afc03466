package org.kneepoint.db;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.fitter.error.ConflictException;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.LibrarySnapshot;
import org.kneepoint.fitter.library.SusceptibilityPoint;
import org.kneepoint.fitter.units.SusceptibilityForm;

class LibraryTest {

    private static final GradeInfo GRADE = new GradeInfo("Invented N40", "sintered NdFeB", "Supplier A (invented)", 7500.0, null, "test");

    @Test
    void a_new_folder_becomes_a_migrated_library(@TempDir Path folder) {
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder))) {
            assertEquals(Library.SCHEMA_VERSION, library.schemaVersion());
            assertTrue(library.reader().isEmpty());
        }
        assertTrue(folder.resolve("kneepoint.mv.db").toFile().exists());
    }

    @Test
    void an_import_is_read_back_exactly() {
        try (Library library = TestLibraries.fresh()) {
            var curves = List.of(new LibraryCurve(GRADE.name(), TestLibraries.curve(293.15, 50), "invented", null),
                    new LibraryCurve(GRADE.name(), TestLibraries.curve(373.15, 40), "invented", null));
            var chi = List.of(new SusceptibilityPoint("Copper (invented)", 293.15, -9.6e-6, SusceptibilityForm.VOLUME, 8960.0, null, "demo", null));
            library.writer().importBatch(TestLibraries.importInfo("a.csv", 1, 2, 90), List.of(GRADE), curves, chi);
            List<LibraryCurve> stored = library.reader().curves(GRADE.name());
            assertEquals(curves.get(0).curve(), stored.get(0).curve());
            assertEquals(curves.get(1).curve(), stored.get(1).curve());
            assertEquals("0".repeat(63) + "1", stored.get(0).importSha256());
            GradeSummary summary = library.reader().grades(null).get(0);
            assertEquals(List.of(293.15, 373.15), summary.temperaturesK());
            assertEquals(GRADE, library.reader().grade(GRADE.name()).orElseThrow());
            assertEquals(chi.get(0).chi(), library.reader().susceptibility("Copper (invented)").get(0).chi());
            assertEquals(List.of(), library.reader().grades("hard ferrite"));
        }
    }

    @Test
    void a_conflicting_import_writes_nothing() {
        try (Library library = TestLibraries.fresh()) {
            library.writer().importBatch(TestLibraries.importInfo("a.csv", 1, 1, 50), List.of(GRADE),
                    List.of(new LibraryCurve(GRADE.name(), TestLibraries.curve(293.15, 50), null, null)), List.of());
            Map<String, Integer> before = library.reader().rowCounts();
            GradeInfo other = new GradeInfo("Invented N45", "sintered NdFeB", null, null, null, null);
            var error = assertThrows(ConflictException.class, () -> library.writer().importBatch(
                    TestLibraries.importInfo("b.csv", 2, 2, 100), List.of(other, GRADE),
                    List.of(new LibraryCurve(other.name(), TestLibraries.curve(293.15, 50), null, null),
                            new LibraryCurve(GRADE.name(), TestLibraries.curve(293.15, 50), null, null)), List.of()));
            assertEquals("grade 'Invented N40' already has a intrinsic curve at 293.15 K", error.getMessage());
            assertEquals(before, library.reader().rowCounts());
        }
    }

    @Test
    void the_same_checksum_is_not_imported_twice() {
        try (Library library = TestLibraries.fresh()) {
            library.writer().importBatch(TestLibraries.importInfo("a.csv", 1, 0, 0), List.of(), List.of(), List.of());
            assertThrows(ConflictException.class, () -> library.writer().importBatch(
                    TestLibraries.importInfo("copy-of-a.csv", 1, 0, 0), List.of(), List.of(), List.of()));
            assertEquals(1, library.reader().rowCounts().get("import_record"));
        }
    }

    @Test
    void a_grade_stored_under_another_family_is_a_conflict() {
        try (Library library = TestLibraries.fresh()) {
            library.writer().importBatch(TestLibraries.importInfo("a.csv", 1, 0, 0), List.of(GRADE), List.of(), List.of());
            GradeInfo sameNameOtherFamily = new GradeInfo(GRADE.name(), "hard ferrite", null, null, null, null);
            assertThrows(ConflictException.class, () -> library.writer().importBatch(
                    TestLibraries.importInfo("b.csv", 2, 0, 0), List.of(sameNameOtherFamily), List.of(), List.of()));
        }
    }

    @Test
    void hostile_strings_are_stored_and_read_back_unchanged() {
        List<String> names = List.of("'; DROP TABLE grade; --", "<script>alert(1)</script>", "Robert\"); DELETE FROM curve;",
                "tab\tand\nnewline\u0007bell", "Ниодим-железо-бор 42 · 磁石 · مغناطيس", "x".repeat(500), "\\ backslash % percent _ underscore");
        try (Library library = TestLibraries.fresh()) {
            List<GradeInfo> grades = new ArrayList<>();
            List<LibraryCurve> curves = new ArrayList<>();
            for (String name : names) {
                grades.add(new GradeInfo(name, "family " + name.substring(0, Math.min(name.length(), 150)), name, null, name, name));
                curves.add(new LibraryCurve(name, TestLibraries.curve(293.15, 5), name, null));
            }
            library.writer().importBatch(TestLibraries.importInfo("hostile.csv", 9, curves.size(), 5 * curves.size()), grades, curves, List.of());
            for (GradeInfo grade : grades) {
                assertEquals(grade, library.reader().grade(grade.name()).orElseThrow());
                assertEquals(grade.name(), library.reader().curves(grade.name()).get(0).source());
            }
            assertEquals(names.size(), library.reader().grades(null).size());
            assertEquals(6, library.reader().rowCounts().size());
        }
    }

    @Test
    void concurrent_imports_lose_and_mix_no_rows() throws Exception {
        try (Library library = TestLibraries.fresh()) {
            ExecutorService pool = Executors.newFixedThreadPool(4);
            List<Future<?>> done = new ArrayList<>();
            for (int t = 0; t < 8; t++) {
                int task = t;
                done.add(pool.submit(() -> {
                    GradeInfo grade = new GradeInfo("Invented grade " + task, "sintered NdFeB", null, null, null, null);
                    List<LibraryCurve> curves = new ArrayList<>();
                    for (int c = 0; c < 5; c++) {
                        curves.add(new LibraryCurve(grade.name(), TestLibraries.curve(293.15 + 20 * c, 200 + task), null, null));
                    }
                    library.writer().importBatch(TestLibraries.importInfo("file" + task + ".csv", 100 + task, 5, 5 * (200 + task)),
                            List.of(grade), curves, List.of());
                }));
            }
            for (Future<?> future : done) {
                future.get();
            }
            pool.shutdown();
            LibrarySnapshot snapshot = library.reader().snapshot();
            assertEquals(8, snapshot.grades().size());
            assertEquals(40, snapshot.curves().size());
            for (LibraryCurve curve : snapshot.curves()) {
                int task = Integer.parseInt(curve.grade().substring("Invented grade ".length()));
                assertEquals(200 + task, curve.curve().size(), "every curve has its own points");
                assertEquals(TestLibraries.curve(curve.curve().temperatureK(), 200 + task), curve.curve());
            }
        }
    }
}
