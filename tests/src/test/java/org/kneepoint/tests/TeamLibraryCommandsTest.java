package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The commands a team uses with a shared library: moving a library between engines (backup from
 * H2, restore into PostgreSQL, back again: the same bytes), editing a grade's price with its
 * version, and the message and exit code when the database cannot be reached.
 */
@Tag("slow")
class TeamLibraryCommandsTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path folder;

    @Test
    void a_library_moves_from_h2_to_postgresql_and_back_without_losing_a_byte() throws IOException {
        String h2 = folder.resolve("laptop").toString();
        assertEquals(0, CliRun.of("demo", "--db", h2).exitCode());
        CliRun edit = CliRun.of("edit", "DEMO AlNiCo 5", "--price", "41.25", "--notes", "quoted <2026-11> 'firm'", "--db", h2);
        assertEquals(0, edit.exitCode(), edit.err());
        Path fromH2 = folder.resolve("from-h2.json");
        Path fromPostgres = folder.resolve("from-postgresql.json");
        Path backToH2 = folder.resolve("back-to-h2.json");
        assertEquals(0, CliRun.of("backup", fromH2.toString(), "--db", h2).exitCode());

        String postgres = TestPostgres.freshSchemaUrl();
        CliRun restore = CliRun.of("restore", fromH2.toString(), "--db", postgres);
        assertEquals(0, restore.exitCode(), restore.err());
        assertEquals(0, CliRun.of("backup", fromPostgres.toString(), "--db", postgres).exitCode());
        String otherH2 = folder.resolve("other-laptop").toString();
        assertEquals(0, CliRun.of("restore", fromPostgres.toString(), "--db", otherH2).exitCode());
        assertEquals(0, CliRun.of("backup", backToH2.toString(), "--db", otherH2).exitCode());

        assertArrayEquals(Files.readAllBytes(fromH2), Files.readAllBytes(fromPostgres));
        assertArrayEquals(Files.readAllBytes(fromH2), Files.readAllBytes(backToH2));
        JsonNode alnico = null;
        for (JsonNode grade : JSON.readTree(Files.readString(backToH2)).get("grades")) {
            alnico = grade.get("name").asText().equals("DEMO AlNiCo 5") ? grade : alnico;
        }
        assertEquals(41.25, alnico.get("price").asDouble(), "the edited price travels with the backup");
        assertEquals("quoted <2026-11> 'firm'", alnico.get("notes").asText());
    }

    @Test
    void edit_changes_only_what_it_names_and_refuses_a_stale_version() throws IOException {
        String db = folder.resolve("library").toString();
        assertEquals(0, CliRun.of("demo", "--db", db).exitCode());
        CliRun first = CliRun.of("edit", "DEMO SmCo 28/200", "--price", "99.5", "--json", "--db", db);
        assertEquals(0, first.exitCode(), first.err());
        JsonNode edited = JSON.readTree(first.out());
        assertEquals(99.5, edited.get("price").asDouble());
        assertEquals(3, edited.get("version").asInt(), "1 after import, 2 after the demo's price, 3 now");
        assertEquals("Supplier South (invented)", edited.get("supplier").asText(), "fields not named stay");

        CliRun stale = CliRun.of("edit", "DEMO SmCo 28/200", "--supplier", "", "--from-version", "2", "--db", db);
        assertEquals(2, stale.exitCode());
        assertEquals("kneepoint: grade 'DEMO SmCo 28/200' was changed by someone else since version 2 (it is now at version 3); "
                + "read it again and redo the edit\n", stale.err());

        CliRun cleared = CliRun.of("edit", "DEMO SmCo 28/200", "--supplier", "", "--from-version", "3", "--json", "--db", db);
        assertEquals(0, cleared.exitCode(), cleared.err());
        assertTrue(JSON.readTree(cleared.out()).get("supplier").isNull(), "an empty value clears");
    }

    @Test
    void bad_edits_are_one_line_exit_2_and_change_nothing() {
        String db = folder.resolve("library").toString();
        assertEquals(0, CliRun.of("demo", "--db", db).exitCode());
        Map<String, String[]> cases = Map.of(
                "kneepoint: --price: expected a price per kilogram such as 42.5 (a plain number, 0 to 1e9), got 'NaN'\n",
                new String[] {"edit", "DEMO AlNiCo 8", "--price", "NaN"},
                "kneepoint: --price: expected a price per kilogram such as 42.5 (a plain number, 0 to 1e9), got '-3'\n",
                new String[] {"edit", "DEMO AlNiCo 8", "--price", "-3"},
                "kneepoint: no grade named 'no such grade' in the library\n",
                new String[] {"edit", "no such grade", "--price", "3"},
                "kneepoint: nothing to change: give --supplier, --density, --notes or --price\n",
                new String[] {"edit", "DEMO AlNiCo 8"},
                "kneepoint: grade details: supplier is 1001 characters long; at most 1000 are kept\n",
                new String[] {"edit", "DEMO AlNiCo 8", "--supplier", "s".repeat(1001)});
        cases.forEach((message, args) -> {
            String before = CliRun.of("grades", "--json", "--db", db).out();
            String[] withDb = java.util.Arrays.copyOf(args, args.length + 2);
            withDb[args.length] = "--db";
            withDb[args.length + 1] = db;
            CliRun run = CliRun.of(withDb);
            assertEquals(2, run.exitCode(), message);
            assertEquals(message, run.err());
            assertEquals("", run.out());
            assertEquals(before, CliRun.of("grades", "--json", "--db", db).out());
        });
        CliRun density = CliRun.of("edit", "DEMO AlNiCo 8", "--density", "7.3", "--db", db);
        assertEquals(2, density.exitCode());
        assertTrue(density.err().startsWith("kneepoint: --density: ") && density.err().contains("unit"), density.err());
    }

    @Test
    void an_unreachable_database_is_exit_4_with_one_line_naming_it() {
        CliRun run = CliRun.of("grades", "--db", "jdbc:postgresql://127.0.0.1:1/kneepoint?connectTimeout=2");
        assertEquals(4, run.exitCode(), run.err());
        assertTrue(run.err().startsWith("kneepoint: the library database at jdbc:postgresql://127.0.0.1:1/kneepoint?connectTimeout=2 "
                + "cannot be reached ("), run.err());
        assertEquals(1, run.err().lines().count(), run.err());
        assertEquals("", run.out());
    }

    @Test
    void a_password_on_the_command_line_is_refused_before_connecting() {
        CliRun run = CliRun.of("grades", "--db", "jdbc:postgresql://127.0.0.1:1/kneepoint?user=team&password=s3cret");
        assertEquals(2, run.exitCode());
        assertFalse(run.err().contains("s3cret"), run.err());
        assertTrue(run.err().contains("set KNEEPOINT_DB_PASSWORD instead"), run.err());
    }
}
