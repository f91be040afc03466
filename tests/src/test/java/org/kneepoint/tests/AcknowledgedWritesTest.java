package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.library.StoredGrade;

/**
 * An answer of success means the write is on disk (issue 13, item 1): a server in a child process
 * is killed with SIGKILL right after it answered an edit or an import, {@value #CYCLES} times, and
 * every acknowledged write is found when the library is opened again.
 */
@Tag("slow")
class AcknowledgedWritesTest {

    private static final int CYCLES = 12;
    private static final String EDITED = "DEMO AlNiCo 8";

    @Test
    void every_acknowledged_write_survives_a_kill_right_after_the_answer(@TempDir Path folder) throws Exception {
        Path library = folder.resolve("library");
        assertEquals(0, CliRun.of("demo", "--db", library.toString()).exitCode());
        int version = storedGrade(library, EDITED).version();
        List<String> lost = new ArrayList<>();
        for (int cycle = 0; cycle < CYCLES; cycle++) {
            ServerProcess server = ServerProcess.start(library, folder);
            boolean importLast = cycle % 2 == 1;
            if (importLast) {
                version = edit(server, version, cycle);
                importGrade(server, cycle);
            } else {
                importGrade(server, cycle);
                version = edit(server, version, cycle);
            }
            server.kill();
            try (Library reopened = Library.open(DatabaseLocation.ofFolder(library))) {
                StoredGrade edited = reopened.reader().storedGrade(EDITED).orElseThrow();
                if (edited.version() != version || !("cycle " + cycle).equals(edited.grade().notes())) {
                    lost.add("cycle " + cycle + ": the edit to version " + version + " (found version " + edited.version() + ")");
                }
                version = edited.version();
                if (reopened.reader().curves(gradeName(cycle)).isEmpty()) {
                    lost.add("cycle " + cycle + ": the import of " + gradeName(cycle));
                }
            }
        }
        assertTrue(lost.isEmpty(), lost.size() + " acknowledged writes lost: " + lost);
    }

    private static int edit(ServerProcess server, int version, int cycle) throws Exception {
        HttpResponse<String> answer = server.post("/api/grades/DEMO%20AlNiCo%208/details?version=" + version + "&notes=cycle%20" + cycle,
                HttpRequest.BodyPublishers.noBody(), "application/x-www-form-urlencoded");
        assertEquals(200, answer.statusCode(), answer.body());
        return version + 1;
    }

    private static void importGrade(ServerProcess server, int cycle) throws Exception {
        HttpResponse<String> answer = server.upload("/api/import", "durable-" + cycle + ".csv", curveFile(cycle));
        assertEquals(200, answer.statusCode(), answer.body());
    }

    private static String gradeName(int cycle) {
        return "Invented durable grade " + cycle;
    }

    /** A small invented curve of one grade, different in every cycle. */
    private static String curveFile(int cycle) {
        StringBuilder file = new StringBuilder("# grade: " + gradeName(cycle) + "\n# family: invented family\n# source: invented for a test\n");
        file.append("T [K],H [A/m],J [T]\n");
        for (int i = 0; i < 40; i++) {
            double h = 1e5 - 1.7e6 * i / 39.0;
            double j = h <= -1.5e6 ? 0 : (1.3 + 1e-4 * cycle + 6.3e-8 * h) * (1 - Math.exp(-(h + 1.5e6) / 4e4));
            file.append(String.format(Locale.ROOT, "293.15,%.3f,%.6f%n", h, j));
        }
        return file.toString();
    }

    private static StoredGrade storedGrade(Path library, String name) {
        try (Library opened = Library.open(DatabaseLocation.ofFolder(library))) {
            return opened.reader().storedGrade(name).orElseThrow();
        }
    }
}
