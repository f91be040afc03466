package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URLEncoder;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A grade whose name, family, supplier and notes hold a script element and both kinds of quotes is shown as
 * text on every page and in the report: never a tag, and inside an attribute never closing the attribute. The
 * checks are independent of the form of escaping: a text between tags, or a double-quoted attribute value,
 * read back with its character references decoded, must hold the whole string.
 */
class PageEscapingTest {

    private static final String NAME = "<script>alert(\"name\")</script> 'N42' \"grade\"";
    private static final String FAMILY = "<script>alert('family')</script> \"sintered\"";
    private static final String SUPPLIER = "<script>alert('supplier')</script> \"North\" & 'Co'";
    private static final String NOTES = "<script>alert(\"notes\")</script> it's a \"test\" & more";
    private static final String IMPORTED = "<script>alert('import')</script> \"W40\"";

    private static final Pattern TEXT = Pattern.compile(">([^<]*)<");
    private static final Pattern REFERENCE = Pattern.compile("&(#[0-9]+|#x[0-9a-fA-F]+|amp|lt|gt|quot|apos);");

    @TempDir
    static Path folder;

    private static RunningServer server;
    private static String report;

    @BeforeAll
    static void start() throws Exception {
        String db = folder.resolve("library").toString();
        Path curves = folder.resolve("hostile.csv");
        Files.writeString(curves, Files.readString(Path.of("..", "examples", "invented-ndfeb-three-temperatures.csv"))
                .replace("# grade: Invented N42H", "# grade: " + NAME).replace("# family: sintered NdFeB", "# family: " + FAMILY));
        CliRun imported = CliRun.of("import", curves.toString(), "--db", db);
        assertEquals(0, imported.exitCode(), imported.err());
        Path reportFile = folder.resolve("report.html");
        CliRun check = CliRun.of("check", NAME, "--pc", "2", "--temperature", "100C", "--report", reportFile.toString(), "--db", db);
        assertEquals(0, check.exitCode(), check.err());
        report = Files.readString(reportFile);
        server = RunningServer.withDemo(folder, null);
        HttpResponse<String> edited = server.post("/api/grades/" + segment(NAME) + "/details?version=1&supplier=" + segment(SUPPLIER)
                + "&notes=" + segment(NOTES), HttpRequest.BodyPublishers.noBody(), "application/x-www-form-urlencoded");
        assertEquals(200, edited.statusCode(), edited.body());
    }

    @AfterAll
    static void stop() {
        server.close();
    }

    @Test
    void the_library_shows_the_name_family_and_supplier_as_text() throws Exception {
        String page = page("/");
        assertNoScript(page);
        assertText(page, NAME, FAMILY, SUPPLIER);
        assertAttribute(page, "value", FAMILY);
        assertTrue(page.contains("href=\"/grades/" + segment(NAME) + "\""), "the link encodes the name");
    }

    @Test
    void the_grade_page_shows_every_detail_as_text_and_in_its_form_fields() throws Exception {
        String page = page("/grades/" + segment(NAME));
        assertNoScript(page);
        assertText(page, NAME, FAMILY, SUPPLIER, NOTES);
        assertText(page, NAME + " · Kneepoint");
        assertAttribute(page, "alt", NAME);
        assertAttribute(page, "value", SUPPLIER);
        assertAttribute(page, "value", NOTES);
    }

    @Test
    void the_check_page_offers_the_grade_and_names_it_in_the_results() throws Exception {
        String form = page("/check");
        assertNoScript(form);
        assertText(form, NAME);
        assertAttribute(form, "value", NAME);
        String results = page("/check?grade=" + segment(NAME) + "&pc=2&temperature=100C");
        assertNoScript(results);
        assertText(results, NAME + " (", " curves measured at ");
        assertAttribute(results, "src", "grade=" + segment(NAME));
    }

    @Test
    void the_check_page_shows_a_refused_value_as_text_and_in_its_field() throws Exception {
        HttpResponse<String> response = server.get("/check?pc=2&temperature=" + segment(NOTES));
        assertEquals(400, response.statusCode());
        assertNoScript(response.body());
        assertText(response.body(), NOTES);
        assertAttribute(response.body(), "value", NOTES);
    }

    @Test
    void the_select_page_ranks_the_grade_under_its_name_and_family() throws Exception {
        String page = page("/select?pc=2&temperature=100C");
        assertNoScript(page);
        assertText(page, NAME, FAMILY);
        assertAttribute(page, "value", FAMILY);
    }

    @Test
    void the_not_found_page_names_the_grade_asked_for_as_text() throws Exception {
        HttpResponse<String> response = server.get("/grades/" + segment(NAME + " 2"), "Accept", "text/html");
        assertEquals(404, response.statusCode());
        assertNoScript(response.body());
        assertText(response.body(), NAME + " 2");
    }

    @Test
    void the_import_pages_show_the_file_and_the_grade_as_text() throws Exception {
        String file = "<script>alert('file') 'W40'.csv"; // no slash: an upload keeps the name after the last one
        String curve = "# grade: " + IMPORTED + "\n# family: " + FAMILY + "\n# temperature: 20 C\n"
                + "H [kA/m],J [T]\n0,1.2\n-500,1.19\n-900,1.1\n-1000,0.5\n-1100,0\n";
        HttpResponse<String> preview = server.upload("/import", Map.of(file, curve), Map.of());
        assertEquals(200, preview.statusCode(), preview.body());
        assertNoScript(preview.body());
        assertText(preview.body(), file, IMPORTED);
        Matcher staged = Pattern.compile("name=\"staged\" value=\"([0-9a-f-]+)\"").matcher(preview.body());
        assertTrue(staged.find());
        HttpResponse<String> done = server.submit("/import/commit", "staged=" + staged.group(1));
        assertEquals(200, done.statusCode(), done.body());
        assertNoScript(done.body());
        assertText(done.body(), file, IMPORTED);
    }

    @Test
    void the_report_names_the_grade_as_text() {
        assertNoScript(report);
        assertText(report, NAME + " (", " curves measured at ", "kneepoint check " + NAME);
    }

    private static String page(String path) throws Exception {
        HttpResponse<String> response = server.get(path);
        assertEquals(200, response.statusCode(), response.body());
        return response.body();
    }

    private static String segment(String value) {
        return URLEncoder.encode(value, StandardCharsets.UTF_8).replace("+", "%20");
    }

    private static void assertNoScript(String html) {
        assertFalse(html.toLowerCase(Locale.ROOT).contains("<script"), html);
    }

    /** Each string stands, whole, in some text between tags. */
    private static void assertText(String html, String... values) {
        for (String value : values) {
            assertTrue(TEXT.matcher(html).results().map(match -> decoded(match.group(1))).anyMatch(text -> text.contains(value)),
                    "not shown as text: " + value);
        }
    }

    /** The string stands, whole, in a double-quoted value of the attribute. */
    private static void assertAttribute(String html, String attribute, String value) {
        Pattern pattern = Pattern.compile("\\s" + attribute + "=\"([^\"]*)\"");
        assertTrue(pattern.matcher(html).results().map(match -> decoded(match.group(1))).anyMatch(text -> text.contains(value)),
                "not in a " + attribute + " attribute: " + value);
    }

    private static String decoded(String html) {
        return REFERENCE.matcher(html).replaceAll(match -> Matcher.quoteReplacement(switch (match.group(1)) {
            case "amp" -> "&";
            case "lt" -> "<";
            case "gt" -> ">";
            case "quot" -> "\"";
            case "apos" -> "'";
            default -> Character.toString(match.group(1).startsWith("#x") ? Integer.parseInt(match.group(1).substring(2), 16)
                    : Integer.parseInt(match.group(1).substring(1)));
        }));
    }
}
