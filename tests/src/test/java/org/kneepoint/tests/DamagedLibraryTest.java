package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;

/**
 * A library whose stored value was changed behind its back (issue 13, item 2): {@code verify}
 * says so (exit 2, listing the grade and curve), {@code backup} refuses to write, reads refuse with
 * one line (exit 2, HTTP 500 with code DAMAGED); a sound library verifies with exit 0.
 */
class DamagedLibraryTest {

    private static final String GRADE = "DEMO AlNiCo 8";

    @TempDir
    Path folder;

    private Path library;

    @BeforeEach
    void demo() {
        library = folder.resolve("library");
        assertEquals(0, CliRun.of("demo", "--db", library.toString()).exitCode());
    }

    @Test
    void a_sound_library_verifies_with_exit_0() throws Exception {
        CliRun verify = CliRun.of("verify", "--db", library.toString());
        assertEquals(0, verify.exitCode(), verify.err());
        assertTrue(verify.out().contains("is sound"), verify.out());
        CliRun json = CliRun.of("verify", "--json", "--db", library.toString());
        assertEquals(0, json.exitCode(), json.err());
        JsonNode document = new ObjectMapper().readTree(json.out());
        assertTrue(document.get("sound").asBoolean());
        assertEquals(0, document.get("damaged").size());
        assertTrue(document.get("checked").get("curve").asInt() > 0);
    }

    @Test
    void a_changed_temperature_is_listed_by_verify_and_refused_by_backup_and_reads() throws Exception {
        changeBehindTheLibrary("UPDATE curve SET temperature_k = temperature_k + 1 WHERE id = "
                + "(SELECT MIN(c.id) FROM curve c JOIN grade g ON c.grade_id = g.id WHERE g.name = '" + GRADE + "')");

        CliRun verify = CliRun.of("verify", "--db", library.toString());
        assertEquals(2, verify.exitCode(), verify.out() + verify.err());
        assertTrue(verify.out().contains("DAMAGED (1 problems)"), verify.out());
        assertTrue(verify.out().contains("of grade '" + GRADE + "' does not match its checksum"), verify.out());

        CliRun json = CliRun.of("verify", "--json", "--db", library.toString());
        assertEquals(2, json.exitCode());
        JsonNode document = new ObjectMapper().readTree(json.out());
        assertFalse(document.get("sound").asBoolean());
        assertEquals(1, document.get("damaged").size());

        Path backup = folder.resolve("backup.json");
        CliRun refused = CliRun.of("backup", backup.toString(), "--db", library.toString());
        assertEquals(2, refused.exitCode());
        assertEquals(1, refused.err().lines().count(), refused.err());
        assertTrue(refused.err().startsWith("kneepoint: the library is damaged (1 problems, the first: "), refused.err());
        assertFalse(Files.exists(backup), "no backup of damaged data");

        CliRun curves = CliRun.of("grades", "--db", library.toString());
        assertEquals(2, curves.exitCode());
        assertEquals(1, curves.err().lines().count(), curves.err());
        assertTrue(curves.err().contains("curve at ") && curves.err().contains("of grade '" + GRADE + "'"), curves.err());
        assertEquals("", curves.out());

        try (RunningServer server = RunningServer.over(DatabaseLocation.ofFolder(library))) {
            HttpResponse<String> answer = server.get("/api/grades/DEMO%20AlNiCo%208");
            assertEquals(500, answer.statusCode(), answer.body());
            assertEquals("DAMAGED", RunningServer.json(answer).get("error").get("code").asText());
        }
    }

    @Test
    void a_changed_point_is_refused_where_the_curve_is_read() throws Exception {
        changeBehindTheLibrary("UPDATE curve SET measured_values = h_values WHERE id = "
                + "(SELECT MIN(c.id) FROM curve c JOIN grade g ON c.grade_id = g.id WHERE g.name = '" + GRADE + "')");
        CliRun listing = CliRun.of("grades", "--db", library.toString());
        assertEquals(0, listing.exitCode(), "a listing reads no points: " + listing.err());
        CliRun check = CliRun.of("export", GRADE, "--temperature", "20C", "--db", library.toString());
        assertEquals(2, check.exitCode(), check.out());
        assertTrue(check.err().contains("the points of the ") && check.err().contains("of grade '" + GRADE + "'"), check.err());
        CliRun verify = CliRun.of("verify", "--db", library.toString());
        assertEquals(2, verify.exitCode());
    }

    private void changeBehindTheLibrary(String sql) throws Exception {
        try (Connection connection = DriverManager.getConnection(DatabaseLocation.ofFolder(library).jdbcUrl(), "sa", "");
                Statement statement = connection.createStatement()) {
            assertEquals(1, statement.executeUpdate(sql), sql);
        }
    }
}
