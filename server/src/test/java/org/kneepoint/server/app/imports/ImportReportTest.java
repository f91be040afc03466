package org.kneepoint.server.app.imports;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.app.DemoLibraryFixture;
import org.kneepoint.server.app.JsonKeys;

/** An import over a fresh library, and its report: what each file holds, a dry run that stores nothing, a second import skipped. */
class ImportReportTest {

    @TempDir
    Path folder;

    private Path file(String name, String grade, String... temperatures) throws IOException {
        StringBuilder text = new StringBuilder("# grade: " + grade + "\n# family: sintered NdFeB\n");
        for (String temperature : temperatures) {
            text.append("# temperature: ").append(temperature).append('\n');
        }
        text.append("H [kA/m],J [T]\n0,1.2\n-500,1.15\n-900,1.1\n-1000,0.5\n-1100,0\n");
        return Files.writeString(folder.resolve(name), text, StandardCharsets.UTF_8);
    }

    @Test
    void a_dry_run_reports_the_file_as_valid_and_stores_nothing() throws IOException {
        try (Library library = DemoLibraryFixture.empty(folder)) {
            Path one = file("one.csv", "Invented One", "20 C");
            ImportReport report = ImportReport.of(ImportRun.run(library, ReadLimits.defaults(), List.of(one), true), true);
            assertTrue(report.dryRun());
            ImportReport.FileReport file = report.files().get(0);
            assertEquals("valid", file.status());
            assertEquals(List.of("Invented One"), file.grades());
            assertEquals(1, file.curves());
            assertEquals(List.of(293.15), file.temperaturesK());
            assertEquals(64, file.sha256().length());
            assertEquals(List.of(), library.reader().grades(null));
        }
    }

    @Test
    void an_imported_file_writes_its_counts_and_no_keys_of_an_earlier_import() throws IOException {
        try (Library library = DemoLibraryFixture.empty(folder)) {
            ImportReport report = ImportReport.of(ImportRun.run(library, ReadLimits.defaults(), List.of(file("one.csv", "Invented One", "20 C")),
                    false), false);
            ImportReport.FileReport file = report.files().get(0);
            assertEquals("imported", file.status());
            assertFalse(file.alreadyImported());
            assertEquals(List.of("dryRun", "files"), JsonKeys.of(report));
            assertEquals(List.of("file", "status", "sha256", "grades", "curves", "points", "susceptibilityPoints", "temperaturesK"),
                    JsonKeys.of(file));
            assertEquals(1, library.reader().grades(null).size());
        }
    }

    @Test
    void the_same_file_again_is_reported_as_imported_before_with_when_and_as_what() throws IOException {
        try (Library library = DemoLibraryFixture.empty(folder)) {
            Path one = file("one.csv", "Invented One", "20 C");
            ImportRun.run(library, ReadLimits.defaults(), List.of(one), false);
            Path again = Files.copy(one, folder.resolve("again.csv"));
            ImportReport.FileReport file = ImportReport.of(ImportRun.run(library, ReadLimits.defaults(), List.of(again), false), false)
                    .files().get(0);
            assertTrue(file.alreadyImported());
            assertEquals("again.csv", file.file());
            assertEquals("one.csv", file.importedAs());
            assertEquals(List.of("file", "status", "sha256", "importedAt", "importedAs"), JsonKeys.of(file));
            assertNull(file.curves());
        }
    }

    @Test
    void a_bad_file_among_good_ones_stores_nothing_and_names_the_file() throws IOException {
        try (Library library = DemoLibraryFixture.empty(folder)) {
            Path good = file("good.csv", "Invented Good", "20 C");
            Path broken = Files.writeString(folder.resolve("broken.csv"),
                    "# grade: Invented Broken\n# family: sintered NdFeB\n# temperature: 20 C\nH [kA/m],J [T]\n0,1.2\n-900,abc\n");
            BadInputException error = assertThrows(BadInputException.class,
                    () -> ImportRun.run(library, ReadLimits.defaults(), List.of(good, broken), false));
            assertTrue(error.getMessage().contains("broken.csv"), error.getMessage());
            assertEquals(List.of(), library.reader().grades(null));
        }
    }

    @Test
    void the_steps_of_an_import_are_reported_in_order_ending_with_storing() throws IOException {
        try (Library library = DemoLibraryFixture.empty(folder)) {
            List<ImportStep> steps = new ArrayList<>();
            ImportRun.run(library, ReadLimits.defaults(), List.of(file("a.csv", "Invented A", "20 C"), file("b.csv", "Invented B", "20 C")),
                    false, steps::add);
            assertEquals(ImportStep.Stage.READING, steps.get(0).stage());
            assertEquals(ImportStep.Stage.STORING, steps.get(steps.size() - 1).stage());
            assertEquals(2, steps.get(steps.size() - 1).filesChecked());
            for (int i = 1; i < steps.size(); i++) {
                assertTrue(steps.get(i).filesChecked() >= steps.get(i - 1).filesChecked(), "files checked never go back");
            }
        }
    }
}
