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
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CheckElementsCommandTest {

    private static final String GRADE = "--br 1.3T --mu-rec 1.05 --hcj 1600kA/m --knee 1450kA/m --alpha -0.12%/K --beta -0.6%/K";

    @TempDir
    Path folder;

    private static String[] args(String line, String... more) {
        List<String> all = new ArrayList<>(List.of(line.split(" ")));
        all.addAll(List.of(more));
        return all.toArray(String[]::new);
    }

    private static JsonNode json(CliRun run) throws IOException {
        assertEquals(0, run.exitCode(), run.err());
        return new ObjectMapper().readTree(run.out());
    }

    private Path uniform(String name, double h, int elements) throws IOException {
        StringBuilder text = new StringBuilder("# source: invented, a uniform field\nx [mm],y [mm],z [mm],Hx [A/m],Hy [A/m],Hz [A/m],V [mm³]\n");
        for (int i = 0; i < elements; i++) {
            text.append(String.format(Locale.ROOT, "%d,0,0,1000,0,%s,%d%n", i, Double.toString(h), i + 1));
        }
        Path file = folder.resolve(name);
        Files.writeString(file, text);
        return file;
    }

    @Test
    void uniform_field_gives_the_checks_loss_with_the_issues_keys() throws IOException {
        // docs/design-checks.md: Pc 1 at 141 °C, H = −405.1 kA/m, loss 6.08 %
        JsonNode check = json(CliRun.of(args("check --pc 1 " + GRADE + " --temperature 141C --json")));
        double h = check.get("operatingPoint").get("h").asDouble();
        Path file = uniform("case.csv", h, 4);
        Path results = folder.resolve("results.csv");
        JsonNode json = json(CliRun.of(args("check-elements " + GRADE + " --temperature 141C --json -o", results.toString(),
                file.toString())));
        List<String> keys = new ArrayList<>();
        json.fieldNames().forEachRemaining(keys::add);
        assertEquals(List.of("elements", "volume", "volumeFractionPastKnee", "irreversibleLossPercent", "worstElements", "verdict",
                "provenance", "lossLimitPercent", "transverseField", "loadCases", "extrapolated", "cautions"), keys);
        assertEquals(4, json.get("elements").asInt());
        assertEquals(1e-8, json.get("volume").asDouble(), 1e-20);
        assertEquals(check.get("irreversibleLossPercent").asDouble(), json.get("irreversibleLossPercent").asDouble(), 1e-9);
        assertEquals("fail", json.get("verdict").asText());
        JsonNode worst = json.get("worstElements").get(0);
        List<String> worstKeys = new ArrayList<>();
        worst.fieldNames().forEachRemaining(worstKeys::add);
        assertEquals(List.of("index", "x", "y", "z", "hParallel", "margin", "lossPercent"), worstKeys);
        assertEquals(h, worst.get("hParallel").asDouble(), 1e-6);
        assertEquals(check.get("kneeMarginH").asDouble(), worst.get("margin").asDouble(), 1e-6);
        assertEquals(4, json.get("worstElements").size());
        assertEquals("grade typed in (knee model, linear temperature law)", json.get("provenance").get("curves").asText());
        assertEquals(3, json.get("cautions").size());

        List<String> rows = Files.readAllLines(results);
        assertEquals("x [mm],y [mm],z [mm],Br [T],mu_rec,loss [%]", rows.get(0));
        assertEquals(5, rows.size());
        String[] last = rows.get(4).split(",");
        assertEquals(3.0, Double.parseDouble(last[0]), 0.0);
        double brHot = 1.3 * (1 - 0.0012 * 121);
        assertEquals(brHot * (1 - check.get("irreversibleLossPercent").asDouble() / 100), Double.parseDouble(last[3]), 1e-9);
        // μrec is the knee model's slope at H = 0 (a one-sided difference over 10⁻⁴·HcJ), 1.05 to rounding
        assertEquals(1.05, Double.parseDouble(last[4]), 1e-9);
    }

    @Test
    void later_load_cases_keep_the_worst_point_and_the_table_shows_the_cautions() throws IOException {
        Path hot = uniform("hot.csv", -4.5e5, 2);
        Path mild = uniform("mild.csv", -1e5, 2);
        JsonNode both = json(CliRun.of(args("check-elements " + GRADE + " --temperature 141C --json", hot.toString(), mild.toString())));
        JsonNode alone = json(CliRun.of(args("check-elements " + GRADE + " --temperature 141C --json", hot.toString())));
        assertTrue(alone.get("irreversibleLossPercent").asDouble() > 1.0);
        assertEquals(alone.get("irreversibleLossPercent").asDouble(), both.get("irreversibleLossPercent").asDouble(), 0.0);
        assertEquals(2, both.get("loadCases").size());
        CliRun table = CliRun.of(args("check-elements " + GRADE + " --temperature 141C", hot.toString(), mild.toString()));
        assertEquals(0, table.exitCode(), table.err());
        assertTrue(table.out().contains("Cautions:"), table.out());
        assertTrue(table.out().contains("FAIL"), table.out());
    }

    @Test
    void the_report_holds_the_summary_the_map_in_the_chosen_plane_and_the_cautions() throws IOException {
        Path hot = uniform("hot.csv", -4.5e5, 2);
        Path report = folder.resolve("elements.html");
        JsonNode json = json(CliRun.of(args("check-elements " + GRADE + " --temperature 141C --json --plane yz --report",
                report.toString(), hot.toString())));
        String html = Files.readString(report);
        assertTrue(html.contains("data-key=\"irreversibleLossPercent\" data-value=\"" + json.get("irreversibleLossPercent").asDouble() + "\""),
                "the report's loss is the command's");
        assertTrue(html.contains("<svg") && html.contains(">y (mm)<") && html.contains(">z (mm)<"), "the map, yz plane, inline");
        assertTrue(html.contains("model estimates"), "the caution");
        assertFalse(html.contains("<script"), "no script: the report opens offline");
        assertFalse(html.contains("href=\"/") || html.contains("src=\"/"), "nothing fetched from a server");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        bad number      | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³]\n0,0,0,0,0,-100,1\n0,0,0,0,oops,0,1\n' | kneepoint: bad.csv, line 3, column 5 (Hy [kA/m]): expected a finite number, got 'oops'
        unknown column  | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],Vol [mm³]\n0,0,0,0,0,0,1\n'                   | kneepoint: bad.csv, line 1, column 7: unknown column 'Vol'; expected x, y, z, Hx, Hy, Hz (or Bx, By, Bz), V (or A), mx, my, mz or T
        no temperature  | 'x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³]\n0,0,0,0,0,0,1\n'                     | kneepoint: good.csv: has no temperature column T; give one, or the temperature of the elements
        """)
    void bad_file_gives_exit_2_one_line_naming_the_place_and_writes_nothing(String name, String text, String message) throws IOException {
        Path good = uniform("good.csv", -1e5, 3);
        Path bad = folder.resolve("bad.csv");
        Files.writeString(bad, text.replace("\\n", "\n"));
        Path results = folder.resolve("results.csv");
        String temperature = name.equals("no temperature") ? "" : " --temperature 20C";
        CliRun run = CliRun.of(args("check-elements " + GRADE + temperature + " -o", results.toString(), good.toString(), bad.toString()));
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertEquals(message, run.err().strip());
        assertFalse(Files.exists(results));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        zero direction   | --direction 0,0,0
        bad rule         | --transverse sideways
        bad plane        | --plane xw
        report not html  | --report report.txt
        no such file     | --loss-limit 1%
        """)
    void bad_options_give_exit_2_and_one_line(String name, String option) throws IOException {
        Path file = name.equals("no such file") ? folder.resolve("missing.csv") : uniform("ok.csv", -1e5, 1);
        CliRun run = CliRun.of(args("check-elements " + GRADE + " --temperature 20C " + option, file.toString()));
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertEquals(1, run.err().strip().lines().count(), run.err());
    }
}
