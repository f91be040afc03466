package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;

/**
 * A seeded fuzz of the import: 1,100 bad files made from the valid example files (every mutation
 * chosen so that the file must be refused) go through the command line's import, and every tenth
 * through {@code POST /api/import}. Each must be refused as bad input — exit 2 with one line on
 * standard error, or HTTP 400 with one JSON error whose message is one line — never an internal
 * error; and the library's backup is the same, byte for byte, before and after.
 */
@Tag("slow")
class ImportFuzzTest {

    private static final int FILES = 1_100;
    private static final int HTTP_EVERY = 10;
    private static final Path EXAMPLES = Path.of("..", "examples");

    @TempDir
    Path folder;

    private String db() {
        return folder.resolve("library").toString();
    }

    /** The example files as bases, and the comma-separated curve files again as JSON. */
    private static List<BadFiles.Base> bases() throws IOException {
        List<BadFiles.Base> bases = new ArrayList<>();
        try (var files = Files.list(EXAMPLES)) {
            // element-field files (check-elements) are not curve files, so no import base
            for (Path file : files.filter(f -> !f.toString().endsWith(".md") && !f.toString().contains("-elements-")).sorted().toList()) {
                String text = Files.readString(file);
                String name = file.getFileName().toString();
                boolean susceptibility = text.contains("chi [");
                boolean loop = text.contains("# kind: loop");
                bases.add(new BadFiles.Base(name, text, false, susceptibility, loop));
                if (!susceptibility && !loop && !text.contains(";") && !text.contains("\t")) {
                    bases.add(new BadFiles.Base(name.replace(".csv", ".json"), json(text), true, false, false));
                }
            }
        }
        return bases;
    }

    /** The JSON curve form of a comma-separated curve file. */
    private static String json(String csv) {
        StringBuilder json = new StringBuilder("{");
        List<String> rows = new ArrayList<>();
        String columns = null;
        for (String line : csv.lines().toList()) {
            if (line.matches("# (grade|family|supplier|temperature|kind|source|notes): .*")) {
                String[] parts = line.substring(2).split(": ", 2);
                json.append('"').append(parts[0]).append("\": \"").append(parts[1].replace("\"", "\\\"")).append("\", ");
            } else if (!line.startsWith("#") && !line.isBlank()) {
                if (columns == null) {
                    columns = "\"" + String.join("\", \"", line.split(",")) + "\"";
                } else {
                    rows.add("[" + String.join(", ", line.split(",")) + "]");
                }
            }
        }
        return json.append("\"columns\": [").append(columns).append("], \"rows\": [").append(String.join(", ", rows)).append("]}\n").toString();
    }

    private byte[] backup(String name) throws IOException {
        Path file = folder.resolve(name);
        CliRun run = CliRun.of("backup", file.toString(), "--db", db());
        assertEquals(0, run.exitCode(), run.err());
        return Files.readAllBytes(file);
    }

    @Test
    void a_thousand_bad_files_are_refused_as_bad_input_with_one_line_and_leave_the_library_as_it_was() throws IOException, InterruptedException {
        List<BadFiles.Base> bases = bases();
        for (BadFiles.Base base : bases) {
            Path valid = folder.resolve("valid").resolve(base.name());
            Files.createDirectories(valid.getParent());
            Files.writeString(valid, base.text());
            CliRun run = CliRun.of("import", valid.toString(), "--dry-run", "--db", db());
            assertEquals(0, run.exitCode(), "every base is valid: " + base.name() + " " + run.err());
        }
        List<String> firsts = bases.stream().filter(base -> !base.json()).map(base -> folder.resolve("valid").resolve(base.name()).toString())
                .toList();
        List<String> importAll = new ArrayList<>(List.of("import"));
        importAll.addAll(firsts);
        importAll.addAll(List.of("--db", db()));
        assertEquals(0, CliRun.of(importAll.toArray(String[]::new)).exitCode());
        byte[] before = backup("before.json");

        SplittableRandom random = new SplittableRandom(20261204);
        Path fuzz = Files.createDirectories(folder.resolve("fuzz"));
        Map<String, Integer> refusedByMutation = new TreeMap<>();
        List<BadFiles.Bad> overHttp = new ArrayList<>();
        for (int index = 0; index < FILES; index++) {
            BadFiles.Bad bad = BadFiles.generate(random, index, bases);
            Path file = fuzz.resolve(bad.name());
            Files.write(file, bad.bytes());
            CliRun run = CliRun.of("import", file.toString(), "--db", db());
            String shown = bad.name() + ": " + run.err();
            assertEquals(2, run.exitCode(), shown);
            assertEquals(1, run.err().strip().lines().count(), shown);
            assertTrue(run.err().startsWith("kneepoint: fuzz-"), shown);
            assertTrue(run.err().length() < 600, "a short line: " + shown.substring(0, Math.min(300, shown.length())));
            refusedByMutation.merge(bad.mutation(), 1, Integer::sum);
            if (index % HTTP_EVERY == 0) {
                overHttp.add(bad);
            }
        }
        assertEquals(FILES, refusedByMutation.values().stream().mapToInt(Integer::intValue).sum());
        assertTrue(refusedByMutation.size() >= 20, "many kinds of mutation were tried: " + refusedByMutation);
        assertArrayEquals(before, backup("after-cli.json"), "the command line wrote nothing");

        try (RunningServer server = RunningServer.over(DatabaseLocation.ofFolder(folder.resolve("library")))) {
            for (BadFiles.Bad bad : overHttp) {
                HttpResponse<String> response = server.upload("/api/import", bad.name(), bad.bytes());
                assertEquals(400, response.statusCode(), bad.name() + ": " + response.body());
                JsonNode error = RunningServer.json(response).get("error");
                assertEquals("BAD_INPUT", error.get("code").asText(), response.body());
                assertEquals(1, error.get("message").asText().lines().count(), response.body());
            }
        }
        assertArrayEquals(before, backup("after-http.json"), "the API wrote nothing");
        System.out.println("import fuzz: " + FILES + " files refused by the CLI (exit 2), " + overHttp.size()
                + " of them also by the API (400); by mutation: " + refusedByMutation);
    }
}
