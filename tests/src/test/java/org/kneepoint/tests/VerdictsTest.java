package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;

/**
 * The verdicts of check, duty, sweep and select (issue 15, items 2 and 3): words first, the JSON key {@code verdict},
 * exit 5 with {@code --fail-on-shortfall} only, and the selection rules (B ≤ 0 and soft materials never pass).
 */
@ExtendWith(SharedDemoServer.class)
class VerdictsTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final List<String> GRADE = List.of("--br", "1.3T", "--mu-rec", "1.05", "--hcj", "1600kA/m", "--knee", "1450kA/m",
            "--alpha", "-0.12%/K", "--beta", "-0.6%/K");

    @TempDir
    static Path folder;

    private static SharedDemoServer.Fixture fixture;

    @BeforeAll
    static void fixture(SharedDemoServer.Fixture shared) {
        fixture = shared;
    }

    private static CliRun run(List<String> first, String... more) {
        List<String> all = new ArrayList<>(first);
        all.addAll(List.of(more));
        return CliRun.of(all.toArray(String[]::new));
    }

    private static List<String> typed(String command, String... options) {
        List<String> all = new ArrayList<>(List.of(command));
        all.addAll(List.of(options));
        all.addAll(GRADE);
        return all;
    }

    private static JsonNode json(CliRun run) throws IOException {
        return JSON.readTree(run.out());
    }

    @Test
    void a_check_within_its_limit_meets_it_and_exits_0_even_under_fail_on_shortfall() throws IOException {
        // Linear part of the curve: Bd = Br·Pc/(Pc + μrec) and no irreversible loss (common practice).
        CliRun run = run(typed("check", "--pc", "2", "--temperature", "20C"), "--json", "--fail-on-shortfall");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode verdict = json(run).get("verdict");
        assertEquals(List.of("passes", "summary", "reasons"), keys(verdict));
        assertTrue(verdict.get("passes").asBoolean(), verdict.toString());
        assertEquals("meets the 1 % limit: 0 % loss at 20 °C", verdict.get("summary").asText());
        assertTrue(verdict.get("reasons").isEmpty());
        CliRun table = run(typed("check", "--pc", "2", "--temperature", "20C"));
        assertTrue(table.out().lines().skip(1).findFirst().orElse("").contains("Verdict: meets the 1 % limit"), table.out());
    }

    @Test
    void a_check_over_its_limit_falls_short_with_the_reason_and_exits_5_only_under_fail_on_shortfall() throws IOException {
        List<String> hot = typed("check", "--pc", "0.5", "--temperature", "150C", "--opposing-field", "300kA/m");
        CliRun plain = run(hot, "--json");
        assertEquals(0, plain.exitCode(), plain.err());
        JsonNode document = json(plain);
        JsonNode verdict = document.get("verdict");
        assertFalse(verdict.get("passes").asBoolean());
        double loss = document.get("irreversibleLossPercent").asDouble();
        assertTrue(loss > 1.0, document.toString());
        java.util.regex.Matcher summary = java.util.regex.Pattern.compile("falls short: ([0-9.]+) % loss against 1 %.*")
                .matcher(verdict.get("summary").asText());
        assertTrue(summary.matches(), verdict.toString());
        String percent = summary.group(1);
        assertEquals(loss, Double.parseDouble(percent), 0.05 * loss, "three significant digits of the loss");
        assertEquals("irreversible loss " + percent + " % exceeds the maximum 1 %", verdict.get("reasons").get(0).asText());
        assertTrue(verdict.get("reasons").toString().contains("margin to the knee is negative"), verdict.toString());
        CliRun failing = run(hot, "--fail-on-shortfall");
        assertEquals(5, failing.exitCode(), failing.err());
        assertEquals("", failing.err());
        assertTrue(failing.out().contains("Verdict: falls short: " + percent + " % loss against 1 %"), failing.out());
        assertTrue(failing.out().contains("Cautions:"), "the result is printed in full: " + failing.out());
        assertEquals(5, run(hot, "--json", "--fail-on-shortfall").exitCode());
    }

    @Test
    void a_typed_in_soft_material_is_never_a_permanent_magnet() throws IOException {
        CliRun run = CliRun.of("check", "--pc", "2", "--br", "1T", "--mu-rec", "1.05", "--hcj", "5kA/m", "--temperature", "20C", "--json");
        JsonNode verdict = json(run).get("verdict");
        assertFalse(verdict.get("passes").asBoolean());
        assertTrue(verdict.get("summary").asText().startsWith("falls short: not a permanent magnet: HcJ 5 kA/m"), verdict.toString());
    }

    @Test
    void duty_and_sweep_fall_short_where_their_loss_exceeds_the_limit_and_exit_5_on_request() throws IOException {
        List<String> duty = typed("duty", "--pc", "1", "--steps", "20C:0, 150C:300kA/m, 20C:0");
        JsonNode dutyVerdict = json(run(duty, "--json")).get("verdict");
        assertFalse(dutyVerdict.get("passes").asBoolean(), dutyVerdict.toString());
        assertTrue(dutyVerdict.get("reasons").get(0).asText().contains("at 2 of 3 steps (2 (150 °C), 3 (20 °C))"), dutyVerdict.toString());
        assertEquals(5, run(duty, "--fail-on-shortfall").exitCode());
        List<String> mild = typed("duty", "--pc", "1", "--steps", "20C:0, 80C:50kA/m, 20C:0");
        JsonNode lenient = json(run(mild, "--json", "--loss-limit", "2%"));
        assertTrue(lenient.get("verdict").get("passes").asBoolean(), lenient.toString());
        assertTrue(lenient.get("verdict").get("summary").asText().startsWith("meets the 2 % limit: "), lenient.toString());
        assertEquals(2.0, lenient.get("lossLimitPercent").asDouble(), 0.0);
        assertEquals(0, run(mild, "--fail-on-shortfall").exitCode());

        List<String> sweep = typed("sweep", "--pc", "1", "--from", "20C", "--to", "180C", "--step", "20K", "--opposing-field", "300kA/m");
        JsonNode sweepVerdict = json(run(sweep, "--json")).get("verdict");
        assertFalse(sweepVerdict.get("passes").asBoolean(), sweepVerdict.toString());
        assertTrue(sweepVerdict.get("summary").asText().matches("falls short: [0-9.]+ % loss at the worst temperature against 1 %.*"),
                sweepVerdict.toString());
        assertTrue(sweepVerdict.get("reasons").get(0).asText().contains("of 9 temperatures"), sweepVerdict.toString());
        assertEquals(5, run(sweep, "--fail-on-shortfall").exitCode());
        CliRun cool = run(typed("sweep", "--pc", "2", "--from", "20C", "--to", "60C", "--step", "20K"), "--fail-on-shortfall");
        assertEquals(0, cool.exitCode(), cool.err());
        assertTrue(cool.out().contains("Verdict: meets the 1 % limit at every temperature swept"), cool.out());
    }

    @Test
    void select_never_passes_a_ferrite_whose_operating_point_has_b_at_or_below_zero() throws IOException {
        // Hard ferrite: HcJ above HcB, so J can stay above its knee while B = μ0·H + J is already negative (common practice).
        CliRun run = CliRun.of("select", "--pc", "0.8", "--temperature", "120C", "--opposing-field", "250kA/m", "--sort", "price",
                "--db", fixture.cliDb(), "--json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode rows = json(run);
        int ferrites = 0;
        for (JsonNode row : rows) {
            if (row.get("family").asText().equals("hard ferrite")) {
                ferrites++;
                assertTrue(row.get("fluxDensity").asDouble() <= 0.0, row.toString());
                assertTrue(row.get("irreversibleLossPercent").asDouble() <= 1.0, "only B ≤ 0 stops it: " + row);
                assertFalse(row.get("pass").asBoolean(), row.toString());
                assertFalse(row.get("verdict").get("passes").asBoolean(), row.toString());
                assertTrue(row.get("reasons").get(0).asText().matches("operating point with B = -0\\.0[0-9]+ T: not above zero, the"
                        + " magnet works in the third quadrant"), row.toString());
                assertEquals(row.get("reasons"), row.get("verdict").get("reasons"));
            }
        }
        assertEquals(2, ferrites);
        assertTrue(rows.get(0).get("pass").asBoolean(), "the cheapest passing grade is a real one: " + rows.get(0));
        assertFalse(rows.get(0).get("family").asText().equals("hard ferrite"));
    }

    @Test
    void a_soft_materials_curve_never_passes_a_selection_and_exits_5_when_nothing_passes() throws IOException {
        Path soft = folder.resolve("soft.csv");
        Files.writeString(soft, softCurveFile());
        String library = folder.resolve("soft-library").toString();
        CliRun imported = CliRun.of("import", soft.toString(), "--db", library);
        assertEquals(0, imported.exitCode(), imported.err());
        CliRun run = CliRun.of("select", "--pc", "5", "--temperature", "50C", "--max-loss", "99%", "--db", library, "--json",
                "--fail-on-shortfall");
        assertEquals(5, run.exitCode(), run.err());
        JsonNode row = json(run).get(0);
        assertTrue(row.get("assessable").asBoolean(), row.toString());
        assertFalse(row.get("pass").asBoolean(), row.toString());
        assertTrue(row.get("verdict").get("summary").asText().startsWith("falls short: not a permanent magnet: HcJ"), row.toString());
        CliRun table = CliRun.of("select", "--pc", "5", "--temperature", "50C", "--db", library);
        assertEquals(0, table.exitCode(), table.err());
        assertTrue(table.out().contains("Verdict: falls short: the one grade does not meet every requirement"), table.out());
        assertTrue(table.out().contains("none in range"), table.out());
        assertFalse(table.out().matches("(?s).*\\bnone\\s{2,}.*"), "\"none\" alone could read as no limit: " + table.out());
    }

    @Test
    void the_api_answers_the_same_verdict_as_the_command() throws IOException, InterruptedException {
        String query = "/api/check?pc=0.5&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&knee=1450kA%2Fm&alpha=-0.12%25%2FK&beta=-0.6%25%2FK"
                + "&temperature=150C&opposingField=300kA%2Fm";
        HttpResponse<String> response = fixture.server().get(query);
        assertEquals(200, response.statusCode(), response.body());
        JsonNode api = JSON.readTree(response.body()).get("verdict");
        JsonNode cli = json(run(typed("check", "--pc", "0.5", "--temperature", "150C", "--opposing-field", "300kA/m"), "--json"))
                .get("verdict");
        assertEquals(cli, api);
        HttpResponse<String> duty = fixture.server().get("/api/duty?pc=1&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&knee=1450kA%2Fm"
                + "&alpha=-0.12%25%2FK&beta=-0.6%25%2FK&steps=20C%3A0%2C80C%3A50kA%2Fm&lossLimit=2%25");
        assertEquals(200, duty.statusCode(), duty.body());
        assertEquals(json(run(typed("duty", "--pc", "1", "--steps", "20C:0,80C:50kA/m", "--loss-limit", "2%"), "--json")).get("verdict"),
                JSON.readTree(duty.body()).get("verdict"));
        assertTrue(JSON.readTree(duty.body()).get("verdict").get("passes").asBoolean(), duty.body());
    }

    private static List<String> keys(JsonNode node) {
        List<String> keys = new ArrayList<>();
        node.fieldNames().forEachRemaining(keys::add);
        return keys;
    }

    /** An invented soft material's second-quadrant branch (HcJ about 80 A/m) at two temperatures. */
    private static String softCurveFile() {
        StringBuilder out = new StringBuilder("# INVENTED DATA for a test\n# grade: INVENTED soft iron\n# family: soft iron\n"
                + "T [°C],H [A/m],J [T]\n");
        for (int t : new int[] {20, 100}) {
            double br = 1.0 * (1 - 0.0005 * (t - 20));
            double hcj = 80 * (1 - 0.001 * (t - 20));
            for (int i = 0; i < 60; i++) {
                double h = -1.5 * hcj * i / 59;
                double j = br * (1 - Math.exp(-(h + hcj) / (0.3 * hcj))) / (1 - Math.exp(-1 / 0.3));
                out.append(String.format(Locale.ROOT, "%d,%.4f,%.5f%n", t, h, Math.max(-br, j)));
            }
        }
        return out.toString();
    }
}
