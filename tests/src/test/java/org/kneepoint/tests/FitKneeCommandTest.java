package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;

class FitKneeCommandTest {

    private static final Path EXAMPLES = Path.of("..", "examples");

    @TempDir
    Path folder;

    @Test
    void fit_knee_json_has_the_documented_keys() throws Exception {
        CliRun run = CliRun.of("fit", "knee", EXAMPLES.resolve("invented-sintered-ndfeb-20C.csv").toString(), "--json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = new ObjectMapper().readTree(run.out());
        for (String key : List.of("br", "muRec", "hcj", "hk", "bhMax", "rmsJ", "kneeWidth", "standardErrors", "correlation")) {
            assertTrue(json.has(key), key);
        }
        assertEquals(1.28, json.get("br").asDouble(), 0.005);
    }

    @Test
    void fit_temperature_of_a_stored_grade_gives_alpha_and_beta_and_saves_one_fit() throws Exception {
        String db = folder.resolve("library").toString();
        assertEquals(0, CliRun.of("demo", "--db", db).exitCode());
        CliRun run = CliRun.of("fit", "temperature", "DEMO NdFeB 40/160", "--json", "--save", "--db", db);
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = new ObjectMapper().readTree(run.out());
        // The demo grade was generated with α = −0.12 %/K (DemoLibrary, invented).
        assertEquals(-0.12, json.get("alphaPercentPerK").asDouble(), 0.005);
        assertTrue(json.get("betaPercentPerK").asDouble() < 0);
        assertEquals(4, json.get("fits").size());
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder.resolve("library")))) {
            assertEquals(1, library.reader().fits().size());
            assertEquals("temperature", library.reader().fits().get(0).model());
        }
    }

    @Test
    void bad_targets_give_one_line_and_exit_code_2() throws Exception {
        String db = folder.resolve("library").toString();
        CliRun unknown = CliRun.of("fit", "knee", "No such grade", "--db", db);
        assertEquals(2, unknown.exitCode());
        assertTrue(unknown.err().startsWith("kneepoint: no file or grade named 'No such grade'"), unknown.err());
        Path straight = folder.resolve("straight.csv");
        java.nio.file.Files.writeString(straight, "H [kA/m],J [T]\n0,1.3\n-200,1.29\n-400,1.28\n-600,1.27\n");
        CliRun early = CliRun.of("fit", "knee", straight.toString());
        assertEquals(2, early.exitCode());
        assertTrue(early.err().contains("the curve stops before its knee"), early.err());
        CliRun single = CliRun.of("fit", "temperature", EXAMPLES.resolve("invented-sintered-ndfeb-20C.csv").toString());
        assertEquals(2, single.exitCode());
        assertTrue(single.err().contains("needs curves at two or more temperatures"), single.err());
        assertEquals("", single.out());
    }
}
