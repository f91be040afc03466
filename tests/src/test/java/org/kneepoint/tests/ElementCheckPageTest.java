package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;

/** The Check page's element upload shows what {@code check-elements --json} says, and a map under 1 MB (issue 16, item 4). */
@ExtendWith(SharedDemoServer.class)
class ElementCheckPageTest {

    /** At 80 °C the invented block passes the knee in a corner of this grade (DemoLibrary, invented). */
    private static final String GRADE = "DEMO NdFeB 40/160";
    private static final String ODD_NAME = "<img src=x onerror=alert(1)>.csv";

    private static SharedDemoServer.Fixture fixture;

    @TempDir
    Path folder;

    @BeforeAll
    static void fixture(SharedDemoServer.Fixture shared) {
        fixture = shared;
    }

    /** The invented block's three load cases (ExampleElementFiles), the first under a name that is markup. */
    private static Map<String, String> cases() {
        Map<String, String> files = new LinkedHashMap<>();
        files.put(ODD_NAME, ExampleElementFiles.text(0));
        files.put("case2.csv", ExampleElementFiles.text(1));
        files.put("case3.csv", ExampleElementFiles.text(2));
        return files;
    }

    private static Map<String, String> fields(String plane) {
        return Map.of("grade", GRADE, "temperature", "80C", "lossLimit", "1%", "plane", plane);
    }

    private JsonNode command(Map<String, String> files) throws Exception {
        List<String> args = new ArrayList<>(List.of("check-elements", GRADE, "--temperature", "80C", "--loss-limit", "1%"));
        int number = 0;
        for (String text : files.values()) {
            Path path = folder.resolve("case" + ++number + ".csv");
            Files.writeString(path, text);
            args.add(path.toString());
        }
        args.addAll(List.of("--json", "--db", fixture.cliDb()));
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertEquals(0, run.exitCode(), run.err());
        return new ObjectMapper().readTree(run.out());
    }

    private static String exact(String page, String key) {
        Matcher matcher = Pattern.compile("data-key=\"" + key + "\" data-value=\"([^\"]*)\"").matcher(page);
        assertTrue(matcher.find(), "no summary value " + key);
        return matcher.group(1).replace("&amp;", "&").replace("&#39;", "'").replace("&quot;", "\"");
    }

    private static String chart(String page) {
        Matcher matcher = Pattern.compile("<img src=\"(/charts/elements/[^\"]+)\"").matcher(page);
        assertTrue(matcher.find(), "no map on the page");
        return matcher.group(1).replace("&amp;", "&");
    }

    @Test
    void the_summary_is_what_the_command_prints_and_the_map_is_an_svg_under_a_megabyte() throws Exception {
        HttpResponse<String> response = fixture.server().upload("/check/elements", cases(), fields("xz"));
        assertEquals(200, response.statusCode(), response.body());
        String page = response.body();
        JsonNode json = command(cases());
        assertEquals(json.get("elements").asInt(), Integer.parseInt(exact(page, "elements")));
        for (String key : List.of("volume", "volumeFractionPastKnee", "irreversibleLossPercent")) {
            assertEquals(json.get(key).asDouble(), Double.parseDouble(exact(page, key)), 0.0, key);
        }
        assertTrue(json.get("volumeFractionPastKnee").asDouble() > 0, "the example passes the knee somewhere");
        assertEquals(json.get("verdict").asText(), exact(page, "verdict"));
        assertEquals(json.get("transverseField").asText(), exact(page, "transverseField"));
        assertEquals(json.get("provenance").get("curves").asText(), exact(page, "provenance"));
        assertEquals(10, Pattern.compile("<tr><td>\\d+</td><td>\\d+</td>").matcher(page).results().count(), "ten worst elements");
        assertTrue(page.contains("Every one of the 250 elements is drawn."), page);
        assertFalse(page.contains(ODD_NAME), "a file's name is shown as text");
        assertTrue(page.contains("&lt;img src=x onerror=alert(1)&gt;.csv"), "a file's name is shown escaped");
        assertTrue(page.contains("model estimates"), "the caution");

        String chart = chart(page);
        assertTrue(chart.endsWith("?plane=xz"), chart);
        HttpResponse<String> svg = fixture.server().get(chart);
        assertEquals(200, svg.statusCode(), svg.body());
        assertEquals("image/svg+xml", svg.headers().firstValue("Content-Type").orElse("").split(";")[0]);
        assertTrue(svg.body().startsWith("<svg") || svg.body().contains("<svg "), "an SVG document");
        assertTrue(svg.body().getBytes(StandardCharsets.UTF_8).length < 1_000_000);
        assertTrue(svg.body().contains(">x (mm)<") && svg.body().contains(">z (mm)<"), "the xz plane's axes");
        assertTrue(svg.body().contains("knee margin (kA/m)"), "the colour scale in kA/m");

        String other = chart.replace("/charts/elements/", "/check/elements/").replace(".svg?plane=xz", "?plane=yz#element-map");
        HttpResponse<String> yz = fixture.server().get(other);
        assertEquals(200, yz.statusCode(), yz.body());
        assertEquals(exact(page, "irreversibleLossPercent"), exact(yz.body(), "irreversibleLossPercent"));
        assertTrue(chart(yz.body()).endsWith("?plane=yz"));

        Matcher link = Pattern.compile("href=\"(/check/elements/[^\"]+/report.html\\?plane=yz)\"").matcher(yz.body());
        assertTrue(link.find(), "a link to the offline report of the map's plane");
        HttpResponse<String> report = fixture.server().get(link.group(1));
        assertEquals(200, report.statusCode(), report.body());
        assertTrue(report.headers().firstValue("Content-Disposition").orElse("").startsWith("attachment"));
        assertEquals(exact(page, "irreversibleLossPercent"), exact(report.body(), "irreversibleLossPercent"));
        assertTrue(report.body().contains(">y (mm)<") && report.body().contains(">z (mm)<"), "the map inline, yz plane");
        assertTrue(report.body().contains("&lt;img src=x onerror=alert(1)&gt;.csv"), "file names escaped in the report too");
        assertFalse(report.body().contains("<script"), "no script");
        assertEquals(404, fixture.server().get("/check/elements/no-such-key/report.html").statusCode());
    }

    @Test
    void a_bad_file_shows_its_line_and_column_and_checks_nothing() throws Exception {
        Map<String, Integer> before = fixture.server().rowCounts();
        Map<String, String> files = cases();
        files.put("case2.csv", "x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³]\n0,0,1,0,0,-100,0.5\n1,0,1,0,0,minus,0.5\n");
        HttpResponse<String> response = fixture.server().upload("/check/elements", files, fields("xy"));
        assertEquals(400, response.statusCode(), response.body());
        assertTrue(response.body().contains("case2.csv, line 3, column 6 (Hz [kA/m]): expected a finite number, got &#39;minus&#39;")
                || response.body().contains("case2.csv, line 3, column 6 (Hz [kA/m]): expected a finite number, got 'minus'"), response.body());
        assertFalse(response.body().contains("/charts/elements/"), "no map");
        assertEquals(before, fixture.server().rowCounts());
        HttpResponse<String> plane = fixture.server().upload("/check/elements", cases(), fields("xw"));
        assertEquals(400, plane.statusCode());
        assertTrue(plane.body().contains("form field &#39;plane&#39;") || plane.body().contains("form field 'plane'"), plane.body());
    }

    @Test
    void an_upload_without_the_form_token_is_refused() throws Exception {
        String boundary = "kneepoint-test";
        String body = "--" + boundary + "\r\nContent-Disposition: form-data; name=\"grade\"\r\n\r\n" + GRADE + "\r\n--" + boundary
                + "\r\nContent-Disposition: form-data; name=\"file\"; filename=\"a.csv\"\r\n\r\n" + ExampleElementFiles.text(0) + "\r\n--"
                + boundary + "--\r\n";
        HttpResponse<String> response = fixture.server().post("/check/elements",
                java.net.http.HttpRequest.BodyPublishers.ofString(body), "multipart/form-data; boundary=" + boundary);
        assertEquals(403, response.statusCode(), response.body());
    }
}
