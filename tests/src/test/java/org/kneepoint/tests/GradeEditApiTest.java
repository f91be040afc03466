package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.net.URLEncoder;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Editing a grade's details over HTTP and from the grade page: optimistic versions, bad input, escaping. */
class GradeEditApiTest {

    private static final String GRADE = "/api/grades/DEMO%20AlNiCo%208";

    @TempDir
    Path folder;

    private RunningServer server;

    @BeforeEach
    void start() {
        server = RunningServer.withDemo(folder, null);
    }

    @AfterEach
    void stop() {
        server.close();
    }

    private HttpResponse<String> edit(String query) throws Exception {
        return server.post(GRADE + "/details?" + query, HttpRequest.BodyPublishers.noBody(), "application/x-www-form-urlencoded");
    }

    @Test
    void an_edit_names_its_version_and_answers_the_grade_after_it() throws Exception {
        JsonNode grade = RunningServer.json(server.get(GRADE));
        assertEquals(2, grade.get("version").asInt(), "the demo's price was set by an edit");
        assertEquals(52.0, grade.get("price").asDouble());
        HttpResponse<String> response = edit("version=2&price=49.9&density=7.31%20g%2Fcm3&notes=");
        assertEquals(200, response.statusCode(), response.body());
        JsonNode after = RunningServer.json(response);
        assertEquals(3, after.get("version").asInt());
        assertEquals(49.9, after.get("price").asDouble());
        assertEquals(7310.0, after.get("density").asDouble(), 1e-9);
        assertTrue(after.get("notes").isNull());
        assertEquals(grade.get("supplier"), after.get("supplier"), "a detail not named stays");
        assertEquals(grade.get("curves"), after.get("curves"));

        JsonNode listed = RunningServer.json(server.get("/api/grades?family=cast%20AlNiCo"));
        assertEquals(49.9, listed.get(1).get("price").asDouble(), listed.toString());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '"', textBlock = """
        no version         | price=3                      | 400 | query parameter 'version': missing
        version not a number | version=two&price=3        | 400 | query parameter 'version': expected a whole number from 1, got 'two'
        version twice      | version=2&version=2&price=3  | 400 | query parameter 'version': given 2 times; give it once
        unknown detail     | version=2&colour=red         | 400 | query parameter 'colour': not an editable detail of a grade
        price NaN          | version=2&price=NaN          | 400 | query parameter 'price': expected a price per kilogram
        price absurd       | version=2&price=1e99         | 400 | query parameter 'price': expected a price per kilogram
        density no unit    | version=2&density=7.3        | 400 | query parameter 'density':
        stale version      | version=1&price=3            | 409 | was changed by someone else since version 1 (it is now at version 2)
        """)
    void bad_edits_are_refused_with_a_message_and_change_nothing(String name, String query, int status, String message)
            throws Exception {
        String before = server.get(GRADE).body();
        HttpResponse<String> response = edit(query);
        assertEquals(status, response.statusCode(), response.body());
        assertTrue(RunningServer.json(response).get("error").get("message").asText().contains(message), response.body());
        assertEquals(before, server.get(GRADE).body());
    }

    @Test
    void an_unknown_grade_is_404() throws Exception {
        HttpResponse<String> response = server.post("/api/grades/nothing%20here/details?version=1&price=3",
                HttpRequest.BodyPublishers.noBody(), "application/x-www-form-urlencoded");
        assertEquals(404, response.statusCode(), response.body());
    }

    @Test
    void the_grade_page_form_edits_and_shows_hostile_notes_as_text() throws Exception {
        String page = server.get("/grades/DEMO%20AlNiCo%208").body();
        assertTrue(page.contains("name=\"version\" value=\"2\""), "the form carries the version shown");
        String notes = "<script>alert(1)</script> & \"quoted\"";
        String form = "version=2&supplier=Supplier%20North%20(invented)&density=7300%20kg%2Fm3&price=50&notes="
                + URLEncoder.encode(notes, StandardCharsets.UTF_8);
        HttpResponse<String> saved = server.submit("/grades/DEMO%20AlNiCo%208/details", form);
        assertEquals(303, saved.statusCode(), saved.body());
        assertEquals("/grades/DEMO%20AlNiCo%208", saved.headers().firstValue("Location").orElseThrow());
        String after = server.get("/grades/DEMO%20AlNiCo%208").body();
        assertTrue(after.contains("50.00 per kg"), "the new price is shown");
        assertTrue(after.contains("<dd>&lt;script&gt;alert(1)&lt;/script&gt; &amp; \"quoted\"</dd>"), "notes escaped as text");
        assertTrue(after.contains("value=\"&lt;script>alert(1)&lt;/script> &amp; &#34;quoted&#34;\""), "notes escaped in the form's field");
        assertFalse(after.contains("<script>alert(1)"));

        HttpResponse<String> stale = server.submit("/grades/DEMO%20AlNiCo%208/details", form, "Accept", "text/html");
        assertEquals(409, stale.statusCode());
        assertTrue(stale.body().contains("changed by someone else since version 2 (it is now at version 3)"), stale.body());
    }
}
