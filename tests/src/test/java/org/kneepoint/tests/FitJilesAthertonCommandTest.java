package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.kneepoint.tests.JilesAthertonSimulateCommandTest.assertBadInput;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.library.FitRecord;

class FitJilesAthertonCommandTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    @TempDir
    Path folder;

    @Test
    void a_loop_file_fit_gives_the_issue_keys_and_recovers_the_parameters() throws IOException {
        CliRun run = CliRun.of("fit", "ja", FitTestData.loopFile(folder).toString(), "--json");
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.err(), "no progress bar with --json");
        JsonNode json = MAPPER.readTree(run.out());
        for (String key : List.of("ms", "a", "k", "c", "alpha", "rmsB", "evaluations", "standardErrors", "correlation",
                "iterations", "points", "fieldMin", "fieldMax", "source", "grade", "curveKind", "temperatureK", "saved")) {
            assertTrue(json.has(key), key);
        }
        assertEquals(1.6e6, json.get("ms").asDouble(), 0.02 * 1.6e6);
        assertEquals(1100, json.get("a").asDouble(), 0.02 * 1100);
        assertEquals(1.6e-3, json.get("alpha").asDouble(), 0.02 * 1.6e-3);
        assertEquals(300, json.get("points").asInt());
        assertEquals("loop", json.get("curveKind").asText());
        assertEquals(FitTestData.GRADE, json.get("grade").asText());
        assertEquals(5, json.get("correlation").size());
        assertTrue(json.get("standardErrors").get("ms").asDouble() > 0);
        assertEquals(false, json.get("saved").asBoolean());
        double noise = 0.003 * 1.6917;
        assertEquals(noise, json.get("rmsB").asDouble(), 0.15 * noise, "the fit reaches the noise floor");
    }

    @Test
    void the_table_names_the_parameters_with_their_errors() throws IOException {
        CliRun run = CliRun.of("fit", "ja", FitTestData.loopFile(folder).toString());
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().startsWith("loop.csv: Jiles–Atherton fit to the loop"), run.out());
        for (String name : List.of("Ms", "rms B residual", "correlation (Ms, a, k, c, α)", "kA/m", "±")) {
            assertTrue(run.out().contains(name), name + " in\n" + run.out());
        }
    }

    @Test
    void a_second_quadrant_curve_is_fitted_after_its_magnetizing_field() throws IOException {
        double[][] curve = FitTestData.secondQuadrantCurve();
        Path file = FitTestData.curveFile(folder, "second.csv", "", curve[0], curve[1]);
        assertBadInput(CliRun.of("fit", "ja", file.toString(), "--json"),
                "second.csv: is a normal (second-quadrant) curve, not a loop; give the field it was magnetized at");
        CliRun run = CliRun.of("fit", "ja", file.toString(), "--magnetizing-field", "20kA/m", "--json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = MAPPER.readTree(run.out());
        assertEquals("normal", json.get("curveKind").asText());
        assertEquals(20_000, json.get("magnetizingField").asDouble(), 1e-9);
        assertTrue(json.get("rmsB").asDouble() < 1e-3, "noise-free data fit closely: " + json.get("rmsB"));
        CliRun table = CliRun.of("fit", "ja", file.toString(), "--magnetizing-field", "20kA/m");
        assertTrue(table.out().startsWith("second.csv: Jiles–Atherton fit to the second-quadrant curve after magnetizing"
                + " at 20 kA/m\n"), table.out());
    }

    @Test
    void a_stored_second_quadrant_curve_is_fitted_only_with_its_magnetizing_field() throws IOException {
        FitTestData.storeSecondQuadrantGrade(folder, "Invented curve only");
        assertBadInput(CliRun.of("fit", "ja", "Invented curve only", "--db", folder.toString()),
                "grade Invented curve only: has no stored loop curve; to fit one of its second-quadrant curves give");
        CliRun run = CliRun.of("fit", "ja", "Invented curve only", "--magnetizing-field", "20kA/m", "--save", "--json",
                "--db", folder.toString());
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = MAPPER.readTree(run.out());
        assertEquals("normal", json.get("curveKind").asText());
        assertTrue(json.get("rmsB").asDouble() < 1e-3, "noise-free data fit closely: " + json.get("rmsB"));
        assertEquals(1, FitTestData.storedFits(folder));
    }

    @Test
    void a_stored_grade_is_fitted_and_save_writes_exactly_one_fit() throws IOException {
        FitTestData.storeLibrary(folder, 293.15, 353.15);
        assertBadInput(CliRun.of("fit", "ja", FitTestData.GRADE, "--db", folder.toString()),
                "grade Invented soft iron: holds curves at 20 °C, 80 °C; choose one with --temperature");
        CliRun run = CliRun.of("fit", "ja", FitTestData.GRADE, "--temperature", "80°C", "--save", "--json",
                "--db", folder.toString());
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = MAPPER.readTree(run.out());
        assertEquals(353.15, json.get("temperatureK").asDouble(), 1e-9);
        assertTrue(json.get("saved").asBoolean());
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder))) {
            List<FitRecord> fits = library.reader().fits();
            assertEquals(1, fits.size());
            FitRecord fit = fits.get(0);
            assertEquals("ja", fit.model());
            assertEquals(FitTestData.GRADE, fit.grade());
            assertEquals("loop", fit.curveKind());
            assertEquals(353.15, fit.curveTemperatureK(), 1e-6, "linked to the stored curve it came from");
            assertEquals(json.get("rmsB").asDouble(), fit.residual(), 0);
            JsonNode parameters = MAPPER.readTree(fit.parametersJson());
            assertEquals(json.get("ms").asDouble(), parameters.get("ms").asDouble(), 0);
            assertEquals(5, parameters.size());
            assertTrue(!fit.programVersion().isBlank());
        }
    }

    @Test
    void saving_a_file_fit_needs_its_grade_in_the_library_and_writes_nothing_otherwise() throws IOException {
        Path loop = FitTestData.loopFile(folder);
        Path db = Files.createDirectory(folder.resolve("db"));
        assertBadInput(CliRun.of("fit", "ja", loop.toString(), "--save", "--db", db.toString()),
                "option --save: grade 'Invented soft iron' of loop.csv is not in the library");
        assertEquals(0, FitTestData.storedFits(db));
        FitTestData.storeLibrary(db, 293.15);
        CliRun run = CliRun.of("fit", "ja", loop.toString(), "--save", "--db", db.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertEquals(1, FitTestData.storedFits(db));
    }

    @Test
    void bad_input_is_one_line_with_exit_code_2() throws IOException {
        Path db = Files.createDirectory(folder.resolve("db"));
        assertBadInput(CliRun.of("fit", "ja", "no such grade", "--db", db.toString()),
                "no file or grade named 'no such grade'");
        Path loop = FitTestData.loopFile(folder);
        assertBadInput(CliRun.of("fit", "ja", loop.toString(), "--temperature", "20"),
                "Invalid value for option '--temperature'");
        assertBadInput(CliRun.of("fit", "ja", loop.toString(), "--magnetizing-field", "3T"),
                "Invalid value for option '--magnetizing-field'");
        assertBadInput(CliRun.of("fit", "ja", loop.toString(), "--temperature", "150°C"),
                "loop.csv: has no curve at 150 °C; it holds curves at 20 °C");
        double[] h = FitTestData.cosineField(10);
        Path tiny = FitTestData.curveFile(folder, "tiny.csv", "# kind: loop\n", h, FitTestData.noisyFluxDensity(h, 0, 1L));
        assertBadInput(CliRun.of("fit", "ja", tiny.toString(), "--json"), "tiny.csv: the loop has 10 points; expected at least 20");
        assertBadInput(CliRun.of("fit"), "missing model; expected one of knee, temperature, ja, curie-weiss");
        assertEquals(0, FitTestData.storedFits(db));
    }
}
