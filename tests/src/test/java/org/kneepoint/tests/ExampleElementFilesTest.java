package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The invented element-field example in {@code examples/} is what {@link ExampleElementFiles} makes, and it runs. */
class ExampleElementFilesTest {

    private static final Path EXAMPLES = Path.of("..", "examples");

    @Test
    void example_files_are_the_analytic_block_field_of_their_generator() throws Exception {
        for (int i = 0; i < 3; i++) {
            assertEquals(ExampleElementFiles.text(i), Files.readString(EXAMPLES.resolve(ExampleElementFiles.NAMES.get(i))),
                    ExampleElementFiles.NAMES.get(i));
        }
    }

    @Test
    void the_stronger_load_cases_push_more_of_the_block_past_the_knee() throws Exception {
        List<String> args = new ArrayList<>(List.of(("check-elements " + ExampleElementFiles.GRADE + " --temperature 80C --json").split(" ")));
        ExampleElementFiles.NAMES.forEach(name -> args.add(EXAMPLES.resolve(name).toString()));
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertEquals(0, run.exitCode(), run.err());
        JsonNode json = new ObjectMapper().readTree(run.out());
        JsonNode cases = json.get("loadCases");
        assertEquals(250, json.get("elements").asInt());
        assertTrue(cases.get(0).get("volumeFractionPastKnee").asDouble() < cases.get(1).get("volumeFractionPastKnee").asDouble()
                && cases.get(1).get("volumeFractionPastKnee").asDouble() < cases.get(2).get("volumeFractionPastKnee").asDouble(),
                cases.toString());
        assertTrue(json.get("irreversibleLossPercent").asDouble() > 0.0);
    }
}
