package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import com.fasterxml.jackson.databind.JsonNode;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;

/**
 * The server keeps each grade's computed models (GradeModelCache) and computes them again as soon as the grade's
 * stored data change: a curve imported for a grade changes the next check and selection, and a refused grade (no
 * model yet) is assessed once its second curve arrives. Curves are invented.
 */
class GradeModelCacheTest {

    static final String GRADE = "Invented cached grade";
    static final String CHECK = "/api/check?grade=Invented%20cached%20grade&pc=2&temperature=125C";
    static final String SELECT = "/api/select?pc=2&temperature=125C&family=sintered%20NdFeB";

    /** An invented J–H curve of the grade at {@code celsius} with remanence {@code br}: a knee at HcJ 1100 kA/m, 24 points. */
    static String curveFile(int celsius, double br) {
        StringBuilder text = new StringBuilder(String.format(Locale.ROOT,
                "# grade: %s\n# family: sintered NdFeB\n# temperature: %d C\nH [kA/m],J [T]\n", GRADE, celsius));
        double hcj = 1.1e6;
        for (int i = 0; i < 24; i++) {
            double h = 0.05 * hcj - 1.2 * hcj * i / 23;
            double j = h <= -hcj ? 0 : (br + MU0 * 0.05 * h) * (1 - Math.exp(-(h + hcj) / (0.04 * hcj)));
            text.append(String.format(Locale.ROOT, "%.4f,%.5f%n", h / 1e3, j));
        }
        return text.toString();
    }

    static JsonNode operatingPoint(RunningServer server) throws Exception {
        HttpResponse<String> response = server.get(CHECK);
        assertEquals(200, response.statusCode(), response.body());
        return RunningServer.json(response).get("operatingPoint");
    }

    static JsonNode selectionRow(RunningServer server) throws Exception {
        HttpResponse<String> response = server.get(SELECT);
        assertEquals(200, response.statusCode(), response.body());
        for (JsonNode row : RunningServer.json(response)) {
            if (row.get("grade").asText().equals(GRADE)) {
                return row;
            }
        }
        throw new AssertionError("no row of " + GRADE + " in " + response.body());
    }

    @Test
    void an_imported_curve_changes_the_next_check_and_selection(@TempDir Path folder) throws Exception {
        try (RunningServer server = RunningServer.over(DatabaseLocation.ofFolder(folder.resolve("library")))) {
            assertEquals(200, server.upload("/api/import", Map.of("c20.csv", curveFile(20, 1.30)), Map.of()).statusCode());
            JsonNode alone = selectionRow(server);
            assertEquals(false, alone.get("assessable").asBoolean(), "one curve: no temperature model yet " + alone);
            assertEquals(200, server.upload("/api/import", Map.of("c100.csv", curveFile(100, 1.22)), Map.of()).statusCode());
            JsonNode first = operatingPoint(server);
            assertEquals(first, operatingPoint(server), "the same answer from the kept model");
            JsonNode row = selectionRow(server);
            assertEquals(true, row.get("assessable").asBoolean(), "the second curve gives the grade a model " + row);

            assertEquals(200, server.upload("/api/import", Map.of("c150.csv", curveFile(150, 1.00)), Map.of()).statusCode());
            JsonNode after = operatingPoint(server);
            assertNotEquals(first.get("b").asDouble(), after.get("b").asDouble(), "the third curve changes the model: " + first + " " + after);
            assertNotEquals(row.get("fluxDensity").asDouble(), selectionRow(server).get("fluxDensity").asDouble());
        }
    }
}
