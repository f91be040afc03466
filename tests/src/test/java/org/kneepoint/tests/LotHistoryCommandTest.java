package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code lot history}: five invented lots ({@link KneeCurveFiles}) whose Br is exact by construction. */
class LotHistoryCommandTest {

    private static final String GRADE = "Invented N45";
    private static final double[] BR = {1.40, 1.42, 1.38, 1.41, 1.39};

    @TempDir
    Path folder;

    private CliRun run(String... args) {
        String[] all = java.util.Arrays.copyOf(args, args.length + 2);
        all[args.length] = "--db";
        all[args.length + 1] = folder.resolve("library").toString();
        return CliRun.of(all);
    }

    // Hand calculation of Cpl = (mean − LSL)/(3s) (D. C. Montgomery, Introduction to Statistical Quality Control, §8.3;
    // docs/references.md §11): Br 1.40, 1.42, 1.38, 1.41, 1.39 T; mean 1.40 T; squared deviations sum to 1e-3 T²;
    // s = √(1e-3/4) = 0.0158114 T; against 1.35 T, Cpk = 0.05/0.0474342 = 1.05409.
    @Test
    void cpk_of_five_lots_matches_the_hand_calculation_and_lots_come_in_order_of_measurement() throws IOException {
        assertEquals(0, run("import", KneeCurveFiles.write(folder, "ref.csv", "# grade: " + GRADE + "\n# family: sintered NdFeB\n", 1.40, 1300)
                .toString()).exitCode());
        assertEquals(0, run("spec", "set", GRADE, "--temperature", "20C", "--br-min", "1.35T").exitCode());
        for (int i = 0; i < BR.length; i++) {
            Path file = KneeCurveFiles.write(folder, "lot" + i + ".csv", "", BR[i], 1300);
            CliRun imported = run("lot", "import", GRADE, "--lot", "L" + (5 - i), "--measured-on", "2026-11-0" + (i + 1), file.toString());
            assertEquals(0, imported.exitCode(), imported.err());
            if (i == 3) {
                JsonNode four = new ObjectMapper().readTree(run("lot", "history", GRADE, "--json").out());
                assertTrue(four.get("quantities").get(0).get("cpk").isNull(), "no Cpk from four lots");
            }
        }
        CliRun history = run("lot", "history", GRADE, "--json");
        assertEquals(0, history.exitCode(), history.err());
        JsonNode json = new ObjectMapper().readTree(history.out());
        assertEquals(293.15, json.get("temperatureK").asDouble(), 1e-12);
        assertEquals("L5", json.get("lots").get(0).get("lot").asText(), "the lot measured first comes first, whatever its name");
        JsonNode br = json.get("quantities").get(0);
        assertEquals("br", br.get("name").asText());
        assertEquals(5, br.get("count").asInt());
        assertEquals(1.40, br.get("mean").asDouble(), 1e-9);
        assertEquals(0.0158114, br.get("standardDeviation").asDouble(), 1e-7);
        assertEquals(1.05409, br.get("cpk").asDouble(), 1e-5);
        assertTrue(json.get("quantities").get(1).get("cpk").isNull(), "HcJ has no minimum, so no Cpk");
        assertTrue(run("lot", "history", GRADE).out().contains("Cpk 1.0541"), "the table shows Cpk");
    }
}
