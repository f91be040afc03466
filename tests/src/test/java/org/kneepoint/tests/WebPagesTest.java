package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WebPagesTest {

    private static final String SCRIPT = "<script>alert(1)</script>";
    private static final String SCRIPT_PATH = "/%3Cscript%3Ealert%281%29%3C%2Fscript%3E";
    private static final String ESCAPED = "&lt;script&gt;alert(1)&lt;/script&gt;";

    @TempDir
    static Path folder;

    private static RunningServer server;

    @BeforeAll
    static void start() throws Exception {
        server = RunningServer.withDemo(folder, null);
        HttpResponse<String> imported = server.upload("/api/import", Map.of("script.csv", curve(SCRIPT, "hostile")), Map.of());
        assertEquals(200, imported.statusCode(), imported.body());
    }

    @AfterAll
    static void stop() {
        server.close();
    }

    private static String curve(String grade, String family) {
        return "# grade: " + grade + "\n# family: " + family + "\n# temperature: 20 C\n"
                + "H [kA/m],J [T]\n0,1.2\n-500,1.19\n-900,1.1\n-1000,0.5\n-1100,0\n";
    }

    private static String page(String path) throws Exception {
        HttpResponse<String> response = server.get(path);
        assertEquals(200, response.statusCode(), response.body());
        assertTrue(response.headers().firstValue("Content-Type").orElse("").startsWith("text/html"));
        return response.body();
    }

    @Test
    void library_lists_every_grade_with_links_and_says_the_demo_grades_are_invented() throws Exception {
        String html = page("/");
        assertTrue(html.contains("href=\"/grades/DEMO%20NdFeB%2042%2F100\""));
        assertTrue(html.contains("20 °C, 60 °C, 80 °C, 100 °C"));
        assertTrue(html.contains("invented demonstration data"));
        assertTrue(html.contains("href=\"/style.css\""));
        HttpResponse<String> style = server.get("/style.css");
        assertEquals(200, style.statusCode());
        assertTrue(style.headers().firstValue("Content-Type").orElse("").startsWith("text/css"));
        assertTrue(style.body().contains(".caution"));
    }

    @Test
    void a_stored_grade_name_is_shown_as_text_never_as_markup() throws Exception {
        for (String html : new String[] {page("/"), page("/grades" + SCRIPT_PATH)}) {
            assertTrue(html.contains(ESCAPED));
            assertFalse(html.contains(SCRIPT));
        }
        HttpResponse<String> chart = server.get("/charts/grades" + SCRIPT_PATH + ".svg");
        assertEquals(200, chart.statusCode());
        assertFalse(chart.body().contains(SCRIPT));
    }

    @Test
    void library_filters_by_family_and_sorts_by_a_column() throws Exception {
        String smco = page("/?family=sintered%20SmCo");
        assertTrue(smco.contains("DEMO SmCo 18/160"));
        assertFalse(smco.contains("DEMO NdFeB 42/100"));
        String byCurves = page("/?sort=curves&order=desc");
        assertTrue(byCurves.indexOf("DEMO Ferrite 30/26") < byCurves.indexOf("DEMO AlNiCo 8"));
        assertTrue(byCurves.indexOf("DEMO AlNiCo 8") < byCurves.indexOf(ESCAPED));
    }

    @Test
    void grade_page_has_the_chart_the_characterization_with_units_export_links_and_the_caution() throws Exception {
        String html = page("/grades/DEMO%20NdFeB%2042%2F100");
        assertTrue(html.contains("<img src=\"/charts/grades/DEMO%20NdFeB%2042%2F100.svg\""));
        for (String header : new String[] {"Br (T)", "HcB (kA/m)", "HcJ (kA/m)", "(BH)max (kJ/m³)", "Hk (kA/m)", "μrec"}) {
            assertTrue(html.contains("<th>" + header + "</th>"), header);
        }
        assertTrue(html.contains("Caution."));
        Matcher export = Pattern.compile("href=\"(/api/grades/[^\"]+/export\\?[^\"]+)\"").matcher(html);
        assertTrue(export.find());
        HttpResponse<String> csv = server.get(export.group(1).replace("&amp;", "&"));
        assertEquals(200, csv.statusCode(), csv.body());
        assertTrue(csv.body().contains("# grade: DEMO NdFeB 42/100"));
    }

    @Test
    void the_chart_is_svg_with_units_on_both_axes_a_legend_and_knee_markers() throws Exception {
        HttpResponse<String> chart = server.get("/charts/grades/DEMO%20NdFeB%2042%2F100.svg");
        assertEquals(200, chart.statusCode());
        assertTrue(chart.headers().firstValue("Content-Type").orElse("").startsWith("image/svg+xml"));
        String svg = chart.body();
        assertTrue(svg.startsWith("<svg") || svg.startsWith("<?xml"));
        assertTrue(svg.contains("field strength H (kA/m)"));
        assertTrue(svg.contains("flux density B, polarization J (T)"));
        assertTrue(svg.contains("B at 100 °C") && svg.contains("J at 20 °C"));
        assertTrue(svg.contains("knee (J = 0.9·Br)"));
    }

    @Test
    void import_page_checks_the_files_first_and_stores_them_only_when_confirmed() throws Exception {
        assertTrue(page("/import").contains("type=\"file\""));
        Map<String, Integer> before = server.rowCounts();
        HttpResponse<String> preview = server.upload("/import", Map.of("w40.csv", curve("Invented W40", "sintered NdFeB")), Map.of());
        assertEquals(200, preview.statusCode(), preview.body());
        assertTrue(preview.body().contains("valid"));
        assertEquals(before, server.rowCounts());
        Matcher staged = Pattern.compile("name=\"staged\" value=\"([0-9a-f-]+)\"").matcher(preview.body());
        assertTrue(staged.find());
        HttpResponse<String> done = server.submit("/import/commit", "staged=" + staged.group(1));
        assertEquals(200, done.statusCode(), done.body());
        assertTrue(done.body().contains("imported"));
        assertEquals(before.get("grade") + 1, server.rowCounts().get("grade"));
        assertTrue(page("/").contains("Invented W40"));
    }

    @Test
    void import_page_shows_the_validation_message_and_stores_nothing() throws Exception {
        Map<String, Integer> before = server.rowCounts();
        HttpResponse<String> refused = server.upload("/import", Map.of("broken.csv", "# grade: X\nH [kA/m],J [T]\n0,abc\n"), Map.of());
        assertEquals(400, refused.statusCode());
        assertTrue(refused.body().contains("Nothing was imported."));
        assertTrue(refused.body().contains("broken.csv"));
        assertEquals(before, server.rowCounts());
        HttpResponse<String> stale = server.submit("/import/commit", "staged=unknown");
        assertEquals(400, stale.statusCode());
        assertEquals(before, server.rowCounts());
    }

    @Test
    void a_browser_asking_for_an_unknown_grade_gets_a_not_found_page_with_the_name_escaped() throws Exception {
        HttpResponse<String> response = server.get("/grades/%3Cb%3ENone%3C%2Fb%3E", "Accept", "text/html,application/xhtml+xml");
        assertEquals(404, response.statusCode());
        assertTrue(response.headers().firstValue("Content-Type").orElse("").startsWith("text/html"));
        assertTrue(response.body().contains("&lt;b&gt;None&lt;/b&gt;"));
        assertFalse(response.body().contains("<b>None"));
    }

    @Test
    void every_page_links_the_check_and_select_pages_in_its_header() throws Exception {
        String html = page("/");
        assertTrue(html.contains("<a href=\"/check\">Check</a>"));
        assertTrue(html.contains("<a href=\"/select\">Select</a>"));
        assertTrue(page("/check").contains("<a href=\"/check\" aria-current=\"page\">Check</a>"));
    }

    @Test
    void check_page_shows_the_form_with_the_library_grades_escaped() throws Exception {
        String html = page("/check");
        for (String field : new String[] {"grade", "br", "muRec", "hcj", "pc", "diameter", "width", "temperature", "opposingField"}) {
            assertTrue(html.contains("name=\"" + field + "\""), field);
        }
        assertTrue(html.contains("<option value=\"DEMO NdFeB 42/100\">DEMO NdFeB 42/100</option>"));
        assertTrue(html.contains(ESCAPED));
        assertFalse(html.contains(SCRIPT));
        assertFalse(html.contains("Caution."));
    }

    @Test
    void check_page_runs_the_check_and_shows_the_numbers_of_the_api_and_the_cautions() throws Exception {
        String query = "?grade=DEMO%20NdFeB%2042%2F100&diameter=10mm&length=5mm&temperature=120C&opposingField=200kA%2Fm";
        HttpResponse<String> api = server.get("/api/check" + query);
        assertEquals(200, api.statusCode(), api.body());
        JsonNode check = RunningServer.json(api);
        String html = page("/check" + query);
        assertTrue(html.contains(String.format(Locale.ROOT, "B = %.4f T", check.get("operatingPoint").get("b").asDouble())), html);
        assertTrue(html.contains(String.format(Locale.ROOT, "%.2f %%", check.get("irreversibleLossPercent").asDouble())));
        assertTrue(html.contains(String.format(Locale.ROOT, "%.4g", check.get("pc").asDouble())));
        assertTrue(html.contains("value=\"10mm\""));
        assertTrue(html.contains("Caution.") && html.contains("implanted medical devices"));
        assertEquals(check.get("extrapolated").asBoolean(), html.contains("extrapolated beyond the measured temperatures"));
        assertTrue(html.contains("<img src=\"/charts/check.svg" + query.replace("&", "&amp;") + "\""));
        assertTrue(html.contains("<strong>Verdict:</strong> " + check.get("verdict").get("summary").asText()), html);
        assertTrue(html.indexOf("Verdict:") < html.indexOf("class=\"results\""), "the verdict comes before the numbers");
    }

    @Test
    void the_check_chart_is_svg_with_the_curves_the_load_line_and_the_operating_point() throws Exception {
        HttpResponse<String> chart = server.get("/charts/check.svg?pc=2&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&temperature=80C"
                + "&alpha=-0.12%25%2FK&beta=-0.6%25%2FK");
        assertEquals(200, chart.statusCode(), chart.body());
        assertTrue(chart.headers().firstValue("Content-Type").orElse("").startsWith("image/svg+xml"));
        String svg = chart.body();
        assertTrue(svg.contains("field strength H (kA/m)") && svg.contains("flux density B, polarization J (T)"));
        assertTrue(svg.contains("B at ") && svg.contains("J at "), "B and J curves per temperature in the legend");
        assertTrue(svg.contains("load line, Pc = 2.00") && svg.contains("operating point"));
        assertTrue(svg.contains("Operating point at 80 °C"));
        assertTrue(svg.contains("B at 80 °C") && svg.contains("B at 20 °C"), "the check's temperature and the reference temperature");
    }

    @Test
    void check_page_with_bad_input_shows_the_message_and_writes_nothing() throws Exception {
        Map<String, Integer> before = server.rowCounts();
        HttpResponse<String> response = server.get("/check?pc=2&temperature=hot&grade=" + SCRIPT_PATH.substring(1));
        assertEquals(400, response.statusCode());
        assertTrue(response.headers().firstValue("Content-Type").orElse("").startsWith("text/html"));
        assertTrue(response.body().contains("No result.") && response.body().contains("temperature"));
        assertTrue(response.body().contains("value=\"hot\""));
        assertFalse(response.body().contains(SCRIPT));
        assertEquals(before, server.rowCounts());
    }

    @Test
    void select_page_ranks_every_grade_with_results_reasons_and_cautions() throws Exception {
        assertTrue(page("/select").contains("name=\"minFluxDensity\""));
        String html = page("/select?pc=2&temperature=100C&minFluxDensity=0.5T&maxLoss=2%25");
        JsonNode ranked = RunningServer.json(server.get("/api/select?pc=2&temperature=100C&minFluxDensity=0.5T&maxLoss=2%25"));
        String first = ranked.get(0).get("grade").asText();
        assertTrue(html.contains(">meets<") && html.contains(">falls short<") && html.contains(">not assessed<"), html);
        assertFalse(html.contains(">pass<") || html.contains(">fail<"), "words of our own, not pass/fail");
        assertTrue(html.indexOf(">" + first + "<") < html.indexOf(">falls short<"), html);
        assertTrue(html.contains("<strong>Verdict:</strong> meets the requirements:"), html);
        assertTrue(html.contains("is below the minimum") || html.contains("exceeds the maximum"));
        assertTrue(html.contains(ESCAPED) && !html.contains(SCRIPT));
        assertTrue(html.contains("not assessable"));
        assertTrue(html.contains("Caution."));
    }
}
