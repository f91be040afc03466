package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** {@code export GRADE --temperature T --after STEPS --pc P}: the curve of a magnet the steps damaged (issue 16, item 3). */
class ExportAfterCommandTest {

    private static final String GRADE = "DEMO NdFeB 42/100";
    private static final String STEPS = "100C:300kA/m, 20C:0";

    @TempDir
    static Path folder;

    @BeforeAll
    static void demo() {
        CliRun run = CliRun.of("demo", "--db", db());
        assertEquals(0, run.exitCode(), run.err());
    }

    private static String db() {
        return folder.resolve("library").toString();
    }

    private static JsonNode json(String... args) throws IOException {
        List<String> all = new ArrayList<>(List.of(args));
        all.addAll(List.of("--db", db()));
        CliRun run = CliRun.of(all.toArray(String[]::new));
        assertEquals(0, run.exitCode(), run.err());
        return new ObjectMapper().readTree(run.out());
    }

    /** J (or B) at H = 0, linear between the two points around it. */
    private static double atZero(JsonNode rows) {
        for (int i = 1; i < rows.size(); i++) {
            double h0 = rows.get(i - 1).get(0).asDouble();
            double h1 = rows.get(i).get(0).asDouble();
            if (h0 >= 0 && h1 <= 0 && h0 != h1) {
                double v0 = rows.get(i - 1).get(1).asDouble();
                double v1 = rows.get(i).get(1).asDouble();
                return v0 + (v1 - v0) * h0 / (h0 - h1);
            }
        }
        throw new AssertionError("no points around H = 0");
    }

    @Test
    void damaged_remanence_at_t0_is_br_times_one_minus_the_loss_of_duty() throws IOException {
        // docs/design.md §4: the worst point so far sets the recoil line; Br' = (1 − loss)·Br at T0
        JsonNode duty = json("duty", GRADE, "--pc", "1", "--steps", STEPS, "--json");
        double loss = duty.get("steps").get(1).get("irreversibleLossPercent").asDouble() / 100.0;
        assertTrue(loss > 0.02, "the hot step must damage the magnet: " + loss);
        double br = json("curve", GRADE, "--temperature", "20C", "--json").get("br").asDouble();
        for (String curve : List.of("intrinsic", "normal")) {
            JsonNode damaged = json("export", GRADE, "--temperature", "20C", "--curve", curve, "--format", "json", "--after", STEPS,
                    "--pc", "1");
            assertEquals((1 - loss) * br, atZero(damaged.get("rows")), 1e-9 * br, curve);
            assertTrue(damaged.get("notes").asText().contains("damaged by 2 steps"), damaged.get("notes").asText());
        }
    }

    @Test
    void damaged_curve_follows_the_original_beyond_the_worst_point() throws IOException {
        JsonNode plain = json("export", GRADE, "--temperature", "20C", "--curve", "intrinsic", "--format", "json").get("rows");
        JsonNode damaged = json("export", GRADE, "--temperature", "20C", "--curve", "intrinsic", "--format", "json", "--after", STEPS,
                "--pc", "1").get("rows");
        JsonNode lowestPlain = plain.get(plain.size() - 1);
        JsonNode lowestDamaged = damaged.get(damaged.size() - 1);
        assertEquals(lowestPlain.get(0).asDouble(), lowestDamaged.get(0).asDouble(), 0.0);
        assertEquals(lowestPlain.get(1).asDouble(), lowestDamaged.get(1).asDouble(), 0.0);
        assertEquals(plain.size() + 1, damaged.size(), "one point added where the recoil line meets the curve");
    }

    @Test
    void no_damage_exports_the_plain_curve() throws IOException {
        // Pc 1000 at 20 °C: the operating point sits at H ≈ −1 kA/m, on the straight part of the curve
        JsonNode duty = json("duty", GRADE, "--pc", "1000", "--steps", "20C:0", "--json");
        assertEquals(0.0, duty.get("steps").get(0).get("irreversibleLossPercent").asDouble(), 0.0);
        for (String format : List.of("csv", "json")) {
            CliRun plain = CliRun.of("export", GRADE, "--temperature", "20C", "--format", format, "--db", db());
            CliRun after = CliRun.of("export", GRADE, "--temperature", "20C", "--format", format, "--after", "20C:0", "--pc", "1000",
                    "--db", db());
            assertEquals(0, after.exitCode(), after.err());
            assertEquals(plain.out(), after.out());
        }
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        after without pc    | --after;150C:300kA/m
        pc without after    | --pc;2
        pc not positive     | --after;150C:300kA/m;--pc;0
        field without unit  | --after;150C:300;--pc;1
        below absolute zero | --after;-300C:0;--pc;1
        """)
    void bad_damage_gives_exit_2_one_line_and_no_file(String name, String options) {
        Path target = folder.resolve("out-" + name.replace(' ', '-') + ".csv");
        List<String> all = new ArrayList<>(List.of("export", GRADE, "--temperature", "20C", "-o", target.toString(), "--db", db()));
        all.addAll(List.of(options.split(";")));
        CliRun run = CliRun.of(all.toArray(String[]::new));
        assertEquals(2, run.exitCode(), run.err());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertEquals("", run.out());
        assertFalse(Files.exists(target), name);
    }
}
