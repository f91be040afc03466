package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.kneepoint.db.DatabaseLocation;

/**
 * Two Kneepoint servers over one PostgreSQL library, as a team runs them: each its own pool and
 * its own in-process write lock, so only the database keeps them apart. Imports and reads through
 * both at once lose and duplicate nothing; of two edits of one grade made from the same version,
 * the second is refused with 409 (optimistic locking on the grade's row version). A curve imported through one server
 * changes the next check and selection on the other (each server's GradeModelCache compares the grade's stamp).
 */
@Tag("slow")
class TeamServersTest {

    private static String curveFile(String grade, int celsius) {
        return String.format(Locale.ROOT, "# grade: %s\n# family: sintered NdFeB\n# temperature: %d C\n"
                + "H [kA/m],J [T]\n50,1.31\n0,1.30\n-500,1.27\n-900,1.22\n-1000,1.0\n-1050,0.6\n-1100,0\n", grade, celsius);
    }

    @Test
    void a_curve_imported_through_one_server_changes_the_next_check_and_selection_on_the_other() throws Exception {
        DatabaseLocation location = new DatabaseLocation(TestPostgres.freshSchemaUrl());
        try (RunningServer first = RunningServer.over(location); RunningServer second = RunningServer.over(location)) {
            for (Map.Entry<Integer, Double> curve : Map.of(20, 1.30, 100, 1.22).entrySet()) {
                assertEquals(200, first.upload("/api/import", Map.of("c" + curve.getKey() + ".csv",
                        GradeModelCacheTest.curveFile(curve.getKey(), curve.getValue())), Map.of()).statusCode());
            }
            JsonNode before = GradeModelCacheTest.operatingPoint(second);
            JsonNode rowBefore = GradeModelCacheTest.selectionRow(second);
            assertEquals(before, GradeModelCacheTest.operatingPoint(first));
            assertEquals(200, first.upload("/api/import", Map.of("c150.csv", GradeModelCacheTest.curveFile(150, 1.00)), Map.of())
                    .statusCode());
            JsonNode after = GradeModelCacheTest.operatingPoint(second);
            assertNotEquals(before.get("b").asDouble(), after.get("b").asDouble(), "the other server kept a stale model");
            assertNotEquals(rowBefore.get("fluxDensity").asDouble(), GradeModelCacheTest.selectionRow(second).get("fluxDensity").asDouble());
            assertEquals(after, GradeModelCacheTest.operatingPoint(first));
        }
    }

    @Test
    void two_servers_importing_and_reading_at_once_lose_and_duplicate_no_rows() throws Exception {
        DatabaseLocation location = new DatabaseLocation(TestPostgres.freshSchemaUrl());
        try (RunningServer first = RunningServer.over(location); RunningServer second = RunningServer.over(location)) {
            int writers = 8;
            ExecutorService pool = Executors.newFixedThreadPool(writers + 2);
            CyclicBarrier start = new CyclicBarrier(writers);
            List<Future<String>> uploads = new ArrayList<>();
            for (int w = 0; w < writers; w++) {
                RunningServer server = w % 2 == 0 ? first : second;
                // Writers w and w+4 add curves of one grade at different temperatures; every file is its own.
                String grade = "Invented team grade " + (w % 4);
                String file = curveFile(grade, 20 + 40 * (w / 4));
                uploads.add(pool.submit(() -> {
                    start.await();
                    return answer(server.upload("/api/import", Map.of("team-" + file.hashCode() + ".csv", file), Map.of()));
                }));
            }
            List<Future<String>> reads = new ArrayList<>();
            for (RunningServer server : List.of(first, second)) {
                reads.add(pool.submit((Callable<String>) () -> {
                    for (int i = 0; i < 20; i++) {
                        String answer = answer(server.get("/api/grades"));
                        if (!answer.equals("200")) {
                            return answer;
                        }
                    }
                    return "200";
                }));
            }
            for (Future<String> upload : uploads) {
                assertEquals("200", upload.get());
            }
            for (Future<String> read : reads) {
                assertEquals("200", read.get());
            }
            pool.shutdown();

            JsonNode grades = RunningServer.json(first.get("/api/grades"));
            assertEquals(4, grades.size(), grades.toString());
            Set<String> names = new HashSet<>();
            for (JsonNode grade : grades) {
                names.add(grade.get("name").asText());
                assertEquals(2, grade.get("curves").asInt(), grade.toString());
                assertEquals(2, grade.get("temperaturesK").size(), grade.toString());
            }
            assertEquals(4, names.size());
            Map<String, Integer> counts = second.rowCounts();
            assertEquals(8, counts.get("import_record"));
            assertEquals(1, counts.get("material_family"));
            assertEquals(8, counts.get("curve"));
        }
    }

    @Test
    void of_two_edits_of_one_grade_from_the_same_version_the_second_is_a_conflict() throws Exception {
        DatabaseLocation location = new DatabaseLocation(TestPostgres.freshSchemaUrl());
        try (RunningServer alice = RunningServer.over(location); RunningServer bob = RunningServer.over(location)) {
            assertEquals(200, alice.upload("/api/import", Map.of("n42.csv", curveFile("Invented N42", 20)), Map.of()).statusCode());
            String path = "/api/grades/Invented%20N42";
            assertEquals(1, RunningServer.json(alice.get(path)).get("version").asInt());
            assertEquals(1, RunningServer.json(bob.get(path)).get("version").asInt());

            HttpResponse<String> first = alice.post(path + "/details?version=1&price=48.5&notes=quoted%202026-11",
                    HttpRequest.BodyPublishers.noBody(), "application/x-www-form-urlencoded");
            assertEquals(200, first.statusCode(), first.body());
            assertEquals(2, RunningServer.json(first).get("version").asInt());
            assertEquals(48.5, RunningServer.json(first).get("price").asDouble());

            HttpResponse<String> second = bob.post(path + "/details?version=1&price=40", HttpRequest.BodyPublishers.noBody(),
                    "application/x-www-form-urlencoded");
            assertEquals(409, second.statusCode(), second.body());
            JsonNode error = RunningServer.json(second).get("error");
            assertEquals("CONFLICT", error.get("code").asText());
            assertEquals("grade 'Invented N42' was changed by someone else since version 1 (it is now at version 2); "
                    + "read it again and redo the edit", error.get("message").asText());

            JsonNode now = RunningServer.json(bob.get(path));
            assertEquals(48.5, now.get("price").asDouble());
            assertEquals("quoted 2026-11", now.get("notes").asText());
            assertEquals(2, now.get("version").asInt());
        }
    }

    /** "200", or the status with the body, so a failure names the server's own words. */
    private static String answer(HttpResponse<String> response) {
        return response.statusCode() == 200 ? "200" : response.statusCode() + " " + response.body();
    }
}
