package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The packaged jar, run as a separate process the way {@code ./kneepoint} runs it. */
@Tag("slow")
class RunnableJarTest {

    private static final Path JAR = Path.of("..", "server", "target", "kneepoint.jar");

    private record Result(int exitCode, String out, String err) {
    }

    private static Result run(Path folder, String... args) throws IOException, InterruptedException {
        Path out = folder.resolve("out.txt");
        Path err = folder.resolve("err.txt");
        List<String> command = new java.util.ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-jar", JAR.toString()));
        command.addAll(List.of(args));
        Process process = new ProcessBuilder(command).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        assertTrue(process.waitFor(60, TimeUnit.SECONDS), "the jar finished");
        return new Result(process.exitValue(), Files.readString(out, StandardCharsets.UTF_8), Files.readString(err, StandardCharsets.UTF_8));
    }

    @Test
    void the_jar_characterizes_an_example_file_as_json(@TempDir Path folder) throws Exception {
        Result result = run(folder, "curve", Path.of("..", "examples", "invented-sintered-ndfeb-120C.csv").toString(), "--json");
        assertEquals(0, result.exitCode(), result.err());
        assertEquals(393.15, new ObjectMapper().readTree(result.out()).get("temperatureK").asDouble(), 1e-9);
    }

    @Test
    void the_jar_reports_bad_input_with_exit_code_2_and_no_stack_trace(@TempDir Path folder) throws Exception {
        Path bad = folder.resolve("bad.csv");
        Files.writeString(bad, "H [kA/m],J [T]\n0,1.2\n-1,x\n");
        Result result = run(folder, "curve", bad.toString());
        assertEquals(2, result.exitCode());
        assertEquals("", result.out());
        assertEquals("kneepoint: bad.csv, line 3, column 2 (J [T]): expected a finite number, got 'x'", result.err().strip());
    }
}
