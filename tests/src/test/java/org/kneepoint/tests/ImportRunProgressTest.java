package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.ConflictException;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.app.imports.ImportRun;
import org.kneepoint.server.app.imports.ImportStep;

/** The steps an import reports as it goes, and an import overtaken by another between its check and its storing. */
class ImportRunProgressTest {

    @TempDir
    Path folder;

    private List<Path> threeExampleFiles() throws Exception {
        Path files = Files.createDirectories(folder.resolve("files"));
        List<Path> paths = new ArrayList<>();
        for (Map.Entry<String, String> file : ImportJobsTest.threeExamples().entrySet()) {
            paths.add(Files.writeString(files.resolve(file.getKey()), file.getValue()));
        }
        return paths;
    }

    @Test
    void an_import_reports_each_file_read_validated_and_characterized_then_the_storing() throws Exception {
        List<Path> paths = threeExampleFiles();
        List<ImportStep> steps = new ArrayList<>();
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder.resolve("library")))) {
            ImportRun.run(library, ReadLimits.defaults(), paths, false, steps::add);
        }
        List<String> seen = steps.stream().map(step -> step.stage() + " " + step.file() + " " + step.filesChecked()).toList();
        assertEquals(List.of("READING three-temperatures.csv 0", "VALIDATING three-temperatures.csv 0",
                "CHARACTERIZING three-temperatures.csv 0", "CHARACTERIZING three-temperatures.csv 0", "CHARACTERIZING three-temperatures.csv 0",
                "CHARACTERIZING three-temperatures.csv 1", "READING n40sh-20C.csv 1", "VALIDATING n40sh-20C.csv 1",
                "CHARACTERIZING n40sh-20C.csv 1", "CHARACTERIZING n40sh-20C.csv 2", "READING salt.csv 2", "VALIDATING salt.csv 2",
                "VALIDATING salt.csv 3", "STORING null 3"), seen);
        for (int i = 1; i < steps.size(); i++) {
            assertTrue(steps.get(i).curvesChecked() >= steps.get(i - 1).curvesChecked(), "curves checked never fall back");
        }
        ImportStep last = steps.get(steps.size() - 1);
        assertEquals(List.of(3, 3, 4, 4), List.of(last.filesChecked(), last.files(), last.curvesChecked(), last.curvesFound()));
        assertTrue(last.everyFileChecked() && !steps.get(steps.size() - 3).everyFileChecked());
    }

    @Test
    void a_file_imported_by_someone_else_between_the_check_and_the_storing_fails_the_import_and_stores_none_of_its_files() throws Exception {
        List<Path> paths = threeExampleFiles();
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder.resolve("library")))) {
            Map<String, Integer> empty = library.reader().rowCounts();
            ConflictException conflict = assertThrows(ConflictException.class, () -> ImportRun.run(library, ReadLimits.defaults(), paths, false,
                    step -> {
                        if (step.stage() == ImportStep.Stage.STORING) {
                            ImportRun.run(library, ReadLimits.defaults(), List.of(paths.get(1)), false);
                        }
                    }));
            assertEquals("the file n40sh-20C.csv was already imported (same SHA-256)", conflict.getMessage());
            assertTrue(library.reader().grade("Invented N40SH").isPresent());
            assertTrue(library.reader().grade("Invented N42H").isEmpty());
            assertEquals(empty.get("curve") + 1, library.reader().rowCounts().get("curve"));
        }
    }
}
