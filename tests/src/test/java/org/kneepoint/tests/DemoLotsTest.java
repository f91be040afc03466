package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;

/** The demo's invented specifications and lots: one grade's lots pass comfortably, the other's are marginal in HcJ. */
class DemoLotsTest {

    @TempDir
    Path folder;

    private CliRun run(String... args) {
        String[] all = java.util.Arrays.copyOf(args, args.length + 2);
        all[args.length] = "--db";
        all[args.length + 1] = folder.resolve("library").toString();
        return CliRun.of(all);
    }

    private String verdict(String... args) throws IOException {
        CliRun check = run(args);
        assertEquals(0, check.exitCode(), check.err());
        return new ObjectMapper().readTree(check.out()).get("verdict").asText();
    }

    private Map<String, Integer> rowCounts() {
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder.resolve("library")))) {
            return library.reader().rowCounts();
        }
    }

    @Test
    void the_demo_has_a_comfortable_and_a_marginal_grade_and_loads_them_once() throws IOException {
        assertEquals(0, run("demo").exitCode());
        assertEquals("pass", verdict("lot", "check", "DEMO NdFeB 40/160", "--lot", "N-2611", "--uncertainty", "br=0.5%,hcj=1%", "--json"));
        assertEquals("pass", verdict("lot", "check", "DEMO NdFeB 38/200", "--lot", "S-2609", "--json"));
        assertEquals("inconclusive", verdict("lot", "check", "DEMO NdFeB 38/200", "--lot", "S-2609", "--uncertainty", "hcj=1%", "--json"));
        assertEquals("fail", verdict("lot", "check", "DEMO NdFeB 38/200", "--lot", "S-2620", "--json"));
        JsonNode lots = new ObjectMapper().readTree(run("lot", "list", "DEMO NdFeB 38/200", "--json").out()).get("lots");
        assertEquals(2, lots.size());
        assertEquals(2, lots.get(0).get("samples").size());
        Map<String, Integer> before = rowCounts();
        assertEquals(0, run("demo").exitCode());
        assertEquals(before, rowCounts());
    }
}
